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
 * HTML page, with the JSON result attached (which is then made as text once, for both files); for a
 * report of one page, that very HTML text is also the HTML file. Part pages of an earlier, larger
 * report of the same name that this one does not write are removed once the new reports are in place.
 */
public final class ReviewReports {

    private ReviewReports() {
    }

    /**
     * Readies now what every report needs and no review changes: the HTML template compiled and the glossary of
     * symbols read, some of a short review's start-up. Safe from any thread, once or more, while another renders
     * (a thread that needs either while another readies it waits for that one); a caller may run it on a second
     * core while the review runs.
     */
    public static void prepare() {
        HtmlReportWriter.prepare();
        Glossary.bundled();
    }

    /**
     * Adds the reports of {@code review} in {@code round} to {@code set}.
     *
     * @param pdf the PDF's file name, when a PDF is wanted
     * @return the names of the HTML files beyond {@code html} (the parts of a large project's report)
     */
    public static List<String> addTo(OutputSet set, Review review, ReviewRound round, String json, String html,
                                     Optional<String> pdf) {
        List<HtmlReportWriter.Page> pages = new HtmlReportWriter().pages(review, round, html);
        set.retire(Paging.partFiles(html));
        if (pdf.isEmpty()) {
            set.addText(json, out -> new JsonResultWriter().write(review, round, out));
            pages.forEach(p -> set.addText(p.fileName(), p.content()));
        } else {
            String result = new JsonResultWriter().write(review, round);
            set.add(json, result);
            String page = new HtmlReportWriter().write(review, round);
            if (pages.size() == 1) {
                set.add(html, page);
            } else {
                pages.forEach(p -> set.addText(p.fileName(), p.content()));
            }
            set.add(pdf.get(), out -> new PdfReportWriter().render(page, review, json, result, out));
        }
        return pages.stream().skip(1).map(HtmlReportWriter.Page::fileName).toList();
    }
}
