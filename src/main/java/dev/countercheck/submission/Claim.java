package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;

/** One value the designer claims: {@code claims.<checkId>.<quantity>: value}, in the quantity's unit. */
public record Claim(String checkId, String quantity, double value, SourceLocation location) {
}
