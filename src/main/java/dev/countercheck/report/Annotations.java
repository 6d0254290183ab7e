package dev.countercheck.report;

/**
 * What both drawings annotate with: dimension lines (values in mm, oblique ticks at the ends),
 * fail tags, a scale bar and break lines. All positions in canvas units.
 */
final class Annotations {

    private static final double TICK = 4;
    private static final double TAG_HEIGHT = 15;
    private static final double CHAR_WIDTH = 7.2;

    private Annotations() {
    }

    /** A horizontal dimension from x1 to x2 at height y, its value above the line. */
    static void horizontal(Svg svg, double x1, double x2, double y, String value, String style) {
        svg.line(x1, y, x2, y, style);
        tick(svg, x1, y, style);
        tick(svg, x2, y, style);
        double width = Math.abs(x2 - x1);
        boolean fits = width >= value.length() * 6.2 + 6;
        double x = fits ? (x1 + x2) / 2 : Math.max(x1, x2) + 4;
        svg.text(x, y - 3.5, value, fits ? "middle" : "start", Styles.TEXT_SMALL);
    }

    /** A vertical dimension from y1 to y2 at x, its value reading upwards to the left of the line. */
    static void vertical(Svg svg, double x, double y1, double y2, String value, String style) {
        svg.line(x, y1, x, y2, style);
        tick(svg, x, y1, style);
        tick(svg, x, y2, style);
        double height = Math.abs(y2 - y1);
        if (height >= value.length() * 6.2 + 6) {
            svg.textUp(x - 3.5, (y1 + y2) / 2, value, "middle", Styles.TEXT_SMALL);
        } else {
            svg.text(x - 4, Math.min(y1, y2) - 3, value, "end", Styles.TEXT_SMALL);
        }
    }

    /** A vertical dimension whose value stands to the right of its upper end (for short ones beside an object). */
    static void verticalLabelRight(Svg svg, double x, double y1, double y2, String value, String style) {
        svg.line(x, y1, x, y2, style);
        tick(svg, x, y1, style);
        tick(svg, x, y2, style);
        svg.text(x + 4, Math.min(y1, y2) - 2, value, "start", Styles.TEXT_SMALL);
    }

    /** A short extension line, from the object towards its dimension line. */
    static void extension(Svg svg, double x1, double y1, double x2, double y2) {
        svg.line(x1, y1, x2, y2, Styles.LEADER);
    }

    private static void tick(Svg svg, double x, double y, String style) {
        svg.line(x - TICK / 2, y + TICK / 2, x + TICK / 2, y - TICK / 2, style);
    }

    /** Text on a pale box, so that it reads over the lines beneath; {@code anchor} start, middle or end. */
    static void label(Svg svg, double x, double y, String text, String anchor, String style) {
        double width = text.length() * 6.1 + 4;
        double left = switch (anchor) {
            case "middle" -> x - width / 2;
            case "end" -> x - width + 2;
            default -> x - 2;
        };
        svg.rect(left, y - 10, width, 13, Styles.LABEL_BACK);
        svg.text(x, y, text, anchor, style);
    }

    /** A boxed fail tag ("F1 F3") with its left edge at x and its middle at y; returns its width. */
    static double tag(Svg svg, double x, double y, String tags) {
        double width = tags.length() * CHAR_WIDTH + 8;
        svg.rect(x, y - TAG_HEIGHT / 2, width, TAG_HEIGHT, Styles.TAG_BOX + " rx=\"2\"");
        svg.text(x + width / 2, y + 4, tags, "middle", Styles.TEXT_FAIL);
        return width;
    }

    /**
     * A scale bar of a round length near a quarter of {@code maxWidth}, from (x, y), labelled in mm;
     * {@code scale} is canvas units per mm.
     */
    static void scaleBar(Svg svg, double x, double y, double scale, double maxWidth) {
        double target = maxWidth / 4 / scale;
        double step = 100;
        for (double candidate : new double[] {100, 200, 250, 500, 1000, 2000, 2500, 5000}) {
            if (candidate <= target) {
                step = candidate;
            }
        }
        double length = step * scale;
        svg.rect(x, y, length / 2, 4, "fill=\"" + Styles.INK + "\" stroke=\"" + Styles.INK + "\" stroke-width=\"0.6\"");
        svg.rect(x + length / 2, y, length / 2, 4, "fill=\"#ffffff\" stroke=\"" + Styles.INK
                + "\" stroke-width=\"0.6\"");
        svg.text(x, y + 15, "0", "middle", Styles.TEXT_SMALL);
        svg.text(x + length, y + 15, ReportNumbers.display(step, "mm") + " mm", "middle", Styles.TEXT_SMALL);
    }

    /** A zigzag break line across a member from (x1, y) to (x2, y). */
    static void breakLine(Svg svg, double x1, double x2, double y) {
        double mid = (x1 + x2) / 2;
        Svg.Path path = new Svg.Path().moveTo(x1 - 6, y).lineTo(mid - 5, y).lineTo(mid - 2, y - 6)
                .lineTo(mid + 2, y + 6).lineTo(mid + 5, y).lineTo(x2 + 6, y);
        svg.path(path, Styles.BREAK);
    }
}
