package dev.countercheck.statics;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.OutOfRangeException;
import dev.countercheck.eurocode.Step;

import java.util.List;
import java.util.Optional;
import java.util.function.BiPredicate;

/**
 * Ground pressure under a rigid footing centred on the origin, linear and without tension (common practice):
 * <ul>
 *   <li>full contact (the resultant in the kern, |e_x|/Lx + |e_y|/Ly ≤ 1/6; a circle: e ≤ D/8):
 *       q = V/A + My*·x/Iy + Mx*·y/Ix, Iy = Ly·Lx³/12, Ix = Lx·Ly³/12 (a circle: I = π·D⁴/64);</li>
 *   <li>partial contact with one eccentricity zero: the triangle, q_max = 2V/(3·B·(L/2 − e)) over a contact
 *       length 3·(L/2 − e);</li>
 *   <li>partial contact otherwise (two eccentricities, or a circle): the clipped plane solved numerically
 *       ({@link NoTensionSolver}) to equilibrium within 10⁻¹¹ of V; a circle is integrated as the inscribed
 *       720-gon (area short by 0.0013 %);</li>
 *   <li>the resultant at or beyond the plan's edge: no equilibrium.</li>
 * </ul>
 * Pressures kPa, lengths mm, forces kN, moments kNm; signs as {@link BaseActions}.
 */
public final class ContactPressure {

    /** How the pressure was found. */
    public enum Regime { FULL_CONTACT, UNIAXIAL_PARTIAL, BIAXIAL_PARTIAL }

    private static final String BASIS = PressureField.BASIS;
    private static final int CIRCLE_VERTICES = 720;

    private ContactPressure() {
    }

    /** The outcome for one action case: a pressure in equilibrium with it, or none. */
    public sealed interface Result permits Contact, NoEquilibrium {

        BaseActions actions();

        /** e_x = My* / V, mm. */
        Step ex();

        /** e_y = Mx* / V, mm. */
        Step ey();

        /** The pressure, when the resultant lies inside the plan. */
        default Optional<Contact> contact() {
            return this instanceof Contact c ? Optional.of(c) : Optional.empty();
        }

        /** V, Mx*, My*, e_x, e_y and (in contact) q_max, q_min and the contact fraction. */
        List<Step> trace();
    }

    /**
     * A pressure in equilibrium with the actions.
     *
     * @param regime          full contact, or how the partial contact was solved
     * @param qMax            the largest pressure, kPa
     * @param qMin            the least pressure over the plan (0 under partial contact), kPa
     * @param contactFraction the area in contact over the plan area, 0 &lt; · ≤ 1
     * @param field           q(x, y) and its integrals
     */
    public record Contact(BaseActions actions, Regime regime, Step ex, Step ey, Step qMax, Step qMin,
                          Step contactFraction, PressureField field) implements Result {

        public double qMaxKpa() {
            return qMax.value();
        }

        public double qMinKpa() {
            return qMin.value();
        }

        public double fraction() {
            return contactFraction.value();
        }

        @Override
        public List<Step> trace() {
            return List.of(actions.v(), actions.mx(), actions.my(), ex, ey, qMax, qMin, contactFraction);
        }
    }

    /**
     * The resultant lies at or beyond the plan's edge: no pressure without tension balances it (the footing
     * overturns).
     *
     * @param reason says where the resultant lies and where the edge is
     */
    public record NoEquilibrium(BaseActions actions, Step ex, Step ey, String reason) implements Result {

        @Override
        public List<Step> trace() {
            return List.of(actions.v(), actions.mx(), actions.my(), ex, ey);
        }
    }

    /**
     * The pressure under a rectangular footing Lx × Ly centred on the origin.
     *
     * @param lxMm    plan side Lx along x, mm, &gt; 0
     * @param lyMm    plan side Ly along y, mm, &gt; 0
     * @param actions V (&gt; 0), Mx*, My* at the base centre
     */
    public static Result rectangular(double lxMm, double lyMm, BaseActions actions) {
        OutOfRangeException.requirePositive("Lx", lxMm, "mm", BASIS);
        OutOfRangeException.requirePositive("Ly", lyMm, "mm", BASIS);
        Step exStep = actions.ex();
        Step eyStep = actions.ey();
        double ex = exStep.value();
        double ey = eyStep.value();
        if (Math.abs(ex) >= lxMm / 2 || Math.abs(ey) >= lyMm / 2) {
            return new NoEquilibrium(actions, exStep, eyStep, "the resultant at e_x = " + Num.f(ex) + " mm, e_y = "
                    + Num.f(ey) + " mm lies at or beyond the edge of the " + Num.f(lxMm) + " × " + Num.f(lyMm)
                    + " mm plan: no contact pressure without tension balances it");
        }
        double v = actions.vKn();
        String suffix = BaseActions.suffix(actions.caseName());
        ConvexPolygon plan = ConvexPolygon.rectangle(-lxMm / 2, -lyMm / 2, lxMm / 2, lyMm / 2);
        double area = lxMm * lyMm;
        double mean = v / area * 1e6;
        String dims = Num.f(lxMm) + "·" + Num.f(lyMm);
        if (Math.abs(ex) / lxMm + Math.abs(ey) / lyMm <= 1.0 / 6 + 1e-12) {
            double iy = lyMm * Math.pow(lxMm, 3) / 12;
            double ix = lxMm * Math.pow(lyMm, 3) / 12;
            PressureField field = new PressureField(plan, plan::contains, mean, actions.myKnm() * 1e9 / iy,
                    actions.mxKnm() * 1e9 / ix);
            double spread = Math.abs(actions.myKnm()) * 1e9 / iy * lxMm / 2
                    + Math.abs(actions.mxKnm()) * 1e9 / ix * lyMm / 2;
            String sub = Num.f(v) + "·10⁶/(" + dims + ") ± (|" + Num.f(actions.myKnm()) + "|·6·10⁹/(" + Num.f(lyMm)
                    + "·" + Num.f(lxMm) + "²) + |" + Num.f(actions.mxKnm()) + "|·6·10⁹/(" + Num.f(lxMm) + "·"
                    + Num.f(lyMm) + "²))";
            return new Contact(actions, Regime.FULL_CONTACT, exStep, eyStep,
                    Step.withRemark("q_max" + suffix, "V/A + |My*|/Wy + |Mx*|/Wx", sub, mean + spread, "kPa", BASIS,
                            "full contact: |e_x|/Lx + |e_y|/Ly ≤ 1/6"),
                    Step.of("q_min" + suffix, "V/A − |My*|/Wy − |Mx*|/Wx", sub, mean - spread, "kPa", BASIS),
                    Step.of("contact fraction" + suffix, "A_contact/A", "full contact", 1, "-", BASIS), field);
        }
        if (ex == 0 || ey == 0) {
            boolean alongX = ey == 0;
            double length = alongX ? lxMm : lyMm;
            double width = alongX ? lyMm : lxMm;
            double e = alongX ? ex : ey;
            double reach = length / 2 - Math.abs(e);
            double qMax = 2 * v / (3 * width * reach) * 1e6;
            double contactLength = 3 * reach;
            double slope = Math.signum(e) * qMax / contactLength;
            double q0 = qMax * (1 - length / 2 / contactLength);
            PressureField field = new PressureField(plan, plan::contains, q0, alongX ? slope : 0, alongX ? 0 : slope);
            String b = alongX ? "Ly" : "Lx";
            String l = alongX ? "Lx" : "Ly";
            return new Contact(actions, Regime.UNIAXIAL_PARTIAL, exStep, eyStep,
                    Step.withRemark("q_max" + suffix, "2·V/(3·" + b + "·(" + l + "/2 − |e|))", "2·" + Num.f(v)
                            + "·10⁶/(3·" + Num.f(width) + "·(" + Num.f(length) + "/2 − " + Num.f(Math.abs(e)) + "))",
                            qMax, "kPa", BASIS, "partial contact: the resultant outside the kern, e > " + l + "/6"),
                    Step.of("q_min" + suffix, "0 (partial contact)", "0", 0, "kPa", BASIS),
                    Step.of("contact fraction" + suffix, "3·(" + l + "/2 − |e|)/" + l, "3·(" + Num.f(length) + "/2 − "
                            + Num.f(Math.abs(e)) + ")/" + Num.f(length), contactLength / length, "-", BASIS), field);
        }
        ConvexPolygon unit = ConvexPolygon.rectangle(-1, -1, 1, 1);
        return numerical(actions, exStep, eyStep, plan, plan::contains, unit, lxMm / 2, lyMm / 2, mean, area);
    }

    /**
     * The pressure under a circular footing of diameter D centred on the origin. Full contact in closed form
     * (e ≤ D/8); partial contact numerically over the inscribed 720-gon.
     *
     * @param diameterMm D, mm, &gt; 0
     * @param actions    V (&gt; 0), Mx*, My* at the base centre
     */
    public static Result circular(double diameterMm, BaseActions actions) {
        OutOfRangeException.requirePositive("D", diameterMm, "mm", BASIS);
        Step exStep = actions.ex();
        Step eyStep = actions.ey();
        double ex = exStep.value();
        double ey = eyStep.value();
        double r = diameterMm / 2;
        double e = Math.hypot(ex, ey);
        if (e >= r) {
            return new NoEquilibrium(actions, exStep, eyStep, "the resultant at e = " + Num.f(e)
                    + " mm from the centre lies at or beyond the edge of the footing of D = " + Num.f(diameterMm)
                    + " mm: no contact pressure without tension balances it");
        }
        double v = actions.vKn();
        String suffix = BaseActions.suffix(actions.caseName());
        double area = Math.PI * r * r;
        double mean = v / area * 1e6;
        if (e <= r / 4 + 1e-12 * r) {
            double i = Math.PI * Math.pow(diameterMm, 4) / 64;
            ConvexPolygon plan = ConvexPolygon.regular(0, 0, r, CIRCLE_VERTICES);
            PressureField field = new PressureField(plan, inCircle(r), mean, actions.myKnm() * 1e9 / i,
                    actions.mxKnm() * 1e9 / i);
            double spread = v * e * 1e6 * r / i;
            String sub = Num.f(v) + "·4·10⁶/(π·" + Num.f(diameterMm) + "²) ± " + Num.f(v) + "·" + Num.f(e)
                    + "·32·10⁶/(π·" + Num.f(diameterMm) + "³)";
            return new Contact(actions, Regime.FULL_CONTACT, exStep, eyStep,
                    Step.withRemark("q_max" + suffix, "V/A + V·e/W, W = π·D³/32", sub, mean + spread, "kPa", BASIS,
                            "full contact: e ≤ D/8"),
                    Step.of("q_min" + suffix, "V/A − V·e/W", sub, mean - spread, "kPa", BASIS),
                    Step.of("contact fraction" + suffix, "A_contact/A", "full contact", 1, "-", BASIS), field);
        }
        return numerical(actions, exStep, eyStep, ConvexPolygon.regular(0, 0, r, CIRCLE_VERTICES), inCircle(r),
                ConvexPolygon.regular(0, 0, 1, CIRCLE_VERTICES), r, r, mean, area);
    }

    private static Contact numerical(BaseActions actions, Step exStep, Step eyStep, ConvexPolygon plan,
                                     BiPredicate<Double, Double> onPlan, ConvexPolygon unit, double halfX,
                                     double halfY, double mean, double area) {
        String suffix = BaseActions.suffix(actions.caseName());
        NoTensionSolver.Plane p = NoTensionSolver.solve(unit, exStep.value() / halfX, eyStep.value() / halfY);
        // The unit plan's mean pressure is 1 over its own area; scale to V over the physical plan.
        double scale = mean * area / (unit.area() * halfX * halfY);
        PressureField field = new PressureField(plan, onPlan, scale * p.alpha(), scale * p.beta() / halfX,
                scale * p.gamma() / halfY);
        double qMax = plan.max((x, y) -> field.q0Kpa() + field.qxKpaPerMm() * x + field.qyKpaPerMm() * y);
        double fraction = field.contactAreaMm2() / plan.area();
        String sub = "q = " + Num.f(field.q0Kpa()) + " + " + Num.f(field.qxKpaPerMm()) + "·x + "
                + Num.f(field.qyKpaPerMm()) + "·y ≥ 0, " + p.iterations() + " Newton steps";
        return new Contact(actions, Regime.BIAXIAL_PARTIAL, exStep, eyStep,
                Step.withRemark("q_max" + suffix, "max q of the plane with ∫q dA = V, ∫q·x dA = My*, ∫q·y dA = Mx*,"
                        + " q ≥ 0", sub, qMax, "kPa", BASIS, "partial contact: the resultant outside the kern"),
                Step.of("q_min" + suffix, "0 (partial contact)", "0", 0, "kPa", BASIS),
                Step.of("contact fraction" + suffix, "A_contact/A", Num.f(field.contactAreaMm2()) + "/"
                        + Num.f(plan.area()), fraction, "-", BASIS), field);
    }

    /** Whether a point lies in the circle of radius r about the origin (its edge included). */
    private static BiPredicate<Double, Double> inCircle(double r) {
        return (x, y) -> x * x + y * y <= r * r * (1 + 1e-12);
    }
}
