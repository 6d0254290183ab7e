package dev.countercheck.review;

/** A computed quantity with its unit. */
public record Value(double value, String unit) {
}
