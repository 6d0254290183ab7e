package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.check;
import static dev.countercheck.element.pilecap.CapReviews.value;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Tie steel in bands over widely spaced piles (EN 1992-1-1 9.8.1(3); band_spacing_limit 3 and
 * band_half_width 1.5, common practice). Invented four-pile cap (resources/hand-calcs/four-pile-wide.yaml):
 * piles φ400 at (±1100, ±1100), cap 3200 × 3200 × 1200, N = 4000 kN, own weight in the actions.
 */
class TieBandingHandCalculationTest {

    private final ElementReview cap = CapReviews.element("/hand-calcs/four-pile-wide.yaml");

    /**
     * Hand calculation. Least spacing 2200 mm > 3·400 = 1200 mm: banded. Bands ±1.5·400 = ±600 mm about
     * y = ±1100, i.e. 500 ≤ |y| ≤ 1700. 16 x-bars φ20, side cover 75: first centre −1600 + 75 + 10 = −1515,
     * spacing (3200 − 150 − 20)/15 = 202 mm: −1515, −1313, −1111, −909, −707, −505, −303, −101, 101, ...
     * Bars 1–6 (|y| ≥ 505) and 11–16 count; bars 7–10 (|y| ≤ 303) do not.
     * As,all = 16·π·20²/4 = 5026.5 mm²; As,band = 12·314.16 = 3769.9 mm².
     * P = 1000 kN each; dx = 1200 − 75 − 10 = 1115 mm; T = 2·1000·1100/1115 = 1973.1 kN;
     * As,req = 1973.1·1000/434.78 = 4538.1 mm² > 3769.9: fails, although all bars (5026.5) would pass.
     */
    @Test
    void onlyTheBarsOverThePilesCountAsTieSteel() {
        assertThat(value(cap, "tie-x", "as_provided_all")).isCloseTo(5026.5, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "tie-x", "as_provided")).isCloseTo(3769.9, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "tie-x", "as_required")).isCloseTo(4538.1, withinPercentage(0.05)); // hand calculation
        assertThat(check(cap, "tie-x").status()).isEqualTo(CheckStatus.FAIL);
        assertThat(cap.cautions()).anySatisfy(c -> assertThat(c).contains("x-bars 7, 8, 9, 10 of 16"));
    }

    /** The y-bars lie the same way across x: bars 7–10 of 16 fall outside the bands (as for x). */
    @Test
    void theOtherDirectionIsBandedAlike() {
        assertThat(value(cap, "tie-y", "as_provided")).isCloseTo(3769.9, withinPercentage(0.01)); // hand calculation
        assertThat(cap.cautions()).anySatisfy(c -> assertThat(c).contains("y-bars 7, 8, 9, 10 of 16"));
    }

    /** Piles at 3φ or closer (resources/hand-calcs/two-pile-close.yaml: 1400 mm ≤ 3·500) are not banded. */
    @Test
    void closelySpacedPilesAreNotBanded() {
        ElementReview close = CapReviews.element("/hand-calcs/two-pile-close.yaml");
        assertThat(check(close, "tie-x").values()).doesNotContainKey("as_provided_all");
    }

    /**
     * Shear width over the same widely spaced piles (strips 3φ = 1200 mm, common practice). Section
     * across x on the +x side: the piles beyond it lie at y = ±1100; strips [500, 1700] and [−1700, −500]
     * clipped to the cap (±1600): b = 1100 + 1100 = 2200 mm. Bars within: the 12 banded x-bars,
     * As = 3769.9 mm²; ρl = 3769.9/(2200·1115) = 0.0015369; k = 1 + √(200/1115) = 1.42352;
     * vRd,c = 0.12·1.42352·(100·0.0015369·30)^(1/3) = 0.28431 MPa < vmin = 0.035·1.42352^1.5·√30
     * = 0.32559 MPa; VRd,c = 0.32559·2200·1115 = 798.7 kN (EN 1992-1-1 6.2.2(1)).
     */
    @Test
    void shearWidthIsTheUnionOfStripsAboutThePilesBeyondTheSection() {
        assertThat(value(cap, "shear-x", "b")).isCloseTo(2200, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "shear-x", "vrdc")).isCloseTo(798.7, withinPercentage(0.05)); // hand calculation
        assertThat(value(CapReviews.element("/hand-calcs/two-pile-close.yaml"), "shear-x", "b"))
                .isCloseTo(850, withinPercentage(0.01)); // full cap width (piles 2.8φ apart, not widely spaced)
    }
}
