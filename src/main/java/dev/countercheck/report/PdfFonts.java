package dev.countercheck.report;

import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FSFontUseCase;
import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FontStyle;
import com.openhtmltopdf.pdfboxout.PdfRendererBuilder;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * The fonts of the PDF, shipped in the jar under {@code fonts/} with their licence
 * ({@code fonts/LICENSE-DejaVu.txt}): DejaVu Sans Condensed for the text and the drawings, in its
 * regular and bold faces, and DejaVu Sans Mono for ids, symbols and expressions. Every glyph the
 * PDF shows comes from one of them, embedded as a subset; the PDF base-14 fonts are never used (the
 * renderer offers them only outside PDF/A, and the text font is the last resort for any character).
 *
 * <p>The renderer's SVG module reads fonts from files only: {@link #open()} writes a private copy of
 * each to the temporary folder for one rendering, and {@link #close()} removes them.
 */
final class PdfFonts implements AutoCloseable {

    /** The text font's family, as the print stylesheet and the drawings name it. */
    static final String TEXT = "DejaVu Sans Condensed";
    /** The monospaced font's family, as the print stylesheet names it. */
    static final String MONO = "DejaVu Sans Mono";

    /** One shipped font file and the family, weight and uses it is registered with. */
    record Face(String resource, String family, int weight, Set<FSFontUseCase> uses) {
    }

    /**
     * The regular text face is registered twice: the renderer files a font under one group only (a
     * font given as the final fallback is not among the document's fonts of its family).
     */
    static final List<Face> FACES = List.of(
            new Face("/fonts/DejaVuSansCondensed.ttf", TEXT, 400, EnumSet.of(FSFontUseCase.DOCUMENT, FSFontUseCase.SVG)),
            new Face("/fonts/DejaVuSansCondensed.ttf", TEXT, 400, EnumSet.of(FSFontUseCase.FALLBACK_FINAL)),
            new Face("/fonts/DejaVuSansCondensed-Bold.ttf", TEXT, 700,
                    EnumSet.of(FSFontUseCase.DOCUMENT, FSFontUseCase.SVG)),
            new Face("/fonts/DejaVuSansMono.ttf", MONO, 400, EnumSet.of(FSFontUseCase.DOCUMENT)));

    private final List<Path> files = new ArrayList<>();

    private PdfFonts() {
    }

    /** Copies every face to a temporary file, ready to be registered. */
    static PdfFonts open() {
        PdfFonts fonts = new PdfFonts();
        try {
            for (Face face : FACES) {
                Path file = Files.createTempFile("countercheck-font-", ".ttf");
                fonts.files.add(file);
                try (InputStream in = stream(face.resource())) {
                    Files.write(file, in.readAllBytes());
                }
            }
        } catch (IOException e) {
            fonts.close();
            // the machine's temporary folder is full or unusable: a condition to report, not a fault of the tool
            throw new UncheckedIOException("the temporary folder cannot be used for the PDF's fonts", e);
        }
        return fonts;
    }

    /**
     * Registers every face with the builder, each also as the italic of its weight (the fonts ship no
     * italic: italic text is set upright rather than in a font the PDF would not embed).
     */
    void register(PdfRendererBuilder builder) {
        for (int i = 0; i < FACES.size(); i++) {
            Face face = FACES.get(i);
            for (FontStyle style : new FontStyle[] {FontStyle.NORMAL}) {
                builder.useFont(files.get(i).toFile(), face.family(), face.weight(), style, true, face.uses());
            }
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
        for (Path file : files) {
            try {
                Files.deleteIfExists(file);
            } catch (IOException e) {
                throw new UncheckedIOException("could not remove the temporary font copy " + file, e);
            }
        }
    }
}
