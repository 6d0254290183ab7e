package dev.countercheck.ruleset;

/**
 * A method the ruleset chooses among those the engine offers (its {@code options:} section), e.g.
 * {@code node_column_basis: partially-loaded-area}.
 *
 * @param name   the option's key, e.g. {@code node_column_basis}
 * @param value  the choice, one of the engine's
 * @param clause where the standard offers the choice, or "common practice"
 * @param note   one line on what it changes
 * @param origin the ruleset file that made the choice
 */
public record RuleOption(String name, String value, String clause, String note, String origin) {
}
