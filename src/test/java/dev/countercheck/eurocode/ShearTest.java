package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * Shear without shear reinforcement, EN 1992-1-1 6.2.2.
 *
 * <p>Main fixture: TCC (The Concrete Centre) "How to design concrete structures using Eurocode 2", chapter 6
 * "Foundations" (Webster &amp; Brooker), Table 6: vRd,c in MPa for fck = 30 MPa by d and ρl, derived (per its
 * note) from vRd,c = 0.12·k·(100·ρl·fck)^(1/3) ≥ 0.035·k^1.5·fck^0.5 and printed to 2 decimal places, with the
 * k row printed to 3 decimal places (as reproduced in published-values §5.3).
 */
class ShearTest {

    private static final double C_RDC = 0.12;   // recommended 0.18/γc with γc = 1.5 (Table 6 note)
    private static final double V_MIN_COEFF = 0.035; // recommended, Exp. (6.3N) (Table 6 note)

    // ---- k, 6.2.2(1) ----

    // Source: TCC "How to design concrete structures using Eurocode 2", ch. 6, Table 6, row k (3 d.p.).
    @ParameterizedTest(name = "d {0} mm: k {1}")
    @CsvSource({"300, 1.816", "400, 1.707", "500, 1.632", "600, 1.577", "700, 1.535", "800, 1.500", "900, 1.471",
            "1000, 1.447"})
    void kMatchesTheTccTableRow(double d, double k) {
        assertThat(Shear.kSize(d).value()).isCloseTo(k, within(0.0005));
    }

    // Both sides of the k ≤ 2.0 cap at d = 200 mm; values by hand calculation.
    @ParameterizedTest(name = "d {0} mm: k {1}, capped {2}")
    @CsvSource({
            "150, 2.0, true",      // 1 + √(200/150) = 2.1547 → capped at 2.0
            "199, 2.0, true",      // 1 + √(200/199) = 2.0025 → capped at 2.0
            "200, 2.0, false",     // 1 + √1 = 2.0 exactly, not capped
            "201, 1.99751, false"  // 1 + √(200/201) = 1.99751
    })
    void kIsCappedAtTwoBelowADepthOf200(double d, double expected, boolean capped) {
        Step k = Shear.kSize(d);
        assertThat(k.value()).isCloseTo(expected, within(0.00001));
        assertThat(k.remark().isPresent()).as("cap recorded in the remark, never silent").isEqualTo(capped);
        if (capped) {
            assertThat(k.remark().orElseThrow()).contains("capped at 2.0");
        }
    }

    // ---- ρl, 6.2.2(1) ----

    // Both sides of the ρl ≤ 0.02 cap; b = 1000 mm, d = 200 mm; hand calculations.
    @ParameterizedTest(name = "As {0} mm2: ρl {1}, capped {2}")
    @CsvSource({
            "3999, 0.019995, false", // 3999/(1000·200)
            "4000, 0.02, false",     // 4000/(1000·200) = 0.02, at the limit
            "4001, 0.02, true",      // 4001/(1000·200) = 0.020005 → capped
            "0, 0, false"
    })
    void rhoLIsCappedAtTwoPercent(double as, double expected, boolean capped) {
        Step rho = Shear.rhoL(as, 1000, 200);
        assertThat(rho.value()).isCloseTo(expected, within(1e-9));
        assertThat(rho.remark().isPresent()).isEqualTo(capped);
        assertThat(rho.symbol()).isEqualTo("ρl");
    }

    // ---- vRd,c and vmin against TCC Table 6 ----

    /** TCC ch. 6 Table 6 as printed: rows ρl = 0.25 % … 2.00 %, columns d = 300 … 1000 mm, fck = 30 MPa. */
    private static final double[] TABLE_6_D = {300, 400, 500, 600, 700, 800, 900, 1000};
    private static final double[] TABLE_6_RHO = {0.0025, 0.0050, 0.0075, 0.0100, 0.0125, 0.0150, 0.0175, 0.0200};
    private static final double[][] TABLE_6_VRDC = {
            {0.47, 0.43, 0.40, 0.38, 0.36, 0.35, 0.35, 0.34},
            {0.54, 0.51, 0.48, 0.47, 0.45, 0.44, 0.44, 0.43},
            {0.62, 0.58, 0.55, 0.53, 0.52, 0.51, 0.50, 0.49},
            {0.68, 0.64, 0.61, 0.59, 0.57, 0.56, 0.55, 0.54},
            {0.73, 0.69, 0.66, 0.63, 0.62, 0.60, 0.59, 0.58},
            {0.78, 0.73, 0.70, 0.67, 0.65, 0.64, 0.63, 0.62},
            {0.82, 0.77, 0.73, 0.71, 0.69, 0.67, 0.66, 0.65},
            {0.85, 0.80, 0.77, 0.74, 0.72, 0.70, 0.69, 0.68}};

    static Stream<Arguments> table6() {
        List<Arguments> cells = new ArrayList<>();
        for (int r = 0; r < TABLE_6_RHO.length; r++) {
            for (int c = 0; c < TABLE_6_D.length; c++) {
                cells.add(Arguments.of(TABLE_6_RHO[r], TABLE_6_D[c], TABLE_6_VRDC[r][c]));
            }
        }
        return cells.stream();
    }

    // Source: TCC "How to design concrete structures using Eurocode 2", ch. 6 Foundations, Table 6 (fck = 30),
    // every cell; printed to 2 d.p., so the computed max(vRd,c; vmin) must round to it (|Δ| ≤ 0.005).
    @ParameterizedTest(name = "ρl {0}, d {1} mm: {2} MPa")
    @MethodSource("table6")
    void shearStressResistanceMatchesTccTable6(double rho, double d, double published) {
        Step k = Shear.kSize(d);
        Step vRdc = Shear.vRdcStress(C_RDC, k.value(), rho, 30);
        Step vMin = Shear.vMin(V_MIN_COEFF, k.value(), 30);
        Step force = Shear.vRdc(vRdc, vMin, 1000, d);
        double stress = force.value() * 1000 / (1000 * d);
        assertThat(stress).isCloseTo(published, within(0.005 + 1e-9));
    }

    @Test
    void vminGovernsAtLowSteelAndShallowDepth() {
        // Source: hand calculation at ρl = 0.25 %, d = 300, fck = 30 (TCC Table 6 cell 0.47):
        // k = 1.8165; vRd,c = 0.12·1.8165·(100·0.0025·30)^(1/3) = 0.12·1.8165·1.9574 = 0.4267;
        // vmin = 0.035·1.8165^1.5·30^0.5 = 0.035·2.4482·5.4772 = 0.4693 → vmin governs
        double k = Shear.kSize(300).value();
        Step vRdc = Shear.vRdcStress(C_RDC, k, 0.0025, 30);
        Step vMin = Shear.vMin(V_MIN_COEFF, k, 30);
        assertThat(vRdc.value()).isCloseTo(0.4267, within(0.0001));
        assertThat(vMin.value()).isCloseTo(0.4693, within(0.0001));
        Step force = Shear.vRdc(vRdc, vMin, 1000, 300);
        // hand calculation: 0.4693·1000·300/1000 = 140.8 kN
        assertThat(force.value()).isCloseTo(140.8, within(0.05));
        assertThat(force.remark().orElseThrow()).startsWith("vmin governs");
        assertThat(force.symbol()).isEqualTo("VRd,c");
        assertThat(force.unit()).isEqualTo("kN");
    }

    @Test
    void vRdcGovernsAtHighSteel() {
        // Source: hand calculation at ρl = 2 %, d = 500, fck = 30 (TCC Table 6 cell 0.77):
        // k = 1.6325; vRd,c = 0.12·1.6325·(100·0.02·30)^(1/3) = 0.12·1.6325·3.9149 = 0.7669 > vmin = 0.3998
        double k = Shear.kSize(500).value();
        Step force = Shear.vRdc(Shear.vRdcStress(C_RDC, k, 0.02, 30), Shear.vMin(V_MIN_COEFF, k, 30), 1000, 500);
        assertThat(force.value()).isCloseTo(383.5, within(0.1)); // 0.7669·1000·500/1000 = 383.5 kN
        assertThat(force.remark().orElseThrow()).startsWith("vRd,c governs");
    }

    // Source: TCC "How to design concrete structures using Eurocode 2", ch. 6, Table 6 multipliers for other fck
    // (printed to 2 d.p.), checked where vRd,c governs (ρl = 1 %, d = 500), since vmin scales with fck^0.5 instead.
    @ParameterizedTest(name = "fck {0}: × {1}")
    @CsvSource({"25, 0.94", "28, 0.98", "32, 1.02", "35, 1.05", "40, 1.10", "45, 1.14"})
    void vRdcScalesWithTheCubeRootOfFckAsTheTccMultipliers(double fck, double multiplier) {
        double k = Shear.kSize(500).value();
        double ratio = Shear.vRdcStress(C_RDC, k, 0.01, fck).value() / Shear.vRdcStress(C_RDC, k, 0.01, 30).value();
        assertThat(ratio).isCloseTo(multiplier, within(0.005 + 1e-9));
    }

    @Test
    void vminAtTheCappedK() {
        // Source: hand calculation, vmin = 0.035·2^1.5·30^0.5 = 0.035·2.8284·5.4772 = 0.5422 MPa for d ≤ 200,
        // fck 30 (published-values §5.3 lists 0.542)
        Step vMin = Shear.vMin(V_MIN_COEFF, Shear.kSize(150).value(), 30);
        assertThat(vMin.value()).isCloseTo(0.5422, within(0.0001));
        assertThat(vMin.substituted()).isEqualTo("0.035·2^(3/2)·30^(1/2)");
        assertThat(vMin.clause()).contains("Exp. (6.3N)");
    }

    @Test
    void vRdcStressRejectsUncappedInputs() {
        assertThatThrownBy(() -> Shear.vRdcStress(C_RDC, 2.01, 0.01, 30)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("k = 2.01").hasMessageContaining("6.2.2(1)");
        assertThatThrownBy(() -> Shear.vRdcStress(C_RDC, 1.5, 0.0201, 30)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("ρl");
    }

    @Test
    void vRdcRefusesAStepThatIsNotAStress() {
        Step notAStress = Shear.kSize(300);
        assertThatThrownBy(() -> Shear.vRdc(notAStress, Shear.vMin(V_MIN_COEFF, 1.5, 30), 1000, 300))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("expected MPa");
    }

    // ---- short shear span, 6.2.2(6) ----

    // Both sides of the av = 0.5d floor with d = 500 mm; hand calculations.
    @ParameterizedTest(name = "av {0} mm → {1} mm, raised {2}")
    @CsvSource({"-50, 250, true", "249, 250, true", "250, 250, false", "251, 251, false"})
    void avIsRaisedToHalfTheEffectiveDepth(double av, double expected, boolean raised) {
        Step step = Shear.avFloored(av, 500);
        assertThat(step.value()).isEqualTo(expected);
        assertThat(step.remark().isPresent()).isEqualTo(raised);
    }

    // Both sides of av = 2d with d = 500 mm, and the lowest β at av = 0.5d; hand calculations.
    @ParameterizedTest(name = "av {0} mm: β {1}")
    @CsvSource({
            "250, 0.25, av ≤ 2·d",   // 250/(2·500) = 0.25, the least β (published-values §5.1: β ≥ 0.25)
            "999, 0.999, av ≤ 2·d",  // 999/1000
            "1000, 1.0, av ≤ 2·d",   // 1000/1000
            "1001, 1.0, av > 2·d"    // no reduction
    })
    void betaIsAvOverTwoDUpToTwoD(double av, double beta, String branch) {
        Step step = Shear.betaShortSpan(av, 500);
        assertThat(step.value()).isCloseTo(beta, within(1e-12));
        assertThat(step.remark().orElseThrow()).startsWith(branch);
        assertThat(step.symbol()).isEqualTo("β");
    }

    @Test
    void betaRefusesAnAvBelowTheFloor() {
        assertThatThrownBy(() -> Shear.betaShortSpan(249, 500)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("av ≥ 250").hasMessageContaining("6.2.2(6)");
    }

    // Source: Exp. (6.6N) ν = 0.6(1 − fck/250) (published-values §5.1, from memory); the values are the ν column
    // of published-values §5.4 (recomputed, 3 d.p.): e.g. 0.6·(1 − 30/250) = 0.528.
    @ParameterizedTest(name = "fck {0}: ν {1}")
    @CsvSource({"20, 0.552", "25, 0.540", "30, 0.528", "35, 0.516", "40, 0.504", "50, 0.480"})
    void nuReducesWithConcreteStrength(double fck, double nu) {
        assertThat(Shear.nu(fck).value()).isCloseTo(nu, within(0.0005));
    }

    @Test
    void shearForceLimitOfExpression65() {
        // Source: hand calculation, 0.5·bw·d·ν·fcd = 0.5·1000·500·0.528·20/1000 = 2640 kN (C30, fcd = 30/1.5)
        Step step = Shear.vEdMax(0.528, 20, 1000, 500);
        assertThat(step.value()).isCloseTo(2640, within(1e-6));
        assertThat(step.clause()).isEqualTo("EN 1992-1-1 6.2.2(6), Exp. (6.5)");
        assertThat(step.unit()).isEqualTo("kN");
    }
}
