package dev.countercheck.eurocode;

import java.util.Optional;

/**
 * One step of a calculation trace: a computed quantity with the formula it came from,
 * the formula with the values substituted, the result, its unit and the clause.
 *
 * <p>Every formula function of this package returns a {@code Step}, so a value never
 * travels without the record of how it was obtained. {@code remark} carries what the
 * reader of the trace must know beyond the formula: a cap the code applies ("k capped
 * at 2.0"), a branch taken ("av ≤ 2d: β = av/2d"), a floor ("av raised to 0.5d").
 *
 * @param symbol      the standard's symbol, e.g. {@code "VRd,c"}
 * @param formula     the formula in the standard's symbols, e.g. {@code "CRd,c·k·(100·ρl·fck)^(1/3)"}
 * @param substituted the formula with the numbers put in, e.g. {@code "0.12·1.44·(100·0.0050·32)^(1/3)"}
 * @param value       the result, in {@code unit}
 * @param unit        the unit of the result ({@code "-"} for dimensionless)
 * @param clause      where the formula comes from, e.g. {@code "EN 1992-1-1 6.2.2(1), Exp. (6.2a)"},
 *                    or {@code "common practice"}
 * @param remark      a cap, floor or branch applied, when there was one
 * @param fromRule    whether a ruleset's rule derived it: its formula and substituted text are then written in
 *                    the rules' expression syntax, not the standard's notation (the report rewrites them; the
 *                    JSON result does not carry the mark)
 */
public record Step(String symbol, String formula, String substituted, double value, String unit,
                   String clause, Optional<String> remark, boolean fromRule) {

    public Step {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            throw new ArithmeticException(symbol + " = " + substituted + " is not a finite number");
        }
    }

    /** A step the code built, not a rule. */
    public Step(String symbol, String formula, String substituted, double value, String unit, String clause,
                Optional<String> remark) {
        this(symbol, formula, substituted, value, unit, clause, remark, false);
    }

    /** A step with no remark. */
    public static Step of(String symbol, String formula, String substituted, double value, String unit,
                          String clause) {
        return new Step(symbol, formula, substituted, value, unit, clause, Optional.empty());
    }

    /** A step a ruleset's rule derived, its formula and substituted text in the rules' syntax; no remark. */
    public static Step ofRule(String symbol, String formula, String substituted, double value, String unit,
                              String clause) {
        return new Step(symbol, formula, substituted, value, unit, clause, Optional.empty(), true);
    }

    /** A step whose value was capped, floored, or chose a branch; {@code remark} says which. */
    public static Step withRemark(String symbol, String formula, String substituted, double value, String unit,
                                  String clause, String remark) {
        return new Step(symbol, formula, substituted, value, unit, clause, Optional.of(remark));
    }

    /** The same step with a remark added (or appended to the existing one). */
    public Step remarked(String more) {
        String text = remark.map(r -> r + "; " + more).orElse(more);
        return new Step(symbol, formula, substituted, value, unit, clause, Optional.of(text), fromRule);
    }
}
