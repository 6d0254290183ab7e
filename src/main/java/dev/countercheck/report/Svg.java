package dev.countercheck.report;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Writes one SVG picture as text. Coordinates are canvas units (the picture scales to its box);
 * they are written with one decimal, so the text never depends on the locale or on the last bits of
 * a double. Every text and every attribute value that is not one of this package's own style
 * constants is escaped, so a submission's text can never become markup.
 *
 * <p>Styles are plain presentation attributes ({@code stroke="…" fill="…"}), not CSS: the browser
 * and the PDF renderer read them alike.
 */
final class Svg {

    /** How near a half a value's tenths may lie and still be rounded in double arithmetic. */
    private static final double TIE_MARGIN = 1e-6;

    private final StringBuilder out = new StringBuilder();

    /**
     * Opens a drawing {@code width} × {@code height} canvas units (rounded up to whole units) with
     * {@code title} as its accessible name.
     */
    Svg(double width, double height, String title) {
        this(width, height, title, "drawing");
    }

    /** As {@link #Svg(double, double, String)}, with the picture's class ("drawing", "sample"). */
    Svg(double width, double height, String title, String cssClass) {
        String w = num(Math.ceil(width));
        String h = num(Math.ceil(height));
        out.append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"").append(cssClass).append("\" viewBox=\"0 0 ")
                .append(w).append(' ').append(h).append("\" width=\"").append(w)
                .append("\" height=\"").append(h).append("\" role=\"img\" font-family=\"")
                .append(Styles.FONT).append("\"><title>").append(escape(title)).append("</title>");
    }

    /** Text with {@code & < > " '} replaced by character references. */
    static String escape(String text) {
        StringBuilder s = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> s.append("&amp;");
                case '<' -> s.append("&lt;");
                case '>' -> s.append("&gt;");
                case '"' -> s.append("&quot;");
                case '\'' -> s.append("&#39;");
                default -> s.append(c);
            }
        }
        return s.toString();
    }

    /**
     * A canvas coordinate to one decimal: {@code 12.345 → "12.3"}, {@code -0.01 → "0"}. Tenths far
     * from a half (and a coordinate below 10⁸) are rounded in double arithmetic, which then decides
     * the digit as the decimal rounding would; the others are rounded exactly ({@link #exactNum}).
     */
    static String num(double value) {
        double tenths = value * 10;
        double magnitude = Math.abs(tenths);
        if (magnitude < 1e9 && Math.abs(magnitude - Math.floor(magnitude) - 0.5) > TIE_MARGIN) {
            long n = Math.abs(Math.round(tenths));
            if (n == 0) {
                return "0";
            }
            String whole = (value < 0 ? "-" : "") + n / 10;
            return n % 10 == 0 ? whole : whole + "." + n % 10;
        }
        return exactNum(value);
    }

    /** {@link #num} by decimal rounding of the value as Java writes it. */
    static String exactNum(double value) {
        BigDecimal rounded = BigDecimal.valueOf(value).setScale(1, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return rounded.signum() == 0 ? "0" : rounded.toPlainString();
    }

    Svg line(double x1, double y1, double x2, double y2, String style) {
        out.append("<line x1=\"").append(num(x1)).append("\" y1=\"").append(num(y1)).append("\" x2=\"")
                .append(num(x2)).append("\" y2=\"").append(num(y2)).append("\" ").append(style).append("/>");
        return this;
    }

    Svg rect(double x, double y, double width, double height, String style) {
        out.append("<rect x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" width=\"")
                .append(num(width)).append("\" height=\"").append(num(height)).append("\" ").append(style)
                .append("/>");
        return this;
    }

    Svg circle(double cx, double cy, double r, String style) {
        out.append("<circle cx=\"").append(num(cx)).append("\" cy=\"").append(num(cy)).append("\" r=\"")
                .append(num(r)).append("\" ").append(style).append("/>");
        return this;
    }

    /** A path; {@code data} is built with {@link Path}, so it holds only commands and numbers. */
    Svg path(Path data, String style) {
        out.append("<path d=\"").append(data.text()).append("\" ").append(style).append("/>");
        return this;
    }

    /** Text at (x, y); {@code anchor} is start, middle or end. */
    Svg text(double x, double y, String text, String anchor, String style) {
        out.append("<text x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" text-anchor=\"")
                .append(anchor).append("\" ").append(style).append('>').append(escape(text)).append("</text>");
        return this;
    }

    /** Text turned a quarter anticlockwise about (x, y), to read upwards along a vertical line. */
    Svg textUp(double x, double y, String text, String anchor, String style) {
        out.append("<text x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" transform=\"rotate(-90 ")
                .append(num(x)).append(' ').append(num(y)).append(")\" text-anchor=\"").append(anchor).append("\" ")
                .append(style).append('>').append(escape(text)).append("</text>");
        return this;
    }

    /**
     * A hatch pattern {@code id} of diagonal lines {@code spacing} apart, for fills such as
     * {@code fill="url(#id)"}.
     */
    Svg hatch(String id, double spacing, String colour) {
        out.append("<defs><pattern id=\"").append(escape(id)).append("\" patternUnits=\"userSpaceOnUse\" width=\"")
                .append(num(spacing)).append("\" height=\"").append(num(spacing))
                .append("\" patternTransform=\"rotate(45)\"><line x1=\"0\" y1=\"0\" x2=\"0\" y2=\"")
                .append(num(spacing)).append("\" stroke=\"").append(colour).append("\" stroke-width=\"1.2\"/>")
                .append("</pattern></defs>");
        return this;
    }

    /** Starts a group clipped to the rectangle; close it with {@link #endGroup()}. */
    Svg clipTo(String id, double x, double y, double width, double height) {
        out.append("<defs><clipPath id=\"").append(escape(id)).append("\"><rect x=\"").append(num(x))
                .append("\" y=\"").append(num(y)).append("\" width=\"").append(num(width)).append("\" height=\"")
                .append(num(height)).append("\"/></clipPath></defs><g clip-path=\"url(#").append(escape(id))
                .append(")\">");
        return this;
    }

    Svg endGroup() {
        out.append("</g>");
        return this;
    }

    /** The finished picture. */
    String done() {
        return out + "</svg>";
    }

    /** Path data: move, line, arc and close commands with one-decimal numbers. */
    static final class Path {

        private final StringBuilder d = new StringBuilder();

        Path moveTo(double x, double y) {
            return command("M", x, y);
        }

        Path lineTo(double x, double y) {
            return command("L", x, y);
        }

        /** A circular arc of radius r to (x, y), the short way, turning clockwise on screen when {@code sweep}. */
        Path arcTo(double r, double x, double y, boolean sweep) {
            d.append(d.length() == 0 ? "" : " ").append("A").append(num(r)).append(' ').append(num(r))
                    .append(" 0 0 ").append(sweep ? '1' : '0').append(' ').append(num(x)).append(' ').append(num(y));
            return this;
        }

        Path close() {
            d.append(" Z");
            return this;
        }

        private Path command(String letter, double x, double y) {
            d.append(d.length() == 0 ? "" : " ").append(letter).append(num(x)).append(' ').append(num(y));
            return this;
        }

        String text() {
            return d.toString();
        }
    }
}
