package dev.countercheck.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.countercheck.ruleset.ValueSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static dev.countercheck.cli.SampleSubmissionsTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * A value a ruleset marks {@code source: from-memory} keeps the mark wherever it is shown: the
 * {@code rules} listing (text and markdown), the JSON result's assumptions and trace, and the HTML
 * report. The UK annex's values are recalled from memory (rulesets/en1992-uk-na.yaml).
 */
class FromMemoryMarkTest {

    private static final String MARK = ValueSource.MARK;

    @Test
    void theRulesListingMarksEveryRecalledValue() {
        SampleSubmissionsTest.Run text = run("rules", "--ruleset", "en1992-uk-na");
        assertThat(text.exit()).isZero();
        assertThat(text.out().lines().filter(l -> l.startsWith("fck_max_shear ")).findFirst().orElseThrow())
                .as("the annex's C50/60 limit in shear").contains(" 50 ").contains(MARK);
        assertThat(text.out().lines().filter(l -> l.startsWith("bs8500_cover ")).findFirst().orElseThrow())
                .contains(MARK);
        assertThat(text.out().lines().filter(l -> l.startsWith("gamma_c ")).findFirst().orElseThrow())
                .as("a value the file does not mark").doesNotContain(MARK);

        SampleSubmissionsTest.Run markdown = run("rules", "--ruleset", "en1992-uk-na", "--format", "markdown");
        assertThat(markdown.out().lines().filter(l -> l.startsWith("| `alpha_cc` |")).findFirst().orElseThrow())
                .contains("0.85").contains(MARK);
    }

    @Test
    void theReviewCarriesTheMarkIntoTheJsonAndTheReport(@TempDir Path dir) throws Exception {
        Path sample = Path.of("sample-submissions/quayside-annex.yaml");
        assertThat(Files.readString(sample)).contains("en1992-uk-na");
        run("review", sample.toString(), "--out", dir.toString(), "--date", "2026-12-01");

        JsonNode result = new ObjectMapper().readTree(dir.resolve("quayside-annex.json").toFile());
        String assumptions = result.get("assumptions").toString();
        assertThat(assumptions).contains("recalled from memory").contains("alpha_cc = 0.85")
                .contains("fck_max_shear = 50 MPa").contains("table bs8500_cover");
        boolean traced = false;
        for (JsonNode e : result.get("elements")) {
            for (JsonNode c : e.get("checks")) {
                for (JsonNode step : c.get("trace")) {
                    traced |= step.path("remark").asText().contains(MARK);
                }
            }
        }
        assertThat(traced).as("a trace step that uses a recalled value says so").isTrue();

        String html = Files.readString(dir.resolve("quayside-annex.html"), StandardCharsets.UTF_8);
        assertThat(html).contains("recalled from memory").contains("table bs8500_cover").contains(MARK);
    }
}
