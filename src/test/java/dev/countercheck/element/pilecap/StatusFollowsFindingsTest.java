package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Severity;
import org.junit.jupiter.api.Test;

import static dev.countercheck.element.pilecap.CapReviews.check;
import static org.assertj.core.api.Assertions.assertThat;

/** A check that raises a major or critical finding about its own subject does not read pass. */
class StatusFollowsFindingsTest {

    /**
     * Two piles on the x axis (invented, the hand-calculation cap with Mx = 60 kNm added): a moment
     * about that line has no lever arm in the pile group, so no pile reaction resists it; the
     * reactions themselves (1500 kN each, under the 2000 kN resistance) would pass.
     */
    @Test
    void aMomentAboutTheLineOfPilesFailsPileReactions() {
        ElementReview cap = CapReviews.element("/hand-calcs/two-pile-moment-about-line.yaml");

        assertThat(cap.findings()).filteredOn(f -> f.check().equals("pile-reactions"))
                .extracting(Finding::severity).contains(Severity.MAJOR);
        assertThat(check(cap, "pile-reactions").status()).isEqualTo(CheckStatus.FAIL);
        assertThat(check(cap, "pile-reactions").reason()).hasValueSatisfying(
                why -> assertThat(why).contains("not resisted by the pile group"));
    }

    @Test
    void withoutTheMomentTheSameCapPassesPileReactions() {
        ElementReview cap = CapReviews.element("/hand-calcs/two-pile.yaml");

        assertThat(check(cap, "pile-reactions").status()).isEqualTo(CheckStatus.PASS);
    }
}
