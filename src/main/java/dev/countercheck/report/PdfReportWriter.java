package dev.countercheck.report;

import com.openhtmltopdf.outputdevice.helper.ExternalResourceControlPriority;
import com.openhtmltopdf.pdfboxout.PdfBoxRenderer;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder.PdfAConformance;
import com.openhtmltopdf.simple.extend.XhtmlNamespaceHandler;
import com.openhtmltopdf.util.XRLog;
import dev.countercheck.review.Review;
import dev.countercheck.round.ReviewRound;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.io.IOUtils;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.helper.W3CDom;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Arrays;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.TimeZone;
import java.util.logging.Level;
import java.util.logging.Logger;

/**
 * The report as a PDF: the HTML page of {@link HtmlReportWriter}, laid out on A4 by its print
 * stylesheet with openhtmltopdf (on PDFBox), the drawings drawn by its SVG module (Batik).
 *
 * <p>Same content: the PDF is made from the very HTML text the report writes, with an outline
 * (bookmarks) of its parts added, and the JSON result attached as a file.
 *
 * <p>An archive copy: PDF/A-3U ({@link PdfArchive}), every font one of the open-licence fonts
 * shipped in the jar ({@link PdfFonts}), embedded as a subset; never a base-14 font or a font of
 * the machine.
 *
 * <p>Deterministic: the document information and XMP metadata (creation and modification dates
 * from the review date, producer from the tool), the attachment's dates and the file identifier
 * (from a hash of the HTML) are set here, never taken from the clock, so the same review gives the
 * same bytes. Nothing is loaded from outside: every external resource is refused, and scripts in
 * SVG are never run.
 */
public final class PdfReportWriter {

    /**
     * PDFBox notes on the log each base-14 font it finds no system copy of, and openhtmltopdf notes
     * each font it loads and each CSS property it does not support; the terminal of a review shows
     * none of that. The logger is held here so that its level is not collected with it.
     */
    private static final Logger PDFBOX_FONT_LOG = Logger.getLogger("org.apache.pdfbox.pdmodel.font");

    static {
        PDFBOX_FONT_LOG.setLevel(Level.SEVERE);
        XRLog.setLoggingEnabled(false);
    }

    private final HtmlReportWriter html = new HtmlReportWriter();

    /** The PDF bytes of the report of {@code review}, with its JSON result attached. */
    public byte[] write(Review review) {
        return write(review, ReviewRound.none(""), jsonName(review), new JsonResultWriter().write(review));
    }

    /**
     * The PDF bytes of the report of {@code review} in its round, with {@code json} (the JSON result
     * as written beside it) attached under the name {@code jsonName}.
     */
    public byte[] write(Review review, ReviewRound round, String jsonName, String json) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            render(html.write(review, round), review, jsonName, json, out);
        } catch (IOException e) {
            throw new IllegalStateException("a ByteArrayOutputStream does not fail", e);
        }
        return out.toByteArray();
    }

    /** The name the JSON result has beside a report of the submission: its base name with {@code .json}. */
    static String jsonName(Review review) {
        String file = review.submission().file().replace('\\', '/');
        String base = file.substring(file.lastIndexOf('/') + 1);
        int dot = base.lastIndexOf('.');
        return (dot > 0 ? base.substring(0, dot) : base) + ".json";
    }

    /**
     * Lays out {@code page}, the HTML text of {@code review}'s report, once and writes the PDF into
     * {@code out}, with {@code json} attached as {@code jsonName}. The pages' content is kept in a
     * scratch file while the document is built, not in memory.
     *
     * @throws IOException when {@code out} cannot be written
     */
    void render(String page, Review review, String jsonName, String json, OutputStream out) throws IOException {
        Document html = Jsoup.parse(page);
        addBookmarks(html);
        PdfStyles styles = PdfStyles.of(html);
        styles.cutPageStyles(html);
        XhtmlNamespaceHandler handler = styles.namespaceHandler();
        styles.unwrapPlainSpans(html);
        org.w3c.dom.Document dom = new W3CDom().fromJsoup(html);
        try (PDDocument document = new PDDocument(IOUtils.createTempFileOnlyStreamCache());
             PdfFonts fonts = PdfFonts.open(document)) {
            PdfDrawings drawings = new PdfDrawings();
            PdfRendererBuilder builder = new PdfRendererBuilder()
                    .withW3cDocument(dom, null)
                    .useNamespaceHandler(handler)
                    .usePDDocument(document)
                    .usePdfAConformance(PdfAConformance.PDFA_3_U)
                    .useColorProfile(PdfArchive.srgbProfile())
                    .useSVGDrawer(drawings)
                    .useExternalResourceAccessControl((uri, type) -> false,
                            ExternalResourceControlPriority.RUN_BEFORE_RESOLVING_URI)
                    .useExternalResourceAccessControl((uri, type) -> false,
                            ExternalResourceControlPriority.RUN_AFTER_RESOLVING_URI)
                    .withProducer(producer(review));
            // The fonts stay open until the document is saved: their subsets are embedded then.
            try (PdfBoxRenderer renderer = builder.buildPdfRenderer()) {
                renderer.getSharedContext().setTextRenderer(new PdfTextWidths());
                fonts.register(renderer.getFontResolver(), drawings);
                layOut(renderer, document, review, page, jsonName, json);
                document.save(out);
            }
        }
    }

    /**
     * Lays the document out and draws its pages into the renderer's document, once, then describes it
     * as an archive copy with the JSON result attached.
     */
    private static void layOut(PdfBoxRenderer renderer, PDDocument document, Review review, String page,
                               String jsonName, String json) {
        try {
            renderer.createPDFWithoutClosing();
            Calendar date = reviewDate(review.reviewDate());
            describe(document, review, page + json, date);
            PdfArchive.describe(document);
            PdfArchive.attachJson(document, jsonName, json, date);
        } catch (IOException e) {
            // Everything the renderer reads is in memory or in our jar: failing here is a bug, not bad input.
            throw new IllegalStateException("could not lay out the PDF report: " + e.getMessage(), e);
        }
    }

    /**
     * The PDF's outline, read by the renderer from {@code <bookmarks>} in the head: the register,
     * each element under "Elements", and the assumptions, each named as its heading reads.
     */
    static void addBookmarks(Document html) {
        Element bookmarks = html.head().appendElement("bookmarks");
        for (Element part : html.select("body > header[id], body > section[id]")) {
            Element heading = part.selectFirst("h1, h2");
            Element mark = bookmarks.appendElement("bookmark")
                    .attr("name", heading == null ? part.id() : heading.text()).attr("href", "#" + part.id());
            for (Element element : part.select("> section.element[id]")) {
                mark.appendElement("bookmark").attr("name", element.selectFirst("h3").text())
                        .attr("href", "#" + element.id());
            }
        }
    }

    private static String producer(Review review) {
        return review.tool().name() + " " + review.tool().version() + " (openhtmltopdf, PDFBox)";
    }

    /**
     * Title, subject, dates and file identifier (from a hash of {@code content}, the page and the
     * attachment) from the review, so that reruns give the same bytes.
     */
    private static void describe(PDDocument document, Review review, String content, Calendar date) {
        PDDocumentInformation info = document.getDocumentInformation();
        Review.SubmissionInfo s = review.submission();
        info.setTitle("Design review: " + s.title().orElse(s.file()));
        info.setSubject("Review of " + s.file() + s.reference().map(r -> ", " + r).orElse("")
                + s.revision().map(r -> " rev. " + r).orElse(""));
        info.setCreator(review.tool().name() + " " + review.tool().version());
        info.setProducer(producer(review));
        info.setCreationDate(date);
        info.setModificationDate(date);
        byte[] id = Arrays.copyOf(sha256(content), 16);
        COSArray ids = new COSArray();
        ids.add(new COSString(id));
        ids.add(new COSString(id));
        document.getDocument().getTrailer().setItem(COSName.ID, ids);
    }

    private static Calendar reviewDate(String isoDate) {
        GregorianCalendar calendar = new GregorianCalendar(TimeZone.getTimeZone(ZoneOffset.UTC));
        calendar.clear();
        LocalDate date = LocalDate.parse(isoDate);
        calendar.set(date.getYear(), date.getMonthValue() - 1, date.getDayOfMonth(), 0, 0, 0);
        return calendar;
    }

    private static byte[] sha256(String text) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
