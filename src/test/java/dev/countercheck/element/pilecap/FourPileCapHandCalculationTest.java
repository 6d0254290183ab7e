package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.check;
import static dev.countercheck.element.pilecap.CapReviews.value;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * A four-pile cap worked by hand from pile-cap-method.md with the recommended values of
 * EN 1992-1-1 (γc 1.5, γs 1.15, αcc = αct = 1.0, CRd,c = 0.18/γc, vmin 0.035·k^1.5·fck^0.5,
 * vRd,max factor 0.4, k1 = 1.0, k3 = 0.75). Invented data: resources/hand-calcs/four-pile.yaml.
 *
 * <p>Hand calculation. C30/37, fyk 500: fyd = 500/1.15 = 434.78 MPa; fcd = 30/1.5 = 20 MPa.
 * h = 1000, bottom cover 75, x-bars 12H25 layer 1, y-bars 12H25 layer 2:
 * dx = 1000 − 75 − 12.5 = 912.5 mm; dy = 1000 − 75 − 25 − 12.5 = 887.5 mm; d = 900 mm.
 * Piles φ500 at (±750, ±750), N = 5000 kN including self weight: P = 1250 kN each.
 * <ul>
 * <li>tie-x: T = 2·1250·750/912.5 = 2054.8 kN (= N·l/(2d), l = 750);
 *     As,req = 2054.8·1000/434.78 = 4726.0 mm²; As,prov = 12·π·25²/4 = 5890.5 mm².</li>
 * <li>tie-y: T = 1 875 000/887.5 = 2112.7 kN; As,req = 4859.2 mm².</li>
 * <li>shear-x: column face at 250, pile centre at 750: av = 500 − 0.3·500 = 350 &lt; 0.5d = 456.25,
 *     so av = 456.25 and β = 456.25/1825 = 0.25; VEd = 0.25·2·1250 = 625 kN; unreduced 2500 kN.
 *     ρl = 5890.5/(2400·912.5) = 0.0026898; k = 1 + √(200/912.5) = 1.4682;
 *     vRd,c = 0.12·1.4682·(100·0.0026898·30)^(1/3) = 0.35337 MPa &gt; vmin = 0.34102 MPa;
 *     VRd,c = 0.35337·2400·912.5 = 773.9 kN. 0.5·b·d·ν·fcd = 0.5·2400·912.5·0.528·20 = 11 563 kN.</li>
 * <li>shear-y: av = 443.75 (floored), β = 0.25, VEd = 625 kN; ρl = 0.0027656, k = 1.4747,
 *     vRd,c = 0.35820 MPa; VRd,c = 0.35820·2400·887.5 = 762.96 kN.</li>
 * <li>punching-face: u0 = 4·500 = 2000 mm; vRd,max·u0·d = 0.4·0.528·20·2000·900 = 7603.2 kN; VEd = 5000 kN.</li>
 * <li>punching-perimeter (perimeters at a = 18, 36, ... 1800 mm, steps of d/50): each pile head's nearest
 *     point is √(500² + 500²) − 250 = 457.1 mm from the column corner. ρl = √(0.0026898·0.0027656) =
 *     0.0027273; k = 1 + √(200/900) = 1.4714; vRd,c = 0.12·1.4714·(100·0.0027273·30)^(1/3) = 0.35580 MPa
 *     &gt; vmin = 0.34216. At a = 486: u = 2000 + 2π·486 = 5053.6 mm; each head's lens inside the corner
 *     arc (circles r = 250 and R = 486, centres 707.1 apart) is 3729.9 mm², share 3729.9/(π·250²) =
 *     0.018996; VEd,red = 5000 − 4·1250·0.018996 = 4905.0 kN; vRd = 0.35580·1800/486 = 1.3178 MPa;
 *     VRd = 1.3178·5053.6·900 = 5993.5 kN, ratio 0.8184. At a = 468 (share 0.0043934) the ratio is
 *     4978.0/6084.8 = 0.8181, at a = 504 4803.6/5908.8 = 0.8129: a = 486 governs.</li>
 * <li>node-column: no moment, A_eff = Ac = 250 000 mm²; σsc = min(434.78; 200 000·0.002) = 400 MPa;
 *     5000·1000/250 000 − (1963.5/250 000)·400 = 20 − 3.1416 = 16.858 MPa ≤ 1.0·0.88·20 = 17.6 MPa.</li>
 * <li>node-pile: 1250·1000/(π·250²) = 6.366 MPa ≤ 0.75·0.88·20 = 13.2 MPa (CTT);
 *     strut angle atan(900/1060.7) = 40.31°.</li>
 * <li>anchorage-starters: fctm = 0.3·30^(2/3) = 2.8965; fctd = 0.7·2.8965/1.5 = 1.3517;
 *     fbd = 2.25·1.3517 = 3.0413 MPa; lb,rqd = (25/4)·434.78/3.0413 = 893.5 mm = lbd;
 *     available = 1000 − 75 − 25 − 25 = 875 mm: fails.</li>
 * </ul>
 */
class FourPileCapHandCalculationTest {

    private static final ElementReview CAP = CapReviews.element("/hand-calcs/four-pile.yaml");

    @Test
    void reactionsAreAQuarterOfTheLoad() {
        assertThat(value(CAP, "pile-reactions", "max")).isCloseTo(1250, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "pile-reactions", "min")).isCloseTo(1250, withinPercentage(0.01)); // hand calculation
    }

    @Test
    void tiesMatchTheTrussFormula() {
        assertThat(value(CAP, "tie-x", "force")).isCloseTo(2054.8, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "tie-x", "as_required")).isCloseTo(4726.0, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "tie-x", "as_provided")).isCloseTo(5890.5, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "tie-y", "force")).isCloseTo(2112.7, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "tie-y", "as_required")).isCloseTo(4859.2, withinPercentage(0.05)); // hand calculation
        assertThat(check(CAP, "tie-x").status()).isEqualTo(CheckStatus.PASS);
    }

    @Test
    void shortShearSpanIsFlooredAtHalfTheEffectiveDepth() {
        assertThat(value(CAP, "shear-x", "av")).isCloseTo(456.25, withinPercentage(0.01)); // hand calculation: 0.5d
        assertThat(value(CAP, "shear-x", "beta")).isCloseTo(0.25, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "shear-x", "ved")).isCloseTo(625, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "shear-x", "ved_unreduced")).isCloseTo(2500, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "shear-x", "vrdc")).isCloseTo(773.9, withinPercentage(0.1)); // hand calculation
        assertThat(value(CAP, "shear-x", "vrd_max")).isCloseTo(11563, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "shear-y", "av")).isCloseTo(443.75, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "shear-y", "vrdc")).isCloseTo(762.96, withinPercentage(0.1)); // hand calculation
    }

    @Test
    void punchingAtTheFaceAndAtTheGoverningPerimeterWithinTwoD() {
        assertThat(value(CAP, "punching-face", "u0")).isCloseTo(2000, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "punching-face", "vrd_max")).isCloseTo(7603.2, withinPercentage(0.05)); // hand calc
        assertThat(value(CAP, "punching-perimeter", "a")).isCloseTo(486, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "punching-perimeter", "u")).isCloseTo(5053.6, withinPercentage(0.05)); // hand calc
        assertThat(value(CAP, "punching-perimeter", "ved")).isCloseTo(4905.0, withinPercentage(0.05)); // hand calc
        assertThat(value(CAP, "punching-perimeter", "vrd")).isCloseTo(5993.5, withinPercentage(0.05)); // hand calc
        assertThat(check(CAP, "punching-perimeter").status()).isEqualTo(CheckStatus.PASS);
    }

    @Test
    void nodeStresses() {
        assertThat(value(CAP, "node-column", "stress")).isCloseTo(16.858, withinPercentage(0.1)); // hand calculation
        assertThat(value(CAP, "node-column", "limit")).isCloseTo(17.6, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "node-pile", "stress")).isCloseTo(6.366, withinPercentage(0.1)); // hand calculation
        assertThat(value(CAP, "node-pile", "limit")).isCloseTo(13.2, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "node-pile", "strut_angle")).isCloseTo(40.31, withinPercentage(0.05)); // hand calc
    }

    @Test
    void starterBarsDoNotAnchorWithinTheCapDepth() {
        assertThat(value(CAP, "anchorage-starters", "lbd")).isCloseTo(893.5, withinPercentage(0.1)); // hand calc
        assertThat(value(CAP, "anchorage-starters", "available")).isCloseTo(875, withinPercentage(0.01)); // hand calc
        assertThat(check(CAP, "anchorage-starters").status()).isEqualTo(CheckStatus.FAIL);
    }
}
