package dev.countercheck.report;

import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.ClaimVerdict;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/** The HTML report of the invented {@link ReviewFixture}. */
class HtmlReportWriterTest {

    private static final String CAUTION = "This review assists a competent engineer and does not replace one. "
            + "Local codes, the applicable National Annex and licensed engineering practice govern.";

    private final Review review = ReviewFixture.review();
    private final String html = new HtmlReportWriter().write(review);

    @Test
    void showsEveryFindingIdAndEveryCheckId() {
        for (ElementReview element : review.elements()) {
            assertThat(html).contains(element.id());
            for (Finding finding : element.findings()) {
                // Once in the register, once in the element's own findings table.
                assertThat(count(html, "<code>" + finding.id() + "</code>")).as(finding.id()).isEqualTo(2);
            }
            for (CheckResult check : element.checks()) {
                assertThat(html).contains("<code>" + check.id() + "</code>");
            }
        }
    }

    @Test
    void alwaysShowsTheCautionFollowedByTheAssumptions() {
        assertThat(html).contains(CAUTION);
        int caution = html.indexOf(CAUTION);
        for (String assumption : review.assumptions()) {
            assertThat(html.indexOf("<li>" + assumption + "</li>")).as(assumption).isGreaterThan(caution);
        }
    }

    @Test
    void headerNamesSubmissionRulesetToolAndDate() {
        assertThat(html).contains(review.submission().file(), review.submission().sha256(), review.ruleset().id(),
                review.ruleset().title(), review.ruleset().sha256(), review.tool().version(), review.reviewDate(),
                "HL-STR-014");
        assertThat(html).as("the fixture has no revision, so no empty revision line")
                .doesNotContain("<dt>Revision</dt>");
    }

    @Test
    void escapesTheProjectTitle() {
        String hostile = new HtmlReportWriter().write(ReviewFixture.review("<script>alert(1)</script>"));
        assertThat(hostile).doesNotContain("<script");
        assertThat(hostile).contains("<h1>&lt;script&gt;alert(1)&lt;/script&gt;</h1>");
        assertThat(hostile).contains("<title>Design review: &lt;script&gt;alert(1)&lt;/script&gt;</title>");
    }

    @Test
    void isSelfContained() {
        assertThat(html).doesNotContain("http://", "https://", "<script", "<link", " src=", "@import", "url(");
        assertThat(html).contains("<style>", "@media print", "break-before: page");
    }

    @Test
    void hasOneCollapsibleTracePerCheck() {
        List<CheckResult> checks = review.elements().stream().flatMap(e -> e.checks().stream()).toList();
        assertThat(count(html, "<details class=\"trace\"")).isEqualTo(checks.size());
        for (CheckResult check : checks) {
            assertThat(html).contains("<summary>Trace of <code>" + check.id() + "</code>");
        }
        assertThat(html).as("a remark of the fixture's trace").contains("<td>k capped at 2.0</td>");
        assertThat(html).as("the not-applicable check has no trace steps")
                .contains("No calculation was recorded for this check.");
    }

    @Test
    void statusesAreWrittenOutWithAMarkerNotOnlyInColour() {
        assertThat(html).contains("[!!]</span> fail</span>", "[ok]</span> pass</span>",
                "[--]</span> not applicable</span>");
        assertThat(html).contains("###</span> critical</span>", "(X)</span> does not conform</span>");
    }

    @Test
    void showsClaimsBesideTheComputedValueWithUnitAndDifference() {
        // Source: hand calculation of the display rounding (fixture values are invented demo data):
        // difference 0.070974 → 0.0710 (4 decimals) → +7.1 %; value 1867.459 → 1867 (4 significant figures).
        assertThat(html).contains("<td class=\"num\">1867 mm2</td>");
        assertThat(html).contains("claimed 2000 mm2, difference +7.1 %");
        assertThat(html).contains("differs, UNCONSERVATIVE");
    }

    @Test
    void showsAClaimEvenWhenItsQuantityIsMissingFromTheValues() {
        // results.md says values carry every computed quantity; should a reviewer break that, the claim
        // must still reach the reader rather than vanish. Invented demo numbers.
        ElementReview first = review.elements().get(0);
        CheckResult tie = first.checks().get(0);
        CheckResult stray = new CheckResult(tie.id(), tie.title(), tie.basis(), tie.status(), tie.utilisation(),
                tie.reason(), Map.of(), List.of(new ClaimComparison("lever_arm", 640.0, 655.5, -0.023646,
                ClaimVerdict.DIFFERS_CONSERVATIVE)), tie.trace());
        ElementReview changed = new ElementReview(first.id(), first.type(), first.description(), first.verdict(),
                List.of(stray), first.findings(), first.cautions(), first.drawing());
        Review variant = new Review(review.tool(), review.submission(), review.ruleset(), review.reviewDate(),
                review.verdict(), List.of(changed), review.summary(), review.assumptions());

        String page = new HtmlReportWriter().write(variant);

        // Source: hand calculation of the display rounding: 655.5 has 4 significant figures already;
        // -0.023646 → -0.0236 (4 decimals) → -2.36 %.
        assertThat(page).contains("<code>lever_arm</code>", "<td class=\"num\">655.5</td>",
                "claimed 640, difference -2.36 %");
    }

    @Test
    void findingsRegisterHasAnEmptyResponseCellPerFinding() {
        long findings = review.elements().stream().mapToLong(e -> e.findings().size()).sum();
        assertThat(html).contains("<th>Designer's response</th>");
        assertThat(count(html, "<td class=\"response\"></td>")).isEqualTo((int) findings);
    }

    @Test
    void outputDoesNotDependOnTheDefaultLocale() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("de-DE"));
            String german = new HtmlReportWriter().write(review);
            Locale.setDefault(Locale.forLanguageTag("ar-EG"));
            String arabic = new HtmlReportWriter().write(review);
            assertThat(german).isEqualTo(html);
            assertThat(arabic).isEqualTo(html);
        } finally {
            Locale.setDefault(saved);
        }
    }

    private static int count(String text, String part) {
        Matcher matcher = Pattern.compile(Pattern.quote(part)).matcher(text);
        int n = 0;
        while (matcher.find()) {
            n++;
        }
        return n;
    }
}
