package dev.countercheck.statics;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiPredicate;

/**
 * A linear no-tension ground pressure under a rigid footing: q(x, y) = max(0, q0 + qx·x + qy·y) on the plan,
 * 0 off it (kPa, x and y in mm, the footing's axes). Integrals over parts of the plan are exact: the part is
 * a convex polygon clipped to the contact zone and the integrand at most quadratic. Forces kN, moments kNm.
 */
public final class PressureField {

    /** Which part of the plan a cut keeps: {@code POSITIVE} the side of larger x (or y) than the line. */
    public enum Side { POSITIVE, NEGATIVE }

    static final String BASIS = "rigid footing, linear contact pressure without tension (common practice)";

    private final ConvexPolygon plan;
    private final BiPredicate<Double, Double> onPlan;
    private final ConvexPolygon contact;
    private final double q0;
    private final double qx;
    private final double qy;

    /**
     * @param plan   the plan as a convex polygon (the integrals are taken over it)
     * @param onPlan whether a point lies on the true plan (a circle, where the polygon is its inscribed 720-gon)
     */
    PressureField(ConvexPolygon plan, BiPredicate<Double, Double> onPlan, double q0Kpa, double qxKpaPerMm,
                  double qyKpaPerMm) {
        this.plan = plan;
        this.onPlan = onPlan;
        this.q0 = q0Kpa;
        this.qx = qxKpaPerMm;
        this.qy = qyKpaPerMm;
        this.contact = plan.clip(q0Kpa, qxKpaPerMm, qyKpaPerMm);
    }

    /** The pressure at (x, y), kPa; 0 off the plan and where the ground has lifted off. */
    public double at(double xMm, double yMm) {
        return onPlan.test(xMm, yMm) ? Math.max(0, plane(xMm, yMm)) : 0;
    }

    /** q0 of the plane q0 + qx·x + qy·y, kPa (the pressure the plane gives at the plan's centre). */
    public double q0Kpa() {
        return q0;
    }

    /** qx of the plane, kPa/mm. */
    public double qxKpaPerMm() {
        return qx;
    }

    /** qy of the plane, kPa/mm. */
    public double qyKpaPerMm() {
        return qy;
    }

    /** The outline of the zone in contact, counter-clockwise (the whole plan under full contact). */
    public List<PlanPoint> contactOutline() {
        List<PlanPoint> points = new ArrayList<>();
        for (int i = 0; i < contact.size(); i++) {
            points.add(new PlanPoint(contact.x(i), contact.y(i)));
        }
        return points;
    }

    /** The area in contact, mm². */
    public double contactAreaMm2() {
        return contact.area();
    }

    private double plane(double x, double y) {
        return q0 + qx * x + qy * y;
    }

    /** ∫ q dA over the whole plan (it gives back V), kN. */
    public Step total() {
        return Step.of("∫q dA", "∫ q dA over the plan", "exact over the contact zone", forceOver(contact), "kN",
                BASIS);
    }

    /**
     * The ground pressure on the part of the plan beyond the line x = x0 ({@code POSITIVE}: x ≥ x0), as at a
     * column face (bending), d beyond it (shear) or h/2 from an edge (anchorage, EN 1992-1-1 9.8.2.2(5)).
     */
    public Resultant beyondX(double x0Mm, Side side) {
        double s = side == Side.POSITIVE ? 1 : -1;
        ConvexPolygon part = contact.clip(-s * x0Mm, s, 0);
        return resultant(part, "x " + (s > 0 ? "≥ " : "≤ ") + Num.f(x0Mm), "x", x0Mm, s, 1, 0);
    }

    /** As {@link #beyondX} for the line y = y0 ({@code POSITIVE}: y ≥ y0). */
    public Resultant beyondY(double y0Mm, Side side) {
        double s = side == Side.POSITIVE ? 1 : -1;
        ConvexPolygon part = contact.clip(-s * y0Mm, 0, s);
        return resultant(part, "y " + (s > 0 ? "≥ " : "≤ ") + Num.f(y0Mm), "y", y0Mm, s, 0, 1);
    }

    /**
     * ∫ q dA over the area enclosed by the control perimeter at distance a from the column face (rounded
     * corners, EN 1992-1-1 6.4.2(1)), clipped to the plan: the ground reaction that 6.4.4(2) deducts from
     * the column load, kN. The perimeter's arcs are drawn by chords of 1° (the area is short by 0.005 %).
     */
    public Step insidePerimeter(ColumnOutline column, double aMm) {
        return insidePerimeter(ControlRegion.of(column, aMm));
    }

    /** As {@link #insidePerimeter(ColumnOutline, double)}, with the region formed once for several fields. */
    public Step insidePerimeter(ControlRegion region) {
        return Step.of("ΔVEd", "∫ q dA inside the control perimeter at a, on the plan",
                "a = " + Num.f(region.aMm()) + " mm", forceInsidePerimeter(region), "kN", BASIS + "; EN 1992-1-1 6.4.4(2)");
    }

    /** The value of {@link #insidePerimeter(ControlRegion)} alone (no trace text: a search over many perimeters), kN. */
    public double forceInsidePerimeter(ControlRegion region) {
        return forceOver(region.on(contact));
    }

    private double forceOver(ConvexPolygon part) {
        return part.integratePlane(q0, qx, qy) / 1e6;
    }

    private Resultant resultant(ConvexPolygon part, String where, String axis, double at, double s, double ux,
                                double uy) {
        double force = forceOver(part);
        double lever = part.integrate((x, y) -> plane(x, y) * s * (ux * x + uy * y - at)) / 1e9;
        PlanPoint centroid = force > 0
                ? new PlanPoint(part.integrate((x, y) -> plane(x, y) * x) / 1e6 / force,
                        part.integrate((x, y) -> plane(x, y) * y) / 1e6 / force)
                : new PlanPoint(ux * at, uy * at);
        return new Resultant(
                Step.of("R (" + where + ")", "∫ q dA over " + axis + " beyond " + axis + "0", where, force, "kN", BASIS),
                Step.of("M (" + where + ")", "∫ q·|" + axis + " − " + axis + "0| dA", where, lever, "kNm", BASIS),
                centroid);
    }

    /**
     * The pressure on a part of the plan: its force, its moment about the cutting line, and where it acts.
     *
     * @param force    R = ∫ q dA over the part, kN
     * @param moment   M = ∫ q·(distance from the line) dA, kNm (R times the lever arm of its centroid)
     * @param centroid where R acts (on the line when R = 0)
     */
    public record Resultant(Step force, Step moment, PlanPoint centroid) {

        public double forceKn() {
            return force.value();
        }

        public double momentKnm() {
            return moment.value();
        }
    }
}
