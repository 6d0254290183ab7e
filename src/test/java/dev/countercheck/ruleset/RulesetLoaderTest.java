package dev.countercheck.ruleset;

import dev.countercheck.input.InputError;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

/** Loading rulesets: the extends chain, origins, and every refusal located in its file. */
class RulesetLoaderTest {

    private static final String BASE = """
            ruleset: 1
            id: base
            title: Base
            parameters:
              gamma_c: {symbol: γc, value: 1.5, unit: "-", clause: "2.4.2.4", note: concrete}
              gamma_s: {symbol: γs, value: 1.15, unit: "-", clause: "2.4.2.4", note: steel}
            """;

    private static RulesetLoader loader(Path dir) {
        return new RulesetLoader(dir, new RuleVocabulary(Map.of(), Set.of("gamma_c", "gamma_s"), Set.of()));
    }

    private static RulesetLoader loaderRaising(Path dir, Set<String> findingKinds) {
        return new RulesetLoader(dir, new RuleVocabulary(Map.of(), Set.of("gamma_c", "gamma_s"), findingKinds));
    }

    @Test
    void aFirmMovesASeverityAndKeepsItsMeaning(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("base.yaml"), BASE + """
                severities:
                  claim-conservative: {severity: minor, meaning: a claim on the safe side}
                """);
        Files.writeString(dir.resolve("firm.yaml"), """
                ruleset: 1
                id: firm
                extends: base
                title: Firm
                severities:
                  claim-conservative: {severity: note}
                """);
        Ruleset r = loaderRaising(dir, Set.of("claim-conservative")).load("firm");
        assertThat(r.severity("claim-conservative")).isEqualTo("note");
        assertThat(r.severities().get("claim-conservative").meaning()).isEqualTo("a claim on the safe side");
        assertThat(r.severities().get("claim-conservative").origin()).endsWith("firm.yaml");
    }

    @Test
    void aChainThatGivesARaisedKindNoSeverityIsRefused(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("base.yaml"), BASE + """
                severities:
                  capacity: {severity: urgent, meaning: a capacity exceeded}
                """);
        List<InputError> errors = catchThrowableOfType(RulesetException.class,
                () -> loaderRaising(dir, Set.of("capacity", "not-reviewed")).load("base")).errors();
        assertThat(errors).anySatisfy(e -> assertThat(e.message()).contains("'urgent' is not one of"));
        assertThat(errors).anySatisfy(e -> assertThat(e.message()).contains("no severity to").contains("not-reviewed"));
    }

    private static List<InputError> errors(Path dir, String reference) {
        return catchThrowableOfType(RulesetException.class, () -> loader(dir).load(reference)).errors();
    }

    @Test
    void anOverrideKeepsItsParentsValuesAndNamesItsOwnFile(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("base.yaml"), BASE);
        Files.writeString(dir.resolve("annex.yaml"), """
                ruleset: 1
                id: annex
                extends: base
                title: Annex
                parameters:
                  gamma_c: {value: 1.4, clause: "NA 2.4.2.4"}
                """);
        Ruleset r = loader(dir).load("annex");
        assertThat(r.number("gamma_c")).isEqualTo(1.4);
        assertThat(r.parameter("gamma_c").origin()).endsWith("annex.yaml");
        assertThat(r.parameter("gamma_c").symbol()).isEqualTo("γc");
        assertThat(r.parameter("gamma_s").origin()).endsWith("base.yaml");
        assertThat(r.files()).hasSize(2);
        assertThat(r.sha256()).matches("[0-9a-f]{64}");
    }

    @Test
    void aRecalledValueIsMarkedAndAnOverrideStatesItsOwnSource(@TempDir Path dir) throws Exception {
        Files.writeString(dir.resolve("base.yaml"), BASE.replace("note: steel}", "note: steel, source: from-memory}"));
        Files.writeString(dir.resolve("annex.yaml"), """
                ruleset: 1
                id: annex
                extends: base
                title: Annex
                parameters:
                  gamma_c: {value: 1.4, clause: "NA 2.4.2.4", source: from-memory}
                  gamma_s: {value: 1.15, clause: "NA 2.4.2.4", source: published}
                """);
        Ruleset base = loader(dir).load("base");
        assertThat(base.parameter("gamma_s").source()).isEqualTo(ValueSource.FROM_MEMORY);
        assertThat(base.parameter("gamma_c").source()).isEqualTo(ValueSource.STATED);
        assertThat(base.parameter("gamma_s").asStep().remark()).hasValue(ValueSource.MARK);
        Ruleset annex = loader(dir).load("annex");
        assertThat(annex.parameter("gamma_s").source()).as("verified in the annex").isEqualTo(ValueSource.PUBLISHED);
        assertThat(annex.recalled()).singleElement().satisfies(r -> assertThat(r).startsWith("gamma_c = 1.4 (NA"));
    }

    @Test
    void anUnknownSourceIsLocated(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("base.yaml"), BASE.replace("note: steel}", "note: steel, source: memory}"));
        assertThat(errors(dir, "base")).singleElement().satisfies(e -> {
            assertThat(e.location().line()).as("the gamma_s line").isEqualTo(6);
            assertThat(e.message()).contains("unknown source 'memory'").contains("from-memory");
        });
    }

    @Test
    void overridingAParameterTheParentLacksIsLocatedWithASuggestion(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("base.yaml"), BASE);
        Files.writeString(dir.resolve("annex.yaml"), """
                ruleset: 1
                id: annex
                extends: base
                title: Annex
                parameters:
                  gama_c: {value: 1.4, clause: "NA"}
                """);
        assertThat(errors(dir, "annex")).singleElement().satisfies(e -> {
            assertThat(e.location().line()).isEqualTo(6);
            assertThat(e.location().column()).isEqualTo(3);
            assertThat(e.message()).contains("did you mean 'gamma_c'");
        });
    }

    @Test
    void anExtendsLoopIsRefused(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("a.yaml"), "ruleset: 1\nid: a\ntitle: A\nextends: b\nparameters: {}\n");
        Files.writeString(dir.resolve("b.yaml"), "ruleset: 1\nid: b\ntitle: B\nextends: a\nparameters: {}\n");
        assertThat(errors(dir, "a")).anySatisfy(e -> assertThat(e.message()).contains("loops"));
    }

    @Test
    void anExtendsThatDoesNotResolveIsLocatedAtTheReference(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("a.yaml"), "ruleset: 1\nid: a\ntitle: A\nextends: nowhere\nparameters: {}\n");
        assertThat(errors(dir, "a")).singleElement().satisfies(e -> {
            assertThat(e.location().line()).isEqualTo(4);
            assertThat(e.message()).contains("nowhere");
        });
    }

    @Test
    void aChainWithoutAParameterTheReviewNeedsIsRefused(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("thin.yaml"), """
                ruleset: 1
                id: thin
                title: Thin
                parameters:
                  gamma_c: {symbol: γc, value: 1.5, unit: "-", clause: "2.4.2.4", note: concrete}
                """);
        assertThat(errors(dir, "thin")).singleElement()
                .satisfies(e -> assertThat(e.message()).contains("gamma_s"));
    }

    @Test
    void everyProblemOfAFileIsListed(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("bad.yaml"), """
                ruleset: 1
                id: bad
                title: Bad
                colour: blue
                parameters:
                  gamma_c: {symbol: γc, value: "one and a half", unit: "-", clause: "x", note: y}
                  gamma_s: {symbol: γs, value: 1.15, unit: "-", note: steel}
                """);
        List<InputError> errors = errors(dir, "bad");
        assertThat(errors).extracting(InputError::message).anySatisfy(m -> assertThat(m).contains("unknown key 'colour'"))
                .anySatisfy(m -> assertThat(m).contains("expected a number"))
                .anySatisfy(m -> assertThat(m).contains("has no 'clause'"));
    }

    @Test
    void aFileThatIsNotARulesetIsRefused(@TempDir Path dir) throws IOException {
        Path notes = dir.resolve("notes.yaml");
        Files.writeString(notes, "shopping: [milk, bread]\n");
        assertThatThrownBy(() -> loader(dir).load(notes.toString())).isInstanceOf(RulesetException.class);
    }

    @Test
    void theShippedRulesetsLoadWithEveryParameterTheReviewNeeds() throws Exception {
        for (String id : List.of("en1992-recommended", "en1992-uk-na", "house-example")) {
            Ruleset r = new RulesetLoader(Path.of("rulesets"),
                    dev.countercheck.element.ProjectReviewer.RULE_VOCABULARY).load(id);
            assertThat(r.id()).isEqualTo(id);
        }
    }
}
