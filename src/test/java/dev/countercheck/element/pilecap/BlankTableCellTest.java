package dev.countercheck.element.pilecap;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A blank cell of a class the table lists is no value, even when several classes are given: C25/30 in
 * [XC2, XD1] has no BS 8500 cover for XD1 (the UK annex's table bs8500_cover, from memory, starts XD1
 * at C28/35), so the cover check cannot be done, rather than taking XC2's 25 mm. A class the table
 * does not list (XF1) still adds nothing.
 */
class BlankTableCellTest {

    private static ElementReview review(Path dir, String exposure) throws Exception {
        String text = Files.readString(Path.of("src/test/resources/rule-fixtures/uk-cover-bs8500.yaml"));
        assertThat(text).contains("concrete: C32/40").contains("exposure: [XC3]");
        Path file = dir.resolve("cap.yaml");
        Files.writeString(file, text.replace("concrete: C32/40", "concrete: C25/30")
                .replace("exposure: [XC3]", "exposure: " + exposure));
        var s = new SubmissionReader(ElementKinds.binders()).read(file);
        return new ProjectReviewer(new Review.ToolInfo("countercheck", "test"))
                .review(s, CapReviews.ruleset("en1992-uk-na"), "2026-01-01").elements().get(0);
    }

    @Test
    void aBlankCellOfAListedClassIsNotPassedOver(@TempDir Path dir) throws Exception {
        var cover = CapReviews.check(review(dir, "[XC2, XD1]"), "cover");
        assertThat(cover.status()).isEqualTo(CheckStatus.NOT_CHECKED);
        assertThat(cover.reason()).hasValueSatisfying(r -> assertThat(r).contains("bs8500_cover").contains("XD1"));
    }

    @Test
    void aClassTheTableDoesNotListAddsNothing(@TempDir Path dir) throws Exception {
        // XC2 at C25/30: cmin,dur 25 mm, cnom = max(φ 20, 25, 10) + 10 = 35 mm (formed faces; hand calculation)
        assertThat(CapReviews.value(review(dir, "[XC2, XF1]"), "cover", "required")).isEqualTo(35.0);
    }
}
