package dev.countercheck.statics;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** β for punching from the column moments, summed over both axes. Invented sizes, hand calculations. */
class PunchingBetaTest {

    @Test
    void rectangularColumnSumsExp639OverBothAxes() {
        ColumnOutline c = ColumnOutline.rectangular(600, 300, new PlanPoint(0, 0));
        // a = 2d = 1600 mm, VEd = 3000 kN, My = 300 kNm (eccentricity along x), Mx = 150 kNm.
        // k: c1/c2 = 600/300 = 2.0 → 0.70 and 300/600 = 0.5 → 0.45 (EN 1992-1-1:2004 Table 6.1).
        // u1 = 2·(600 + 300) + 2π·1600 = 11 853.1 mm.
        // Wx = 600²/2 + 600·300 + 2·300·1600 + 4·1600² + π·1600·600 = 14 575 929 mm² (Exp. 6.41);
        // Wy = 300²/2 + 300·600 + 2·600·1600 + 4·1600² + π·1600·300 = 13 892 964 mm².
        // β = 1 + 0.70·(300 000/3000)·(11 853.1/14 575 929) + 0.45·(150 000/3000)·(11 853.1/13 892 964)
        //   = 1 + 0.056924 + 0.019196 = 1.076120 (hand calculation).
        assertThat(ControlPerimeter.beta(c, 1600, 3000, 150, 300).value()).isCloseTo(1.076120, within(1e-5));
        // No moment: β = 1.
        assertThat(ControlPerimeter.beta(c, 1600, 3000, 0, 0).value()).isCloseTo(1.0, within(1e-12));
    }

    @Test
    void circularColumnUsesExp642WithTheResultantEccentricity() {
        ColumnOutline c = ColumnOutline.circular(500, new PlanPoint(0, 0));
        // Mx = 300, My = 400 kNm: resultant 500 kNm; VEd = 2500 kN: e = 200 mm; a = 2d = 1200 mm:
        // β = 1 + 0.6·π·200/(500 + 2·1200) = 1.129997 (EN 1992-1-1 Exp. 6.42, D + 4d = D + 2a; hand calculation).
        assertThat(ControlPerimeter.beta(c, 1200, 2500, 300, 400).value()).isCloseTo(1.129997, within(1e-5));
    }

    @Test
    void theSearchValueIsTheTracedValueToTheLastBit() {
        // The perimeter search compares β by value and traces only the governing perimeter: both must be
        // the same double, or the trace would show a β the search did not use. Invented sizes and loads.
        ColumnOutline[] columns = {ColumnOutline.rectangular(600, 300, new PlanPoint(0, 0)),
            ColumnOutline.rectangular(350, 900, new PlanPoint(120, -80)), ColumnOutline.rectangular(400, 400,
                new PlanPoint(0, 0)), ColumnOutline.circular(550, new PlanPoint(0, 0))};
        for (ColumnOutline c : columns) {
            for (double a : new double[] {17.3, 480, 1600}) {
                for (double[] m : new double[][] {{0, 0}, {150, -300}, {-75.5, 910}}) {
                    assertThat(ControlPerimeter.betaValue(ControlPerimeter.betaGeometry(c, a), 2317.5, m[0], m[1]))
                            .isEqualTo(ControlPerimeter.beta(c, a, 2317.5, m[0], m[1]).value());
                }
            }
        }
    }
}
