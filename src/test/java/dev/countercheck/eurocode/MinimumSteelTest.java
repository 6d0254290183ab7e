package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Minimum and maximum reinforcement, EN 1992-1-1 9.2.1.1, with the recommended 0.26, 0.0013 and 0.04. */
class MinimumSteelTest {

    @Test
    void slabExampleOfThreeHundredAndTwentyOneSquareMillimetresPerMetre() {
        // Source: blog check value seen in a published reproduction (published-values §7.1): 250 mm slab, C30/37,
        // d = 213: As,min = 0.26·2.9/500·1000·213 = 321 mm²/m (printed to the mm²; 321.18 unrounded)
        Step step = MinimumSteel.asMin(0.26, 0.0013, 2.9, 500, 1000, 213);
        assertThat(step.value()).isCloseTo(321, within(0.5));
        assertThat(step.symbol()).isEqualTo("As,min");
        assertThat(step.unit()).isEqualTo("mm2");
        assertThat(step.clause()).isEqualTo("EN 1992-1-1 9.2.1.1(1), Exp. (9.1N)");
    }

    // Both sides of the crossover fctm = 0.0013·500/0.26 = 2.5 MPa (published-values §7.1); b·d = 10^6 mm² so
    // As,min in mm² equals ρmin·10^6. Hand calculations.
    @ParameterizedTest(name = "fctm {0}: As,min {1}")
    @CsvSource({
            "2.2, 1300, the floor",          // 0.26·2.2/500 = 0.001144 < 0.0013 (C20/25, Table 3.1 fctm)
            "2.4, 1300, the floor",          // 0.001248 < 0.0013
            "2.6, 1352, c·fctm/fyk",         // 0.26·2.6/500 = 0.001352 (C25/30, Table 3.1 fctm)
            "4.1, 2132, c·fctm/fyk"          // 0.26·4.1/500 = 0.002132 (C50/60, Table 3.1 fctm)
    })
    void theFloorGovernsOnlyBelowAFctmOfTwoAndAHalf(double fctm, double expected, String governs) {
        Step step = MinimumSteel.asMin(0.26, 0.0013, fctm, 500, 1000, 1000);
        assertThat(step.value()).isCloseTo(expected, within(1e-6));
        assertThat(step.remark().orElseThrow()).startsWith(governs).contains("governs");
    }

    @Test
    void minimumSteelWithTheUnroundedFctmOfC30() {
        // Source: hand calculation (published-values §7.1 lists 0.001506): 0.26·2.8965/500 = 0.0015062
        double fctm = Materials.fctm(30).value();
        assertThat(MinimumSteel.asMin(0.26, 0.0013, fctm, 500, 1000, 1000).value()).isCloseTo(1506.2, within(0.05));
    }

    @Test
    void maximumSteelIsFourPercentOfTheConcrete() {
        // Source: hand calculation, 0.04·(2400·650) = 0.04·1 560 000 = 62 400 mm²
        Step step = MinimumSteel.asMax(0.04, 2400 * 650);
        assertThat(step.value()).isCloseTo(62_400, within(1e-6));
        assertThat(step.clause()).isEqualTo("EN 1992-1-1 9.2.1.1(3)");
    }
}
