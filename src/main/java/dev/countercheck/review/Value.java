package dev.countercheck.review;

import java.util.OptionalInt;

/**
 * A computed quantity with its unit.
 *
 * @param step the index in the check's trace of the step that computed it, when one did
 */
public record Value(double value, String unit, OptionalInt step) {
}
