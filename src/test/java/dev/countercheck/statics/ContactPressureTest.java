package dev.countercheck.statics;

import dev.countercheck.statics.ContactPressure.Contact;
import dev.countercheck.statics.ContactPressure.NoEquilibrium;
import dev.countercheck.statics.ContactPressure.Regime;
import dev.countercheck.statics.ContactPressure.Result;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Contact pressure under a rigid footing without tension. Invented footings; expected values are the closed
 * forms of the linear distribution worked by hand beside each test, or an independent brute-force integration
 * of the solved field ({@link GridIntegral}).
 */
class ContactPressureTest {

    static Contact contact(Result r) {
        return r.contact().orElseThrow(() -> new AssertionError("no equilibrium: " + r));
    }

    @Test
    void fullContactIsTheLinearFormula() {
        // Hand calculation: 3000 × 2000 plan, V = 1200 kN, My* = 300 kNm. A = 6 m²: V/A = 200 kPa;
        // Wy = Ly·Lx²/6 = 2·3²/6 = 3 m³: My*/Wy = 100 kPa. q_max = 300, q_min = 100 kPa; e_x = 250 mm ≤ Lx/6.
        Contact c = contact(ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("SLS-1", 1200, 0, 300)));
        assertThat(c.regime()).isEqualTo(Regime.FULL_CONTACT);
        assertThat(c.qMaxKpa()).isCloseTo(300, within(1e-9));
        assertThat(c.qMinKpa()).isCloseTo(100, within(1e-9));
        assertThat(c.fraction()).isEqualTo(1);
        assertThat(c.ex().value()).isCloseTo(250, within(1e-9));
        // The field: q(1500, 0) = 300, q(−1500, y) = 100, q(0, 0) = 200 kPa.
        assertThat(c.field().at(1500, 0)).isCloseTo(300, within(1e-9));
        assertThat(c.field().at(-1500, 700)).isCloseTo(100, within(1e-9));
        assertThat(c.field().at(0, 0)).isCloseTo(200, within(1e-9));
        assertThat(c.field().at(1501, 0)).isZero();
    }

    @Test
    void fullContactAddsBothMoments() {
        // Hand calculation: 2400 × 2400 plan, V = 1440 kN, Mx* = 115.2, My* = 57.6 kNm.
        // A = 5.76 m²: 250 kPa; W = 2.4³/6 = 2.304 m³: 57.6/2.304 = 25 kPa, 115.2/2.304 = 50 kPa.
        // e_x/Lx + e_y/Ly = (40 + 80)/2400 = 0.05 ≤ 1/6: q_max = 325, q_min = 175 kPa.
        Contact c = contact(ContactPressure.rectangular(2400, 2400, BaseActions.atCentre("", 1440, 115.2, 57.6)));
        assertThat(c.qMaxKpa()).isCloseTo(325, within(1e-9));
        assertThat(c.qMinKpa()).isCloseTo(175, within(1e-9));
        assertThat(c.field().at(1200, 1200)).isCloseTo(325, within(1e-9));
        assertThat(c.field().at(1200, -1200)).isCloseTo(225, within(1e-9));
    }

    @Test
    void uniaxialPartialContactIsTheTriangle() {
        // Hand calculation: 3000 × 2000 plan, V = 1200 kN, My* = 720 kNm: e = 600 mm > Lx/6 = 500.
        // L/2 − e = 900 mm; q_max = 2·1200/(3·2.0·0.9) = 444.44 kPa over 3·900 = 2700 mm: fraction 0.9.
        Contact c = contact(ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("", 1200, 0, 720)));
        assertThat(c.regime()).isEqualTo(Regime.UNIAXIAL_PARTIAL);
        assertThat(c.qMaxKpa()).isCloseTo(444.444, within(1e-3));
        assertThat(c.qMinKpa()).isZero();
        assertThat(c.fraction()).isCloseTo(0.9, within(1e-12));
        assertThat(c.field().at(1500, 0)).isCloseTo(444.444, within(1e-3));
        assertThat(c.field().at(-1200, 0)).isCloseTo(0, within(1e-9));
        assertThat(c.field().at(-1300, 0)).isZero();
        // The same about x: a negative Mx* puts the triangle at −y.
        Contact y = contact(ContactPressure.rectangular(2000, 3000, BaseActions.atCentre("", 1200, -720, 0)));
        assertThat(y.qMaxKpa()).isCloseTo(444.444, within(1e-3));
        assertThat(y.field().at(0, -1500)).isCloseTo(444.444, within(1e-3));
    }

    @Test
    void aCornerTriangleOfContactMatchesItsClosedForm() {
        // Hand calculation: when the contact zone is the triangle at one corner with legs a, b, the pressure is
        // a pyramid: V = q_max·a·b/6 acting a/4, b/4 from the corner. So a = 4·(Lx/2 − e_x), b = 4·(Ly/2 − e_y)
        // (valid for a ≤ Lx, b ≤ Ly) and q_max = 6V/(a·b). 3000 × 2000 plan, V = 1000 kN, e_x = 1100,
        // e_y = 700 mm: a = 1600, b = 1200 mm; q_max = 6·1000/(1.6·1.2) = 3125 kPa; fraction
        // (1.6·1.2/2)/6 = 0.16.
        Contact c = contact(ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("", 1000, 700, 1100)));
        assertThat(c.regime()).isEqualTo(Regime.BIAXIAL_PARTIAL);
        assertThat(c.qMaxKpa()).isCloseTo(3125, withinPercentage(1e-6));
        assertThat(c.fraction()).isCloseTo(0.16, within(1e-9));
        assertThat(c.field().at(1500 - 1600, 1000)).isCloseTo(0, within(1e-6));
        assertThat(c.field().at(1500, 1000 - 1200)).isCloseTo(0, within(1e-6));
    }

    @Test
    void aSmallSecondEccentricityApproachesTheTriangle() {
        // The numerical solution with e_y → 0 tends to the closed form of uniaxialPartialContactIsTheTriangle.
        Contact c = contact(ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("", 1200, 1e-4, 720)));
        assertThat(c.regime()).isEqualTo(Regime.BIAXIAL_PARTIAL);
        assertThat(c.qMaxKpa()).isCloseTo(444.444, withinPercentage(0.01));
        assertThat(c.fraction()).isCloseTo(0.9, within(1e-4));
    }

    @Test
    void biaxialPartialContactIsInEquilibriumByAnIndependentGridIntegration() {
        // A five-sided contact zone: 2800 × 2400 plan, V = 1500 kN, My* = 600, Mx* = 300 kNm
        // (e_x = 400, e_y = 200 mm: 400/2800 + 200/2400 = 0.226 > 1/6).
        Contact c = contact(ContactPressure.rectangular(2800, 2400, BaseActions.atCentre("", 1500, 300, 600)));
        assertThat(c.regime()).isEqualTo(Regime.BIAXIAL_PARTIAL);
        GridIntegral g = GridIntegral.of(c.field()::at, 2800, 2400, 1000);
        assertThat(g.forceKn()).isCloseTo(1500, withinPercentage(0.5));
        assertThat(g.myKnm()).isCloseTo(600, withinPercentage(0.5));
        assertThat(g.mxKnm()).isCloseTo(300, withinPercentage(0.5));
        assertThat(c.fraction()).isGreaterThan(0).isLessThan(1);
        assertThat(c.fraction()).isCloseTo(g.contactFraction(), within(0.005));
        assertThat(c.qMaxKpa()).isCloseTo(c.field().at(1400, 1200), within(1e-9));
    }

    @Test
    void aResultantAtOrBeyondTheEdgeHasNoEquilibrium() {
        // e_x = 1800·1000/1200 = 1500 mm = Lx/2: at the edge.
        Result r = ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("ULS-2", 1200, 0, 1800));
        assertThat(r).isInstanceOf(NoEquilibrium.class);
        assertThat(((NoEquilibrium) r).reason()).contains("1500 mm").contains("edge");
        assertThat(r.contact()).isEmpty();
        assertThat(ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("", 100, -150, 0)))
                .isInstanceOf(NoEquilibrium.class);
    }

    @Test
    void aCircularFootingInFullContactIsTheLinearFormula() {
        // Hand calculation: D = 2000, V = 1000 kN, Mx* = 60, My* = 80 kNm: e = 100 mm ≤ D/8 = 250.
        // A = π m²: 318.31 kPa; W = π·2³/32 = 0.78540 m³: V·e/W = 100/0.78540 = 127.32 kPa;
        // q_max = 445.63, q_min = 190.99 kPa, the largest at the edge point in the direction (0.8, 0.6).
        Contact c = contact(ContactPressure.circular(2000, BaseActions.atCentre("", 1000, 60, 80)));
        assertThat(c.regime()).isEqualTo(Regime.FULL_CONTACT);
        assertThat(c.qMaxKpa()).isCloseTo(445.63, within(0.01));
        assertThat(c.qMinKpa()).isCloseTo(190.99, within(0.01));
        assertThat(c.field().at(800, 600)).isCloseTo(445.63, within(0.01));
        assertThat(c.field().at(0, 0)).isCloseTo(318.31, within(0.01));
        assertThat(c.field().at(800, 700)).isZero();
        // e at or beyond the radius: no equilibrium.
        assertThat(ContactPressure.circular(2000, BaseActions.atCentre("", 1000, 0, 1000)))
                .isInstanceOf(NoEquilibrium.class);
    }

    @Test
    void aCircularFootingInPartialContactIsInEquilibriumByAnIndependentGridIntegration() {
        // D = 2400, V = 1000 kN, e = 500 mm > D/8 = 300 (My* = 400, Mx* = 300 kNm).
        Contact c = contact(ContactPressure.circular(2400, BaseActions.atCentre("", 1000, 300, 400)));
        assertThat(c.regime()).isEqualTo(Regime.BIAXIAL_PARTIAL);
        GridIntegral g = GridIntegral.of(c.field()::at, 2400, 2400, 600);
        assertThat(g.forceKn()).isCloseTo(1000, withinPercentage(0.5));
        assertThat(g.myKnm()).isCloseTo(400, withinPercentage(0.5));
        assertThat(g.mxKnm()).isCloseTo(300, withinPercentage(0.5));
        // The grid's square cells outside the circle see no pressure: the fraction of the plan in contact is
        // the grid's share of the square over the circle's share π/4.
        assertThat(c.fraction()).isCloseTo(g.contactFraction() / (Math.PI / 4), within(0.005));
    }

    @Test
    void traceNamesTheCase() {
        Result r = ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("SLS-1", 1200, 0, 720));
        assertThat(r.trace()).extracting(s -> s.symbol())
                .containsExactly("V (SLS-1)", "Mx* (SLS-1)", "My* (SLS-1)", "e_x (SLS-1)", "e_y (SLS-1)",
                        "q_max (SLS-1)", "q_min (SLS-1)", "contact fraction (SLS-1)");
        // The substituted formula reads as the arithmetic that gives the value (kN over mm² to kPa: ·10⁶).
        Contact c = contact(r);
        assertThat(c.qMax().substituted()).isEqualTo("2·1200·10⁶/(3·2000·(3000/2 − 600))");
        assertThat(c.contactFraction().substituted()).isEqualTo("3·(3000/2 − 600)/3000");
    }
}
