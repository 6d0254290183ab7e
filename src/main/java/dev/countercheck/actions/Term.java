package dev.countercheck.actions;

/**
 * One action as it enters a combination: its label (with a sign for a reversible action), the total
 * factor applied and how it was formed, e.g. {@code W−}, 0.9, {@code γQ·ψ0}.
 */
public record Term(String action, double factor, String how) {
}
