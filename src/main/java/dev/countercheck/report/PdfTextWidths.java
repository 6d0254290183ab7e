package dev.countercheck.report;

import com.openhtmltopdf.extend.FontContext;
import com.openhtmltopdf.extend.OutputDevice;
import com.openhtmltopdf.extend.TextRenderer;
import com.openhtmltopdf.pdfboxout.PdfBoxFSFont;
import com.openhtmltopdf.pdfboxout.PdfBoxFastOutputDevice;
import com.openhtmltopdf.pdfboxout.PdfBoxFontResolver.FontDescription;
import com.openhtmltopdf.pdfboxout.PdfBoxTextRenderer;
import com.openhtmltopdf.render.FSFont;
import com.openhtmltopdf.render.JustificationInfo;
import org.apache.pdfbox.pdmodel.font.PDFont;

import java.lang.reflect.Field;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The renderer's text measure, each width remembered for the document: the renderer measures a word
 * each time it sets a line and each time it sizes a table column, and a report repeats the same words,
 * numbers and symbols thousands of times; PDFBox measures a string by encoding it glyph by glyph. A
 * width depends only on the font's faces, its size and the text, so the remembered width is the one
 * measured the first time, and the layout is the same.
 *
 * <p>Drawing a text, the renderer's PDF device first measures it once more in the first face of the
 * current font, only to learn whether that face has a glyph for every character (if not, it splits the
 * text into runs of the faces that have them). The answer is remembered per face and text here, and a
 * text the face is known to encode is handed straight to the device's drawing of one face's text, as
 * the device itself does after its test. The device keeps its current font to itself: it is read from
 * its field {@code _font} (openhtmltopdf 1.1.31); where that cannot be read, the device draws as usual.
 */
final class PdfTextWidths extends PdfBoxTextRenderer {

    /** The faces (in their order of use) and the size of a font. */
    private record Font(List<FontDescription> faces, float size) {
    }

    /** The widths by font object, each the map of the font's faces and size (the renderer makes many equal font objects). */
    private final Map<FSFont, Map<String, Integer>> byObject = new IdentityHashMap<>();
    private final Map<Font, Map<String, Integer>> byFont = new HashMap<>();
    /** The texts each face (the first of a font) is known to encode whole. */
    private final Map<PDFont, Set<String>> encoded = new IdentityHashMap<>();

    /** The PDF device's current font, or null where this version of the renderer does not keep it there. */
    private static final Field CURRENT_FONT = currentFontField();

    private static Field currentFontField() {
        try {
            Field field = PdfBoxFastOutputDevice.class.getDeclaredField("_font");
            field.setAccessible(true);
            return field.getType() == PdfBoxFSFont.class ? field : null;
        } catch (NoSuchFieldException | RuntimeException e) {
            return null;
        }
    }

    /** Whether the PDF device's current font can be read, so that texts are drawn without the device's test. */
    static boolean readsTheDevicesFont() {
        return CURRENT_FONT != null;
    }

    @Override
    public void drawString(OutputDevice device, String text, float x, float y) {
        drawString(device, text, x, y, null);
    }

    @Override
    public void drawString(OutputDevice device, String text, float x, float y, JustificationInfo info) {
        PdfBoxFSFont font = currentFont(device);
        if (font == null) {
            super.drawString(device, text, x, y, info);
            return;
        }
        FontDescription face = font.getFontDescriptions().get(0);
        String printable = TextRenderer.getEffectivePrintableString(text);
        if (encodes(face.getFont(), printable)) {
            ((PdfBoxFastOutputDevice) device).drawStringFast(printable, x, y, info, face, font.getSize2D());
        } else {
            super.drawString(device, text, x, y, info);
        }
    }

    private static PdfBoxFSFont currentFont(OutputDevice device) {
        if (CURRENT_FONT == null || !(device instanceof PdfBoxFastOutputDevice)) {
            return null;
        }
        try {
            return (PdfBoxFSFont) CURRENT_FONT.get(device);
        } catch (IllegalAccessException e) {
            return null;
        }
    }

    /** Whether {@code face} has a glyph for every character of {@code text}: the device's own test, remembered. */
    private boolean encodes(PDFont face, String text) {
        Set<String> known = encoded.computeIfAbsent(face, f -> new HashSet<>());
        if (known.contains(text)) {
            return true;
        }
        try {
            face.getStringWidth(text);
        } catch (Exception e) {
            return false;
        }
        known.add(text);
        return true;
    }

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
