package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.check;
import static dev.countercheck.element.pilecap.CapReviews.value;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * A four-pile cap worked by hand with the recommended values of EN 1992-1-1 (γc 1.5, γs 1.15,
 * αcc = αct = 1.0, CRd,c = 0.18/γc, vmin 0.035·k^1.5·fck^0.5, vRd,max factor 0.4, k1 = 1.0,
 * k3 = 0.75). Invented geometry: resources/hand-calcs/four-pile.yaml (a rectangular group).
 *
 * <p>Hand calculation. C30/37, fyk 500: fyd = 500/1.15 = 434.78 MPa; fcd = 30/1.5 = 20 MPa.
 * h = 1050, bottom cover 75, x-bars 13H25 layer 1, y-bars 14H25 layer 2:
 * dx = 1050 − 75 − 12.5 = 962.5 mm; dy = 1050 − 75 − 25 − 12.5 = 937.5 mm; d = 950 mm.
 * Piles φ550 at (±900, ±850), N = 5400 kN including self weight: P = 1350 kN each.
 * Column 600 × 550 at the centre, starters 6H28.
 * <ul>
 * <li>tie-x: T = 2·1350·900/962.5 = 2524.7 kN; As,req = 2524.7·1000/434.78 = 5806.8 mm²;
 *     Piles 1700 apart &gt; 3·550 = 1650 (band_spacing_limit, common practice): only x-bars within
 *     1.5·550 = 825 of y = ±850 count (9.8.1(3)). Bars at −1312.5 + 218.75·i: bar 7 at y = 0 lies outside
 *     (|0 ∓ 850| &gt; 825); As,prov = 12·π·25²/4 = 5890.5 mm² (all 13: 6381.4 mm²).</li>
 * <li>tie-y: T = 2·1350·850/937.5 = 2448.0 kN; As,req = 2448.0·1000/434.78 = 5630.4 mm².</li>
 * <li>shear-x: column face at 300, pile centre at 900: av = 600 − 0.3·550 = 435 &lt; 0.5d = 481.25,
 *     so av = 481.25 and β = 481.25/1925 = 0.25; VEd = 0.25·2·1350 = 675 kN; unreduced 2700 kN.
 *     Widely spaced piles: b = strips 3·550 = 1650 about y = ±850, clipped to ±1400: 2·1375 = 2750 mm,
 *     with the 12 banded bars: ρl = 5890.5/(2750·962.5) = 0.0022254; k = 1 + √(200/962.5) = 1.4558;
 *     vRd,c = 0.12·1.4558·(100·0.0022254·30)^(1/3) = 0.32896 MPa &lt; vmin = 0.035·1.4558^1.5·√30
 *     = 0.33674 MPa, so vmin governs: VRd,c = 0.33674·2750·962.5 = 891.3 kN.
 *     0.5·b·d·ν·fcd = 0.5·2750·962.5·0.528·20 = 13 976 kN.</li>
 * <li>shear-y: face at 275, pile at 850: av = 575 − 165 = 410 &lt; 0.5·937.5, so av = 468.75, β = 0.25,
 *     VEd = 675 kN; b = strips 1650 about x = ±900 clipped to ±1475: 2·1400 = 2800 mm; all 14 y-bars
 *     (|x| ≥ 106.7) lie within: ρl = 6872.2/(2800·937.5) = 0.0026180, k = 1.4619,
 *     vRd,c = 0.12·1.4619·(100·0.0026180·30)^(1/3) = 0.34870 MPa &gt; vmin = 0.33884 MPa;
 *     VRd,c = 0.34870·2800·937.5 = 915.3 kN.</li>
 * <li>punching-face: u0 = 2·(600 + 550) = 2300 mm; vRd,max·u0·d = 0.4·0.528·20·2300·950 = 9229.4 kN;
 *     VEd = 5400 kN.</li>
 * <li>punching-perimeter (perimeters at a = 19, 38, ... 1900 mm, steps of d/50): each pile centre is
 *     √(600² + 575²) = 831.0 mm from the column corner, its head's nearest point 556.0 mm. ρl =
 *     √(6381.4/(2800·962.5)·6872.2/(2950·937.5)) = 0.0024257; k = 1 + √(200/950) = 1.4588;
 *     vRd,c = 0.12·1.4588·(100·0.0024257·30)^(1/3) = 0.33924 MPa &gt; vmin = 0.33778. At a = 570:
 *     u = 2·(600 + 550) + 2π·570 = 5881.4 mm (all on the 2950 × 2800 plan); each head's lens inside the
 *     corner arc (circles r = 275 and R = 570, centres 831.0 apart) is 1334.6 mm², share 0.0056172;
 *     VEd,red = 5400 − 4·1350·0.0056172 = 5369.7 kN (no moment, β = 1); vRd = 0.33924·1900/570 =
 *     1.1308 MPa; VRd = 1.1308·5881.4·950 = 6318.1 kN, ratio 0.8499; at a = 551 (no share) 5400/6403.3 =
 *     0.8433, at a = 589 5290.0/6238.4 = 0.8480: a = 570 governs.</li>
 * <li>node-column: no moment, A_eff = Ac = 600·550 = 330 000 mm²; As,starters = 6·π·28²/4 = 3694.5 mm²;
 *     σsc = min(434.78; 200 000·0.002) = 400 MPa;
 *     5400·1000/330 000 − (3694.5/330 000)·400 = 16.364 − 4.478 = 11.885 MPa ≤ 1.0·0.88·20 = 17.6 MPa.</li>
 * <li>node-pile: 1350·1000/(π·275²) = 5.682 MPa ≤ 0.75·0.88·20 = 13.2 MPa (CTT);
 *     strut angle atan(950/√(900² + 850²)) = atan(950/1237.9) = 37.50°.</li>
 * <li>anchorage-starters: fctm = 0.3·30^(2/3) = 2.8965; fctd = 0.7·2.8965/1.5 = 1.3517;
 *     fbd = 2.25·1.3517 = 3.0413 MPa; lb,rqd = (28/4)·434.78/3.0413 = 1000.7 mm = lbd;
 *     available = 1050 − 75 − 25 − 25 = 925 mm: fails.</li>
 * </ul>
 */
class FourPileCapHandCalculationTest {

    private static final ElementReview CAP = CapReviews.element("/hand-calcs/four-pile.yaml");

    @Test
    void reactionsAreAQuarterOfTheLoad() {
        assertThat(value(CAP, "pile-reactions", "max")).isCloseTo(1350, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "pile-reactions", "min")).isCloseTo(1350, withinPercentage(0.01)); // hand calculation
    }

    @Test
    void tiesMatchTheTrussFormula() {
        assertThat(value(CAP, "tie-x", "force")).isCloseTo(2524.7, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "tie-x", "as_required")).isCloseTo(5806.8, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "tie-x", "as_provided")).isCloseTo(5890.5, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "tie-x", "as_provided_all")).isCloseTo(6381.4, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "tie-y", "force")).isCloseTo(2448.0, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "tie-y", "as_required")).isCloseTo(5630.4, withinPercentage(0.05)); // hand calculation
        assertThat(check(CAP, "tie-x").status()).isEqualTo(CheckStatus.PASS);
    }

    @Test
    void shortShearSpanIsFlooredAtHalfTheEffectiveDepth() {
        assertThat(value(CAP, "shear-x", "av")).isCloseTo(481.25, withinPercentage(0.01)); // hand calculation: 0.5d
        assertThat(value(CAP, "shear-x", "beta")).isCloseTo(0.25, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "shear-x", "ved")).isCloseTo(675, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "shear-x", "ved_unreduced")).isCloseTo(2700, withinPercentage(0.05)); // hand calculation
        assertThat(value(CAP, "shear-x", "vrdc")).isCloseTo(891.3, withinPercentage(0.1)); // hand calculation
        assertThat(value(CAP, "shear-x", "vrd_max")).isCloseTo(13975.5, withinPercentage(0.05)); // hand calculation (b = 2750)
        assertThat(value(CAP, "shear-y", "av")).isCloseTo(468.75, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "shear-y", "vrdc")).isCloseTo(915.3, withinPercentage(0.1)); // hand calculation
    }

    @Test
    void punchingAtTheFaceAndAtTheGoverningPerimeterWithinTwoD() {
        assertThat(value(CAP, "punching-face", "u0")).isCloseTo(2300, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "punching-face", "vrd_max")).isCloseTo(9229.4, withinPercentage(0.05)); // hand calc
        assertThat(value(CAP, "punching-perimeter", "a")).isCloseTo(570, withinPercentage(0.01)); // hand calc
        assertThat(value(CAP, "punching-perimeter", "u")).isCloseTo(5881.4, withinPercentage(0.05)); // hand calc
        assertThat(value(CAP, "punching-perimeter", "ved")).isCloseTo(5369.7, withinPercentage(0.05)); // hand
        assertThat(value(CAP, "punching-perimeter", "vrd")).isCloseTo(6318.1, withinPercentage(0.05)); // hand
        assertThat(check(CAP, "punching-perimeter").status()).isEqualTo(CheckStatus.PASS);
    }

    @Test
    void nodeStresses() {
        assertThat(value(CAP, "node-column", "stress")).isCloseTo(11.885, withinPercentage(0.1)); // hand calculation
        assertThat(value(CAP, "node-column", "limit")).isCloseTo(17.6, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "node-pile", "stress")).isCloseTo(5.682, withinPercentage(0.1)); // hand calculation
        assertThat(value(CAP, "node-pile", "limit")).isCloseTo(13.2, withinPercentage(0.01)); // hand calculation
        assertThat(value(CAP, "node-pile", "strut_angle")).isCloseTo(37.50, withinPercentage(0.05)); // hand calc
    }

    @Test
    void starterBarsDoNotAnchorWithinTheCapDepth() {
        assertThat(value(CAP, "anchorage-starters", "lbd")).isCloseTo(1000.7, withinPercentage(0.1)); // hand calc
        assertThat(value(CAP, "anchorage-starters", "available")).isCloseTo(925, withinPercentage(0.01)); // hand calc
        assertThat(check(CAP, "anchorage-starters").status()).isEqualTo(CheckStatus.FAIL);
    }
}
