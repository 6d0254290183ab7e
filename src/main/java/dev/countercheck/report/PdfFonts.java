package dev.countercheck.report;

import com.openhtmltopdf.css.constants.IdentValue;
import com.openhtmltopdf.extend.SVGDrawer;
import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FontStyle;
import com.openhtmltopdf.pdfboxout.PDFontSupplier;
import com.openhtmltopdf.pdfboxout.PdfBoxFontResolver;
import com.openhtmltopdf.pdfboxout.PdfBoxFontResolver.FontGroup;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDType0Font;

import java.awt.FontFormatException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The fonts of the PDF, shipped in the jar under {@code fonts/} with their licence
 * ({@code fonts/LICENSE-DejaVu.txt}): DejaVu Sans Condensed for the text and the drawings, in its
 * regular and bold faces, and DejaVu Sans Mono for ids, symbols and expressions. Every glyph the
 * PDF shows comes from one of them, embedded as a subset; the PDF base-14 fonts are never used (the
 * renderer offers them only outside PDF/A, and the text font is the last resort for any character).
 *
 * <p>Each face is read once per document and handed to the renderer as a PDFBox font, the regular
 * face both for its family and as the final fallback (one font, one embedded subset). Glyphs are
 * set one per character, without the fonts' substitution table (GSUB: the fi and ff ligatures): the
 * renderer measures words without it, and applying it word by word while drawing was a fifth of the
 * PDF's time; the text of the PDF then reads "file", not "ﬁle", wherever it is searched or copied.
 *
 * <p>The renderer's SVG module reads fonts from files only: {@link #open} writes a private copy of
 * the faces the drawings use to the temporary folder for one rendering, and {@link #close()} removes
 * them.
 */
final class PdfFonts implements AutoCloseable {

    /** The text font's family, as the print stylesheet and the drawings name it. */
    static final String TEXT = "DejaVu Sans Condensed";
    /** The monospaced font's family, as the print stylesheet names it. */
    static final String MONO = "DejaVu Sans Mono";

    /** One shipped font file, the family and weight it is registered with, and whether the drawings use it. */
    record Face(String resource, String family, int weight, boolean inDrawings) {
    }

    static final List<Face> FACES = List.of(
            new Face("/fonts/DejaVuSansCondensed.ttf", TEXT, 400, true),
            new Face("/fonts/DejaVuSansCondensed-Bold.ttf", TEXT, 700, true),
            new Face("/fonts/DejaVuSansMono.ttf", MONO, 400, false));

    private final List<TrueTypeFont> parsed = new ArrayList<>();
    private final List<PDType0Font> fonts = new ArrayList<>();
    /** The temporary copies of the drawings' faces, by face (none for the others). */
    private final Path[] copies = new Path[FACES.size()];

    private PdfFonts() {
    }

    /**
     * Reads every face for {@code document} (embedded as subsets when it is saved; keep this open
     * until then) and copies the faces of the drawings to temporary files.
     */
    static PdfFonts open(PDDocument document) {
        PdfFonts opened = new PdfFonts();
        for (int i = 0; i < FACES.size(); i++) {
            byte[] bytes = bytes(FACES.get(i).resource());
            try {
                TrueTypeFont font = new TTFParser().parse(new RandomAccessReadBuffer(bytes));
                opened.parsed.add(font);
                font.setEnableGsub(false);
                opened.fonts.add(PDType0Font.load(document, font, true));
            } catch (IOException e) {
                opened.close();
                throw new IllegalStateException("the shipped font " + FACES.get(i).resource() + " cannot be read", e);
            }
            if (FACES.get(i).inDrawings()) {
                try {
                    opened.copies[i] = Files.createTempFile("countercheck-font-", ".ttf");
                    Files.write(opened.copies[i], bytes);
                } catch (IOException e) {
                    opened.close();
                    // the machine's temporary folder is full or unusable: a condition to report, not a fault of the tool
                    throw new UncheckedIOException("the temporary folder cannot be used for the PDF's fonts", e);
                }
            }
        }
        return opened;
    }

    private static byte[] bytes(String resource) {
        try (InputStream in = stream(resource)) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw new IllegalStateException("the shipped font " + resource + " cannot be read", e);
        }
    }

    /**
     * Registers the faces with the renderer's font resolver (the regular text face also as the final
     * fallback) and the drawings' faces with its SVG module; italic text is set upright in the face
     * of its weight (the fonts ship no italic, and the PDF embeds no other font).
     */
    void register(PdfBoxFontResolver resolver, SVGDrawer drawings) {
        try {
            for (int i = 0; i < FACES.size(); i++) {
                Face face = FACES.get(i);
                PDFontSupplier font = new PDFontSupplier(fonts.get(i));
                resolver.addFont(font, face.family(), face.weight(), IdentValue.NORMAL, true, FontGroup.MAIN);
                if (face.family().equals(TEXT) && face.weight() == 400) {
                    resolver.addFont(font, face.family(), face.weight(), IdentValue.NORMAL, true,
                            FontGroup.FINAL_FALLBACK);
                }
                if (face.inDrawings()) {
                    drawings.addFontFile(copies[i].toFile(), face.family(), face.weight(), FontStyle.NORMAL);
                }
            }
        } catch (IOException | FontFormatException e) {
            throw new IllegalStateException("a shipped font could not be read back: " + e.getMessage(), e);
        }
    }

    static InputStream stream(String resource) {
        InputStream in = PdfFonts.class.getResourceAsStream(resource);
        if (in == null) {
            throw new IllegalStateException("the PDF font " + resource + " is missing from the class path");
        }
        return in;
    }

    @Override
    public void close() {
        for (TrueTypeFont font : parsed) {
            try {
                font.close();
            } catch (IOException e) {
                throw new UncheckedIOException("could not close a font read from memory", e);
            }
        }
        for (Path file : copies) {
            if (file == null) {
                continue;
            }
            try {
                Files.deleteIfExists(file);
            } catch (IOException e) {
                throw new UncheckedIOException("could not remove the temporary font copy " + file, e);
            }
        }
    }
}
