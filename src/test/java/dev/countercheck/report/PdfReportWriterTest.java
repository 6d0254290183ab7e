package dev.countercheck.report;

import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.interactive.action.PDActionURI;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotation;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotationLink;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The PDF of the invented {@link ReviewFixture}, read back with PDFBox. */
class PdfReportWriterTest {

    private static final String HOSTILE = "<script>alert(1)</script> & \"Unit 3\"";

    private static Review review;
    private static byte[] pdf;
    private static String text;

    @BeforeAll
    static void render() throws IOException {
        review = ReviewFixture.review(HOSTILE);
        pdf = new PdfReportWriter().write(review);
        try (PDDocument document = Loader.loadPDF(pdf)) {
            text = new PDFTextStripper().getText(document);
        }
    }

    @Test
    void isAnA4PdfWithACoverARegisterAPagePerElementAndTheAssumptions() throws IOException {
        assertThat(new String(pdf, 0, 5, StandardCharsets.US_ASCII)).isEqualTo("%PDF-");
        try (PDDocument document = Loader.loadPDF(pdf)) {
            // 1 cover + 1 register + 2 elements (each starts a page) + 1 assumptions, at least.
            assertThat(document.getNumberOfPages()).isGreaterThanOrEqualTo(5);
        }
    }

    @Test
    void holdsTheSameContentAsTheHtml() {
        String flat = text.replaceAll("\\s+", "");
        for (Finding finding : review.elements().stream().flatMap(e -> e.findings().stream()).toList()) {
            assertThat(flat).as("ids wrap in narrow cells; compared without line breaks").contains(finding.id());
        }
        assertThat(text).contains("Findings register", "Assumptions and cautions", "Checked by", "Approved by",
                review.submission().sha256(), review.ruleset().sha256());
        assertThat(text).as("the submitted title, as text").contains(HOSTILE);
        assertThat(text).as("the running head of the pages").contains("Page 1 of ");
    }

    @Test
    void printsTheGreekLettersAndSignsOfTheTrace() {
        // The fixture's trace writes "Σ P_i·x_i / z", "T / fyd", "1 + √(200/45)" and "γs".
        String flat = text.replaceAll("\\s+", "");
        assertThat(flat).contains("ΣP_i·x_i/z", "1+√(200/45)", "γs");
        assertThat(text).contains("mm²");
    }

    @Test
    void hasAnOutlineOfItsParts() throws IOException {
        try (PDDocument document = Loader.loadPDF(pdf)) {
            var outline = document.getDocumentCatalog().getDocumentOutline();
            List<String> top = new ArrayList<>();
            outline.children().forEach(item -> top.add(item.getTitle()));
            assertThat(top).containsExactly(HOSTILE, "1 Findings register", "2 Elements", "3 Assumptions and cautions",
                    "4 Calculations");
            List<String> elements = new ArrayList<>();
            outline.children().forEach(item -> {
                if (item.getTitle().equals("2 Elements")) {
                    item.children().forEach(child -> elements.add(child.getTitle()));
                }
            });
            assertThat(elements).containsExactly("2.1 PC-D1 pile-cap", "2.2 PF-A2 pad-footing");
        }
    }

    @Test
    void linksOnlyWithinTheDocument() throws IOException {
        try (PDDocument document = Loader.loadPDF(pdf)) {
            for (PDPage page : document.getPages()) {
                for (PDAnnotation annotation : page.getAnnotations()) {
                    if (annotation instanceof PDAnnotationLink link) {
                        assertThat(link.getAction()).as("no link leaves the document")
                                .isNotInstanceOf(PDActionURI.class);
                    }
                }
            }
        }
        String raw = new String(pdf, StandardCharsets.ISO_8859_1);
        assertThat(raw).doesNotContain("/JavaScript", "/JS ", "/Launch", "/URI");
    }

    @Test
    void isTheSameBytesOnEveryRunAndDatedByTheReview() throws IOException {
        assertThat(new PdfReportWriter().write(review)).isEqualTo(pdf);
        try (PDDocument document = Loader.loadPDF(pdf)) {
            var info = document.getDocumentInformation();
            assertThat(info.getCreationDate().toInstant().toString()).isEqualTo(review.reviewDate() + "T00:00:00Z");
            assertThat(info.getModificationDate()).isEqualTo(info.getCreationDate());
            assertThat(info.getProducer()).isEqualTo("countercheck 0.1.0 (openhtmltopdf, PDFBox)");
            assertThat(info.getTitle()).isEqualTo("Design review: " + HOSTILE);
        }
    }
}
