package dev.countercheck.report;

import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FSFontUseCase;
import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FontStyle;
import com.openhtmltopdf.outputdevice.helper.ExternalResourceControlPriority;
import com.openhtmltopdf.pdfboxout.PdfBoxRenderer;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer.SvgExternalResourceMode;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer.SvgScriptMode;
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
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Arrays;
import java.util.Calendar;
import java.util.EnumSet;
import java.util.Set;
import java.util.GregorianCalendar;
import java.util.TimeZone;
import java.util.logging.Level;
import java.util.logging.Logger;

/**
 * The report as a PDF: the HTML page of {@link HtmlReportWriter}, laid out on A4 by its print
 * stylesheet with openhtmltopdf (on PDFBox), the drawings drawn by its SVG module (Batik).
 *
 * <p>Same content: the PDF is made from the very HTML text the report writes, with an outline
 * (bookmarks) of its parts added. Its one font is
 * Liberation Sans, which PDFBox ships in its jar, embedded as a subset; it covers the Greek letters
 * and mathematical signs of the calculation traces, which the PDF base-14 fonts do not. Bold text
 * is set in the same regular face.
 *
 * <p>Deterministic: the document information (creation and modification dates from the review
 * date, producer from the tool) and the file identifier (from a hash of the HTML) are set here,
 * never taken from the clock, so the same review gives the same bytes. Nothing is loaded from
 * outside: every external resource is refused, and scripts in SVG are never run.
 */
public final class PdfReportWriter {

    /** The font PDFBox ships inside its jar. */
    static final String FONT_RESOURCE = "/org/apache/pdfbox/resources/ttf/LiberationSans-Regular.ttf";
    static final String FONT_FAMILY = "Liberation Sans";

    /** The font sets the HTML text and the SVG text, and is the last resort for any character. */
    private static final Set<FSFontUseCase> USES = EnumSet.of(FSFontUseCase.DOCUMENT, FSFontUseCase.SVG,
            FSFontUseCase.FALLBACK_FINAL);

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

    /** The PDF bytes of the report of {@code review}. */
    public byte[] write(Review review) {
        return write(review, ReviewRound.none(""));
    }

    /** The PDF bytes of the report of {@code review} in its round. */
    public byte[] write(Review review, ReviewRound round) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            render(html.write(review, round), review, out);
        } catch (IOException e) {
            throw new IllegalStateException("a ByteArrayOutputStream does not fail", e);
        }
        return out.toByteArray();
    }

    /**
     * Lays out {@code page}, the HTML text of {@code review}'s report, once and writes the PDF into
     * {@code out}. The pages' content is kept in a scratch file while the document is built, not in
     * memory.
     *
     * @throws IOException when {@code out} cannot be written
     */
    void render(String page, Review review, OutputStream out) throws IOException {
        Document html = Jsoup.parse(page);
        addBookmarks(html);
        org.w3c.dom.Document dom = new W3CDom().fromJsoup(html);
        Path font;
        try {
            font = fontFile();
        } catch (IOException e) {
            // the machine's temporary folder is full or unusable: a condition to report, not a fault of the tool
            throw new UncheckedIOException("the temporary folder cannot be used for the PDF's font", e);
        }
        try (PDDocument document = new PDDocument(IOUtils.createTempFileOnlyStreamCache())) {
            PdfRendererBuilder builder = new PdfRendererBuilder()
                    .withW3cDocument(dom, null)
                    .usePDDocument(document)
                    .useSVGDrawer(new BatikSVGDrawer(SvgScriptMode.SECURE, SvgExternalResourceMode.SECURE))
                    .useExternalResourceAccessControl((uri, type) -> false,
                            ExternalResourceControlPriority.RUN_BEFORE_RESOLVING_URI)
                    .useExternalResourceAccessControl((uri, type) -> false,
                            ExternalResourceControlPriority.RUN_AFTER_RESOLVING_URI)
                    .withProducer(producer(review));
            for (int weight : new int[] {400, 700}) {
                for (FontStyle style : new FontStyle[] {FontStyle.NORMAL, FontStyle.ITALIC}) {
                    builder.useFont(font.toFile(), FONT_FAMILY, weight, style, true, USES);
                }
            }
            // The renderer's fonts stay open until the document is saved: their subsets are embedded then.
            try (PdfBoxRenderer renderer = builder.buildPdfRenderer()) {
                layOut(renderer);
                describe(document, review, page);
                document.save(out);
            }
        } finally {
            delete(font);
        }
    }

    /** Lays the document out and draws its pages into the renderer's document, once. */
    private static void layOut(PdfBoxRenderer renderer) {
        try {
            renderer.createPDFWithoutClosing();
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

    /** Title, subject, dates and file identifier from the review, so that reruns give the same bytes. */
    private static void describe(PDDocument document, Review review, String page) {
        PDDocumentInformation info = document.getDocumentInformation();
        Review.SubmissionInfo s = review.submission();
        info.setTitle("Design review: " + s.title().orElse(s.file()));
        info.setSubject("Review of " + s.file() + s.reference().map(r -> ", " + r).orElse("")
                + s.revision().map(r -> " rev. " + r).orElse(""));
        info.setCreator(review.tool().name() + " " + review.tool().version());
        info.setProducer(producer(review));
        Calendar date = reviewDate(review.reviewDate());
        info.setCreationDate(date);
        info.setModificationDate(date);
        byte[] id = Arrays.copyOf(sha256(page), 16);
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

    private static InputStream fontStream() {
        InputStream in = PdfReportWriter.class.getResourceAsStream(FONT_RESOURCE);
        if (in == null) {
            throw new IllegalStateException("the PDF font " + FONT_RESOURCE + " is missing from the class path");
        }
        return in;
    }

    /** The renderer's SVG module reads fonts from files only: a private copy of the font for this rendering. */
    private static Path fontFile() throws IOException {
        Path file = Files.createTempFile("countercheck-font-", ".ttf");
        try (InputStream in = fontStream()) {
            Files.write(file, in.readAllBytes());
        }
        return file;
    }

    private static void delete(Path file) {
        if (file == null) {
            return;
        }
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            throw new UncheckedIOException("could not remove the temporary font copy " + file, e);
        }
    }
}
