package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Severity;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.check;
import static dev.countercheck.element.pilecap.CapReviews.value;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/** Pile deviation δ (75 mm when none is stated, common practice) in the edge distance (EN 1992-1-1 9.8.1(1)). */
class PileDeviationDetailingTest {

    /**
     * Hand calculation, resources/hand-calcs/two-pile.yaml: cap 2600 × 850, piles φ500 at x = ±850:
     * e = min(1300 − 850, 425 − 0) − 250 = 175 mm ≥ the minimum 150 (common practice): passes;
     * deviated 175 − 75 = 100 mm < 150: a note, not a failure.
     */
    @Test
    void aNominalEdgeAtTheMinimumPassesWithANoteForTheDeviatedOne() {
        ElementReview cap = CapReviews.element("/hand-calcs/two-pile.yaml");
        assertThat(value(cap, "edge-distance", "min_edge")).isCloseTo(175, withinPercentage(0.01)); // hand calculation
        assertThat(value(cap, "edge-distance", "min_edge_deviated")).isCloseTo(100, withinPercentage(0.01)); // hand calculation
        assertThat(check(cap, "edge-distance").status()).isEqualTo(CheckStatus.PASS);
        assertThat(cap.findings()).anySatisfy(f -> {
            assertThat(f.check()).isEqualTo("edge-distance");
            assertThat(f.severity()).isEqualTo(Severity.NOTE);
        });
    }

    /**
     * Hand calculation, resources/hand-calcs/four-pile-wide.yaml: cap 3200 square, piles φ400 at ±1100:
     * e = 1600 − 1100 − 200 = 300 mm, deviated 225 mm, both ≥ 150: no edge-distance finding.
     */
    @Test
    void aWideEdgeRaisesNothing() {
        ElementReview cap = CapReviews.element("/hand-calcs/four-pile-wide.yaml");
        assertThat(value(cap, "edge-distance", "min_edge_deviated")).isCloseTo(225, withinPercentage(0.01)); // hand calculation
        assertThat(cap.findings()).noneSatisfy(f -> assertThat(f.check()).isEqualTo("edge-distance"));
    }
}
