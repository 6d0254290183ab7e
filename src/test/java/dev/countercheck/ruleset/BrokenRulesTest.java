package dev.countercheck.ruleset;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.input.InputError;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

/**
 * Every kind of broken rule is refused at load, before any review, with its file, line and column.
 * Each case is a house ruleset over the shipped recommended one that adds one bad check.
 */
class BrokenRulesTest {

    private static final String HEAD = """
            ruleset: 1
            id: broken
            extends: en1992-recommended
            title: Broken
            checks:
            """;

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            unknown variable   |  max-steel: {applies_to: [pile-cap], scope: section, derived: {as_max: {formula: 'as_q * 2', unit: mm2, clause: x}}, values: [as_max], requirements: []}                                  | 6 | 'as_q'
            unknown table      |  max-steel: {applies_to: [pile-cap], scope: section, derived: {as_max: {formula: 'no_such_table(1, 2)', unit: mm2, clause: x}}, values: [as_max], requirements: []}                     | 6 | no_such_table
            type error         |  max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [{that: 'as_x + 1', severity: major, message: m, clause: x}]}                                    | 6 | must be a condition
            derived cycle      |  max-steel: {applies_to: [pile-cap], scope: section, derived: {a: {formula: 'b + 1', unit: mm2, clause: x}, b: {formula: 'a + 1', unit: mm2, clause: x}}, values: [], requirements: []}     | 6 | cycle
            rule without clause|  max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [{that: 'as_x > 0', severity: major, message: m}]}                                              | 6 | every rule names the clause
            unknown check      |  max-stell: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: []}                                                                                                 | 6 | not a check a ruleset can define
            unknown scope      |  max-steel: {applies_to: [pile-cap], scope: slab, derived: {}, values: [], requirements: []}                                                                                                | 6 | unknown scope
            wrong unit         |  max-steel: {applies_to: [pile-cap], scope: section, derived: {as_max: {formula: 'as_x', unit: mm, clause: x}}, values: [as_max], requirements: []}                                          | 6 | reported in mm2
            bad severity       |  max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [{that: 'as_x > 0', severity: grave, message: m, clause: x}]}                                    | 6 | is not one of critical
            unknown type       |  max-steel: {applies_to: [pile-kap], scope: section, derived: {}, values: [], requirements: []}                                                                                             | 6 | unknown element type
            no type            |  max-steel: {scope: section, derived: {}, values: [], requirements: []}                                                                                                                   | 6 | is missing: every check names the element types it applies to
            unknown placeholder|  max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [{that: 'as_x > 0', severity: major, message: 'see {nothing}', clause: x}]}                     | 6 | {nothing}
            variant of a type the check does not apply to | max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [], for: {pad-footing: {}}} | 6 | is not a type the check applies to (pile-cap)
            variant of a quantity the check does not derive | max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [], for: {pile-cap: {derived: {as_max: {formula: 'as_x', clause: x}}}}} | 6 | to restate
            variant with an unknown variable | max-steel: {applies_to: [pile-cap, pad-footing], scope: section, derived: {as_max: {formula: 'as_x', unit: mm2, clause: x}}, values: [as_max], requirements: [], for: {pad-footing: {derived: {as_max: {formula: 'as_q', clause: x}}}}} | 6 | 'as_q'
            variant restating nothing | max-steel: {applies_to: [pile-cap], scope: section, derived: {as_max: {formula: 'as_x', unit: mm2, clause: x}}, values: [], requirements: [], for: {pile-cap: {derived: {as_max: {}}}}} | 6 | a restatement gives its formula, its clause or both
            variant restating a unit | max-steel: {applies_to: [pile-cap], scope: section, derived: {as_max: {formula: 'as_x', unit: mm2, clause: x}}, values: [], requirements: [], for: {pile-cap: {derived: {as_max: {formula: 'as_y', unit: mm, clause: x}}}}} | 6 | unknown key
            variant of a finding no requirement raises | max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [{that: 'as_x > 0', finding: as-x, severity: major, message: m, clause: x}], for: {pile-cap: {requirements: {as-y: {message: m}}}}} | 6 | no requirement of the check raises finding
            variant requirement without words | max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [{that: 'as_x > 0', finding: as-x, severity: major, message: m, clause: x}], for: {pile-cap: {requirements: {as-x: {}}}}} | 6 | a restatement gives its message, its clause or both
            variant message with an unknown name | max-steel: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: [{that: 'as_x > 0', finding: as-x, severity: major, message: m, clause: x}], for: {pile-cap: {requirements: {as-x: {message: 'see {nothing}'}}}}} | 6 | {nothing}
            """)
    void aBrokenRuleIsRefusedWithItsLocation(String name, String check, int line, String message, @TempDir Path dir)
            throws IOException {
        Files.writeString(dir.resolve("broken.yaml"), HEAD + "  " + check.strip() + "\n");
        List<InputError> errors = catchThrowableOfType(RulesetException.class,
                () -> new RulesetLoader(dir, ProjectReviewer.RULE_VOCABULARY).load("broken")).errors();
        assertThat(errors).as(name).anySatisfy(e -> {
            assertThat(e.location().file()).endsWith("broken.yaml");
            assertThat(e.location().line()).isEqualTo(line);
            assertThat(e.location().column()).isPositive();
            assertThat(e.message()).contains(message.replace("'", ""));
        });
    }

    @Test
    void twoChecksCannotDefineTheSameCheckOfOneElementType(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("broken.yaml"), HEAD
                + "  min-steel-x: {applies_to: [pile-cap], scope: section, derived: {}, values: [], requirements: []}\n");
        List<InputError> errors = catchThrowableOfType(RulesetException.class,
                () -> new RulesetLoader(dir, ProjectReviewer.RULE_VOCABULARY).load("broken")).errors();
        assertThat(errors).anySatisfy(e -> assertThat(e.message())
                .contains("'min-steel-x' of pile-cap is already defined by the check min-steel-{dir}"));
    }

    @Test
    void aVariantsErrorsArePlacedWhereTheVariantWritesThem(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("broken.yaml"), HEAD + """
                  max-steel:
                    applies_to: [pile-cap, pad-footing]
                    scope: section
                    derived:
                      as_max: {formula: 'as_x', unit: mm2, clause: x}
                    values: [as_max]
                    requirements:
                      - {that: 'as_x > 0', finding: as-x, severity: major, message: m, clause: x}
                    for:
                      pad-footing:
                        derived:
                          as_max: {formula: 'as_q', clause: x}
                        requirements:
                          as-x:
                            message: 'see {nothing}'
                """);
        List<InputError> errors = catchThrowableOfType(RulesetException.class,
                () -> new RulesetLoader(dir, ProjectReviewer.RULE_VOCABULARY).load("broken")).errors();
        assertThat(errors).anySatisfy(e -> {
            assertThat(e.message()).contains("'as_q'");
            assertThat(e.location().line()).isEqualTo(17);
            assertThat(e.location().column()).isEqualTo(11);
        }).anySatisfy(e -> {
            assertThat(e.message()).contains("{nothing}");
            assertThat(e.location().line()).isEqualTo(20);
            assertThat(e.location().column()).isEqualTo(22);
        }).as("none at the check's own lines").allSatisfy(e -> assertThat(e.location().line()).isIn(17, 20));
    }

    @Test
    void aVariantRestatesOneTypesFormulasAndRequirementsAndLeavesTheRestAsTheCheckStatesIt() throws RulesetException {
        Ruleset rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load("en1992-recommended");
        CheckDef pad = rules.rule("pad-footing", "cover").orElseThrow().def();
        CheckDef cap = rules.rule("pile-cap", "cover").orElseThrow().def();
        assertThat(pad).as("the check as written serves pads").isSameAs(rules.checks().get("cover"));
        assertThat(formula(pad, "required")).isEqualTo("MAX(c_nom, c_ground)");
        assertThat(formula(cap, "required")).isEqualTo("MAX(c_nom, c_ground, embedment)");
        assertThat(cap.derived().stream().map(CheckDef.DerivedDef::name))
                .as("the same quantities, in the same order").containsExactlyElementsOf(
                        pad.derived().stream().map(CheckDef.DerivedDef::name).toList());
        assertThat(cap.derived()).filteredOn(d -> !d.name().equals("required")).containsExactlyElementsOf(
                pad.derived().stream().filter(d -> !d.name().equals("required")).toList());
        assertThat(cap.requirements().get(0).message()).contains("pile embedment {embedment} mm");
        assertThat(pad.requirements().get(0).message()).doesNotContain("pile");
        assertThat(cap.requirements().subList(1, 3)).isEqualTo(pad.requirements().subList(1, 3));
        assertThat(rules.rule("pile-cap", "min-steel-x").orElseThrow().def().requirements().get(1).clause())
                .isEqualTo("EN 1992-1-1 9.8.1(3)");
        assertThat(rules.rule("pad-footing", "min-steel-x").orElseThrow().def().requirements().get(1).clause())
                .isEqualTo("EN 1992-1-1 9.8.2.1(1)");
        assertThat(derived(rules, "pile-cap", "crack-control", "sigma_s").clause()).contains("governing tie case");
        assertThat(derived(rules, "pad-footing", "crack-control", "sigma_s").clause()).doesNotContain("tie")
                .contains("the largest quasi-permanent and ULS axial forces");
        assertThat(derived(rules, "pad-footing", "crack-control", "sigma_s").formula())
                .as("a clause restated alone keeps the formula").isEqualTo(
                        derived(rules, "pile-cap", "crack-control", "sigma_s").formula());
        assertThat(rules.rule("pile-cap", "max-steel").orElseThrow().def()).as("a check without variants")
                .isSameAs(rules.rule("pad-footing", "max-steel").orElseThrow().def());
    }

    private static CheckDef.DerivedDef derived(Ruleset rules, String type, String check, String name) {
        return rules.rule(type, check).orElseThrow().def().derived().stream().filter(d -> d.name().equals(name))
                .findFirst().orElseThrow();
    }

    private static String formula(CheckDef check, String name) {
        return check.derived().stream().filter(d -> d.name().equals(name)).findFirst().orElseThrow().formula();
    }

    @Test
    void rulesAreFoundByElementTypeAndCheckId() throws RulesetException {
        Ruleset rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load("en1992-recommended");
        assertThat(rules.rule("pile-cap", "anchorage-y")).hasValueSatisfying(r -> {
            assertThat(r.def().id()).isEqualTo("anchorage-{dir}");
            assertThat(r.subject()).isEqualTo("y");
        });
        assertThat(rules.rule("pile-cap", "tie-x")).as("computed in Java, not by a rule").isEmpty();
        assertThat(rules.rule("pad-footing", "anchorage-x")).as("no such element type").isEmpty();
    }
}
