package dev.countercheck.submission;

/** A rectangular plan centred on the origin, mm: to test whether piles and columns stand on it. */
record Plan(double xMm, double yMm) {

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
