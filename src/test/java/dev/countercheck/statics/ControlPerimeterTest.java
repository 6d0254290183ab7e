package dev.countercheck.statics;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/** The geometry of control perimeters: length on the cap, share of a pile head inside. Invented sizes. */
class ControlPerimeterTest {

    private static final ColumnOutline SQUARE = ColumnOutline.rectangular(400, 400, new PlanPoint(0, 0));
    private static final ColumnOutline ROUND = ColumnOutline.circular(400, new PlanPoint(0, 0));

    @Test
    void aFreeEdgeCutsThePerimeter() {
        // Hand calculation: 400 × 400 column, a = 300, plan 800 wide in x. The sides at x = ±500 lie off
        // the cap; the sides at y = ±500 (x from −200 to 200) are on it: 2·400 = 800 mm. Each corner arc
        // (centre (±200, ±200), radius 300) is on the cap while 200 + 300·cos φ ≤ 400: φ ≥ acos(2/3) =
        // 48.19°, i.e. 41.81° = 0.72973 rad of the 90°: 4·300·0.72973 = 875.7 mm. Total 1675.7 mm.
        assertThat(ControlPerimeter.lengthInPlan(SQUARE, 300, 800, 5000)).isCloseTo(1675.7, withinPercentage(0.01));
        // On a plan large enough the whole perimeter counts: 4·400 + 2π·300 = 3485.0 mm (EN 1992-1-1 Figure 6.13).
        assertThat(ControlPerimeter.lengthInPlan(SQUARE, 300, 5000, 5000)).isCloseTo(3485.0, withinPercentage(0.01));
        // Circular column D = 400: 2π·(200 + 300) = 3141.6 mm; a plan 500 wide in y keeps the part with
        // |y| ≤ 250, four arcs of asin(250/500) = 30° each: 4·(π/6)·500 = 1047.2 mm.
        assertThat(ControlPerimeter.lengthInPlan(ROUND, 300, 5000, 5000)).isCloseTo(3141.6, withinPercentage(0.01));
        assertThat(ControlPerimeter.lengthInPlan(ROUND, 300, 5000, 500)).isCloseTo(1047.2, withinPercentage(0.01));
    }

    @Test
    void aPileHeadCountsByTheShareOfItsAreaInside() {
        // A head wholly inside, wholly outside, and centred on a straight side (half inside by symmetry).
        assertThat(ControlPerimeter.headShareInside(SQUARE, 300, new PlanPoint(250, 0), 200)).isCloseTo(1, within(1e-9));
        assertThat(ControlPerimeter.headShareInside(SQUARE, 300, new PlanPoint(900, 0), 200)).isCloseTo(0, within(1e-9));
        assertThat(ControlPerimeter.headShareInside(SQUARE, 300, new PlanPoint(500, 0), 200))
                .isCloseTo(0.5, within(0.002));
        // A head of D = 4000 over the column takes in the whole rounded rectangle at a = 100:
        // 400² + 4·400·100 + π·100² = 351 416 mm² of π·2000² = 12 566 371 mm²: share 0.027965 (hand calculation).
        assertThat(ControlPerimeter.headShareInside(SQUARE, 100, new PlanPoint(0, 0), 4000))
                .isCloseTo(0.027965, withinPercentage(0.5));
        // Circular column, a = 100: the disc of radius 300, π·300²/(π·2000²) = 0.0225 (hand calculation).
        assertThat(ControlPerimeter.headShareInside(ROUND, 100, new PlanPoint(0, 0), 4000))
                .isCloseTo(0.0225, withinPercentage(0.5));
    }

    @Test
    void aGroupOfHeadsGivesEachHeadItsOwnShare() {
        // The heads of a group, prepared once for every a, give each head the share it has alone.
        List<PlanPoint> heads = List.of(new PlanPoint(500, 0), new PlanPoint(-430, 380), new PlanPoint(900, 0),
                new PlanPoint(250, 0));
        ControlPerimeter.Heads group = ControlPerimeter.heads(SQUARE, heads, 200);
        for (double a : new double[] {120, 300, 455.5, 700}) {
            for (int i = 0; i < heads.size(); i++) {
                assertThat(group.shareInside(i, a))
                        .isEqualTo(ControlPerimeter.headShareInside(SQUARE, a, heads.get(i), 200));
            }
        }
        // Centred on a straight side at a = 300, half inside by symmetry (as above).
        assertThat(group.shareInside(0, 300)).isCloseTo(0.5, within(0.002));
    }

    /**
     * The strips the perimeter cannot reach are passed over: the share is, to the last bit, the sum over all 400
     * strips across x and across y that the method states (the oracle below, written out here). Invented sizes.
     */
    @Test
    void theShareIsTheSumOverEveryStrip() {
        Random random = new Random(14);
        for (int trial = 0; trial < 300; trial++) {
            PlanPoint centre = new PlanPoint(random.nextInt(401) - 200, random.nextInt(401) - 200);
            ColumnOutline c = random.nextBoolean()
                    ? ColumnOutline.rectangular(200 + random.nextInt(600), 200 + random.nextInt(600), centre)
                    : ColumnOutline.circular(200 + random.nextInt(600), centre);
            PlanPoint head = new PlanPoint(random.nextInt(3001) - 1500, random.nextInt(3001) - 1500);
            double diameter = 300 + random.nextInt(600);
            double a = 1 + random.nextInt(2000);
            double oracle = (everyStrip(c, a, head, diameter)
                    + everyStrip(c.turned(), a, new PlanPoint(head.yMm(), head.xMm()), diameter)) / 2;
            double clear = 1e-9 * (a + diameter);
            double distance = ControlPerimeter.distanceFromColumn(c, head);
            if (distance > a + diameter / 2 + clear || distance < a - diameter / 2 - clear) {
                continue;
            }
            assertThat(ControlPerimeter.headShareInside(c, a, head, diameter)).as("trial %d", trial).isEqualTo(oracle);
        }
    }

    /**
     * Heads in rows and columns share what depends only on their x (or y): each head's share is still, to the last
     * bit, the sum over its own strips (the oracle below). Random grids about random columns, invented sizes.
     */
    @Test
    void headsInARowShareTheirStripsAndKeepTheirOwnShares() {
        Random random = new Random(1404);
        List<String> mismatches = new ArrayList<>();
        for (int trial = 0; trial < 60; trial++) {
            PlanPoint centre = new PlanPoint(random.nextInt(201) - 100, random.nextInt(201) - 100);
            ColumnOutline c = random.nextBoolean()
                    ? ColumnOutline.rectangular(200 + random.nextInt(600), 200 + random.nextInt(600), centre)
                    : ColumnOutline.circular(200 + random.nextInt(600), centre);
            double spacing = 900 + random.nextInt(900);
            double diameter = 300 + random.nextInt(500);
            List<PlanPoint> heads = new ArrayList<>();
            for (int i = -1; i <= 1; i++) {
                for (int j = -1; j <= 1; j++) {
                    heads.add(new PlanPoint(i * spacing + 0.1 * trial, j * spacing - 0.3 * trial));
                }
            }
            ControlPerimeter.Heads group = ControlPerimeter.heads(c, heads, diameter);
            for (int k = 0; k < 12; k++) {
                double a = 1 + random.nextDouble() * 2500;
                for (int i = 0; i < heads.size(); i++) {
                    PlanPoint h = heads.get(i);
                    double clear = 1e-9 * (a + diameter);
                    double distance = ControlPerimeter.distanceFromColumn(c, h);
                    double oracle = distance > a + diameter / 2 + clear ? 0 : distance < a - diameter / 2 - clear ? 1
                            : (everyStrip(c, a, h, diameter)
                                    + everyStrip(c.turned(), a, new PlanPoint(h.yMm(), h.xMm()), diameter)) / 2;
                    double share = group.shareInside(i, a);
                    if (Double.doubleToRawLongBits(share) != Double.doubleToRawLongBits(oracle)) {
                        mismatches.add("trial " + trial + " head " + i + " a " + a + ": " + share + " vs " + oracle);
                    }
                }
            }
        }
        assertThat(mismatches).isEmpty();
    }

    /**
     * An arc the plan does not cut takes the bounds acos(1) and asin(1) without the calls: the length on the plan is,
     * to the last bit, the sum that the method states with every bound called (the oracle below). Random columns on
     * random plans, from perimeters wholly on the plan to ones cut on every side; invented sizes.
     */
    @Test
    void theLengthOnThePlanIsTheSumOverItsSidesAndArcs() {
        Random random = new Random(2003);
        List<String> mismatches = new ArrayList<>();
        for (int trial = 0; trial < 2000; trial++) {
            double planX = 1000 + random.nextInt(4000);
            double planY = 1000 + random.nextInt(4000);
            PlanPoint centre = new PlanPoint(random.nextInt(401) - 200, random.nextInt(401) - 200);
            ColumnOutline c = random.nextBoolean()
                    ? ColumnOutline.rectangular(200 + random.nextInt(500), 200 + random.nextInt(500), centre)
                    : ColumnOutline.circular(200 + random.nextInt(500), centre);
            double a = random.nextInt(4) == 0 ? 1 + random.nextInt(3000) : 1 + random.nextDouble() * 3000;
            double length = ControlPerimeter.lengthInPlan(c, a, planX, planY);
            double oracle = everyArc(c, a, planX, planY);
            if (Double.doubleToRawLongBits(length) != Double.doubleToRawLongBits(oracle)) {
                mismatches.add("trial " + trial + ": " + length + " vs " + oracle);
            }
        }
        assertThat(mismatches).isEmpty();
    }

    /** The perimeter's sides on the plan and its arcs between acos and asin of the clamped ratios, in order. */
    private static double everyArc(ColumnOutline c, double a, double planX, double planY) {
        double hx = c.circular() ? 0 : c.cxMm() / 2;
        double hy = c.circular() ? 0 : c.cyMm() / 2;
        double r = c.circular() ? c.cxMm() / 2 + a : a;
        double x0 = c.centre().xMm();
        double y0 = c.centre().yMm();
        double length = 0;
        for (int sx : new int[] {1, -1}) {
            length += Math.abs(x0 + sx * (hx + a)) <= planX / 2
                    ? Math.max(0, Math.min(y0 + hy, planY / 2) - Math.max(y0 - hy, -planY / 2)) : 0;
            for (int sy : new int[] {1, -1}) {
                double from = Math.acos(Math.max(-1, Math.min(1, (planX / 2 - sx * (x0 + sx * hx)) / r)));
                double to = Math.asin(Math.max(-1, Math.min(1, (planY / 2 - sy * (y0 + sy * hy)) / r)));
                length += r * Math.max(0, to - from);
            }
        }
        for (int sy : new int[] {1, -1}) {
            length += Math.abs(y0 + sy * (hy + a)) <= planY / 2
                    ? Math.max(0, Math.min(x0 + hx, planX / 2) - Math.max(x0 - hx, -planX / 2)) : 0;
        }
        return length;
    }

    /** The share inside by 400 strips across x, each summed in order. */
    private static double everyStrip(ColumnOutline c, double a, PlanPoint p, double diameter) {
        double r = diameter / 2;
        double width = diameter / 400;
        double inside = 0;
        double whole = 0;
        for (int i = 0; i < 400; i++) {
            double x = p.xMm() - r + (i + 0.5) * width;
            double chord = Math.sqrt(Math.max(0, r * r - (x - p.xMm()) * (x - p.xMm())));
            whole += 2 * chord;
            double dx = Math.abs(x - c.centre().xMm());
            double beyond = c.circular() ? dx : Math.max(0, dx - c.cxMm() / 2);
            double reach = c.circular() ? c.cxMm() / 2 + a : a;
            if (beyond <= reach) {
                double half = c.circular() ? Math.sqrt(reach * reach - beyond * beyond)
                        : c.cyMm() / 2 + Math.sqrt(a * a - beyond * beyond);
                double lo = Math.max(p.yMm() - chord, c.centre().yMm() - half);
                double hi = Math.min(p.yMm() + chord, c.centre().yMm() + half);
                inside += Math.max(0, hi - lo);
            }
        }
        return whole == 0 ? 0 : inside / whole;
    }
}
