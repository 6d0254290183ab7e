package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** EN 1997-1:2004 6.5.3. Invented loads; hand calculations beside each value. */
class SlidingTest {

    @Test
    void drainedResistanceIsTheFrictionOfTheBase() {
        // Hand calculation: V'd = 800 kN, δd = φ'cv;d = 30° (cast in place, 6.5.3(10)): 800·tan 30° = 461.88 kN.
        Step delta = Sliding.deltaCastInPlace(30);
        assertThat(Sliding.drained(800, delta.value(), 1.0).value()).isCloseTo(461.88, within(0.01));
        // With γR;h = 1.1 (Exp. (6.3b) form): 419.89 kN.
        assertThat(Sliding.drained(800, 30, 1.1).value()).isCloseTo(419.89, within(0.01));
    }

    @Test
    void undrainedResistanceIsLimitedToFourTenthsOfVdWhereWaterCanReachTheBase() {
        // Hand calculation: Ac = 4 m², cu,d = 50 kPa: 200 kN. Vd = 400 kN: 0.4·Vd = 160 kN governs (Exp. (6.5)).
        Step open = Sliding.undrained(4, 50, 1.0, 400, true);
        assertThat(open.value()).isCloseTo(160, within(1e-9));
        assertThat(open.remark()).hasValueSatisfying(r -> assertThat(r).contains("0.4·Vd governs"));
        assertThat(Sliding.undrained(4, 50, 1.0, 400, false).value()).isCloseTo(200, within(1e-9));
        // Vd = 600 kN: 240 kN > 200 kN, Ac·cu governs.
        assertThat(Sliding.undrained(4, 50, 1.0, 600, true).value()).isCloseTo(200, within(1e-9));
    }
}
