package dev.countercheck.report;

import dev.countercheck.review.Review;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/** The index of a batch: one row per submission, links beside it, totals, and what was not reviewed. */
class ReportIndexTest {

    private final Review review = ReviewFixture.review();

    private Document index() {
        ReportIndex index = new ReportIndex(review.tool(), "2026-03-14");
        index.reviewed(review, Path.of("reports/harbour-lane.json"), Path.of("reports/harbour-lane.html"),
                Optional.of(Path.of("reports/harbour-lane.pdf")));
        index.notReviewed("sample-submissions/broken <b>file</b>.yaml", "input errors");
        index.reviewed(review, Path.of("reports/second copy#2.json"), Path.of("reports/second copy#2.html"),
                Optional.empty());
        return Jsoup.parse(index.html());
    }

    @Test
    void listsEverySubmissionInOrderWithItsVerdictAndFindings() {
        List<Element> rows = index().select("table.index-table tbody tr");
        assertThat(rows).hasSize(3);
        // The fixture: does not conform, 2 elements, findings critical 1, major 1, minor 2, note 1.
        assertThat(rows.get(0).select("td").eachText()).containsExactly("1", review.submission().file(),
                ReviewFixture.TITLE + " HL-STR-014", "DOES NOT CONFORM", "2", "1", "1", "2", "1",
                "report · PDF · JSON");
        assertThat(rows.get(1).text()).contains("NOT REVIEWED", "input errors");
        assertThat(rows.get(2).select("a").eachText()).as("no PDF was written for the third").containsExactly(
                "report", "JSON");
    }

    @Test
    void linksToTheReportsBesideTheIndex() {
        List<String> links = index().select("a[href]").eachAttr("href");
        assertThat(links).containsExactly("./harbour-lane.html", "./harbour-lane.pdf", "./harbour-lane.json",
                "./second%20copy%232.html", "./second%20copy%232.json");
    }

    @Test
    void addsUpTheReviewedSubmissionsOnly() {
        Document page = index();
        assertThat(page.select("table.tally[aria-label=Submissions by verdict] tr").eachText())
                .containsExactly("CONFORMS 0", "CONFORMS WITH REMARKS 0", "DOES NOT CONFORM 2", "INCOMPLETE 0");
        // Two copies of the fixture: critical 2, major 2, minor 4, note 2.
        assertThat(page.select("table.tally[aria-label^=Findings] tr").eachText())
                .containsExactly("CRITICAL 2", "MAJOR 2", "MINOR 4", "NOTE 2");
        assertThat(page.select("header p").text()).contains("2 reviewed, 1 not reviewed");
    }

    @Test
    void escapesFileNamesAndLoadsNothing() {
        Document page = index();
        assertThat(page.select("b")).isEmpty();
        assertThat(page.select("code").eachText()).contains("sample-submissions/broken <b>file</b>.yaml");
        assertThat(page.select("script, link, img, [src]")).isEmpty();
    }
}
