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

    /** Error messages may quote a bad input that is not a finite number; formatting must not throw. */
    @Test
    void printsNonFiniteValuesInsteadOfThrowing() {
        assertThat(Num.f(Double.NaN)).isEqualTo("NaN");
        assertThat(Num.f(Double.POSITIVE_INFINITY)).isEqualTo("Infinity");
    }
}
