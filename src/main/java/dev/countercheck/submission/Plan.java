package dev.countercheck.submission;

import dev.countercheck.submission.Values.Bound;

import java.util.List;
import java.util.Optional;

/** A rectangular plan centred on the origin, mm: to test whether piles and columns stand on it. */
record Plan(double xMm, double yMm) {

    /** The keys of an element's {@code plan}. */
    static final List<String> KEYS = List.of("x", "y");

    /** The {@code plan} of an element: both sides required, each positive. */
    static Optional<Plan> read(Fields f) {
        Optional<Double> x = f.requiredQuantity("x", Dimension.LENGTH, Bound.POSITIVE);
        Optional<Double> y = f.requiredQuantity("y", Dimension.LENGTH, Bound.POSITIVE);
        return x.flatMap(a -> y.map(b -> new Plan(a, b)));
    }

    boolean containsCentre(Point p) {
        return Math.abs(p.xMm()) <= xMm / 2 && Math.abs(p.yMm()) <= yMm / 2;
    }

    /**
     * How far a footprint centred at {@code p} with half-sizes {@code halfX}, {@code halfY} reaches
     * beyond the plan's edges, mm (zero or negative when it lies within). For a circle the
     * half-sizes are its radius: a circle crosses a straight edge exactly when its bounding
     * square does.
     */
    double overhangMm(Point p, double halfX, double halfY) {
        return Math.max(Math.abs(p.xMm()) + halfX - xMm / 2, Math.abs(p.yMm()) + halfY - yMm / 2);
    }

    /** "x = ±1200 mm, y = ±900 mm" */
    String extent() {
        return "x = ±" + Values.format(xMm / 2) + " mm, y = ±" + Values.format(yMm / 2) + " mm";
    }

    static String describe(Point p) {
        return "(" + Values.format(p.xMm()) + ", " + Values.format(p.yMm()) + ")";
    }
}
