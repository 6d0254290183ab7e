package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.Punching;
import dev.countercheck.eurocode.Step;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.Point;

/**
 * A control perimeter at distance a from the column face, with rounded corners (EN 1992-1-1
 * 6.4.2(1)), the part of it that lies on the cap and the share of a pile head inside it.
 */
final class ControlPerimeter {

    private static final int STRIPS = 400;
    /** The margin, as a share of a + D, by which a head must clear the perimeter to skip the strips. */
    private static final double CLEARANCE = 1e-9;

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
     * Length of the perimeter at distance a that lies within the plan |x| ≤ planX/2, |y| ≤ planY/2
     * (the cap, centred on the origin; a free edge cuts the perimeter off, EN 1992-1-1 6.4.2(4)), mm.
     * The perimeter is four straight sides and four quarter arcs of radius a about the column corners
     * (a circular column: four quarter arcs of radius D/2 + a about its centre); on a quarter arc
     * x = xc + sx·r·cos φ and y = yc + sy·r·sin φ, φ from 0 to π/2, so the part within the plan is
     * acos((X − sx·xc)/r) ≤ φ ≤ asin((Y − sy·yc)/r), with X, Y the half plan. The column lies on the cap.
     */
    static double lengthInPlan(Column c, double aMm, double planXMm, double planYMm) {
        boolean circular = c.shape() == ColumnShape.CIRCULAR;
        double hx = circular ? 0 : c.cxMm() / 2;
        double hy = circular ? 0 : c.cyMm() / 2;
        double r = circular ? c.cxMm() / 2 + aMm : aMm;
        double x0 = c.position().xMm();
        double y0 = c.position().yMm();
        double halfX = planXMm / 2;
        double halfY = planYMm / 2;
        double length = 0;
        for (int sx : new int[] {1, -1}) {
            length += Math.abs(x0 + sx * (hx + aMm)) <= halfX ? overlap(y0 - hy, y0 + hy, halfY) : 0;
            for (int sy : new int[] {1, -1}) {
                double from = Math.acos(clamp((halfX - sx * (x0 + sx * hx)) / r));
                double to = Math.asin(clamp((halfY - sy * (y0 + sy * hy)) / r));
                length += r * Math.max(0, to - from);
            }
        }
        for (int sy : new int[] {1, -1}) {
            length += Math.abs(y0 + sy * (hy + aMm)) <= halfY ? overlap(x0 - hx, x0 + hx, halfX) : 0;
        }
        return length;
    }

    /** Length of [lo, hi] within [−half, half]. */
    private static double overlap(double lo, double hi, double half) {
        return Math.max(0, Math.min(hi, half) - Math.max(lo, -half));
    }

    private static double clamp(double v) {
        return Math.max(-1, Math.min(1, v));
    }

    /**
     * Share (0 to 1) of a circular pile head's area that lies inside the control perimeter at distance
     * a from the column face (EN 1992-1-1 6.4.4(2): the pile relieves the load by that share of its
     * reaction): the mean of {@value #STRIPS} strips across x and as many across y, so that the share
     * turns with the cap; the region inside the perimeter is convex, so each strip meets it once.
     * A head clear of the perimeter (its centre farther than a + D/2 from the column) has none of its
     * area inside, and a head clear within it (nearer than a − D/2) all of it: the strips are summed
     * only for a head the perimeter crosses.
     *
     * @param centre     pile centre
     * @param diameterMm pile head diameter, mm
     */
    static double headShareInside(Column c, double aMm, Point centre, double diameterMm) {
        double distance = distanceFromColumn(c, centre);
        double clear = CLEARANCE * (aMm + diameterMm);
        if (distance > aMm + diameterMm / 2 + clear) {
            return 0;
        }
        if (distance < aMm - diameterMm / 2 - clear) {
            return 1;
        }
        Column turned = new Column(c.shape(), c.cyMm(), c.cxMm(), new Point(c.position().yMm(), c.position().xMm()),
                c.starterBars());
        return (stripShare(c, aMm, centre, diameterMm)
                + stripShare(turned, aMm, new Point(centre.yMm(), centre.xMm()), diameterMm)) / 2;
    }

    /** The share of the head inside the perimeter by strips across x. */
    private static double stripShare(Column c, double aMm, Point centre, double diameterMm) {
        double r = diameterMm / 2;
        double width = diameterMm / STRIPS;
        double whole = 0;
        double inside = 0;
        for (int i = 0; i < STRIPS; i++) {
            double x = centre.xMm() - r + (i + 0.5) * width;
            double chord = Math.sqrt(Math.max(0, r * r - sq(x - centre.xMm())));
            whole += 2 * chord;
            double half = halfHeightInside(c, aMm, x);
            if (half >= 0) {
                double lo = Math.max(centre.yMm() - chord, c.position().yMm() - half);
                double hi = Math.min(centre.yMm() + chord, c.position().yMm() + half);
                inside += Math.max(0, hi - lo);
            }
        }
        return whole == 0 ? 0 : inside / whole;
    }

    /** Half the height of the region within distance a of the column at abscissa x, mm; −1 outside it. */
    private static double halfHeightInside(Column c, double aMm, double x) {
        double dx = Math.abs(x - c.position().xMm());
        if (c.shape() == ColumnShape.CIRCULAR) {
            double radius = c.cxMm() / 2 + aMm;
            return dx > radius ? -1 : Math.sqrt(radius * radius - dx * dx);
        }
        double beyond = Math.max(0, dx - c.cxMm() / 2);
        return beyond > aMm ? -1 : c.cyMm() / 2 + Math.sqrt(aMm * aMm - beyond * beyond);
    }

    private static double sq(double v) {
        return v * v;
    }
}
