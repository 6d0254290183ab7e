package dev.countercheck.statics;

import dev.countercheck.eurocode.Punching;
import dev.countercheck.eurocode.Step;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A control perimeter at distance a from the column face, with rounded corners (EN 1992-1-1
 * 6.4.2(1)): its length, the part of it that lies on a plan centred on the origin, the share of a pile
 * head inside it, and the region it encloses (for the ground pressure inside it under a footing).
 */
public final class ControlPerimeter {

    /** Chords per quarter arc of the enclosed region's outline (1°: the region's area is short by 0.005 %). */
    private static final int CHORDS_PER_QUARTER = 90;

    /** cos φ and sin φ at the region's vertices, φ = (π/2)·(q + i/chords) on quarter q, i = 0 … chords. */
    private static final double[] ARC_COS = new double[4 * (CHORDS_PER_QUARTER + 1)];
    private static final double[] ARC_SIN = new double[4 * (CHORDS_PER_QUARTER + 1)];

    static {
        int n = CHORDS_PER_QUARTER + 1;
        for (int q = 0; q < 4; q++) {
            for (int i = 0; i < n; i++) {
                double phi = Math.PI / 2 * (q + (double) i / CHORDS_PER_QUARTER);
                ARC_COS[q * n + i] = Math.cos(phi);
                ARC_SIN[q * n + i] = Math.sin(phi);
            }
        }
    }

    /** Math.acos(1) and Math.asin(1), formed once: the bounds of the part of an arc the plan does not cut. */
    private static final double ACOS_ONE = Math.acos(1);
    private static final double ASIN_ONE = Math.asin(1);

    private static final int STRIPS = 400;
    /** The margin, as a share of a + D, by which a head must clear the perimeter to skip the strips. */
    private static final double CLEARANCE = 1e-9;

    private ControlPerimeter() {
    }

    /** Distance from {@code p} to the column outline, 0 inside the column, mm. */
    public static double distanceFromColumn(ColumnOutline c, PlanPoint p) {
        double dx = p.xMm() - c.centre().xMm();
        double dy = p.yMm() - c.centre().yMm();
        if (c.circular()) {
            return Math.max(0, Math.hypot(dx, dy) - c.cxMm() / 2);
        }
        double ox = Math.max(0, Math.abs(dx) - c.cxMm() / 2);
        double oy = Math.max(0, Math.abs(dy) - c.cyMm() / 2);
        return Math.hypot(ox, oy);
    }

    /** The full perimeter at distance a (EN 1992-1-1 6.4.2(1)), as a trace step. */
    public static Step full(ColumnOutline c, double aMm) {
        return c.circular()
                ? Punching.u1Circular(c.cxMm(), aMm)
                : Punching.u1Rectangular(c.cxMm(), c.cyMm(), aMm);
    }

    /** The value of {@link #full} alone (no trace text: a search over many perimeters), mm. */
    public static double fullValue(ColumnOutline c, double aMm) {
        return c.circular()
                ? Punching.u1CircularValue(c.cxMm(), aMm)
                : Punching.u1RectangularValue(c.cxMm(), c.cyMm(), aMm);
    }

    /**
     * β for the column's moments at the perimeter at distance a (EN 1992-1-1 6.4.3(3), Exp. (6.39) with
     * W of Exp. (6.41) and k of Table 6.1, summed over both axes; 6.4.4(2), Exp. (6.51) within 2d); a
     * circular column by Exp. (6.42) with the resultant eccentricity. At the face a = 2d (u1, W1).
     *
     * @param vEdKn VEd (VEd,red at a perimeter within 2d), kN, &gt; 0
     */
    public static Step beta(ColumnOutline c, double aMm, double vEdKn, double mxKnm, double myKnm) {
        if (c.circular()) {
            return Punching.betaCircular(Math.hypot(mxKnm, myKnm) * 1000 / vEdKn, c.cxMm(), aMm);
        }
        Step u = Punching.u1Rectangular(c.cxMm(), c.cyMm(), aMm);
        // My turns about y: the eccentricity lies along x, c1 = cx; Mx: along y, c1 = cy.
        Step alongX = Punching.betaEccentric(Punching.kEccentricity(c.cxMm(), c.cyMm()).value(), myKnm, vEdKn,
                u.value(), Punching.w1Rectangular(c.cxMm(), c.cyMm(), aMm).value());
        Step alongY = Punching.betaEccentric(Punching.kEccentricity(c.cyMm(), c.cxMm()).value(), mxKnm, vEdKn,
                u.value(), Punching.w1Rectangular(c.cyMm(), c.cxMm(), aMm).value());
        return Step.of("β", "1 + kx·(|My|/VEd)·(u/Wx) + ky·(|Mx|/VEd)·(u/Wy)", alongX.substituted() + " + "
                + alongY.substituted().substring(4), alongX.value() + alongY.value() - 1, "-",
                "EN 1992-1-1 6.4.3(3), Exp. (6.39), (6.41), Table 6.1; 6.4.4(2), Exp. (6.51)");
    }

    /**
     * What β at distance a takes from the column and a alone, formed once for a perimeter that many cases and loads
     * are tried at ({@link #betaValue}): u, and k and W along x (My) and along y (Mx), of a rectangular column.
     */
    public record BetaGeometry(ColumnOutline column, double aMm, double u, double kAlongX, double wAlongX,
                               double kAlongY, double wAlongY) {
    }

    /** The {@link BetaGeometry} of the perimeter at distance a, with the range checks of its formulas. */
    public static BetaGeometry betaGeometry(ColumnOutline c, double aMm) {
        if (c.circular()) {
            return new BetaGeometry(c, aMm, 0, 0, 0, 0, 0);
        }
        double u = Punching.u1RectangularValue(c.cxMm(), c.cyMm(), aMm);
        return new BetaGeometry(c, aMm, u, Punching.kEccentricityValue(c.cxMm(), c.cyMm()),
                Punching.w1RectangularValue(c.cxMm(), c.cyMm(), aMm), Punching.kEccentricityValue(c.cyMm(), c.cxMm()),
                Punching.w1RectangularValue(c.cyMm(), c.cxMm(), aMm));
    }

    /**
     * The value of {@link #beta} alone at the perimeter {@code g} was formed for, without its trace text (the search
     * over many perimeters and cases; the governing one is traced by {@link #beta}): the same arithmetic and the same
     * range checks.
     */
    public static double betaValue(BetaGeometry g, double vEdKn, double mxKnm, double myKnm) {
        ColumnOutline c = g.column();
        if (c.circular()) {
            return Punching.betaCircularValue(Math.hypot(mxKnm, myKnm) * 1000 / vEdKn, c.cxMm(), g.aMm());
        }
        double alongX = Punching.betaEccentricValue(g.kAlongX(), myKnm, vEdKn, g.u(), g.wAlongX());
        double alongY = Punching.betaEccentricValue(g.kAlongY(), mxKnm, vEdKn, g.u(), g.wAlongY());
        return alongX + alongY - 1;
    }

    /**
     * Length of the perimeter at distance a that lies within the plan |x| ≤ planX/2, |y| ≤ planY/2
     * (the cap, centred on the origin; a free edge cuts the perimeter off, EN 1992-1-1 6.4.2(4)), mm.
     * The perimeter is four straight sides and four quarter arcs of radius a about the column corners
     * (a circular column: four quarter arcs of radius D/2 + a about its centre); on a quarter arc
     * x = xc + sx·r·cos φ and y = yc + sy·r·sin φ, φ from 0 to π/2, so the part within the plan is
     * acos((X − sx·xc)/r) ≤ φ ≤ asin((Y − sy·yc)/r), with X, Y the half plan. The column lies on the cap.
     */
    public static double lengthInPlan(ColumnOutline c, double aMm, double planXMm, double planYMm) {
        boolean circular = c.circular();
        double hx = circular ? 0 : c.cxMm() / 2;
        double hy = circular ? 0 : c.cyMm() / 2;
        double r = circular ? c.cxMm() / 2 + aMm : aMm;
        double x0 = c.centre().xMm();
        double y0 = c.centre().yMm();
        double halfX = planXMm / 2;
        double halfY = planYMm / 2;
        double length = 0;
        for (int sx : new int[] {1, -1}) {
            length += Math.abs(x0 + sx * (hx + aMm)) <= halfX ? overlap(y0 - hy, y0 + hy, halfY) : 0;
            for (int sy : new int[] {1, -1}) {
                double from = acosClamped((halfX - sx * (x0 + sx * hx)) / r);
                double to = asinClamped((halfY - sy * (y0 + sy * hy)) / r);
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

    /**
     * acos of v clamped to [−1, 1]. An arc the plan does not cut has v ≥ 1: it takes {@link #ACOS_ONE}, the same
     * double without the call (the arcs of most perimeters are whole, and the call is costly).
     */
    private static double acosClamped(double v) {
        return v >= 1 ? ACOS_ONE : Math.acos(clamp(v));
    }

    /** asin of v clamped to [−1, 1]; v ≥ 1 takes {@link #ASIN_ONE}, as {@link #acosClamped}. */
    private static double asinClamped(double v) {
        return v >= 1 ? ASIN_ONE : Math.asin(clamp(v));
    }

    private static double clamp(double v) {
        return Math.max(-1, Math.min(1, v));
    }

    /**
     * Share (0 to 1) of a circular pile head's area that lies inside the control perimeter at distance
     * a from the column face (EN 1992-1-1 6.4.4(2): the pile relieves the load by that share of its
     * reaction), as {@link Heads#shareInside} for a group of one head.
     *
     * @param centre     pile centre
     * @param diameterMm pile head diameter, mm
     */
    public static double headShareInside(ColumnOutline c, double aMm, PlanPoint centre, double diameterMm) {
        return heads(c, List.of(centre), diameterMm).shareInside(0, aMm);
    }

    /** The pile heads of a group about the column, prepared once for the perimeters at every distance a. */
    public static Heads heads(ColumnOutline c, List<PlanPoint> centres, double diameterMm) {
        return new Heads(c, centres, diameterMm);
    }

    /**
     * Circular pile heads of one diameter about a column. The share of a head inside the perimeter at
     * distance a is the mean of {@value #STRIPS} strips across x and as many across y, so that the share
     * turns with the cap; the region inside the perimeter is convex, so each strip meets it once. A head
     * clear of the perimeter (its centre farther than a + D/2 from the column) has none of its area
     * inside, and a head clear within it (nearer than a − D/2) all of it: the strips are summed only for a
     * head the perimeter crosses. What does not depend on a is computed once per head; what depends only on
     * the head's x (the chords of the strips across x, their distances from the column, the head's area by
     * strips), once per x, and so for y: the heads of a row or a column of piles share it.
     */
    public static final class Heads {

        private final ColumnOutline column;
        private final List<PlanPoint> centres;
        private final double diameterMm;
        private final double[] distances;
        /** Each head's strips across x and across y, made when a perimeter first crosses the head. */
        private final Strips[][] strips;
        /** The strips across x of the heads at one x (by its bits), and across y of those at one y. */
        private final Map<Long, Across> acrossX = new HashMap<>();
        private final Map<Long, Across> acrossY = new HashMap<>();

        private Heads(ColumnOutline c, List<PlanPoint> centres, double diameterMm) {
            this.column = c;
            this.centres = List.copyOf(centres);
            this.diameterMm = diameterMm;
            distances = new double[centres.size()];
            strips = new Strips[centres.size()][];
            for (int i = 0; i < distances.length; i++) {
                distances[i] = distanceFromColumn(c, centres.get(i));
            }
        }

        /** Share (0 to 1) of head {@code i}'s area inside the control perimeter at distance a, mm. */
        public double shareInside(int i, double aMm) {
            double clear = CLEARANCE * (aMm + diameterMm);
            if (distances[i] > aMm + diameterMm / 2 + clear) {
                return 0;
            }
            if (distances[i] < aMm - diameterMm / 2 - clear) {
                return 1;
            }
            if (strips[i] == null) {
                PlanPoint p = centres.get(i);
                ColumnOutline turned = column.turned();
                Across x = acrossX.computeIfAbsent(Double.doubleToLongBits(p.xMm()),
                        k -> new Across(column, p.xMm(), diameterMm));
                Across y = acrossY.computeIfAbsent(Double.doubleToLongBits(p.yMm()),
                        k -> new Across(turned, p.yMm(), diameterMm));
                strips[i] = new Strips[] {new Strips(column, x, p.yMm()), new Strips(turned, y, p.xMm())};
            }
            return (strips[i][0].shareInside(aMm) + strips[i][1].shareInside(aMm)) / 2;
        }
    }

    /**
     * What the strips across x of a head share with every head at the same x (across y: the same with x and y
     * swapped, the column turned): each strip's half chord, its distance from the column along x (beyond the
     * column's side, or from a circular column's centre), the strip nearest the column and the head's area by
     * strips.
     */
    private static final class Across {

        private final double[] chords = new double[STRIPS];
        private final double[] beyond = new double[STRIPS];
        /** The strip nearest the column: {@code beyond} falls to it and rises after it. */
        private final int nearest;
        private final double whole;

        Across(ColumnOutline c, double centreX, double diameterMm) {
            boolean circular = c.circular();
            double r = diameterMm / 2;
            double width = diameterMm / STRIPS;
            double sum = 0;
            for (int i = 0; i < STRIPS; i++) {
                double x = centreX - r + (i + 0.5) * width;
                double chord = Math.sqrt(Math.max(0, r * r - sq(x - centreX)));
                sum += 2 * chord;
                chords[i] = chord;
                double dx = Math.abs(x - c.centre().xMm());
                beyond[i] = circular ? dx : Math.max(0, dx - c.cxMm() / 2);
            }
            whole = sum;
            int m = 0;
            for (int i = 1; i < STRIPS; i++) {
                if (beyond[i] < beyond[m]) {
                    m = i;
                }
            }
            nearest = m;
        }
    }

    /**
     * The strips of one head across x (a head across y is the same with x and y swapped, the column
     * turned): what it shares with the heads at its x, and its centre's y (a strip's lower and upper edge
     * on the head lie its half chord below and above it).
     *
     * <p>A strip the region holds whole adds its whole length; which strips it holds is known without the
     * square root. At a strip {@code beyond} from the column the region's half height is
     * {@code lift + √(s² − beyond²)} (s = a and lift = cy/2; a circular column: s = D/2 + a, lift = 0), and the
     * square root rises with its argument v. Where v reaches {@code wholeFrom} (the least half height that holds the
     * strip, with a margin of 10⁻⁹ of the sizes involved, far above the rounding of the few operations between),
     * the strip's edges are inside by more than their rounding, so that min and max return them and the strip adds,
     * to the bit, what the sum with the root would: its length.
     */
    private static final class Strips {

        private static final double MARGIN = 1e-9;

        private final boolean circular;
        private final double columnY;
        private final double columnHalfY;
        private final double columnRadius;
        private final double centreY;
        private final double[] chords;
        private final double[] beyond;
        private final int nearest;
        private final double whole;
        /** The argument of the square root from which strip i lies whole inside the region. */
        private final double[] wholeFrom = new double[STRIPS];
        /** The length of strip i on the head (its upper edge less its lower). */
        private final double[] lengths = new double[STRIPS];

        Strips(ColumnOutline c, Across across, double centreY) {
            circular = c.circular();
            columnY = c.centre().yMm();
            columnHalfY = c.cyMm() / 2;
            columnRadius = c.cxMm() / 2;
            this.centreY = centreY;
            chords = across.chords;
            beyond = across.beyond;
            nearest = across.nearest;
            whole = across.whole;
            double lift = lift();
            for (int i = 0; i < STRIPS; i++) {
                double top = centreY + chords[i];
                double bottom = centreY - chords[i];
                lengths[i] = top - bottom;
                double need = Math.max(top - columnY, columnY - bottom);
                double scale = 1 + Math.abs(columnY) + Math.abs(top) + Math.abs(bottom) + lift;
                double root = Math.max(0, need * (1 + MARGIN) + MARGIN * scale - lift);
                wholeFrom[i] = root * root * (1 + MARGIN);
            }
        }

        /** What the region's half height adds to the square root: cy/2, or 0 about a circular column. */
        private double lift() {
            return circular ? 0 : columnHalfY;
        }

        /**
         * The share of the head inside the perimeter at distance a by these strips. The strips the region reaches
         * ({@code beyond} within a, or within D/2 + a of a circular column's centre) are those next to the
         * nearest, found by bisection on each side of it; the others add nothing to the sum.
         */
        double shareInside(double aMm) {
            double inside = 0;
            double radius = columnRadius + aMm;
            double reach = circular ? radius : aMm;
            if (beyond[nearest] > reach) {
                return whole == 0 ? 0 : inside / whole;
            }
            int first = firstWithin(reach);
            int last = lastWithin(reach);
            double lift = lift();
            for (int i = first; i <= last; i++) {
                double v = reach * reach - beyond[i] * beyond[i];
                if (v >= wholeFrom[i]) {
                    inside += lengths[i];
                    continue;
                }
                double half = lift + Math.sqrt(v);
                double lo = greater(centreY - chords[i], columnY - half);
                double hi = lesser(centreY + chords[i], columnY + half);
                inside += greater(0, hi - lo);
            }
            return whole == 0 ? 0 : inside / whole;
        }

        /** The first strip up to the nearest whose {@code beyond} is within {@code reach} (the nearest's is). */
        private int firstWithin(double reach) {
            int lo = 0;
            int hi = nearest;
            while (lo < hi) {
                int mid = (lo + hi) >>> 1;
                if (beyond[mid] <= reach) {
                    hi = mid;
                } else {
                    lo = mid + 1;
                }
            }
            return lo;
        }

        /** The last strip from the nearest on whose {@code beyond} is within {@code reach} (the nearest's is). */
        private int lastWithin(double reach) {
            int lo = nearest;
            int hi = STRIPS - 1;
            while (lo < hi) {
                int mid = (lo + hi + 1) >>> 1;
                if (beyond[mid] <= reach) {
                    lo = mid;
                } else {
                    hi = mid - 1;
                }
            }
            return lo;
        }
    }

    /**
     * The region within distance a of the column (the area the control perimeter encloses), as a convex
     * polygon whose arcs are drawn by chords of 1°, counter-clockwise.
     */
    static ConvexPolygon region(ColumnOutline c, double aMm) {
        double x0 = c.centre().xMm();
        double y0 = c.centre().yMm();
        if (c.circular()) {
            return ConvexPolygon.regular(x0, y0, c.cxMm() / 2 + aMm, 4 * CHORDS_PER_QUARTER);
        }
        double hx = c.cxMm() / 2;
        double hy = c.cyMm() / 2;
        int n = CHORDS_PER_QUARTER + 1;
        double[] xs = new double[4 * n];
        double[] ys = new double[4 * n];
        double[][] corners = {{hx, hy}, {-hx, hy}, {-hx, -hy}, {hx, -hy}};
        for (int q = 0; q < 4; q++) {
            for (int i = 0; i < n; i++) {
                xs[q * n + i] = x0 + corners[q][0] + aMm * ARC_COS[q * n + i];
                ys[q * n + i] = y0 + corners[q][1] + aMm * ARC_SIN[q * n + i];
            }
        }
        // The vertices lie within hx + a and hy + a of the centre; the box is widened far beyond rounding.
        double slack = 1e-9 * (Math.abs(x0) + Math.abs(y0) + hx + hy + aMm);
        return ConvexPolygon.of(xs, ys).enclosedBy(x0 - hx - aMm - slack, y0 - hy - aMm - slack,
                x0 + hx + aMm + slack, y0 + hy + aMm + slack);
    }

    private static double sq(double v) {
        return v * v;
    }

    /**
     * The greater of two finite values, as {@link Math#max} gives it but for the sign of a zero when both are
     * zeros: the strips' lengths use it where that sign never reaches the sum (a length of ±0 adds nothing, and
     * a bound of ±0 subtracted from a nonzero value gives the same difference). Math.max's handling of NaN and
     * −0 compiles to a blend that costs the strip loops about half their time; this is a compare and a branch.
     */
    private static double greater(double a, double b) {
        return a >= b ? a : b;
    }

    /** The lesser of two finite values, as {@link Math#min} gives it but for the sign of a zero (see {@link #greater}). */
    private static double lesser(double a, double b) {
        return a <= b ? a : b;
    }
}
