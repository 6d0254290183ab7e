package dev.countercheck.ruleset;

/**
 * The ruleset's rule for one check of one element type: the check definition and the subject its
 * id names ({@code x} for {@code min-steel-x} of {@code min-steel-{dir}}; empty for a check of one subject).
 */
public record Rule(CheckDef def, String subject) {
}
