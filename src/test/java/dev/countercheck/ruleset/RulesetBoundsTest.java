package dev.countercheck.ruleset;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.input.InputError;
import dev.countercheck.input.SourceLocation;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

/**
 * What a ruleset may not do, refused at load with its place: expressions too deep, too long or too
 * costly for the evaluator; parameters outside the range of their kind; an extends chain without
 * end; a file that is not a ruleset (never echoed); a submission naming a file instead of an id.
 * Ids and extends resolve against the checker's folder and the naming file, never the working
 * folder, and a local file that replaces a bundled ruleset is named as such.
 */
class RulesetBoundsTest {

    private static final String HEAD = """
            ruleset: 1
            id: house
            extends: en1992-recommended
            title: House
            """;

    @TempDir
    Path dir;

    private RulesetLoader loader(Optional<Path> folder) {
        return new RulesetLoader(folder, ProjectReviewer.RULE_VOCABULARY);
    }

    private List<InputError> errors(String house) throws IOException {
        Files.writeString(dir.resolve("house.yaml"), HEAD + house);
        return catchThrowableOfType(RulesetException.class, () -> loader(Optional.of(dir)).load("house")).errors();
    }

    private static String formula(String expression) {
        return "checks:\n  max-steel: {applies_to: [pile-cap], scope: section, derived: {as_max: {formula: '" + expression
                + "', unit: mm2, clause: x}}, values: [as_max], requirements: []}\n";
    }

    @Test
    void thousandsOfUnaryMinusSignsAreRefusedAtLoadNotInAStackOverflow() throws IOException {
        assertThat(errors(formula("-".repeat(900) + "as_x"))).singleElement().satisfies(e -> {
            assertThat(e.location().line()).isEqualTo(6);
            assertThat(e.location().column()).isPositive();
            assertThat(e.message()).contains("more than " + ExpressionBounds.MAX_TOKENS);
        });
    }

    @Test
    void aLongChainOfOperatorsIsRefused() throws IOException {
        assertThat(errors(formula("as_x" + "+1".repeat(400)))).singleElement()
                .satisfies(e -> assertThat(e.message()).contains("split it into derived quantities"));
    }

    @Test
    void deepParenthesesAreRefused() throws IOException {
        assertThat(errors(formula("(".repeat(30) + "as_x" + ")".repeat(30)))).singleElement()
                .satisfies(e -> assertThat(e.message()).contains("deeper than " + ExpressionBounds.MAX_NESTING));
    }

    @Test
    void aTextOfThousandsOfCharactersIsRefused() throws IOException {
        assertThat(errors(formula("as_x" + " ".repeat(2000)))).singleElement()
                .satisfies(e -> assertThat(e.message()).contains("characters, more than"));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            as_x + FACT(100000000)      | the function FACT is not offered to rules
            as_x + fact(1e2)            | the function fact is not offered to rules
            as_x + Fact (1e2)           | the function Fact is not offered to rules
            ROUND(as_x, 100)            | the function ROUND is not offered to rules
            SQRT(1e300000)              | the number 1e300000 is larger than any a rule needs
            as_x * 2000000              | the number 2000000 is larger than any a rule needs
            2 ^ 999999999               | a power is raised only to a number of at most 10
            as_x ^ as_x                 | a power is raised only to a number of at most 10
            as_x ^ (1/3 + 20)           | a power is raised only to a number of at most 10
            """)
    void aCostlyCalculationIsRefused(String expression, String message) throws IOException {
        assertThat(errors(formula(expression))).singleElement().satisfies(e -> {
            assertThat(e.location().line()).isEqualTo(6);
            assertThat(e.message()).contains(message);
        });
    }

    @Test
    void smallPowersAndTheAllowedFunctionsAreAccepted() throws Exception {
        Files.writeString(dir.resolve("house.yaml"), HEAD + formula("MAX(1, MIN(2, ABS(SQRT(as_x) ^ 0.5 + 2 ^ (1/3))))"));
        assertThat(loader(Optional.of(dir)).load("house").checks()).containsKey("max-steel");
    }

    @ParameterizedTest(name = "{0}: {1}")
    @CsvSource(delimiter = '|', textBlock = """
            gamma_c               | 0      | a partial factor
            gamma_c               | 0.9    | a partial factor
            gamma_s               | 1e308  | a partial factor
            concrete_unit_weight  | 1e308  | a unit weight
            concrete_unit_weight  | 0      | a unit weight
            pile_tolerance        | -5     | a length
            lever_arm_factor      | 0      | a factor
            strut_angle_min       | 90     | an angle
            claim_tolerance       | 1000   | a plain number
            claim_floor_pressure  | -1     | a pressure
            """)
    void anImplausibleParameterIsRefusedAtItsValue(String name, String value, String kind) throws IOException {
        List<InputError> errors = errors("parameters:\n  " + name + ": {value: " + value + ", clause: NA}\n");
        assertThat(errors).singleElement().satisfies(e -> {
            assertThat(e.location().line()).isEqualTo(6);
            assertThat(e.location().column()).as("the column of the value").isEqualTo(name.length() + 13);
            assertThat(e.path()).isEqualTo("parameters." + name + ".value");
            assertThat(e.message()).contains("is not plausible for " + kind);
        });
    }

    @Test
    void aPartialFactorOfOneIsAccepted() throws Exception {
        Files.writeString(dir.resolve("house.yaml"), HEAD + "parameters:\n  gamma_s: {value: 1.0, clause: NA}\n");
        assertThat(loader(Optional.of(dir)).load("house").number("gamma_s")).isEqualTo(1.0);
    }

    @Test
    void anExtendsChainLongerThanTheLimitIsRefusedAtTheExtendsThatExceedsIt() throws IOException {
        int files = RulesetLoader.MAX_CHAIN + 2;
        for (int i = 0; i < files; i++) {
            Files.writeString(dir.resolve("r" + i + ".yaml"), "ruleset: 1\nid: r" + i + "\ntitle: R\nextends: "
                    + (i == files - 1 ? "en1992-recommended" : "r" + (i + 1)) + "\n");
        }
        List<InputError> errors = catchThrowableOfType(RulesetException.class,
                () -> loader(Optional.of(dir)).load("r0")).errors();
        assertThat(errors).singleElement().satisfies(e -> {
            assertThat(e.location().file()).endsWith("r" + (RulesetLoader.MAX_CHAIN - 1) + ".yaml");
            assertThat(e.location().line()).isEqualTo(4);
            assertThat(e.message()).contains("longer than " + RulesetLoader.MAX_CHAIN);
        });
    }

    @Test
    void extendsResolvesAgainstTheFileThatSaysItNotTheWorkingFolder() throws Exception {
        Path base = Files.createDirectories(dir.resolve("firm/base"));
        Path house = Files.createDirectories(dir.resolve("firm/house"));
        Files.writeString(base.resolve("standard.yaml"), "ruleset: 1\nid: standard\ntitle: S\n"
                + "extends: en1992-recommended\nparameters:\n  gamma_c: {value: 1.45, clause: NA}\n");
        Files.writeString(house.resolve("annex.yaml"), "ruleset: 1\nid: annex\ntitle: A\nextends: ../base/standard.yaml\n"
                + "parameters:\n  gamma_s: {value: 1.1, clause: NA}\n");
        Files.writeString(house.resolve("rules.yaml"), "ruleset: 1\nid: rules\ntitle: R\nextends: annex\n");

        Ruleset r = loader(Optional.empty()).load(house.resolve("rules.yaml").toString());

        assertThat(r.number("gamma_c")).isEqualTo(1.45);
        assertThat(r.number("gamma_s")).isEqualTo(1.1);
        assertThat(r.files()).hasSize(4);
        assertThat(r.files().get(1)).isEqualTo(base.resolve("standard.yaml").toAbsolutePath().normalize().toString());
    }

    @Test
    void aFileThatIsNotARulesetIsRefusedWithoutShowingAnyOfItsLines() throws IOException {
        Path secret = Files.writeString(dir.resolve("credentials"), "db_password: s3cret-Value\n"
                + "api_token: tok-123456\nnot yaml at all: [\n");

        List<InputError> errors = catchThrowableOfType(RulesetException.class,
                () -> loader(Optional.empty()).load(secret.toString())).errors();

        assertThat(errors).singleElement().satisfies(e -> assertThat(e.message()).contains("is not a ruleset"));
        for (String line : Files.readAllLines(secret)) {
            assertThat(errors.toString()).as("no line of the file").doesNotContain(line.strip());
        }
        assertThat(errors.toString()).doesNotContain("s3cret").doesNotContain("tok-").doesNotContain("password");
    }

    @Test
    void aRulesetsFolderThatDoesNotExistIsRefusedRatherThanPassedOver() {
        List<InputError> errors = catchThrowableOfType(RulesetException.class,
                () -> loader(Optional.of(dir.resolve("typo"))).load("en1992-recommended")).errors();
        assertThat(errors).singleElement().satisfies(e -> assertThat(e.message()).contains("is not a folder"));
    }

    @Test
    void aSubmissionNamesARulesetByIdOnly() {
        SourceLocation at = new SourceLocation("job.yaml", 3, 12);
        for (String path : List.of("/etc/passwd", "../rulesets/house.yaml", "house.yaml", "C:\\rules\\x")) {
            List<InputError> errors = catchThrowableOfType(RulesetException.class,
                    () -> loader(Optional.of(dir)).loadId(path, at)).errors();
            assertThat(errors).as(path).singleElement().satisfies(e -> {
                assertThat(e.location()).isEqualTo(at);
                assertThat(e.message()).contains("is not a ruleset id").contains("--ruleset");
            });
        }
    }

    @Test
    void aLocalRulesetThatReplacesABundledOneSaysSoAndAnIdenticalCopyDoesNot() throws Exception {
        String bundled = Files.readString(Path.of("rulesets/en1992-uk-na.yaml"));
        Files.writeString(dir.resolve("en1992-uk-na.yaml"), bundled);
        assertThat(loader(Optional.of(dir)).load("en1992-uk-na").files())
                .noneMatch(f -> f.contains(RulesetLoader.SHADOWS));

        Files.writeString(dir.resolve("en1992-uk-na.yaml"), bundled.replace("title:", "title: Changed"));
        Ruleset r = loader(Optional.of(dir)).load("en1992-uk-na");

        assertThat(r.files().get(r.files().size() - 1)).startsWith(dir.resolve("en1992-uk-na.yaml").toString())
                .endsWith("(in place of the bundled ruleset en1992-uk-na)");
        Files.writeString(dir.resolve("house.yaml"), HEAD.replace("en1992-recommended", "en1992-uk-na"));
        assertThat(loader(Optional.empty()).load(dir.resolve("house.yaml").toString()).files())
                .as("an extends that finds a changed copy beside its file says so too")
                .anyMatch(f -> f.endsWith("(in place of the bundled ruleset en1992-uk-na)"));
        assertThat(loader(Optional.empty()).load("en1992-uk-na").files())
                .as("without the checker's folder, the bundled one")
                .containsExactly("rulesets/en1992-recommended.yaml", "rulesets/en1992-uk-na.yaml");
    }
}
