package dev.countercheck.element.pilecap;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The UK annex limits the concrete class taken in shear to C50/60 (NA to BS EN 1992-1-1, NA.2 for
 * 3.1.2(2)P, from memory; ruleset parameter fck_max_shear): the four-pile hand-calculation cap
 * (hand-calcs/four-pile.yaml, invented) in C60/75 has the vRd,c of the same cap in C50/60 under the
 * annex, and a larger one under the recommended values (Cmax = C90/105). vRd,c depends on fck only
 * through CRd,c·k·(100·ρl·fck)^(1/3) and vmin (EN 1992-1-1 6.2.2(1), 6.4.4(1)).
 */
class ShearStrengthLimitTest {

    private static ElementReview review(Path dir, String concrete, String ruleset) throws Exception {
        String text = Files.readString(Path.of("src/test/resources/hand-calcs/four-pile.yaml"));
        assertThat(text).contains("concrete: C30/37");
        Path file = dir.resolve(concrete.replace('/', '-') + "-" + ruleset + ".yaml");
        Files.writeString(file, text.replace("concrete: C30/37", "concrete: " + concrete));
        var s = new SubmissionReader(ElementKinds.binders()).read(file);
        return new ProjectReviewer(new Review.ToolInfo("countercheck", "test"))
                .review(s, CapReviews.ruleset(ruleset), "2026-01-01").elements().get(0);
    }

    @Test
    void aClassAboveC50IsTakenAsC50InShearUnderTheUkAnnex(@TempDir Path dir) throws Exception {
        ElementReview c60 = review(dir, "C60/75", "en1992-uk-na");
        ElementReview c50 = review(dir, "C50/60", "en1992-uk-na");
        for (String check : new String[] {"shear-x", "shear-y"}) {
            assertThat(CapReviews.value(c60, check, "vrdc")).as(check)
                    .isEqualTo(CapReviews.value(c50, check, "vrdc"));
        }
        Step fckV = CapReviews.check(c60, "shear-x").trace().stream().filter(s -> s.symbol().equals("fck,v"))
                .findFirst().orElseThrow();
        assertThat(fckV.value()).isEqualTo(50.0);
        assertThat(fckV.remark()).hasValueSatisfying(r -> assertThat(r).contains("limited to 50 MPa"));
    }

    @Test
    void theRecommendedValuesTakeTheFullClass(@TempDir Path dir) throws Exception {
        ElementReview c60 = review(dir, "C60/75", "en1992-recommended");
        ElementReview c50 = review(dir, "C50/60", "en1992-recommended");
        // (60/50)^(1/3) = 1.063 on the vRd,c stress (or (60/50)^(1/2) = 1.095 on vmin): larger either way
        assertThat(CapReviews.value(c60, "shear-x", "vrdc")).isGreaterThan(CapReviews.value(c50, "shear-x", "vrdc"));
    }
}
