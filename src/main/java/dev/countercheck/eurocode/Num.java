package dev.countercheck.eurocode;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/** Formats numbers for traces: four significant figures, no trailing zeros, no exponent. */
public final class Num {

    private Num() {
    }

    /**
     * {@code 1870.4321 → "1870"}, {@code 0.0123456 → "0.01235"}, {@code 2.0 → "2"};
     * a non-finite value (only ever seen in an error message) prints as {@code "NaN"} or {@code "Infinity"}.
     */
    public static String f(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0.0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(4, RoundingMode.HALF_EVEN));
        if (rounded.abs().compareTo(BigDecimal.valueOf(10_000)) >= 0) {
            rounded = rounded.setScale(0, RoundingMode.HALF_EVEN);
        }
        return rounded.stripTrailingZeros().toPlainString();
    }
}
