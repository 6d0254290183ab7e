package dev.countercheck.eurocode;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/** Formats numbers for traces: four significant figures, no trailing zeros, no exponent. */
public final class Num {

    private Num() {
    }

    /** Powers of ten that a double holds exactly. */
    private static final double[] POWERS_OF_TEN = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11,
        1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};
    /** How far from a half the scaled value must lie for double rounding to decide like exact rounding. */
    private static final double TIE_MARGIN = 1e-6;

    /**
     * {@code 1870.4321 → "1870"}, {@code 0.0123456 → "0.01235"}, {@code 2.0 → "2"};
     * a non-finite value (only ever seen in an error message) prints as {@code "NaN"} or {@code "Infinity"}.
     * The value is rounded half-even as its exact binary value, not its shortest decimal text.
     */
    public static String f(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0.0) {
            return "0";
        }
        // Fast path: scale to four digits before the point with one rounding of the double arithmetic;
        // far from a half, that decides the digit as exact rounding would. Otherwise round exactly.
        int scale = 3 - (int) Math.floor(Math.log10(Math.abs(value)));
        if (Math.abs(scale) < POWERS_OF_TEN.length) {
            double scaled = scale >= 0 ? value * POWERS_OF_TEN[scale] : value / POWERS_OF_TEN[-scale];
            double magnitude = Math.abs(scaled);
            double fraction = magnitude - Math.floor(magnitude);
            if (magnitude >= 1000 && magnitude < 10_000 && Math.abs(fraction - 0.5) > TIE_MARGIN) {
                return plain(Math.round(scaled), scale);
            }
        }
        return exact(value);
    }

    /**
     * unscaled·10^(−scale) written as {@code BigDecimal.valueOf(unscaled, scale).stripTrailingZeros().toPlainString()}
     * writes it: no exponent, no trailing zeros after the point, the point only when a digit follows it.
     */
    static String plain(long unscaled, int scale) {
        long m = unscaled;
        int s = scale;
        while (s > 0 && m % 10 == 0) {
            m /= 10;
            s--;
        }
        boolean negative = m < 0;
        long digitsLeft = Math.abs(m);
        int digits = 1;
        for (long rest = digitsLeft; rest >= 10; rest /= 10) {
            digits++;
        }
        int length = (negative ? 1 : 0) + (s <= 0 ? digits - s : digits > s ? digits + 1 : s + 2);
        char[] out = new char[length];
        int at = length;
        if (s < 0) {
            for (int i = 0; i < -s; i++) {
                out[--at] = '0';
            }
        }
        for (int i = 0; i < Math.max(digits, s); i++) {
            if (s > 0 && i == s) {
                out[--at] = '.';
            }
            out[--at] = (char) ('0' + digitsLeft % 10);
            digitsLeft /= 10;
        }
        if (s > 0 && digits <= s) {
            out[--at] = '.';
            out[--at] = '0';
        }
        if (negative) {
            out[--at] = '-';
        }
        return new String(out);
    }

    /** {@link #f} by exact decimal arithmetic on the binary value. */
    static String exact(double value) {
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(4, RoundingMode.HALF_EVEN));
        if (rounded.abs().compareTo(BigDecimal.valueOf(10_000)) >= 0) {
            rounded = rounded.setScale(0, RoundingMode.HALF_EVEN);
        }
        return rounded.stripTrailingZeros().toPlainString();
    }
}
