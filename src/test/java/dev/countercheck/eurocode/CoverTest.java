package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;

/** Concrete cover, EN 1992-1-1 4.4.1. */
class CoverTest {

    // Table 4.2 (published-values §3.1, from memory): cmin,b = φ, + 5 mm when dg > 32 mm; rows either side of 32.
    @ParameterizedTest(name = "φ {0}, dg {1}: cmin,b {2}")
    @CsvSource({"20, 20, 20, false", "20, 32, 20, false", "20, 33, 25, true", "25, 40, 30, true"})
    void bondCoverIsTheBarSizePlusFiveForLargeAggregate(double phi, double dg, double expected, boolean added) {
        Step step = Cover.cMinB(phi, dg);
        assertThat(step.value()).isEqualTo(expected);
        assertThat(step.remark().isPresent()).isEqualTo(added);
        assertThat(step.clause()).contains("Table 4.2");
    }

    @Test
    void nominalCoverForXc2StructuralClassS4() {
        // Source: published-values §3.3 example (recomputed) on EN 1992-1-1 Table 4.4N, S4, XC2/XC3: cmin,dur = 25 mm
        // (from memory; the same 25 mm cell is used in a textbook cover example seen in a published reproduction,
        // §3.2), φ 20, Δcdev = 10 mm: cmin = max(20; 25 + 0 − 0 − 0; 10) = 25, cnom = 25 + 10 = 35 mm
        Step cMinB = Cover.cMinB(20, 20);
        Step cMin = Cover.cMin(cMinB.value(), 25, 0, 0, 0);
        assertThat(cMin.value()).isEqualTo(25);
        assertThat(cMin.remark().orElseThrow()).isEqualTo("durability governs");
        Step cNom = Cover.cNom(cMin.value(), 10);
        assertThat(cNom.value()).isEqualTo(35);
        assertThat(cNom.symbol()).isEqualTo("cnom");
        assertThat(cNom.clause()).isEqualTo("EN 1992-1-1 4.4.1.1(2), Exp. (4.1)");
    }

    // Hand calculations of Exp. (4.2): each of the three terms governing in turn.
    @ParameterizedTest(name = "cmin,b {0}, cmin,dur {1}, Δγ {2}, Δst {3}, Δadd {4}: cmin {5}")
    @CsvSource({
            "32, 25, 0, 0, 0, 32, 'bond (cmin,b) governs'",    // max(32; 25; 10)
            "20, 25, 5, 0, 0, 30, durability governs",       // max(20; 25 + 5; 10)
            "8, 10, 0, 0, 5, 10, the 10 mm minimum governs", // max(8; 10 − 5 = 5; 10)
            "8, 15, 0, 5, 5, 10, the 10 mm minimum governs"  // max(8; 15 − 5 − 5 = 5; 10)
    })
    void minimumCoverIsTheLargestOfBondDurabilityAndTenMillimetres(double cMinB, double cMinDur, double dGamma,
                                                                  double dSt, double dAdd, double expected,
                                                                  String governs) {
        Step step = Cover.cMin(cMinB, cMinDur, dGamma, dSt, dAdd);
        assertThat(step.value()).isEqualTo(expected);
        assertThat(step.remark().orElseThrow()).isEqualTo(governs);
    }
}
