package dev.countercheck.report;

import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.text.PDFTextStripper;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every sample submission reviewed and reported twice, from the file each time: HTML and JSON must
 * come out byte-identical, and the PDF (laid out once per sample: its layout is most of this test's
 * time, and {@link PdfReportWriterTest} shows that a rerun gives the same bytes) must hold what the
 * HTML holds, in embedded fonts, with the JSON attached.
 */
class SampleReportsTest {

    /** The outputs of one run over one sample. */
    private record Run(Review review, String html, String json, byte[] pdf) {
        static Run of(Path sample, boolean withPdf) {
            Review review = SampleReviews.review(sample);
            String json = new JsonResultWriter().write(review);
            return new Run(review, new HtmlReportWriter().write(review), json,
                    withPdf ? new PdfReportWriter().write(review, ReviewRound.none(""),
                            PdfReportWriter.jsonName(review), json) : null);
        }
    }

    private static final Map<Path, Run> FIRST = new LinkedHashMap<>();
    private static final Map<Path, Run> SECOND = new LinkedHashMap<>();

    @BeforeAll
    static void reviewEverySampleTwice() {
        for (Path sample : SampleReviews.samples()) {
            FIRST.put(sample, Run.of(sample, true));
            SECOND.put(sample, Run.of(sample, false));
        }
    }

    @Test
    void rerunsGiveByteIdenticalHtmlAndJson() {
        for (Path sample : FIRST.keySet()) {
            Run a = FIRST.get(sample);
            Run b = SECOND.get(sample);
            assertThat(b.html()).as(sample + " html").isEqualTo(a.html());
            assertThat(b.json()).as(sample + " json").isEqualTo(a.json());
        }
    }

    @Test
    void everyElementHasItsSectionAndEveryReviewedCapItsTwoDrawings() {
        for (Run run : FIRST.values()) {
            Document page = Jsoup.parse(run.html());
            for (ElementReview e : run.review().elements()) {
                Element section = page.selectFirst("section.element[aria-label=" + e.id() + "]");
                assertThat(section).as(e.id()).isNotNull();
                assertThat(section.select("svg.drawing")).as(e.id() + " plan and section")
                        .hasSize(e.drawing().isPresent() ? 2 : 0);
            }
            assertThat(page.select("#register tbody tr")).hasSize(findings(run.review()).size());
        }
    }

    @Test
    void pdfHoldsEveryFindingIdOnA4PagesInEmbeddedFontsWithTheJsonAttached() throws IOException {
        for (Map.Entry<Path, Run> entry : FIRST.entrySet()) {
            Run run = entry.getValue();
            try (PDDocument pdf = Loader.loadPDF(run.pdf())) {
                // Cover, register, one page at least per element, assumptions.
                assertThat(pdf.getNumberOfPages()).as(entry.getKey() + " pages")
                        .isGreaterThanOrEqualTo(3 + run.review().elements().size());
                for (PDPage page : pdf.getPages()) {
                    // A4 is 210 × 297 mm = 595.3 × 841.9 pt (ISO 216; 1 pt = 25.4/72 mm).
                    assertThat(page.getMediaBox().getWidth()).isBetween(595f, 596f);
                    assertThat(page.getMediaBox().getHeight()).isBetween(841f, 843f);
                    for (var name : page.getResources().getFontNames()) {
                        PDFont font = page.getResources().getFont(name);
                        assertThat(font.isEmbedded()).as(font.getName() + " is embedded").isTrue();
                    }
                }
                // Ids wrap inside narrow table cells, so the comparison ignores line breaks and spaces;
                // ids themselves hold neither.
                String text = new PDFTextStripper().getText(pdf).replaceAll("\\s+", "");
                for (Finding finding : findings(run.review())) {
                    assertThat(text).as("finding id in the PDF text").contains(finding.id());
                }
                assertThat(text).contains(run.review().submission().sha256());
                assertThat(pdf.getDocumentInformation().getCreationDate().toInstant().toString())
                        .isEqualTo(SampleReviews.DATE + "T00:00:00Z");
                var attached = pdf.getDocumentCatalog().getNames().getEmbeddedFiles().getNames()
                        .get(PdfReportWriter.jsonName(run.review()));
                assertThat(attached).as(entry.getKey() + ": the JSON result attached").isNotNull();
                assertThat(new String(attached.getEmbeddedFile().toByteArray(), StandardCharsets.UTF_8))
                        .isEqualTo(run.json());
            }
        }
    }

    private static List<Finding> findings(Review review) {
        List<Finding> all = new ArrayList<>();
        review.elements().forEach(e -> all.addAll(e.findings()));
        return all;
    }
}
