package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.check;
import static dev.countercheck.element.pilecap.CapReviews.value;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Two- and three-pile caps worked by hand with the recommended values of EN 1992-1-1
 * (fyd = 434.78 MPa, fcd = 20 MPa for C30/37). Invented geometry under resources/hand-calcs.
 * The tie forces also follow from statics about the node under the column: for two piles
 * T = N·l/(4d) with l the pile spacing; for three piles the moments of the piles on either side
 * of the column balance.
 */
class TwoAndThreePileCapHandCalculationTest {

    /**
     * Hand calculation, two piles φ500 at ±850, column 400 × 400, N = 2900 kN: P = 1450 kN.
     * dx = 950 − 100 − 12.5 = 837.5 mm. T = 1450·850/837.5 = 1471.6 kN (= 2900·1700/(4·837.5));
     * As,req = 1471.6·1000/434.78 = 3384.8 mm²; As,prov = 7·490.87 = 3436.1 mm².
     * Shear-x: face at 200, pile at 850: av = 650 − 0.3·500 = 500 ≥ 0.5d = 418.75; β = 500/1675 = 0.29851;
     * VEd = 0.29851·1450 = 432.8 kN; b = 850, ρl = 3436.1/(850·837.5) = 0.0048269, k = 1 + √(200/837.5) = 1.4887,
     * vRd,c = 0.12·1.4887·(100·0.0048269·30)^(1/3) = 0.43542 MPa (&gt; vmin 0.34820);
     * VRd,c = 0.43542·850·837.5 = 310.0 kN: fails. No pile lies beyond the column in y: tie-y force 0,
     * shear-y not applicable.
     * Node over a pile of a two-pile cap: CCT, 0.85·0.88·20 = 14.96 MPa; σ = 1450·1000/(π·250²) = 7.385 MPa.
     */
    @Test
    void twoPileCap() {
        ElementReview cap = CapReviews.element("/hand-calcs/two-pile.yaml");
        assertThat(value(cap, "tie-x", "force")).isCloseTo(1471.6, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-x", "as_required")).isCloseTo(3384.8, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-x", "as_provided")).isCloseTo(3436.1, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "tie-y", "force")).isZero(); // no pile beyond the column in y
        assertThat(value(cap, "shear-x", "av")).isCloseTo(500, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "shear-x", "beta")).isCloseTo(0.29851, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "shear-x", "ved")).isCloseTo(432.8, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "shear-x", "vrdc")).isCloseTo(310.0, withinPercentage(0.1)); // hand calculation
        assertThat(check(cap, "shear-x").status()).isEqualTo(CheckStatus.FAIL);
        assertThat(check(cap, "shear-y").status()).isEqualTo(CheckStatus.NOT_APPLICABLE);
        assertThat(value(cap, "node-pile", "limit")).isCloseTo(14.96, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "node-pile", "stress")).isCloseTo(7.385, withinPercentage(0.1)); // hand calculation
    }

    /**
     * Hand calculation, three piles φ500 at (0, 720), (±825, −720) (an isosceles triangle, base 1650,
     * sides √(825² + 1440²) = 1659.6), column D = 500 at the centroid (0, (720 − 2·720)/3) = (0, −240),
     * N = 4050 kN: P = 1350 kN each. dx = 950 − 75 − 10 = 865 mm; dy = 950 − 75 − 20 − 10 = 845 mm.
     * tie-x: T = 1350·825/865 = 1287.6 kN; As,req = 1287.6·1000/434.78 = 2961.4 mm².
     * tie-y: +y side 1350·(720 + 240)/845 = 1533.7 kN; −y side 2·1350·(720 − 240)/845 = 1533.7 kN
     * (equilibrium about the node); As,req = 1533.7·1000/434.78 = 3527.6 mm²; As,prov = 12·π·20²/4 = 3769.9 mm².
     * shear-y (column as a 400 mm square, faces at y = −40 and −440; piles widely spaced: 1650 > 3φ, so each
     * side's section is the strips 3φ = 1500 wide about its own piles, common practice):
     * +y side, the pile at y = 720: av = 760 − (0.5 − 0.2)·500 = 610 ≥ 0.5d = 422.5; β = 610/(2·845) =
     * 0.36095; VEd = 0.36095·1350 = 487.28 kN on b = 1500 (0.325 kN/mm);
     * −y side, the two piles at y = −720: av = 280 − 150 = 130 → 0.5d = 422.5; β = 0.25; VEd = 675 kN on
     * the union of two strips, the whole 2600 (0.260 kN/mm), with about the same ρl. The +y side has the
     * smaller VEd but the greater VEd/VRd,c, and it governs.
     */
    @Test
    void threePileCap() {
        ElementReview cap = CapReviews.element("/hand-calcs/three-pile.yaml");
        assertThat(value(cap, "pile-reactions", "max")).isCloseTo(1350, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "pile-reactions", "min")).isCloseTo(1350, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "tie-x", "force")).isCloseTo(1287.6, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-x", "as_required")).isCloseTo(2961.4, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-y", "force")).isCloseTo(1533.7, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-y", "as_required")).isCloseTo(3527.6, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "tie-y", "as_provided")).isCloseTo(3769.9, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "punching-face", "u0")).isCloseTo(Math.PI * 500, withinPercentage(0.01)); // π·D
        // One-way shear takes the circular column as a square of side 0.8·500 = 400 mm (common practice).
        assertThat(check(cap, "shear-y").trace()).anyMatch(t -> t.symbol().equals("c,eq") && t.value() == 400);
        assertThat(value(cap, "shear-y", "av")).isCloseTo(610, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "shear-y", "beta")).isCloseTo(0.36095, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "shear-y", "ved")).isCloseTo(487.28, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "shear-y", "b")).isCloseTo(1500, withinPercentage(0.01)); // hand calculation
    }
}
