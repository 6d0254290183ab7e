package dev.countercheck.report;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;

/** Output rounding rules of the report (project convention, no external source; rows are hand calculations). */
class ReportNumbersTest {

    @ParameterizedTest
    @CsvSource({
            "0.91, 0.91",          // hand calculation: 0.9100 with trailing zeros dropped
            "0.81234567, 0.8123",  // hand calculation: 0.8123|4567, the dropped part is below half
            "1.00004, 1",          // 1.0000 → 1
            "-0.00004, 0",         // -0.0000 is written as 0, never -0
            "1.23456, 1.2346"      // 1.2345|6 → 1.2346
    })
    void ratiosKeepFourDecimals(double value, String expected) {
        assertThat(ReportNumbers.ratioText(value)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({
            "-0.000425, -0.04 %",  // hand calculation: -0.0004 → -0.04 %
            "0.070974, +7.1 %",    // 0.0710 → +7.10 % → +7.1 %
            "0, 0 %",
            "0.19988, +19.99 %"    // 0.1999 → +19.99 %
    })
    void differencesArePerCentOfTheRoundedRatio(double difference, String expected) {
        assertThat(ReportNumbers.percentText(difference)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({
            "4300.0, 4300",        // as submitted, no trailing .0
            "4301.95, 4301.95",    // not rounded: the designer's figure is quoted exactly
            "0.1, 0.1"             // the shortest decimal of the double, not its binary expansion
    })
    void claimedValuesAreQuotedAsSubmitted(double value, String expected) {
        assertThat(ReportNumbers.claimedText(value)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({
            "123456.7, 123500",    // hand calculation: 4 significant figures, plain notation
            "0.000123456, 0.0001235"
    })
    void quantitiesKeepFourSignificantFigures(double value, String expected) {
        assertThat(ReportNumbers.quantityText(value)).isEqualTo(expected);
    }
}
