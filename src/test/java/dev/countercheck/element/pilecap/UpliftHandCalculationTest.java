package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.value;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * An invented two-pile cap under a large moment (resources/hand-calcs/uplift-two-pile.yaml), worked by
 * hand with the recommended values (γG,sup = 1.35, γG,inf = 1.0: EN 1990 Table A1.2(B)).
 * Piles φ500 at x = ±1000, cap 3200 × 1000 × 900, N = 600 kN, My = 900 kNm, own weight added.
 * Wcap = 25·3.2·1.0·0.9 = 72 kN. Moment share per pile: My·s/Σs² = 900·1/(2·1²) = 450 kN.
 */
class UpliftHandCalculationTest {

    private final ElementReview cap = CapReviews.element("/hand-calcs/uplift-two-pile.yaml");

    /**
     * Largest reaction with γG,sup: (600 + 1.35·72)/2 + 450 = 697.2/2 + 450 = 798.6 kN.
     * Least reaction with γG,inf: (600 + 1.0·72)/2 − 450 = 336 − 450 = −114 kN (with γG,sup it would
     * have been 348.6 − 450 = −101.4 kN, hiding 12.6 kN of tension).
     */
    @Test
    void ownWeightTakesGammaSupForTheLargestAndGammaInfForTheLeastReaction() {
        assertThat(value(cap, "pile-reactions", "max")).isCloseTo(798.6, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "pile-reactions", "min")).isCloseTo(-114.0, withinPercentage(0.01)); // hand calculation
    }

    /**
     * Off position by δ = 75 mm (none stated). Moving the compression pile 2 inward, from 1000 to 925,
     * moves the centroid away from the column: x̄ = −37.5, s = ∓962.5, Σs² = 2·962.5² = 1 852 812.5;
     * My* = 900 + 672·(0 + 37.5)/1000 = 925.2 kNm (own weight × γG,inf, at the cap centre) and
     * P1 = 336 − 925.2·1000·962.5/1 852 812.5 = 336 − 480.6 = −144.6 kN. (Moving pile 1 inward instead
     * gives My* = 874.8 and P1 = 336 − 454.4 = −118.4 kN; sideways moves leave the line and the arm.)
     */
    @Test
    void deviationReportsTheLeastReactionWithGammaInf() {
        assertThat(value(cap, "pile-reactions-deviation", "min")).isCloseTo(-144.6, withinPercentage(0.1)); // hand calculation
        assertThat(value(cap, "pile-reactions-deviation", "min"))
                .isLessThanOrEqualTo(value(cap, "pile-reactions", "min"));
    }

    /**
     * hogging-x, top bars 6 φ16 (layer 1): d = 900 − 50 − 8 = 842 mm; As,prov = 6·201.06 = 1206.4 mm².
     * Tension pile 1 at x = −1000, column face at −200: l = 0.8 m; the cap beyond the face is
     * 1600 − 200 = 1400 mm long, 1.0 m wide, 0.9 m deep: 25·1.0·0.9 = 22.5 kN/m.
     * With γG,inf: P1 = −114 kN, M = 114·0.8 + 1.0·22.5·1.4²/2 = 91.2 + 22.05 = 113.25 kNm.
     * With γG,sup: P1 = −101.4 kN, M = 101.4·0.8 + 1.35·22.05 = 81.12 + 29.77 = 110.89 kNm. γG,inf governs.
     * K = 113.25e6/(1000·842²·30) = 0.0053246; z = 421·[1 + √(1 − 2·0.0053246/(1/1.5))] = 838.6 mm
     * > 0.95d = 799.9 mm, so z = 799.9 mm; As,req = 113.25e6/(434.78·799.9) = 325.6 mm² ≤ 1206.4: passes.
     * Both piles lie on y = 0, within the column's width: no pile lies beyond a face in y, so hogging-y
     * is not applicable.
     */
    @Test
    void hoggingOverTheTensionPileTakesTheWorseOwnWeightFactor() {
        assertThat(value(cap, "hogging-x", "moment")).isCloseTo(113.25, withinPercentage(0.05)); // hand calculation
        assertThat(value(cap, "hogging-x", "as_required")).isCloseTo(325.6, withinPercentage(0.1)); // hand calculation
        assertThat(value(cap, "hogging-x", "as_provided")).isCloseTo(1206.4, withinPercentage(0.01)); // hand calculation
        assertThat(CapReviews.check(cap, "hogging-x").status()).isEqualTo(CheckStatus.PASS);
        assertThat(CapReviews.check(cap, "hogging-y").status()).isEqualTo(CheckStatus.NOT_APPLICABLE);
    }

    /** The two-pile cap without moment (resources/hand-calcs/two-pile.yaml) has no pile in tension. */
    @Test
    void noTensionPileMeansNotApplicableWithTheReason() {
        ElementReview plain = CapReviews.element("/hand-calcs/two-pile.yaml");
        assertThat(CapReviews.check(plain, "hogging-x").status()).isEqualTo(CheckStatus.NOT_APPLICABLE);
        assertThat(CapReviews.check(plain, "hogging-x").reason()).hasValueSatisfying(
                reason -> assertThat(reason).contains("no pile is in tension"));
    }
}
