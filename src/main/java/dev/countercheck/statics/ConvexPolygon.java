package dev.countercheck.statics;

import java.util.function.DoubleBinaryOperator;

/**
 * A convex polygon in plan (vertices counter-clockwise, mm or any consistent unit), clipped by half-planes
 * and integrated exactly: a triangle fan with the edge-midpoint rule, ∫g = (A/3)·Σ g(edge midpoints) per
 * triangle, which is exact for every g of degree two or less (a linear pressure times a linear lever arm).
 */
final class ConvexPolygon {

    /** The margin, relative to the terms of a + b·x + c·y, by which a bounding box clears a half-plane. */
    private static final double CLEAR = 1e-12;

    private final double[] xs;
    private final double[] ys;
    /** The bounding box (min x, min y, max x, max y), made when first asked for. */
    private double[] box;

    private ConvexPolygon(double[] xs, double[] ys) {
        this.xs = xs;
        this.ys = ys;
    }

    /** The rectangle x0 ≤ x ≤ x1, y0 ≤ y ≤ y1. */
    static ConvexPolygon rectangle(double x0, double y0, double x1, double y1) {
        return new ConvexPolygon(new double[] {x0, x1, x1, x0}, new double[] {y0, y0, y1, y1});
    }

    /** The polygon through the given vertices, counter-clockwise. */
    static ConvexPolygon of(double[] xs, double[] ys) {
        return new ConvexPolygon(xs.clone(), ys.clone());
    }

    /** A regular polygon of n vertices on the circle of radius r about (cx, cy), the first on the x axis. */
    static ConvexPolygon regular(double cx, double cy, double r, int n) {
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            double phi = 2 * Math.PI * i / n;
            x[i] = cx + r * Math.cos(phi);
            y[i] = cy + r * Math.sin(phi);
        }
        return new ConvexPolygon(x, y);
    }

    /**
     * The same polygon, told a box that encloses it (known from how it was drawn, so that {@link #intersect}
     * need not look through its vertices for one); a box larger than the polygon only skips fewer edges.
     */
    ConvexPolygon enclosedBy(double minX, double minY, double maxX, double maxY) {
        box = new double[] {minX, minY, maxX, maxY};
        return this;
    }

    /** Whether {@code other} has the same vertices in the same order (exactly). */
    boolean sameAs(ConvexPolygon other) {
        return other == this || java.util.Arrays.equals(xs, other.xs) && java.util.Arrays.equals(ys, other.ys);
    }

    int size() {
        return xs.length;
    }

    double x(int i) {
        return xs[i];
    }

    double y(int i) {
        return ys[i];
    }

    /** The part where a + b·x + c·y ≥ 0 (Sutherland–Hodgman against one half-plane). */
    ConvexPolygon clip(double a, double b, double c) {
        int n = xs.length;
        double[] nx = new double[2 * n];
        double[] ny = new double[2 * n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double fi = a + b * xs[i] + c * ys[i];
            double fj = a + b * xs[j] + c * ys[j];
            if (fi >= 0) {
                nx[m] = xs[i];
                ny[m++] = ys[i];
            }
            if ((fi >= 0) != (fj >= 0)) {
                double t = fi / (fi - fj);
                nx[m] = xs[i] + t * (xs[j] - xs[i]);
                ny[m++] = ys[i] + t * (ys[j] - ys[i]);
            }
        }
        return new ConvexPolygon(java.util.Arrays.copyOf(nx, m), java.util.Arrays.copyOf(ny, m));
    }

    /**
     * The intersection with another convex polygon (clipped by each of its edges). An edge whose half-plane
     * holds this polygon's bounding box with a margin far above rounding is skipped: clipping by it would
     * return every vertex unchanged, in the same order.
     */
    ConvexPolygon intersect(ConvexPolygon other) {
        ConvexPolygon result = this;
        int n = other.xs.length;
        for (int i = 0; i < n && result.size() >= 3; i++) {
            int j = (i + 1) % n;
            double ex = other.xs[j] - other.xs[i];
            double ey = other.ys[j] - other.ys[i];
            // Left of the edge i → j (inside for a counter-clockwise polygon): ex·(y − yi) − ey·(x − xi) ≥ 0.
            double a = ey * other.xs[i] - ex * other.ys[i];
            if (!result.clearlyWithin(a, -ey, ex)) {
                result = result.clip(a, -ey, ex);
            }
        }
        return result;
    }

    /** Whether a + b·x + c·y is positive at every vertex by more than its rounding error (by the bounding box). */
    private boolean clearlyWithin(double a, double b, double c) {
        if (box == null) {
            double[] bb = {Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
                Double.NEGATIVE_INFINITY};
            for (int i = 0; i < xs.length; i++) {
                bb[0] = Math.min(bb[0], xs[i]);
                bb[1] = Math.min(bb[1], ys[i]);
                bb[2] = Math.max(bb[2], xs[i]);
                bb[3] = Math.max(bb[3], ys[i]);
            }
            box = bb;
        }
        double least = a + b * (b >= 0 ? box[0] : box[2]) + c * (c >= 0 ? box[1] : box[3]);
        double scale = Math.abs(a) + Math.abs(b) * Math.max(Math.abs(box[0]), Math.abs(box[2]))
                + Math.abs(c) * Math.max(Math.abs(box[1]), Math.abs(box[3]));
        return least > CLEAR * scale;
    }

    /** ∫ g dA for g of degree ≤ 2 (exact), 0 for a polygon of fewer than three vertices. */
    double integrate(DoubleBinaryOperator g) {
        double sum = 0;
        for (int i = 1; i + 1 < xs.length; i++) {
            double area = 0.5 * ((xs[i] - xs[0]) * (ys[i + 1] - ys[0]) - (xs[i + 1] - xs[0]) * (ys[i] - ys[0]));
            sum += area / 3 * (g.applyAsDouble((xs[0] + xs[i]) / 2, (ys[0] + ys[i]) / 2)
                    + g.applyAsDouble((xs[i] + xs[i + 1]) / 2, (ys[i] + ys[i + 1]) / 2)
                    + g.applyAsDouble((xs[i + 1] + xs[0]) / 2, (ys[i + 1] + ys[0]) / 2));
        }
        return sum;
    }

    /**
     * ∫ (q0 + qx·x + qy·y) dA: {@link #integrate} of that plane with the same arithmetic, term for term (the same
     * double), without a call through an interface per point (the search over control perimeters integrates many).
     * The midpoint of the fan's edge from vertex 0 to vertex i + 1, and its pressure, are those of triangle i's last
     * midpoint and triangle i + 1's first (the same sum, x0 + x(i+1), either way round): formed once for both, as is
     * that edge's difference from vertex 0.
     */
    double integratePlane(double q0, double qx, double qy) {
        if (xs.length < 3) {
            return 0;
        }
        double x0 = xs[0];
        double y0 = ys[0];
        double dx = xs[1] - x0;
        double dy = ys[1] - y0;
        double first = q0 + qx * ((x0 + xs[1]) / 2) + qy * ((y0 + ys[1]) / 2);
        double sum = 0;
        for (int i = 1; i + 1 < xs.length; i++) {
            double dxNext = xs[i + 1] - x0;
            double dyNext = ys[i + 1] - y0;
            double area = 0.5 * (dx * dyNext - dxNext * dy);
            double outer = q0 + qx * ((xs[i] + xs[i + 1]) / 2) + qy * ((ys[i] + ys[i + 1]) / 2);
            double last = q0 + qx * ((xs[i + 1] + x0) / 2) + qy * ((ys[i + 1] + y0) / 2);
            sum += area / 3 * (first + outer + last);
            first = last;
            dx = dxNext;
            dy = dyNext;
        }
        return sum;
    }

    double area() {
        return integrate((x, y) -> 1);
    }

    /** The largest of f over the vertices. */
    double max(DoubleBinaryOperator f) {
        double best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < xs.length; i++) {
            best = Math.max(best, f.applyAsDouble(xs[i], ys[i]));
        }
        return best;
    }

    /** Whether (x, y) lies in the polygon (on its edges included, within a relative 1e-12). */
    boolean contains(double x, double y) {
        int n = xs.length;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double cross = (xs[j] - xs[i]) * (y - ys[i]) - (ys[j] - ys[i]) * (x - xs[i]);
            double scale = Math.hypot(xs[j] - xs[i], ys[j] - ys[i]) * (1 + Math.hypot(x - xs[i], y - ys[i]));
            if (cross < -1e-12 * scale) {
                return false;
            }
        }
        return n >= 3;
    }
}
