package dev.countercheck.submission;

import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Collectors;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The table of checks, quantities, units and safe sides in {@code docs/pile-cap.md} is generated
 * from the pile cap's check catalogue ({@link PileCapChecks}); this test keeps the two equal. Run it with
 * {@code -Dcountercheck.writeDocs=true} to rewrite the generated part after changing the catalogue.
 */
class CheckCatalogueDocsTest {

    static final Path PAGE = Path.of("docs/pile-cap.md");
    static final Path PAD_PAGE = Path.of("docs/pad-footing.md");
    static final String START = "<!-- generated from the check catalogue: do not edit by hand (CheckCatalogueDocsTest) -->\n";
    static final String END = "<!-- end of generated part -->\n";

    /** The generated table: one row per check, its quantities with unit and unsafe side. */
    static String table(CheckCatalogue catalogue) {
        StringBuilder out = new StringBuilder("| check | title | basis | kind | quantities (unit, unconservative claim) |\n"
                + "|---|---|---|---|---|\n");
        for (CheckSpec c : catalogue.checks().values()) {
            String quantities = c.quantities().stream().map(CheckCatalogueDocsTest::quantity)
                    .collect(Collectors.joining("; "));
            out.append("| `").append(c.id()).append("` | ").append(c.title()).append(" | ").append(c.basis())
                    .append(" | ").append(c.kind().name().toLowerCase(java.util.Locale.ROOT)).append(" | ")
                    .append(quantities).append(" |\n");
        }
        return out.toString();
    }

    private static String quantity(QuantitySpec q) {
        return "`" + q.name() + "` (" + q.unit() + ", "
                + (q.safeSide() == CheckCatalogue.SafeSide.DEMAND ? "smaller" : "larger") + ")";
    }

    @Test
    void theClaimsTableOfThePileCapPageIsTheCatalogue() throws IOException {
        assertTableIsTheCatalogue(PAGE, PileCapChecks.CATALOGUE);
    }

    @Test
    void theClaimsTableOfThePadFootingPageIsTheCatalogue() throws IOException {
        assertTableIsTheCatalogue(PAD_PAGE, PadFootingChecks.CATALOGUE);
    }

    private static void assertTableIsTheCatalogue(Path file, CheckCatalogue catalogue) throws IOException {
        String page = Files.readString(file, StandardCharsets.UTF_8);
        int start = page.indexOf(START);
        int end = page.indexOf(END);
        assertThat(start).as("the page marks its generated part").isNotNegative();
        assertThat(end).isGreaterThan(start);
        String generated = table(catalogue);
        String expected = page.substring(0, start + START.length()) + generated + page.substring(end);
        if (Boolean.getBoolean("countercheck.writeDocs")) {
            Files.writeString(file, expected, StandardCharsets.UTF_8);
        }
        assertThat(page).as(file + " is behind the check catalogue: rerun this test with "
                + "-Dcountercheck.writeDocs=true").isEqualTo(expected);
    }

    @Test
    void everyCheckOfThePageIsInTheCatalogueAndEveryCatalogueCheckHasASection() throws IOException {
        for (var page : java.util.Map.of(PAGE, PileCapChecks.CATALOGUE, PAD_PAGE, PadFootingChecks.CATALOGUE)
                .entrySet()) {
            String text = Files.readString(page.getKey(), StandardCharsets.UTF_8);
            String prose = text.substring(0, text.indexOf(START));
            for (String id : page.getValue().checks().keySet()) {
                assertThat(prose).as(page.getKey() + ": a method section names " + id)
                        .containsPattern("### [^\\n]*\\b" + id + "\\b");
            }
        }
    }
}
