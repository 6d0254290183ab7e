package dev.countercheck.statics;

/** A point in plan, in the element's axes (mm). */
public record PlanPoint(double xMm, double yMm) {
}
