package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.check;
import static dev.countercheck.element.pilecap.CapReviews.value;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Two- and three-pile caps worked by hand from pile-cap-method.md with the recommended values of
 * EN 1992-1-1 (fyd = 434.78 MPa, fcd = 20 MPa for C30/37). Invented data under resources/hand-calcs.
 * The tie forces also reproduce the classic truss results from statics (published-values.md §6.4:
 * two piles T = N·l/(4d); three piles, total across a section = 1.5·N·l/(9d)).
 */
class TwoAndThreePileCapHandCalculationTest {

    /**
     * Hand calculation, two piles φ600 at ±900, N = 3000 kN: P = 1500 kN.
     * dx = 1000 − 100 − 12.5 = 887.5 mm. T = 1500·900/887.5 = 1521.1 kN (= 3000·1800/(4·887.5));
     * As,req = 1521.1·1000/434.78 = 3498.6 mm²; As,prov = 8·490.87 = 3927.0 mm².
     * Shear-x: face at 225, pile at 900: av = 675 − 180 = 495 ≥ 0.5d = 443.75; β = 495/1775 = 0.27887;
     * VEd = 0.27887·1500 = 418.3 kN; b = 900, ρl = 3927/(900·887.5) = 0.0049165, k = 1.4747,
     * vRd,c = 0.12·1.4747·(100·0.0049165·30)^(1/3) = 0.43385 MPa; VRd,c = 0.43385·900·887.5 = 346.5 kN:
     * fails. No pile lies beyond the column in y: tie-y force 0, shear-y not applicable.
     * Node over a pile of a two-pile cap: CCT, 0.85·0.88·20 = 14.96 MPa; σ = 1500·1000/(π·300²) = 5.305 MPa.
     */
    @Test
    void twoPileCap() {
        ElementReview cap = CapReviews.element("/hand-calcs/two-pile.yaml");
        assertThat(value(cap, "tie-x", "force")).isCloseTo(1521.1, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-x", "as_required")).isCloseTo(3498.6, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-y", "force")).isZero(); // no pile beyond the column in y
        assertThat(value(cap, "shear-x", "av")).isCloseTo(495, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "shear-x", "beta")).isCloseTo(0.27887, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "shear-x", "ved")).isCloseTo(418.3, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "shear-x", "vrdc")).isCloseTo(346.5, withinPercentage(0.1)); // hand calculation
        assertThat(check(cap, "shear-x").status()).isEqualTo(CheckStatus.FAIL);
        assertThat(check(cap, "shear-y").status()).isEqualTo(CheckStatus.NOT_APPLICABLE);
        assertThat(value(cap, "node-pile", "limit")).isCloseTo(14.96, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "node-pile", "stress")).isCloseTo(5.305, withinPercentage(0.1)); // hand calculation
    }

    /**
     * Hand calculation, three piles φ450 at (0, 585), (±675, −585), column at the centroid (0, −195),
     * N = 3600 kN: P = 1200 kN each. dx = 900 − 75 − 10 = 815 mm; dy = 900 − 75 − 20 − 10 = 795 mm.
     * tie-x: T = 1200·675/815 = 993.9 kN (= 1.5·N·l/(9d) with l = 1350: 1.5·3600·1350/(9·815));
     * As,req = 993.9·1000/434.78 = 2285.9 mm².
     * tie-y: +y side 1200·780/795 = 1177.4 kN; −y side 2·1200·390/795 = 1177.4 kN (equilibrium);
     * As,req = 2707.9 mm².
     */
    @Test
    void threePileCap() {
        ElementReview cap = CapReviews.element("/hand-calcs/three-pile.yaml");
        assertThat(value(cap, "pile-reactions", "max")).isCloseTo(1200, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "tie-x", "force")).isCloseTo(993.9, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-x", "as_required")).isCloseTo(2285.9, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-y", "force")).isCloseTo(1177.4, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-y", "as_required")).isCloseTo(2707.9, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "punching-face", "u0")).isCloseTo(Math.PI * 450, withinPercentage(0.01)); // π·D
        // One-way shear takes the circular column as a square of side 0.8·450 = 360 mm (common practice):
        // the −y face at −195 − 180 = −375, the piles at −585: 210 − 0.3·450 = 75 < 0.5·795, so av = 397.5 mm.
        assertThat(check(cap, "shear-y").trace()).anyMatch(t -> t.symbol().equals("c,eq") && t.value() == 360);
        assertThat(value(cap, "shear-y", "av")).isCloseTo(397.5, withinPercentage(0.01)); // hand calculation
    }
}
