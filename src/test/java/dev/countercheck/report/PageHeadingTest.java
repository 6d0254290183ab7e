package dev.countercheck.report;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** The running head goes into the stylesheet as a CSS string that no title can break out of. */
class PageHeadingTest {

    @Test
    void keepsLettersDigitsAndSpacesAndEscapesEverythingElse() {
        // Hand-written expectation: " is U+0022, ; U+003B, } U+007D, < U+003C, / U+002F, · U+00B7.
        assertThat(PageHeading.quote("Unit 3 \"; } </style> ·"))
                .isEqualTo("\"Unit 3 \\22 \\3b  \\7d  \\3c \\2f style\\3e  \\b7 \"");
    }

    @Test
    void namesProjectReferenceAndRevision() {
        // Fixture: title, reference HL-STR-014, no revision.
        String css = PageHeading.css(ReviewFixture.review());
        assertThat(css).startsWith("\"Harbour Lane cold store ").contains("HL\\2d STR\\2d 014").doesNotContain("rev");
    }

    @Test
    void fallsBackToTheFileWithoutATitle() {
        var fixture = ReviewFixture.review();
        var s = fixture.submission();
        var untitled = new dev.countercheck.review.Review(fixture.tool(),
                new dev.countercheck.review.Review.SubmissionInfo(s.file(), s.sha256(), java.util.Optional.empty(),
                        java.util.Optional.empty(), java.util.Optional.of("P01"), s.preparedBy(), s.date()),
                fixture.ruleset(), fixture.reviewDate(), fixture.verdict(), fixture.elements(), fixture.summary(),
                fixture.assumptions());
        assertThat(PageHeading.css(untitled)).startsWith("\"sample\\2d submissions\\2f harbour\\2d lane\\2e yaml")
                .endsWith("rev\\2e  P01\"");
    }
}
