package dev.countercheck.report;

import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;

import java.util.List;
import java.util.Optional;

/**
 * The reports of one reviewed submission, joined to its {@link OutputSet}: the JSON result and the
 * HTML report, each written straight into its temporary file when the set is committed (the JSON
 * element by element, the HTML as the template runs; a large project's HTML on several pages, see
 * {@link Paging}), and, when asked for, the PDF. The PDF is laid out once from the report as one
 * HTML page; for a report of one page, that very text is also the HTML file.
 */
public final class ReviewReports {

    private ReviewReports() {
    }

    /**
     * Adds the reports of {@code review} in {@code round} to {@code set}.
     *
     * @param pdf the PDF's file name, when a PDF is wanted
     * @return the names of the HTML files beyond {@code html} (the parts of a large project's report)
     */
    public static List<String> addTo(OutputSet set, Review review, ReviewRound round, String json, String html,
                                     Optional<String> pdf) {
        set.addText(json, out -> new JsonResultWriter().write(review, out));
        List<HtmlReportWriter.Page> pages = new HtmlReportWriter().pages(review, round, html);
        if (pdf.isPresent() && pages.size() == 1) {
            String page = new HtmlReportWriter().write(review, round);
            set.add(html, page);
            set.add(pdf.get(), out -> new PdfReportWriter().render(page, review, out));
            return List.of();
        }
        pages.forEach(p -> set.addText(p.fileName(), p.content()));
        pdf.ifPresent(name -> set.add(name,
                out -> new PdfReportWriter().render(new HtmlReportWriter().write(review, round), review, out)));
        return pages.stream().skip(1).map(HtmlReportWriter.Page::fileName).toList();
    }
}
