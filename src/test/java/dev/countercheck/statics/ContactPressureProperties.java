package dev.countercheck.statics;

import dev.countercheck.statics.ContactPressure.Contact;
import dev.countercheck.statics.ContactPressure.Result;
import dev.countercheck.statics.PressureField.Side;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Properties of the no-tension contact pressure over the whole range of resultants inside the plan. The
 * resultant is drawn as fractions of the half sides (u = e_x/(Lx/2), v = e_y/(Ly/2)), up to 0.98 of the way
 * to an edge.
 */
class ContactPressureProperties {

    private static Result rect(double lx, double ly, double v, double u, double w) {
        return ContactPressure.rectangular(lx, ly, BaseActions.atCentre("", v, v * w * ly / 2000, v * u * lx / 2000));
    }

    /** The field carries V, Mx* and My*: ∫q = V, ∫q·x = My*, ∫q·y = Mx* (to 10⁻⁶), by the field's own integrals. */
    @Property(tries = 100)
    void theFieldIsInEquilibriumWithTheActions(@ForAll @DoubleRange(min = 500, max = 6000) double lx,
                                               @ForAll @DoubleRange(min = 500, max = 6000) double ly,
                                               @ForAll @DoubleRange(min = 10, max = 20000) double v,
                                               @ForAll @DoubleRange(min = -0.98, max = 0.98) double u,
                                               @ForAll @DoubleRange(min = -0.98, max = 0.98) double w) {
        Contact c = rect(lx, ly, v, u, w).contact().orElseThrow();
        PressureField f = c.field();
        assertThat(f.total().value()).isCloseTo(v, withinPercentage(1e-6));
        // ∫q·(x + Lx/2) over the plan is the moment about the edge x = −Lx/2: My* + V·Lx/2.
        double my = f.beyondX(-lx / 2, Side.POSITIVE).momentKnm() - v * lx / 2000;
        double mx = f.beyondY(-ly / 2, Side.POSITIVE).momentKnm() - v * ly / 2000;
        assertThat(my).isCloseTo(c.actions().myKnm(), within(1e-6 * v * lx / 1000));
        assertThat(mx).isCloseTo(c.actions().mxKnm(), within(1e-6 * v * ly / 1000));
        assertThat(c.fraction()).isGreaterThan(0).isLessThanOrEqualTo(1);
        assertThat(c.qMinKpa()).isGreaterThanOrEqualTo(-1e-9);
        assertThat(c.qMaxKpa()).isGreaterThanOrEqualTo(v / (lx * ly) * 1e6 * (1 - 1e-12));
    }

    /** Independently: a 400 × 400 midpoint grid over the plan reproduces V, Mx*, My* to 0.5 % of V·L/2. */
    @Property(tries = 20)
    void aGridIntegrationReproducesTheActions(@ForAll @DoubleRange(min = 1000, max = 4000) double lx,
                                              @ForAll @DoubleRange(min = 1000, max = 4000) double ly,
                                              @ForAll @DoubleRange(min = -0.8, max = 0.8) double u,
                                              @ForAll @DoubleRange(min = -0.8, max = 0.8) double w) {
        double v = 1000;
        Contact c = rect(lx, ly, v, u, w).contact().orElseThrow();
        GridIntegral g = GridIntegral.of(c.field()::at, lx, ly, 400);
        assertThat(g.forceKn()).isCloseTo(v, withinPercentage(0.5));
        assertThat(g.myKnm()).isCloseTo(c.actions().myKnm(), within(0.005 * v * lx / 2000));
        assertThat(g.mxKnm()).isCloseTo(c.actions().mxKnm(), within(0.005 * v * ly / 2000));
    }

    /** Mirroring the moment mirrors the field; turning the footing a quarter swaps the axes. */
    @Property(tries = 60)
    void mirroredAndTurnedActionsGiveTheMirroredAndTurnedField(
            @ForAll @DoubleRange(min = 500, max = 6000) double lx, @ForAll @DoubleRange(min = 500, max = 6000) double ly,
            @ForAll @DoubleRange(min = -0.95, max = 0.95) double u, @ForAll @DoubleRange(min = -0.95, max = 0.95) double w,
            @ForAll @DoubleRange(min = -0.5, max = 0.5) double px, @ForAll @DoubleRange(min = -0.5, max = 0.5) double py) {
        Contact c = rect(lx, ly, 1000, u, w).contact().orElseThrow();
        Contact mirrored = rect(lx, ly, 1000, -u, w).contact().orElseThrow();
        Contact turned = rect(ly, lx, 1000, w, u).contact().orElseThrow();
        double x = px * lx;
        double y = py * ly;
        double q = c.field().at(x, y);
        double tolerance = 1e-6 * c.qMaxKpa();
        assertThat(mirrored.field().at(-x, y)).isCloseTo(q, within(tolerance));
        assertThat(turned.field().at(y, x)).isCloseTo(q, within(tolerance));
        assertThat(mirrored.qMaxKpa()).isCloseTo(c.qMaxKpa(), within(tolerance));
        assertThat(turned.fraction()).isCloseTo(c.fraction(), within(1e-6));
    }

    /** A larger moment (same V, same direction) never lowers q_max nor raises the contact fraction. */
    @Property(tries = 60)
    void qMaxRisesWithTheMoment(@ForAll @DoubleRange(min = 500, max = 6000) double lx,
                                @ForAll @DoubleRange(min = 500, max = 6000) double ly,
                                @ForAll @DoubleRange(min = -0.98, max = 0.98) double u,
                                @ForAll @DoubleRange(min = -0.98, max = 0.98) double w,
                                @ForAll @DoubleRange(min = 0, max = 1) double s1,
                                @ForAll @DoubleRange(min = 0, max = 1) double s2) {
        Contact small = rect(lx, ly, 1000, u * Math.min(s1, s2), w * Math.min(s1, s2)).contact().orElseThrow();
        Contact large = rect(lx, ly, 1000, u * Math.max(s1, s2), w * Math.max(s1, s2)).contact().orElseThrow();
        assertThat(large.qMaxKpa()).isGreaterThanOrEqualTo(small.qMaxKpa() * (1 - 1e-9));
        assertThat(large.fraction()).isLessThanOrEqualTo(small.fraction() + 1e-9);
    }

    /** A circular footing: equilibrium by its own integrals and q_max no less than the mean pressure. */
    @Property(tries = 50)
    void aCircularFootingIsInEquilibrium(@ForAll @DoubleRange(min = 500, max = 6000) double d,
                                         @ForAll @DoubleRange(min = 0, max = 0.95) double e,
                                         @ForAll @DoubleRange(min = 0, max = 6.3) double angle) {
        double v = 1000;
        double r = d / 2;
        Assume.that(e * r < r);
        double ex = e * r * Math.cos(angle);
        double ey = e * r * Math.sin(angle);
        Contact c = ContactPressure.circular(d, BaseActions.atCentre("", v, v * ey / 1000, v * ex / 1000))
                .contact().orElseThrow();
        PressureField f = c.field();
        assertThat(f.total().value()).isCloseTo(v, withinPercentage(0.01));
        assertThat(f.beyondX(-r, Side.POSITIVE).momentKnm() - v * r / 1000).isCloseTo(v * ex / 1000,
                within(1e-4 * v * r / 1000));
        assertThat(c.fraction()).isGreaterThan(0).isLessThanOrEqualTo(1);
        assertThat(c.qMaxKpa()).isGreaterThanOrEqualTo(v / (Math.PI * r * r) * 1e6 * (1 - 1e-4));
    }

    /**
     * The ground reaction inside a control perimeter grows with a and never exceeds V, for columns anywhere on
     * the plan (perimeters clipped at the edges), rectangular or circular.
     */
    @Property(tries = 40)
    void thePressureInsideAPerimeterGrowsWithItsDistance(@ForAll @DoubleRange(min = -0.4, max = 0.4) double cx,
                                                         @ForAll @DoubleRange(min = -0.4, max = 0.4) double cy,
                                                         @ForAll @DoubleRange(min = -0.9, max = 0.9) double u,
                                                         @ForAll @DoubleRange(min = -0.9, max = 0.9) double w,
                                                         @ForAll @DoubleRange(min = 10, max = 1500) double a1,
                                                         @ForAll @DoubleRange(min = 10, max = 1500) double a2,
                                                         @ForAll boolean circular) {
        double lx = 3000;
        double ly = 2400;
        Contact c = rect(lx, ly, 1000, u, w).contact().orElseThrow();
        PlanPoint centre = new PlanPoint(cx * lx, cy * ly);
        ColumnOutline column = circular ? ColumnOutline.circular(450, centre)
                : ColumnOutline.rectangular(500, 350, centre);
        double inner = c.field().insidePerimeter(column, Math.min(a1, a2)).value();
        double outer = c.field().insidePerimeter(column, Math.max(a1, a2)).value();
        assertThat(inner).isGreaterThanOrEqualTo(0);
        assertThat(outer).isGreaterThanOrEqualTo(inner - 1e-9).isLessThanOrEqualTo(1000 * (1 + 1e-9));
    }
}
