package dev.countercheck.ruleset;

import dev.countercheck.input.SourceLocation;
import org.junit.jupiter.api.Test;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A rule's formula and message texts, split once at their names, are filled from a run's values: every name the text
 * writes, not a function called nor a text literal; a name outside the check's layout from the run's extra values;
 * a name with no value as the caller shows it. Invented check (the texts only matter here).
 */
class NamedTextTest {

    private static final SourceLocation AT = new SourceLocation("invented.yaml", 1, 1);
    private static final String FORMULA = "MAX(As, k * b) + IF(b > 0, \"b\", \"none\")";
    private static final String MESSAGE = "needs {As} mm² against {missing} at {dir}";

    private static RuleLayout layout(Map<String, Variable> scope) {
        CheckDef check = new CheckDef("invented-check", List.of("pile_cap"), "cap", Optional.empty(), "not applicable",
                List.of(new CheckDef.DerivedDef("total", "T", FORMULA, "mm2", "6.1", AT)), List.of(),
                List.of(new CheckDef.RequirementDef("total > 0", "invented", "error", Optional.empty(), MESSAGE,
                        "6.1", AT)),
                List.of(), Map.of(), "invented", AT);
        return new RuleExpressions(Map.of(), Map.of()).layout(check, scope);
    }

    private static String shown(Object value, String name) {
        return value == null ? "<" + name + ">" : name + "=" + value;
    }

    @Test
    void aFormulaShowsTheValueOfEveryNameItWritesButFunctionsAndTextLiterals() {
        Map<String, Variable> scope = new LinkedHashMap<>();
        scope.put("As", Variable.number("mm2", "area", 1));
        scope.put("b", Variable.number("mm", "width", 1));
        RuleLayout layout = layout(scope);
        Map<String, Object> values = new LinkedHashMap<>();
        values.put("As", 1250.0);
        values.put("b", 400.0);
        values.put("k", 2.0); // not declared by the scope: the run's extra value

        String filled = layout.formula(0).fill(layout.frame(values, "x"), NamedTextTest::shown);

        assertThat(filled).isEqualTo("MAX(As=1250.0, k=2.0 * b=400.0) + IF(b=400.0 > 0, \"b\", \"none\")");
    }

    @Test
    void aMessageFillsItsPlaceholdersAndLeavesANameWithoutValueToTheCaller() {
        Map<String, Variable> scope = new LinkedHashMap<>();
        scope.put("As", Variable.number("mm2", "area", 1));
        RuleLayout layout = layout(scope);

        String filled = layout.message(MESSAGE).fill(layout.frame(Map.of("As", 905.0), "y"), NamedTextTest::shown);

        assertThat(filled).isEqualTo("needs As=905.0 mm² against <missing> at dir=y");
    }
}
