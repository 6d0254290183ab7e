package dev.countercheck.report;

import com.openhtmltopdf.css.sheet.FontFaceRule;
import com.openhtmltopdf.css.style.CssContext;
import com.openhtmltopdf.extend.OutputDevice;
import com.openhtmltopdf.extend.OutputDeviceGraphicsDrawer;
import com.openhtmltopdf.extend.SVGDrawer;
import com.openhtmltopdf.extend.UserAgentCallback;
import com.openhtmltopdf.layout.SharedContext;
import com.openhtmltopdf.outputdevice.helper.BaseRendererBuilder.FontStyle;
import com.openhtmltopdf.pdfboxout.PdfBoxFastOutputDevice;
import com.openhtmltopdf.render.Box;
import com.openhtmltopdf.render.RenderingContext;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer.SvgExternalResourceMode;
import com.openhtmltopdf.svgsupport.BatikSVGDrawer.SvgScriptMode;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import org.apache.pdfbox.cos.COSDictionary;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.Node;

import java.awt.FontFormatException;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.io.File;
import java.io.IOException;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Proxy;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The drawings of the PDF, drawn by the renderer's SVG module (Batik) with scripts and external
 * resources refused, each distinct drawing once. The module draws a drawing into a form XObject of its
 * own and places it on the page; a report repeats drawings (the legend's samples, the same in every
 * element), and a drawing of the same markup, with the same styles of the page for its parts, at the
 * same size is the same form. So the form drawn the first time is kept, and each repeat is placed by
 * the renderer at its own position as before, with the kept form in place of a new one: the page
 * looks the same, without laying out and drawing the same picture again.
 */
final class PdfDrawings implements SVGDrawer {

    private final BatikSVGDrawer batik = new BatikSVGDrawer(SvgScriptMode.SECURE, SvgExternalResourceMode.SECURE);
    /** Each drawing's form, by its markup, the page's styles for its parts and its size on the page. */
    private final Map<String, PDFormXObject> drawn = new HashMap<>();

    @Override
    public void importFontFaceRules(List<FontFaceRule> rules, SharedContext context) {
        batik.importFontFaceRules(rules, context);
    }

    @Override
    public void withUserAgent(UserAgentCallback userAgent) {
        batik.withUserAgent(userAgent);
    }

    @Override
    public void addFontFile(File file, String family, Integer weight, FontStyle style) throws IOException, FontFormatException {
        batik.addFontFile(file, family, weight, style);
    }

    @Override
    public SVGImage buildSVGImage(Element svg, Box box, CssContext context, double cssWidth, double cssHeight,
                                  double dotsPerPixel) {
        // the module sets the drawing's width and height on the element here: the markup is read after
        SVGImage image = batik.buildSVGImage(svg, box, context, cssWidth, cssHeight, dotsPerPixel);
        return new Drawing(image, svg, box, dotsPerPixel);
    }

    @Override
    public void close() throws IOException {
        batik.close();
    }

    /** One drawing of the page, drawn by the module the first time its kind is placed, else placed again. */
    private final class Drawing implements SVGImage {

        private final SVGImage image;
        private final Element svg;
        private final Box box;
        private final double dotsPerPixel;

        Drawing(SVGImage image, Element svg, Box box, double dotsPerPixel) {
            this.image = image;
            this.svg = svg;
            this.box = box;
            this.dotsPerPixel = dotsPerPixel;
        }

        @Override
        public int getIntrinsicWidth() {
            return image.getIntrinsicWidth();
        }

        @Override
        public int getIntrinsicHeight() {
            return image.getIntrinsicHeight();
        }

        @Override
        public void drawSVG(OutputDevice device, RenderingContext context, double x, double y) {
            if (!(device instanceof PdfBoxFastOutputDevice pdf)) {
                image.drawSVG(device, context, x, y);
                return;
            }
            // the module draws at the size of the box's content area, styled by the page's rules for the drawing's parts
            Rectangle area = box.getContentAreaEdge(box.getAbsX(), box.getAbsY(), context);
            StringBuilder key = new StringBuilder().append(area.width).append('x').append(area.height).append('\n')
                    .append(context.getCss().getCSSForAllDescendants(svg)).append('\n');
            markup(svg, key);
            PDFormXObject form = drawn.get(key.toString());
            if (form == null) {
                Graphics2D[] used = new Graphics2D[1];
                image.drawSVG(capturing(pdf, used), context, x, y);
                if (used[0] instanceof PdfBoxGraphics2D graphics) {
                    drawn.put(key.toString(), graphics.getXFormObject());
                }
            } else {
                placeAgain(pdf, form, x, y, area);
            }
        }

        /**
         * Places {@code form} as the module would place a new drawing at ({@code x}, {@code y}): the
         * renderer places an empty form there (same size, same matrix), which then names the kept one.
         */
        private void placeAgain(PdfBoxFastOutputDevice pdf, PDFormXObject form, double x, double y, Rectangle area) {
            Graphics2D[] used = new Graphics2D[1];
            pdf.drawWithGraphics((float) x, (float) y, (float) (area.width / dotsPerPixel),
                    (float) (area.height / dotsPerPixel), graphics -> used[0] = graphics);
            PDFormXObject empty = ((PdfBoxGraphics2D) used[0]).getXFormObject();
            COSDictionary forms = pdf.getPage().getResources().getCOSObject().getCOSDictionary(COSName.XOBJECT);
            for (COSName name : forms.keySet()) {
                if (forms.getDictionaryObject(name) == empty.getCOSObject()) {
                    forms.setItem(name, form);
                    return;
                }
            }
            throw new IllegalStateException("the renderer placed a drawing's form under no name of the page");
        }
    }

    /** {@code device}, which keeps in {@code used} the graphics the module draws a drawing into. */
    private static OutputDevice capturing(OutputDevice device, Graphics2D[] used) {
        return (OutputDevice) Proxy.newProxyInstance(OutputDevice.class.getClassLoader(), new Class<?>[] {OutputDevice.class},
                (proxy, method, args) -> {
                    if (method.getName().equals("drawWithGraphics") && args[4] instanceof OutputDeviceGraphicsDrawer drawer) {
                        args[4] = (OutputDeviceGraphicsDrawer) graphics -> {
                            used[0] = graphics;
                            drawer.render(graphics);
                        };
                    }
                    try {
                        return method.invoke(device, args);
                    } catch (InvocationTargetException e) {
                        throw e.getCause();
                    }
                });
    }

    /** Writes {@code node}'s markup into {@code out}: names, attributes and text, in document order. */
    private static void markup(Node node, StringBuilder out) {
        if (node.getNodeType() == Node.TEXT_NODE || node.getNodeType() == Node.CDATA_SECTION_NODE) {
            text(node.getNodeValue(), out);
            return;
        }
        if (node.getNodeType() != Node.ELEMENT_NODE) {
            return;
        }
        out.append('<').append(node.getNodeName());
        NamedNodeMap attributes = node.getAttributes();
        for (int i = 0; i < attributes.getLength(); i++) {
            Node attribute = attributes.item(i);
            out.append(' ').append(attribute.getNodeName()).append('=');
            text(attribute.getNodeValue(), out);
        }
        out.append('>');
        for (Node child = node.getFirstChild(); child != null; child = child.getNextSibling()) {
            markup(child, out);
        }
        out.append("</>");
    }

    /** Writes {@code text} after its length, so that no text can read as markup. */
    private static void text(String text, StringBuilder out) {
        out.append(text.length()).append(':').append(text);
    }
}
