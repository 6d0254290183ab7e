package dev.countercheck.element.pilecap;

import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Severity;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** An axial force that reads like MN written without its unit draws a note, and only then. */
class ForcePlausibilityTest {

    private static List<Finding> notesOnReactions(ElementReview e) {
        return e.findings().stream()
                .filter(f -> f.check().equals("pile-reactions") && f.severity() == Severity.NOTE).toList();
    }

    @Test
    void aForceOfTenKilonewtonsOnPilesOfFifteenHundredIsNoted() {
        ElementReview cap = CapReviews.element("/plausibility/n-written-in-meganewtons.yaml");
        // 4 piles × 1500 kN = 6000 kN; 10.4 kN read as MN is 10 400 kN ≤ 2 × 6000: noted. 5200 kN is not.
        assertThat(notesOnReactions(cap)).singleElement().extracting(Finding::message).asString()
                .contains("N = 10.4 kN in ULS-1").contains("\"10.4 MN\"").contains("6000 kN");
    }

    @Test
    void ordinaryForcesDrawNoNote() {
        assertThat(notesOnReactions(CapReviews.element("/hand-calcs/four-pile.yaml"))).isEmpty();
    }
}
