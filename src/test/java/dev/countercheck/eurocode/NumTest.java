package dev.countercheck.eurocode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;

class NumTest {

    /** Trace numbers carry four significant figures (project convention, no external source). */
    @ParameterizedTest
    @CsvSource({
            "1870.4321, 1870",
            "0.0123456, 0.01235",
            "2.0, 2",
            "0, 0",
            "-12.5, -12.5",
            "123456.7, 123500",
            "4301.9, 4302"
    })
    void formatsToFourSignificantFigures(double value, String expected) {
        assertThat(Num.f(value)).isEqualTo(expected);
    }

    /**
     * The fast path gives exactly what exact decimal rounding of the binary value gives: across
     * magnitudes, signs and values at or next to a half in the fifth figure (where double arithmetic
     * alone would decide wrongly).
     */
    @Test
    void fastFormattingAgreesWithExactRounding() {
        java.util.Random random = new java.util.Random(20260101);
        for (int i = 0; i < 20_000; i++) {
            double magnitude = Math.pow(10, random.nextInt(40) - 20);
            double value = (random.nextBoolean() ? 1 : -1) * magnitude * (1 + 9 * random.nextDouble());
            assertThat(Num.f(value)).as("%s", value).isEqualTo(Num.exact(value));
            double half = Math.floor(value / magnitude * 1000) / 1000 * magnitude + magnitude / 2000;
            for (double v : new double[] {half, Math.nextUp(half), Math.nextDown(half)}) {
                assertThat(Num.f(v)).as("%s", v).isEqualTo(Num.exact(v));
            }
        }
        for (double v : new double[] {999.95, 9999.5, 0.00012345, 1234.5, 12345, 99995, 1e22, 1e-22, 5e-324,
            Double.MAX_VALUE, 0.5, 1.5, 2.5}) {
            assertThat(Num.f(v)).as("%s", v).isEqualTo(Num.exact(v));
        }
    }

    /** The fast path's plain text is the text BigDecimal writes for the same unscaled value and scale. */
    @Test
    void plainTextIsWhatBigDecimalWrites() {
        java.util.Random random = new java.util.Random(14);
        for (int i = 0; i < 20_000; i++) {
            long unscaled = (random.nextBoolean() ? 1 : -1) * (1000 + random.nextInt(9001));
            if (random.nextInt(4) == 0) {
                unscaled = unscaled / 100 * 100;
            }
            int scale = random.nextInt(45) - 22;
            assertThat(Num.plain(unscaled, scale)).as("%d, %d", unscaled, scale).isEqualTo(
                    java.math.BigDecimal.valueOf(unscaled, scale).stripTrailingZeros().toPlainString());
        }
    }

    /** Error messages may quote a bad input that is not a finite number; formatting must not throw. */
    @Test
    void printsNonFiniteValuesInsteadOfThrowing() {
        assertThat(Num.f(Double.NaN)).isEqualTo("NaN");
        assertThat(Num.f(Double.POSITIVE_INFINITY)).isEqualTo("Infinity");
    }
}
