package dev.countercheck.report;

import com.openhtmltopdf.extend.FontContext;
import com.openhtmltopdf.pdfboxout.PdfBoxFSFont;
import com.openhtmltopdf.pdfboxout.PdfBoxFontResolver.FontDescription;
import com.openhtmltopdf.pdfboxout.PdfBoxTextRenderer;
import com.openhtmltopdf.render.FSFont;

import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * The renderer's text measure, each width remembered for the document: the renderer measures a word
 * each time it sets a line and each time it sizes a table column, and a report repeats the same words,
 * numbers and symbols thousands of times; PDFBox measures a string by encoding it glyph by glyph. A
 * width depends only on the font's faces, its size and the text, so the remembered width is the one
 * measured the first time, and the layout is the same.
 */
final class PdfTextWidths extends PdfBoxTextRenderer {

    /** The faces (in their order of use) and the size of a font. */
    private record Font(List<FontDescription> faces, float size) {
    }

    /** The widths by font object, each the map of the font's faces and size (the renderer makes many equal font objects). */
    private final Map<FSFont, Map<String, Integer>> byObject = new IdentityHashMap<>();
    private final Map<Font, Map<String, Integer>> byFont = new HashMap<>();

    @Override
    public int getWidth(FontContext context, FSFont font, String text) {
        Map<String, Integer> widths = byObject.computeIfAbsent(font, this::widths);
        Integer width = widths.get(text);
        if (width == null) {
            width = super.getWidth(context, font, text);
            widths.put(text, width);
        }
        return width;
    }

    private Map<String, Integer> widths(FSFont font) {
        if (!(font instanceof PdfBoxFSFont pdfFont)) {
            return new HashMap<>();
        }
        return byFont.computeIfAbsent(new Font(pdfFont.getFontDescriptions(), pdfFont.getSize2D()), f -> new HashMap<>());
    }
}
