package dev.countercheck.report;

import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;

import java.util.Optional;

/**
 * The reports of one reviewed submission, joined to its {@link OutputSet}: the JSON result and the
 * HTML page, each written straight into its temporary file when the set is committed (the JSON
 * element by element, the HTML as the template runs), and, when asked for, the PDF. With a PDF, the
 * HTML text is rendered once and both the HTML file and the PDF are made from it, so that the two
 * show the very same page.
 */
public final class ReviewReports {

    private ReviewReports() {
    }

    /**
     * Adds the reports of {@code review} in {@code round} to {@code set}.
     *
     * @param pdf the PDF's file name, when a PDF is wanted
     */
    public static void addTo(OutputSet set, Review review, ReviewRound round, String json, String html,
                             Optional<String> pdf) {
        set.addText(json, out -> new JsonResultWriter().write(review, out));
        if (pdf.isEmpty()) {
            set.addText(html, out -> new HtmlReportWriter().write(review, round, out));
            return;
        }
        String page = new HtmlReportWriter().write(review, round);
        set.add(html, page);
        set.add(pdf.get(), out -> new PdfReportWriter().render(page, review, out));
    }
}
