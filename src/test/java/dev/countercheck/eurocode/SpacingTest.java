package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Bar spacing, EN 1992-1-1 8.2, and the even bar layout (common practice). */
class SpacingTest {

    // Source: J. M. Arrieta, "Anchorage and lap splicing – detailing of slabs, columns, beams, footings",
    // EU/JRC workshop "Eurocode 2: Background and Applications", Brussels, 2011 (published-values §7.2):
    // recommended k1 = 1, k2 = 5 mm; dg = 20 mm and φ ≤ 25 mm → 25 mm. Other rows by hand calculation.
    @ParameterizedTest(name = "φ {0}, dg {1}: {2} mm")
    @CsvSource({
            "12, 20, 25, dg + k2 governs",  // max(12; 25; 20), Arrieta's example
            "24, 20, 25, dg + k2 governs",  // max(24; 25; 20), Arrieta's example
            "26, 20, 26, k1·φ governs",     // max(26; 25; 20)
            "32, 20, 32, k1·φ governs",     // max(32; 25; 20)
            "12, 10, 20, 20 mm governs"     // max(12; 15; 20)
    })
    void minimumClearSpacingOf82(double phi, double dg, double expected, String governs) {
        Step step = Spacing.minClearSpacing(1.0, 5, phi, dg);
        assertThat(step.value()).isEqualTo(expected);
        assertThat(step.remark().orElseThrow()).isEqualTo(governs);
        assertThat(step.clause()).isEqualTo("EN 1992-1-1 8.2(2)");
    }

    @Test
    void barsSpreadEvenlyOverTheWidthLessSideCovers() {
        // Source: hand calculation (common practice layout): (2400 − 2·50 − 16)/(12 − 1) = 2284/11 = 207.64 mm
        Step step = Spacing.centreSpacing(2400, 50, 16, 12);
        assertThat(step.value()).isCloseTo(207.64, within(0.005));
        assertThat(step.clause()).startsWith("common practice");
        // two bars: one at each side, (1000 − 2·40 − 20)/1 = 900 mm
        assertThat(Spacing.centreSpacing(1000, 40, 20, 2).value()).isEqualTo(900);
    }

    @Test
    void centreSpacingNeedsTwoBarsThatFit() {
        assertThatThrownBy(() -> Spacing.centreSpacing(2400, 50, 16, 1)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("n = 1");
        assertThatThrownBy(() -> Spacing.centreSpacing(100, 50, 16, 2)).isInstanceOf(OutOfRangeException.class)
                .hasMessageContaining("b − 2·c − φ");
    }
}
