package dev.countercheck.report;

import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.interactive.action.PDActionURI;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotation;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotationLink;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.graphics.PDXObject;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.xmpbox.XMPMetadata;
import org.apache.xmpbox.xml.DomXmpParser;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

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

    @Test
    void drawsEachDistinctDrawingOnceAndPlacesEveryRepeatAsTheSameForm() throws IOException {
        // the fixture's page with its first drawing drawn twice over, side by side
        String page = new HtmlReportWriter().write(review);
        java.util.regex.Matcher svg = java.util.regex.Pattern.compile("(?s)<svg.*?</svg>").matcher(page);
        assertThat(svg.find()).isTrue();
        page = page.substring(0, svg.end()) + svg.group() + svg.group() + page.substring(svg.end());
        List<String> drawings = new ArrayList<>();
        for (svg.reset(page); svg.find(); ) {
            drawings.add(svg.group());
        }
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        new PdfReportWriter().render(page, review, "fixture.json", new JsonResultWriter().write(review), out);

        List<org.apache.pdfbox.cos.COSObjectKey> placed = new ArrayList<>();
        try (PDDocument document = Loader.loadPDF(out.toByteArray())) {
            for (PDPage p : document.getPages()) {
                org.apache.pdfbox.cos.COSDictionary forms = p.getResources().getCOSObject().getCOSDictionary(COSName.XOBJECT);
                if (forms != null) {
                    forms.keySet().forEach(name -> placed.add(((org.apache.pdfbox.cos.COSObject) forms.getItem(name)).getKey()));
                }
            }
        }
        assertThat(placed).as("every drawing placed").hasSameSizeAs(drawings);
        assertThat(Set.copyOf(placed)).as("one form per distinct drawing").hasSize(Set.copyOf(drawings).size())
                .hasSizeLessThan(drawings.size());
    }

    @Test
    void embedsEveryFontItUsesAndOnlyTheShippedOnes() throws IOException {
        Set<String> fonts = new TreeSet<>();
        try (PDDocument document = Loader.loadPDF(pdf)) {
            for (PDPage page : document.getPages()) {
                collectFonts(page.getResources(), fonts, 0);
            }
        }
        assertThat(fonts).as("fonts on the pages, in drawings and margin boxes").isNotEmpty();
        for (String font : fonts) {
            assertThat(font).as("embedded subset of a shipped font (tag + name)")
                    .matches("[A-Z]{6}\\+DejaVuSans(Condensed|Condensed-Bold|Mono) embedded");
        }
        assertThat(fonts).as("ids are set in the monospaced font").anyMatch(f -> f.contains("DejaVuSansMono"));
        assertThat(fonts).as("headings in the bold face").anyMatch(f -> f.contains("Condensed-Bold"));
        assertThat(fonts).as("body text in the regular face").anyMatch(f -> f.endsWith("+DejaVuSansCondensed embedded"));
    }

    /** Every font of {@code resources} and of the forms it holds (drawings), as "name embedded|NOT embedded". */
    private static void collectFonts(PDResources resources, Set<String> fonts, int depth) throws IOException {
        if (resources == null || depth > 8) {
            return;
        }
        for (COSName name : resources.getFontNames()) {
            PDFont font = resources.getFont(name);
            boolean embedded = font instanceof PDType0Font type0 ? type0.getDescendantFont().isEmbedded()
                    : font.isEmbedded();
            fonts.add(font.getName() + (embedded ? " embedded" : " NOT embedded"));
        }
        for (COSName name : resources.getXObjectNames()) {
            PDXObject object = resources.getXObject(name);
            if (object instanceof PDFormXObject form) {
                collectFonts(form.getResources(), fonts, depth + 1);
            }
        }
    }

    @Test
    void carriesTheJsonResultAsAnAssociatedFileEqualToTheJson() throws IOException {
        String json = new JsonResultWriter().write(review);
        try (PDDocument document = Loader.loadPDF(pdf)) {
            var catalog = document.getDocumentCatalog();
            var files = catalog.getNames().getEmbeddedFiles().getNames();
            assertThat(files).containsOnlyKeys("harbour-lane.json");
            PDComplexFileSpecification spec = files.get("harbour-lane.json");
            assertThat(spec.getFileUnicode()).isEqualTo("harbour-lane.json");
            assertThat(spec.getCOSObject().getNameAsString(COSName.getPDFName("AFRelationship"))).isEqualTo("Data");
            assertThat(spec.getEmbeddedFile().getSubtype()).isEqualTo("application/json");
            assertThat(new String(spec.getEmbeddedFile().toByteArray(), StandardCharsets.UTF_8)).isEqualTo(json);
            assertThat(spec.getEmbeddedFile().getModDate().toInstant().toString())
                    .isEqualTo(review.reviewDate() + "T00:00:00Z");
            COSArray associated = catalog.getCOSObject().getCOSArray(COSName.getPDFName("AF"));
            assertThat(associated).as("PDF/A-3: the catalogue names the attachment an associated file").isNotNull();
            assertThat(associated.getObject(0)).isSameAs(spec.getCOSObject());
        }
    }

    @Test
    void declaresPdfA3uWithAnSrgbOutputIntentAndMetadataThatRepeatsTheDocumentInformation() throws Exception {
        try (PDDocument document = Loader.loadPDF(pdf)) {
            var catalog = document.getDocumentCatalog();
            assertThat(catalog.getOutputIntents()).hasSize(1);
            assertThat(catalog.getOutputIntents().get(0).getOutputConditionIdentifier()).isEqualTo("sRGB IEC61966-2.1");
            XMPMetadata xmp;
            try (InputStream in = catalog.getMetadata().exportXMPMetadata()) {
                xmp = new DomXmpParser().parse(in.readAllBytes());
            }
            assertThat(xmp.getPDFAIdentificationSchema().getPart()).isEqualTo(3);
            assertThat(xmp.getPDFAIdentificationSchema().getConformance()).isEqualTo("U");
            var info = document.getDocumentInformation();
            assertThat(xmp.getDublinCoreSchema().getTitle()).isEqualTo(info.getTitle());
            assertThat(xmp.getAdobePDFSchema().getProducer()).isEqualTo(info.getProducer());
            assertThat(xmp.getXMPBasicSchema().getCreateDate().toInstant()).isEqualTo(info.getCreationDate().toInstant());
            assertThat(xmp.getXMPBasicSchema().getModifyDate().toInstant())
                    .as("the review date, never the clock").isEqualTo(info.getModificationDate().toInstant());
        }
    }

    @Test
    void theShippedFontsAndTheirLicenceAreInTheJar() throws IOException {
        for (PdfFonts.Face face : PdfFonts.FACES) {
            try (InputStream in = PdfFonts.stream(face.resource())) {
                assertThat(in.readNBytes(4)).as(face.resource() + " is a TrueType file")
                        .containsExactly(0, 1, 0, 0);
            }
        }
        try (InputStream licence = PdfReportWriterTest.class.getResourceAsStream("/fonts/LICENSE-DejaVu.txt")) {
            assertThat(new String(licence.readAllBytes(), StandardCharsets.UTF_8)).contains("Bitstream Vera",
                    "Permission is hereby granted");
        }
        // Each library has its own META-INF/NOTICE on the class path (the shaded jar joins them): ours among them.
        List<String> notices = new ArrayList<>();
        for (var url : java.util.Collections.list(getClass().getClassLoader().getResources("META-INF/NOTICE"))) {
            try (InputStream in = url.openStream()) {
                notices.add(new String(in.readAllBytes(), StandardCharsets.UTF_8));
            }
        }
        assertThat(notices).anyMatch(n -> n.contains("DejaVu fonts") && n.contains("fonts/LICENSE-DejaVu.txt"));
    }
}
