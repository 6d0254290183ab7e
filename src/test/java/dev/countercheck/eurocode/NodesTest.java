package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Strut-and-tie nodes, EN 1992-1-1 6.5. */
class NodesTest {

    // Source: Exp. (6.57N) ν' = 1 − fck/250 (published-values §6.1, from memory); hand calculations,
    // e.g. 1 − 30/250 = 0.88 (the C30 value listed in published-values §6.1).
    @ParameterizedTest(name = "fck {0}: ν' {1}")
    @CsvSource({"25, 0.90", "30, 0.88", "35, 0.86", "40, 0.84", "50, 0.80"})
    void nuPrimeReducesWithStrength(double fck, double nuPrime) {
        Step step = Nodes.nuPrime(fck);
        assertThat(step.value()).isCloseTo(nuPrime, within(1e-12));
        assertThat(step.symbol()).isEqualTo("ν'");
        assertThat(step.clause()).contains("Exp. (6.57N)");
    }

    // Source: EN 1992-1-1 6.5.4(4), Exps. (6.60)-(6.62) with the recommended k1 = 1.0, k2 = 0.85, k3 = 0.75
    // (published-values §6.1, from memory); its test values, fcd = fck/1.5, 2 d.p., e.g. C30 CCT 0.85·0.88·20 = 14.96.
    @ParameterizedTest(name = "C{0}: CCC {1}, CCT {2}, CTT {3} MPa")
    @CsvSource({
            "25, 15.00, 12.75, 11.25",
            "30, 17.60, 14.96, 13.20",
            "35, 20.07, 17.06, 15.05",
            "40, 22.40, 19.04, 16.80",
            "50, 26.67, 22.67, 20.00"
    })
    void nodeStressLimitsWithRecommendedFactors(double fck, double ccc, double cct, double ctt) {
        double nuPrime = Nodes.nuPrime(fck).value();
        double fcd = Materials.fcd(1.0, fck, 1.5).value();
        assertThat(Nodes.nodeLimit(NodeType.CCC, 1.0, nuPrime, fcd).value()).isCloseTo(ccc, within(0.005));
        assertThat(Nodes.nodeLimit(NodeType.CCT, 0.85, nuPrime, fcd).value()).isCloseTo(cct, within(0.005));
        assertThat(Nodes.nodeLimit(NodeType.CTT, 0.75, nuPrime, fcd).value()).isCloseTo(ctt, within(0.005));
    }

    @Test
    void nodeLimitWithTheFlexuralAlphaCc() {
        // Source: published-values §6.1, "with αcc = 0.85 multiply by 0.85 (C30 CCT → 12.72)";
        // hand calculation 0.85·0.88·(0.85·30/1.5) = 0.85·0.88·17 = 12.716
        Step step = Nodes.nodeLimit(NodeType.CCT, 0.85, 0.88, Materials.fcd(0.85, 30, 1.5).value());
        assertThat(step.value()).isCloseTo(12.72, within(0.005));
    }

    @Test
    void eachNodeTypeNamesItsFactorAndExpression() {
        Step ccc = Nodes.nodeLimit(NodeType.CCC, 1.0, 0.88, 20);
        assertThat(ccc.formula()).isEqualTo("k1·ν'·fcd");
        assertThat(ccc.clause()).isEqualTo("EN 1992-1-1 6.5.4(4)a, Exp. (6.60)");
        assertThat(ccc.symbol()).isEqualTo("σRd,max");
        assertThat(Nodes.nodeLimit(NodeType.CCT, 0.85, 0.88, 20).formula()).isEqualTo("k2·ν'·fcd");
        assertThat(Nodes.nodeLimit(NodeType.CCT, 0.85, 0.88, 20).clause()).endsWith("Exp. (6.61)");
        assertThat(Nodes.nodeLimit(NodeType.CTT, 0.75, 0.88, 20).formula()).isEqualTo("k3·ν'·fcd");
        assertThat(Nodes.nodeLimit(NodeType.CTT, 0.75, 0.88, 20).clause()).endsWith("Exp. (6.62)");
    }

    @Test
    void nodeLimitRejectsAFactorNamedByItsSymbol() {
        assertThatThrownBy(() -> Nodes.nodeLimit(NodeType.CCT, 0, 0.88, 20)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("k2");
    }

    // Hand calculations: atan(1) = 45°, atan(√3) = 60°, atan(1/√3) = 30°.
    @ParameterizedTest(name = "z {0}, l {1}: θ {2}°")
    @CsvSource({"1000, 1000, 45", "1732.0508, 1000, 60", "1000, 1732.0508, 30"})
    void strutAngleToTheHorizontal(double z, double distance, double degrees) {
        Step step = Nodes.strutAngle(z, distance);
        assertThat(step.value()).isCloseTo(degrees, within(1e-5));
        assertThat(step.unit()).isEqualTo("deg");
    }
}
