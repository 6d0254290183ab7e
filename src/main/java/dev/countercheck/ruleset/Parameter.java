package dev.countercheck.ruleset;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;

/**
 * A nationally determined parameter (or a project convention) as the effective ruleset states it.
 *
 * @param name    the ruleset key, e.g. {@code gamma_c}
 * @param symbol  the standard's symbol, e.g. {@code γc}
 * @param unit    {@code "-"} for dimensionless
 * @param clause  where the standard (or the annex) sets it, or "common practice"
 * @param note    one line on what it is
 * @param origin  the ruleset file that set the value
 * @param source  how sure the file is of the value ({@code source: from-memory}: recalled, not verified)
 */
public record Parameter(String name, String symbol, double value, String unit, String clause, String note,
                        String origin, ValueSource source) {

    /** The parameter as a trace step, so that the report shows where each value came from. */
    public Step asStep() {
        Step step = Step.of(symbol, "ruleset parameter " + name, Num.f(value) + " (" + origin + ")", value, unit, clause);
        return source.recalled() ? step.remarked(ValueSource.MARK) : step;
    }
}
