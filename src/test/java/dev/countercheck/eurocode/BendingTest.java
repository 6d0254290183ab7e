package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Bending with the rectangular stress block, EN 1992-1-1 6.1 and 3.1.7(3). αcc = 0.85, γc = 1.5 throughout. */
class BendingTest {

    @Test
    void normalisedMoment() {
        // Source: hand calculation, K = 500·10^6/(1000·500²·30) = 500·10^6/7.5·10^9 = 0.06667
        Step step = Bending.kFactor(500, 1000, 500, 30);
        assertThat(step.value()).isCloseTo(0.066667, within(1e-6));
        assertThat(step.symbol()).isEqualTo("K");
        assertThat(step.substituted()).isEqualTo("500·10^6/(1000·500²·30)");
    }

    // Both sides of the 0.95d cap, d = 500 mm. The cap starts where √(1 − 2K/(αcc/γc)) = 0.9, i.e.
    // K = 0.095·0.5667 = 0.05383. Hand calculations with z = 250·[1 + √(1 − 2K/0.56667)]:
    @ParameterizedTest(name = "K {0}: z {1} mm, capped {2}")
    @CsvSource({
            "0, 475, true",          // 250·2 = 500 → capped at 0.95·500 = 475
            "0.05, 475, true",       // 250·(1 + √0.82353) = 476.87 → capped at 475
            "0.06, 471.957, false",  // 250·(1 + √0.78824) = 471.96
            "0.1, 451.100, false",   // 250·(1 + √0.64706) = 451.10
            "0.168, 409.503, false"  // 250·(1 + √0.40706) = 409.50, i.e. 0.82d at K' (common practice)
    })
    void leverArmIsLimitedToNinetyFivePercentOfD(double k, double z, boolean capped) {
        Step step = Bending.leverArm(k, 500, 0.85, 1.5);
        assertThat(step.value()).isCloseTo(z, within(0.001));
        assertThat(step.remark().isPresent()).as("0.95d cap recorded").isEqualTo(capped);
    }

    @Test
    void leverArmMatchesTheFamiliarUkForm() {
        // Source: UK design-guide form z = (d/2)·[1 + √(1 − 3.53·K)] for αcc = 0.85, γc = 1.5
        // (common practice); 3.53 is 2/0.5667 rounded, so agreement is to about 0.01 mm here:
        // hand calculation 250·(1 + √(1 − 0.353)) = 451.09 mm
        assertThat(Bending.leverArm(0.1, 500, 0.85, 1.5).value()).isCloseTo(451.09, within(0.02));
    }

    @Test
    void leverArmRefusesAKThatNeedsCompressionSteel() {
        // Source: hand calculation, the root 1 − 2K/(αcc/γc) turns negative above K = 0.85/(2·1.5) = 0.28333;
        // just below: 250·(1 + √(1 − 0.5666/0.566667)) = 250·(1 + √0.00011765) = 250·1.010847 = 252.71 mm
        assertThat(Bending.leverArm(0.2833, 500, 0.85, 1.5).value()).isCloseTo(252.71, within(0.01));
        assertThatThrownBy(() -> Bending.leverArm(0.2834, 500, 0.85, 1.5)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("compression steel").hasMessageContaining("0.2833");
    }

    @Test
    void tensionSteelForTheMoment() {
        // Source: hand calculation, As = 500·10^6/(434.78·450) = 2555.6 mm² (fyd = 500/1.15)
        Step step = Bending.asRequired(500, 500 / 1.15, 450);
        assertThat(step.value()).isCloseTo(2555.6, within(0.05));
        assertThat(step.symbol()).isEqualTo("As,req");
        assertThat(step.unit()).isEqualTo("mm2");
    }
}
