package dev.countercheck.report;

import dev.countercheck.eurocode.Num;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * How numbers are rounded for output. Plain notation, no exponent, no locale.
 *
 * <p>The JSON result:
 * <ul>
 *   <li>computed quantities and trace results: four significant figures, as in the trace's
 *       substituted text ({@link Num#f});</li>
 *   <li>utilisation and claim difference: four decimal places;</li>
 *   <li>claimed values: as submitted (the shortest decimal that gives the same double), so the
 *       report never misquotes the designer.</li>
 * </ul>
 *
 * <p>The HTML report and the PDF show the same numbers to the precision that suits each quantity
 * ({@link #display}): never more digits than the JSON, and never fewer than the trace's
 * substituted values carry, so each step can be followed by hand. Utilisation is shown to two
 * decimals rounded up, so a failing check never reads 1.00.
 */
final class ReportNumbers {

    private static final int RATIO_DECIMALS = 4;
    private static final int UTILISATION_DECIMALS = 2;

    private ReportNumbers() {
    }

    /** A dimensionless ratio, to four decimal places: {@code 0.91234 → 0.9123}, {@code 0.9100 → 0.91}. */
    static BigDecimal ratio(double value) {
        return new BigDecimal(value).setScale(RATIO_DECIMALS, RoundingMode.HALF_EVEN).stripTrailingZeros();
    }

    /** A value the designer submitted, as written: {@code 4300.0 → 4300}, {@code 4301.95 → 4301.95}. */
    static BigDecimal claimed(double value) {
        return BigDecimal.valueOf(value).stripTrailingZeros();
    }

    /** A computed quantity, to four significant figures ({@code 4301.9 → "4302"}): the trace's own text, {@link Num#f}. */
    static String quantityText(double value) {
        return Num.f(value);
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

    /**
     * A computed value for a person to read, to four significant figures and at most as many
     * decimals as suit its unit: whole mm² ({@code 2945.24 mm2 → "2945"}), tenths of mm, kN and kNm
     * ({@code 42.357 mm → "42.4"}), tenths of a degree; MPa and plain numbers keep four
     * significant figures ({@code 0.003125 → "0.003125"}).
     */
    static String display(double value, String unit) {
        String figures = Num.f(value);
        int decimals = switch (unit) {
            case "mm2" -> 0;
            case "mm", "kN", "kNm", "deg" -> 1;
            default -> Integer.MAX_VALUE;
        };
        int point = figures.indexOf('.');
        if (point < 0 || figures.length() - point - 1 <= decimals) {
            // Four figures within the unit's decimals: Num.f's text is already plain, without trailing zeros.
            return figures;
        }
        BigDecimal rounded = new BigDecimal(value).setScale(decimals, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return rounded.signum() == 0 ? "0" : rounded.toPlainString();
    }

    /** A unit as printed: {@code mm2 → mm²}, {@code deg → °}, {@code - → –} (dimensionless). */
    static String unit(String unit) {
        return switch (unit) {
            case "mm2" -> "mm²";
            case "mm3" -> "mm³";
            case "deg" -> "°";
            case "-" -> "–";
            default -> unit;
        };
    }

    /**
     * A utilisation to two decimals, rounded up so that the text is never below the value:
     * {@code 1.0004 → "1.01"} (a failing check never reads 1.00), {@code 0.8123 → "0.82"}. Rounded
     * from the shortest decimal of the double, so that 0.9 stays 0.90.
     */
    static String utilisation(double value) {
        return BigDecimal.valueOf(value).setScale(UTILISATION_DECIMALS, RoundingMode.CEILING).toPlainString();
    }

    /**
     * The width of a utilisation bar in percent of its track (the track stands for 0 to 1): the utilisation as
     * printed, times 100, at most 100 (a bar past its track is marked as over, not drawn longer).
     */
    static String barPercent(double value) {
        BigDecimal printed = BigDecimal.valueOf(value).setScale(UTILISATION_DECIMALS, RoundingMode.CEILING);
        return printed.min(BigDecimal.ONE).max(BigDecimal.ZERO).movePointRight(2).stripTrailingZeros()
                .toPlainString();
    }
}
