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

    @ParameterizedTest
    @CsvSource({
            "2945.24, mm2, 2945",       // hand calculation: whole mm²
            "314.159, mm2, 314",        // 4 significant figures would give 314.2; areas are shown to whole mm²
            "42.357, mm, 42.4",         // 4 s.f. 42.36, then at most one decimal for mm: 42.4 (from the raw value)
            "887.5, mm, 887.5",
            "1867.459, kN, 1867",       // 4 significant figures
            "321.84, kN, 321.8",
            "56.3099, deg, 56.3",
            "19.3712, MPa, 19.37",      // MPa keep four significant figures
            "0.3497, MPa, 0.3497",
            "0.0031254, -, 0.003125",   // a plain number keeps four significant figures
            "-0.04, mm, 0",             // never -0
            "12345.67, mm, 12350"       // four significant figures, without exponent, as the trace writes them
    })
    void displayedValuesSuitTheirUnit(double value, String unit, String expected) {
        assertThat(ReportNumbers.display(value, unit)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({
            "0.8123456, 0.82",  // hand calculation: rounded up to two decimals
            "1.0004, 1.01",     // a failing check never shows 1.00
            "1.0, 1.00",        // equality passes and shows 1.00
            "0.995, 1.00",
            "0.9, 0.90"
    })
    void utilisationIsRoundedUpToTwoDecimals(double value, String expected) {
        assertThat(ReportNumbers.utilisation(value)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({"mm2, mm²", "deg, °", "-, –", "kN, kN", "MPa, MPa"})
    void unitsArePrintedInTheirUsualForm(String unit, String printed) {
        assertThat(ReportNumbers.unit(unit)).isEqualTo(printed);
    }
}
