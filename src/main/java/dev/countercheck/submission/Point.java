package dev.countercheck.submission;

/** A plan position in mm, origin at the centre of the element's plan. */
public record Point(double xMm, double yMm) {

    public double distanceTo(Point other) {
        return Math.hypot(xMm - other.xMm, yMm - other.yMm);
    }
}
