package dev.countercheck.ruleset;

/**
 * The severity a ruleset gives one kind of finding, so that a firm can move it.
 *
 * @param kind     the kind of finding, e.g. {@code claim-unconservative}
 * @param severity critical, major, minor or note
 * @param meaning  one line on when a finding is of this kind
 * @param origin   the ruleset file that set the severity
 */
public record SeverityDef(String kind, String severity, String meaning, String origin) {
}
