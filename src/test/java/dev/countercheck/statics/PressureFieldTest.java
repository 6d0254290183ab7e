package dev.countercheck.statics;

import dev.countercheck.statics.ContactPressure.Contact;
import dev.countercheck.statics.PressureField.Resultant;
import dev.countercheck.statics.PressureField.Side;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/** Integrals of a pressure field over parts of the plan. Invented footings; hand calculations beside each value. */
class PressureFieldTest {

    /** 3000 × 2000 plan, V = 1200 kN, My* = 300 kNm: q = 200 + x/15 kPa (x in mm), 100 to 300 kPa. */
    private static final Contact TRAPEZIUM = ContactPressureTest.contact(
            ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("", 1200, 0, 300)));

    @Test
    void thePartBeyondAFaceCarriesItsTrapezium() {
        // Hand calculation, x in m: q = 200 + 66.667·x. Beyond x0 = 0.5 m on the +x side, width 2 m:
        // R = 2·∫(200 + 66.667x)dx over [0.5, 1.5] = 2·(200 + 66.667·1) = 533.33 kN;
        // M = 2·∫q·(x − 0.5)dx = 2·(200·0.5 + 66.667·0.58333) = 277.78 kNm; lever 277.78/533.33 = 0.52083 m,
        // so the centroid lies at x = 1020.8 mm, y = 0.
        Resultant r = TRAPEZIUM.field().beyondX(500, Side.POSITIVE);
        assertThat(r.forceKn()).isCloseTo(533.333, within(1e-3));
        assertThat(r.momentKnm()).isCloseTo(277.778, within(1e-3));
        assertThat(r.centroid().xMm()).isCloseTo(1020.83, within(0.01));
        assertThat(r.centroid().yMm()).isCloseTo(0, within(1e-9));
        // The −x side beyond x0 = −500: q from 100 to 166.67: R = 2·(200 − 66.667·1) = 266.67 kN;
        // M = 2·∫_{0.5}^{1.5} (200 − 66.667s)(s − 0.5) ds = 2·(100 − 38.889) = 122.22 kNm.
        Resultant left = TRAPEZIUM.field().beyondX(-500, Side.NEGATIVE);
        assertThat(left.forceKn()).isCloseTo(266.667, within(1e-3));
        assertThat(left.momentKnm()).isCloseTo(122.222, within(1e-3));
    }

    @Test
    void aCutAcrossYSplitsTheLoadByArea() {
        // q does not vary with y: beyond y0 = 600 (+y side) lies 400/2000 of the plan: R = 0.2·1200 = 240 kN;
        // M = 240·0.2 m = 48 kNm (centroid 200 mm beyond the line).
        Resultant r = TRAPEZIUM.field().beyondY(600, Side.POSITIVE);
        assertThat(r.forceKn()).isCloseTo(240, within(1e-9));
        assertThat(r.momentKnm()).isCloseTo(48, within(1e-9));
        assertThat(TRAPEZIUM.field().total().value()).isCloseTo(1200, within(1e-9));
    }

    @Test
    void thePressureInsideAControlPerimeterIsClippedToThePlan() {
        // Uniform 200 kPa (V = 1200 kN on 3000 × 2000). Column 400 × 400 at the centre, a = 300:
        // area 400² + 4·400·300 + π·300² = 922 743 mm²: 200·0.922743 = 184.55 kN (hand calculation).
        Contact uniform = ContactPressureTest.contact(
                ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("", 1200, 0, 0)));
        ColumnOutline column = ColumnOutline.rectangular(400, 400, new PlanPoint(0, 0));
        assertThat(uniform.field().insidePerimeter(column, 300).value()).isCloseTo(184.55, withinPercentage(0.01));
        // At a = 900 the rounded square reaches y = ±1300 and leaves the 2000 deep plan (|y| ≤ 1000). In the
        // quadrant x, y ≥ 0 the region's height is min(1000, 1100) over 0 ≤ x ≤ 200 and 200 + min(800,
        // √(900² − s²)) over s = x − 200 from 0 to 900; √ = 800 at s = √170 000 = 412.31. Quadrant area
        // = 200·1000 + 200·900 + 800·412.31 + [s·√(810 000 − s²)/2 + 405 000·asin(s/900)] from 412.31 to 900
        // = 200 000 + 180 000 + 329 848 + (636 173 − 357 657) = 988 364 mm²; whole 3 953 458 mm²:
        // 200 kPa × 3.953458 m² = 790.69 kN (hand calculation).
        assertThat(uniform.field().insidePerimeter(column, 900).value()).isCloseTo(790.69, withinPercentage(0.01));
    }

    @Test
    void theTwoSidesOfACutAddUpToTheWhole() {
        // A biaxial partial contact (3000 × 2000, V = 1200 kN, e_x = 700, e_y = 300 mm): whatever the cut, the
        // parts on its two sides carry V together, and their moments about the cut differ by My*' = ∫q·(x − x0).
        Contact c = ContactPressureTest.contact(
                ContactPressure.rectangular(3000, 2000, BaseActions.atCentre("", 1200, 360, 840)));
        for (double x0 : new double[] {-1200, -300, 0, 450, 1400}) {
            Resultant plus = c.field().beyondX(x0, Side.POSITIVE);
            Resultant minus = c.field().beyondX(x0, Side.NEGATIVE);
            assertThat(plus.forceKn() + minus.forceKn()).isCloseTo(1200, within(1e-6));
            // ∫q·(x − x0) dA = My* − V·x0.
            assertThat(plus.momentKnm() - minus.momentKnm()).isCloseTo(840 - 1200 * x0 / 1000, within(1e-6));
        }
    }
}
