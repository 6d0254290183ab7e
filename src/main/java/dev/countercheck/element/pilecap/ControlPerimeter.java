package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.Punching;
import dev.countercheck.eurocode.Step;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;

/**
 * A control perimeter at distance a from the column face, with rounded corners (EN 1992-1-1
 * 6.4.2(1)), and the part of it that lies on the cap.
 */
final class ControlPerimeter {

    private static final int SAMPLES = 4000;

    private ControlPerimeter() {
    }

    /** Distance from {@code p} to the column outline, 0 inside the column, mm. */
    static double distanceFromColumn(Column c, Point p) {
        double dx = p.xMm() - c.position().xMm();
        double dy = p.yMm() - c.position().yMm();
        if (c.shape() == ColumnShape.CIRCULAR) {
            return Math.max(0, Math.hypot(dx, dy) - c.cxMm() / 2);
        }
        double ox = Math.max(0, Math.abs(dx) - c.cxMm() / 2);
        double oy = Math.max(0, Math.abs(dy) - c.cyMm() / 2);
        return Math.hypot(ox, oy);
    }

    /** The full perimeter at distance a (EN 1992-1-1 6.4.2(1)), as a trace step. */
    static Step full(Column c, double aMm) {
        return c.shape() == ColumnShape.CIRCULAR
                ? Punching.u1Circular(c.cxMm(), aMm)
                : Punching.u1Rectangular(c.cxMm(), c.cyMm(), aMm);
    }

    /**
     * Length of the perimeter at distance a that lies within the cap's plan, mm, found by walking
     * the perimeter in {@value #SAMPLES} equal steps.
     */
    static double lengthOnCap(PileCap cap, double aMm) {
        Column c = cap.column();
        double total = full(c, aMm).value();
        int inside = 0;
        for (int i = 0; i < SAMPLES; i++) {
            Point p = pointAt(c, aMm, (i + 0.5) / SAMPLES * total);
            if (Math.abs(p.xMm()) <= cap.planXMm() / 2 && Math.abs(p.yMm()) <= cap.planYMm() / 2) {
                inside++;
            }
        }
        return total * inside / SAMPLES;
    }

    /** The point at arc length {@code s} along the perimeter, starting at the middle of the +x side. */
    private static Point pointAt(Column c, double a, double s) {
        double cx = c.position().xMm();
        double cy = c.position().yMm();
        if (c.shape() == ColumnShape.CIRCULAR) {
            double r = c.cxMm() / 2 + a;
            double t = s / r;
            return new Point(cx + r * Math.cos(t), cy + r * Math.sin(t));
        }
        double hx = c.cxMm() / 2;
        double hy = c.cyMm() / 2;
        double arc = Math.PI * a / 2;
        double[] straight = {2 * hy, 2 * hx, 2 * hy, 2 * hx};
        double[][] corner = {{hx, hy}, {-hx, hy}, {-hx, -hy}, {hx, -hy}};
        double remaining = s + hy;
        for (int side = 0; side < 4; side++) {
            if (remaining <= straight[side]) {
                double t = remaining;
                return switch (side) {
                    case 0 -> new Point(cx + hx + a, cy - hy + t);
                    case 1 -> new Point(cx + hx - t, cy + hy + a);
                    case 2 -> new Point(cx - hx - a, cy + hy - t);
                    default -> new Point(cx - hx + t, cy - hy - a);
                };
            }
            remaining -= straight[side];
            if (remaining <= arc) {
                double angle = side * Math.PI / 2 + remaining / Math.max(a, 1e-9);
                return new Point(cx + corner[side][0] + a * Math.cos(angle),
                        cy + corner[side][1] + a * Math.sin(angle));
            }
            remaining -= arc;
        }
        return new Point(cx + hx + a, cy - hy + remaining);
    }
}
