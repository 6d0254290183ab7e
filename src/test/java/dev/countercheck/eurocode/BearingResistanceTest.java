package dev.countercheck.eurocode;

import dev.countercheck.eurocode.BearingResistance.EffectiveArea;
import dev.countercheck.eurocode.BearingResistance.Resistance;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * EN 1997-1:2004 Annex D. The bearing factors against a published table; whole resistances against hand
 * calculations of invented footings, written out beside each test.
 */
class BearingResistanceTest {

    /**
     * Nq and Nc: B. M. Das, Principles of Foundation Engineering, 7th edition (2011), Table 3.3 (bearing capacity
     * factors; Nq and Nc are the Prandtl–Reissner expressions that Annex D uses), printed to two decimals —
     * values from memory. Nγ of Annex D, 2·(Nq − 1)·tan φ', is not the table's Vesić Nγ = 2·(Nq + 1)·tan φ':
     * the expected value is the table's Nγ less 4·tan φ' (from memory; e.g. φ' = 30°: 22.40 − 2.31 = 20.09).
     */
    @ParameterizedTest(name = "φ'' = {0}°")
    @CsvSource({
        "20, 6.40, 14.83, 5.39",
        "25, 10.66, 20.72, 10.88",
        "30, 18.40, 30.14, 22.40",
        "35, 33.30, 46.12, 48.03",
        "40, 64.20, 75.31, 109.41"})
    void bearingFactorsMatchThePublishedTable(double phi, double nq, double nc, double nGammaVesic) {
        Step q = BearingResistance.nq(phi);
        assertThat(q.value()).isCloseTo(nq, within(0.006));
        assertThat(BearingResistance.nc(q.value(), phi).value()).isCloseTo(nc, within(0.006));
        double nGamma = nGammaVesic - 4 * Math.tan(Math.toRadians(phi));
        assertThat(BearingResistance.nGamma(q.value(), phi).value()).isCloseTo(nGamma, within(0.006));
    }

    @Test
    void ncTendsToPiPlusTwoAsPhiVanishes() {
        // Prandtl's undrained factor π + 2 = 5.142 (EN 1997-1 Annex D, D.3, Exp. (D.1)) is the limit of
        // (Nq − 1)·cot φ' for φ' → 0.
        double phi = 1e-4;
        assertThat(BearingResistance.nc(BearingResistance.nq(phi).value(), phi).value())
                .isCloseTo(Math.PI + 2, within(1e-3));
    }

    @Test
    void theEffectiveAreaNamesTheSmallerSideB() {
        // Hand calculation: 2000 × 3000 plan, e_x = 150, e_y = −400: 2000 − 300 = 1700 along x, 3000 − 800 =
        // 2200 along y; B' = 1700 (x), L' = 2200, A' = 3.74 m².
        EffectiveArea a = BearingResistance.effectiveArea(2000, 3000, 150, -400);
        assertThat(a.bEff().value()).isEqualTo(1700);
        assertThat(a.lEff().value()).isEqualTo(2200);
        assertThat(a.area().value()).isCloseTo(3.74, within(1e-12));
        assertThat(a.widthAlongX()).isTrue();
        assertThat(BearingResistance.effectiveArea(3000, 2000, 0, 0).widthAlongX()).isFalse();
        assertThatThrownBy(() -> BearingResistance.effectiveArea(2000, 3000, 1000, 0))
                .isInstanceOf(OutOfRangeException.class).hasMessageContaining("Annex D");
    }

    @Test
    void drainedResistanceOfAnEccentricFootingOnSandUnderDesignApproach1Combination2() {
        // Hand calculation (invented footing): 2000 × 3000 plan, e_x = 150 mm: B' = 1700, L' = 3000 mm,
        // B'/L' = 0.56667, A' = 5.1 m². φ'k = 32°, γφ' = 1.25 (EN 1997-1 Table A.4, M2):
        // φ'd = atan(tan 32°/1.25) = 26.560°. c'd = 0; q' = 18 kPa (1 m of soil at 18 kN/m³); γ' = 18 kN/m³.
        // Nq = e^(π·tan 26.56°)·tan²(58.28°) = 12.588; Nγ = 2·11.588·tan 26.56° = 11.585;
        // sq = 1 + 0.56667·sin 26.56° = 1.2534; sγ = 1 − 0.3·0.56667 = 0.83.
        // V = 1500 kN, H = 120 kN along x (along B'): m = mB = (2 + 0.56667)/(1 + 0.56667) = 1.6383;
        // iq = (1 − 120/1500)^1.6383 = 0.87232; iγ = 0.92^2.6383 = 0.80253.
        // R/A' = 18·12.588·1.2534·0.87232 + 0.5·18·1.7·11.585·0.83·0.80253 = 247.74 + 118.05 = 365.79 kPa;
        // Rd = 5.1·365.79/1.0 = 1865.5 kN (γR;v = 1.0, Table A.5, R1).
        EffectiveArea a = BearingResistance.effectiveArea(2000, 3000, 150, 0);
        Step phiD = BearingResistance.phiDesign(32, 1.25);
        assertThat(phiD.value()).isCloseTo(26.560, within(1e-3));
        Resistance r = BearingResistance.drained(a, phiD.value(), 0, 18, 18, 1500, 120, 0, 1.0);
        assertThat(r.perArea().value()).isCloseTo(365.79, withinPercentage(0.01));
        assertThat(r.rd().value()).isCloseTo(1865.5, withinPercentage(0.01));
        assertThat(r.trace()).extracting(Step::symbol).contains("Nq", "Nc", "Nγ", "sq", "sγ", "sc", "m", "iq", "iγ",
                "ic", "R/A'", "Rd");
        assertThat(r.perArea().remark()).hasValueSatisfying(t -> assertThat(t).contains("bc = bq = bγ = 1"));
        // Without H the inclination factors are 1: R/A' = 18·12.588·1.2534 + 0.5·18·1.7·11.585·0.83 = 431.10.
        assertThat(BearingResistance.drained(a, phiD.value(), 0, 18, 18, 1500, 0, 0, 1.0).perArea().value())
                .isCloseTo(431.10, withinPercentage(0.01));
    }

    @Test
    void undrainedResistanceOnClay() {
        // Hand calculation (invented footing): B' = 1600, L' = 2800 mm (2000 × 2800 plan, e_x = 200 mm),
        // A' = 4.48 m²; cu,k = 60 kPa, γcu = 1.4 (Table A.4, M2): cu,d = 42.857 kPa; sc = 1 + 0.2·0.57143
        // = 1.11429; H = 50 kN: ic = ½·(1 + √(1 − 50/(4.48·42.857))) = 0.92999; q = 19·1.2 = 22.8 kPa.
        // R/A' = 5.1416·42.857·1.11429·0.92999 + 22.8 = 251.15 kPa; Rd = 4.48·251.15 = 1125.1 kN.
        EffectiveArea a = BearingResistance.effectiveArea(2000, 2800, 200, 0);
        Step cu = BearingResistance.strengthDesign("cu,d", 60, 1.4);
        Resistance r = BearingResistance.undrained(a, cu.value(), 22.8, 50, 1.0);
        assertThat(r.perArea().value()).isCloseTo(251.15, withinPercentage(0.01));
        assertThat(r.rd().value()).isCloseTo(1125.1, withinPercentage(0.01));
        // H beyond A'·cu: the footing slides, the expression has no value (D.3).
        assertThatThrownBy(() -> BearingResistance.undrained(a, cu.value(), 22.8, 200, 1.0))
                .isInstanceOf(OutOfRangeException.class).hasMessageContaining("H ≤ A'·cu");
    }

    @Test
    void theInclinationExponentTurnsFromMbToMl() {
        // Annex D, D.4: B'/L' = 0.5: mB = 2.5/1.5 = 1.6667, mL = 4/3 = 1.3333; H at 45° to L': the mean 1.5.
        assertThat(BearingResistance.m(0.5, 10, 0).value()).isCloseTo(5.0 / 3, within(1e-12));
        assertThat(BearingResistance.m(0.5, 0, 10).value()).isCloseTo(4.0 / 3, within(1e-12));
        assertThat(BearingResistance.m(0.5, 10, 10).value()).isCloseTo(1.5, within(1e-12));
    }
}
