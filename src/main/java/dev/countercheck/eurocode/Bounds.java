package dev.countercheck.eurocode;

/** Input checks shared by the formula classes; each failure names value, bound and clause. */
final class Bounds {

    /** Strength classes C12/15 to C90/105 of EN 1992-1-1 3.1.2(2)P. */
    static final String FCK_CLAUSE = "EN 1992-1-1 3.1.2(2)P, Table 3.1";

    private Bounds() {
    }

    /** Throws unless 12 ≤ fck ≤ 90 MPa. */
    static double fck(double fckMpa) {
        return OutOfRangeException.requireWithin("fck", fckMpa, "MPa", 12, 90, FCK_CLAUSE);
    }

    /** Throws unless {@code value ≥ 0}. */
    static double nonNegative(String symbol, double value, String unit, String clause) {
        return atLeast(symbol, value, unit, 0, clause);
    }

    /** Throws unless {@code value ≥ low}. */
    static double atLeast(String symbol, double value, String unit, double low, String clause) {
        if (!(value >= low) || Double.isInfinite(value)) {
            throw new OutOfRangeException(symbol, value, unit, symbol + " ≥ " + Num.f(low) + " " + unit, clause);
        }
        return value;
    }

    /** Throws unless {@code 0 < value ≤ high}. */
    static double positiveAtMost(String symbol, double value, String unit, double high, String clause) {
        if (!(value > 0 && value <= high)) {
            throw new OutOfRangeException(symbol, value, unit, "0 < " + symbol + " ≤ " + Num.f(high) + " " + unit,
                    clause);
        }
        return value;
    }

    /** Throws unless {@code value > 0} and finite. */
    static double positive(String symbol, double value, String unit, String clause) {
        if (Double.isInfinite(value)) {
            throw new OutOfRangeException(symbol, value, unit, symbol + " finite", clause);
        }
        return OutOfRangeException.requirePositive(symbol, value, unit, clause);
    }

    /** Throws unless the step carries a value in {@code unit}; guards formulas that take steps. */
    static Step inUnit(Step step, String unit) {
        if (!step.unit().equals(unit)) {
            throw new IllegalArgumentException(step.symbol() + " is in " + step.unit() + ", expected " + unit);
        }
        return step;
    }
}
