package dev.countercheck.eurocode;

/**
 * A formula was asked for a value outside the range in which its clause is valid.
 * The message names the value, the bound and the clause.
 */
public final class OutOfRangeException extends IllegalArgumentException {

    public OutOfRangeException(String symbol, double value, String unit, String bound, String clause) {
        super(symbol + " = " + Num.f(value) + " " + unit + " is outside the valid range (" + bound + ") of "
                + clause);
    }

    /** Throws unless {@code low ≤ value ≤ high}. */
    public static double requireWithin(String symbol, double value, String unit, double low, double high,
                                       String clause) {
        if (!(value >= low && value <= high)) {
            throw new OutOfRangeException(symbol, value, unit,
                    Num.f(low) + " ≤ " + symbol + " ≤ " + Num.f(high) + " " + unit, clause);
        }
        return value;
    }

    /** Throws unless {@code value > 0}. */
    public static double requirePositive(String symbol, double value, String unit, String clause) {
        if (!(value > 0)) {
            throw new OutOfRangeException(symbol, value, unit, symbol + " > 0", clause);
        }
        return value;
    }
}
