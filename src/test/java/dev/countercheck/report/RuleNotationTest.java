package dev.countercheck.report;

import org.junit.jupiter.api.Test;

import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The report's rendering of a rule's expression (issue 12 item 2): each rule of {@link RuleNotation} on its own,
 * then brackets and precedence. Expected texts are the notation decided here (docs/results.md, reading the
 * derivation); no published source.
 */
class RuleNotationTest {

    private static final RuleNotation NOTATION = new RuleNotation(Map.of("phi", "φ", "as_x", "As,x", "ac_x", "Ac,x",
            "lever_arm_factor", "z/d", "crack_bar_spacing", "smax", "cover_k2_soil", "k2"));

    private static String render(String expression) {
        return NOTATION.render(expression).orElseThrow();
    }

    @Test
    void namesBecomeTheirSymbolsAndANameWithNoneStaysAsWritten() {
        assertThat(render("phi")).isEqualTo("φ");
        assertThat(render("as_min_coefficient * phi")).isEqualTo("as_min_coefficient·φ");
        assertThat(render("lever_arm_factor * phi")).as("a symbol that is an expression is bracketed")
                .isEqualTo("(z/d)·φ");
    }

    @Test
    void operatorsAreWrittenAsTheOtherStepsWriteThem() {
        assertThat(render("a * b / c - d + e")).isEqualTo("a·b/c − d + e");
        assertThat(render("a <= b")).isEqualTo("a ≤ b");
        assertThat(render("a >= b")).isEqualTo("a ≥ b");
        assertThat(render("a != b")).isEqualTo("a ≠ b");
        assertThat(render("a == b")).isEqualTo("a = b");
        assertThat(render("a < b && c > d || e")).isEqualTo("(a < b and c > d) or e");
        assertThat(render("!a")).isEqualTo("not a");
    }

    @Test
    void functionsReadAsInTheStandard() {
        assertThat(render("MAX(a, b, 10)")).isEqualTo("max(a; b; 10)");
        assertThat(render("MIN(a, b)")).isEqualTo("min(a; b)");
        assertThat(render("ABS(a - b)")).isEqualTo("|a − b|");
        assertThat(render("SQRT(a)")).isEqualTo("√(a)");
        assertThat(render("crack_bar_spacing(sigma_s, w_max)")).as("a table's lookup: its symbol, then the keys")
                .isEqualTo("smax(sigma_s; w_max)");
    }

    @Test
    void aConditionalReadsThenIfElseAndIsBracketedInsideAnythingLarger() {
        assertThat(render("IF(phi <= 32, 1, (132 - phi) / 100)")).isEqualTo("1 if φ ≤ 32, else (132 − φ)/100");
        assertThat(render("0.04 * IF(x == 1, ac_x, 2)")).isEqualTo("0.04·(Ac,x if x = 1, else 2)");
        assertThat(render("IF(c == \"soil\", cover_k2_soil, IF(c == \"blinding\", 40, 0))"))
                .isEqualTo("k2 if c = \"soil\", else (40 if c = \"blinding\", else 0)");
        assertThat(render("MAX(0.7, IF(bent, 1, 2))")).isEqualTo("max(0.7; (1 if bent, else 2))");
    }

    @Test
    void bracketsWhereTheOrderOfOperationsNeedsThemAndNowhereElse() {
        assertThat(render("(a + b) * c")).isEqualTo("(a + b)·c");
        assertThat(render("a - (b - c)")).isEqualTo("a − (b − c)");
        assertThat(render("a - (b + c)")).isEqualTo("a − (b + c)");
        assertThat(render("a + (b - c)")).isEqualTo("a + b − c");
        assertThat(render("a / (b * c)")).isEqualTo("a/(b·c)");
        assertThat(render("(a / b) * c")).isEqualTo("a/b·c");
        assertThat(render("((a))")).isEqualTo("a");
        assertThat(render("a - -5")).isEqualTo("a − (−5)");
        assertThat(render("-(a + b)")).isEqualTo("−(a + b)");
        assertThat(render("(a + b) ^ (1 / 3)")).isEqualTo("(a + b)^(1/3)");
        assertThat(render("a || b || c")).isEqualTo("a or b or c");
        assertThat(render("a && (b || c)")).isEqualTo("a and (b or c)");
    }

    @Test
    void textsListsAndTruthValuesStayAsWritten() {
        assertThat(render("durability_cover(4, [XC2, XD1])")).isEqualTo("durability_cover(4; [XC2, XD1])");
        assertThat(render("IF(true, \"a b\", 1.5e-3)")).isEqualTo("\"a b\" if true, else 1.5e-3");
    }

    @Test
    void textThatIsNotARuleExpressionIsNotRendered() {
        assertThat(NOTATION.render("fyk/γs")).isEmpty();
        assertThat(NOTATION.render("max(av; 0.5·d)")).isEmpty();
        assertThat(NOTATION.render("a b")).isEmpty();
        assertThat(NOTATION.render("IF(a, b)")).isEmpty();
        assertThat(NOTATION.render("(a")).isEmpty();
        assertThat(NOTATION.render("")).isEmpty();
    }

    @Test
    void theNamesOfAnExpressionAreListedOnceInOrderWithTablesButNotTheRulesFunctions() {
        assertThat(RuleNotation.names("MAX(phi, crack_bar_spacing(s, phi)) + IF(t == \"x\", u, 0)"))
                .containsExactly("phi", "crack_bar_spacing", "s", "t", "u");
    }
}
