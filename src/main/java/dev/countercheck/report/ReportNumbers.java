package dev.countercheck.report;

import dev.countercheck.eurocode.Num;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * How numbers are rounded for output. The JSON result and the HTML report use the same
 * rounding, so a person reading the report sees exactly the numbers the JSON carries.
 * Plain notation, no exponent, no locale.
 *
 * <ul>
 *   <li>computed quantities and trace results: four significant figures, as in the trace's
 *       substituted text ({@link Num#f});</li>
 *   <li>utilisation and claim difference: four decimal places;</li>
 *   <li>claimed values: as submitted (the shortest decimal that gives the same double), so the
 *       report never misquotes the designer.</li>
 * </ul>
 */
final class ReportNumbers {

    private static final int RATIO_DECIMALS = 4;

    private ReportNumbers() {
    }

    /** A computed quantity, to four significant figures: {@code 4301.9 → 4302}. */
    static BigDecimal quantity(double value) {
        return new BigDecimal(Num.f(value));
    }

    /** A dimensionless ratio, to four decimal places: {@code 0.91234 → 0.9123}, {@code 0.9100 → 0.91}. */
    static BigDecimal ratio(double value) {
        return new BigDecimal(value).setScale(RATIO_DECIMALS, RoundingMode.HALF_EVEN).stripTrailingZeros();
    }

    /** A value the designer submitted, as written: {@code 4300.0 → 4300}, {@code 4301.95 → 4301.95}. */
    static BigDecimal claimed(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros();
    }

    /** Text of {@link #quantity}. */
    static String quantityText(double value) {
        return quantity(value).toPlainString();
    }

    /** Text of {@link #ratio}. */
    static String ratioText(double value) {
        return ratio(value).toPlainString();
    }

    /** Text of {@link #claimed}. */
    static String claimedText(double value) {
        return claimed(value).toPlainString();
    }

    /**
     * A relative difference in per cent, signed, from the same four-decimal rounding the JSON
     * carries (only the decimal point moves): {@code -0.0004 → "-0.04 %"}, {@code 0.125 → "+12.5 %"}.
     */
    static String percentText(double difference) {
        BigDecimal percent = ratio(difference).movePointRight(2).stripTrailingZeros();
        String sign = percent.signum() > 0 ? "+" : "";
        return sign + percent.toPlainString() + " %";
    }
}
