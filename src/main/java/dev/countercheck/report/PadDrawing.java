package dev.countercheck.report;

import dev.countercheck.report.HtmlModel.DrawingView;
import dev.countercheck.report.HtmlModel.LegendRow;
import dev.countercheck.review.Drawing.SectionLine;
import dev.countercheck.review.PadFootingDrawing;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.PadFooting;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.List;

/**
 * A pad footing drawn to scale: the plan with the zone in contact under the drawn case, the column, the
 * critical sections of bending and shear and the governing control perimeter; below it the ground pressure
 * along x through the column centre. x to the right, y up, as in the submission.
 */
final class PadDrawing {

    private static final double WIDTH = 800;
    private static final double LEFT = 92;
    private static final double RIGHT = 160;
    private static final double TOP = 40;
    private static final double BOTTOM = 40;
    private static final double MAX_HEIGHT = 380;
    private static final double DIAGRAM = 120;
    /** The width a character of the small text takes at most, px (as the drawing tests measure it). */
    private static final double MARGIN_CHAR_WIDTH = 5.5;
    private static final String CONTACT = "fill=\"#d9e6d0\" stroke=\"#4f7a3a\" stroke-width=\"1.2\"";
    private static final String PRESSURE = "fill=\"#cfdcec\" stroke=\"#2f5d8a\" stroke-width=\"1.2\"";
    private static final String FACE = "stroke=\"#8a6a12\" stroke-width=\"1.2\" stroke-dasharray=\"4 3\"";

    private final PadFootingDrawing drawing;
    private final PadFooting pad;
    private final double scale;
    private final double cx;
    private final double cy;

    private PadDrawing(PadFootingDrawing drawing) {
        this.drawing = drawing;
        this.pad = drawing.pad();
        this.scale = Math.min((WIDTH - LEFT - RIGHT) / pad.planXMm(), MAX_HEIGHT / pad.planYMm());
        this.cx = LEFT + (WIDTH - LEFT - RIGHT) / 2;
        this.cy = TOP + pad.planYMm() * scale / 2;
    }

    static DrawingView view(String id, PadFootingDrawing drawing) {
        PadDrawing d = new PadDrawing(drawing);
        return new DrawingView(d.plan(id), d.pressure(), legend(id, drawing), List.of());
    }

    private double x(double mm) {
        return cx + mm * scale;
    }

    private double y(double mm) {
        return cy - mm * scale;
    }

    private String plan(String id) {
        double hx = pad.planXMm() / 2;
        double hy = pad.planYMm() / 2;
        Svg svg = new Svg(WIDTH, TOP + pad.planYMm() * scale + BOTTOM, "Plan of pad footing " + pad.id());
        svg.rect(x(-hx), y(hy), pad.planXMm() * scale, pad.planYMm() * scale, Styles.CAP);
        Svg.Path contact = new Svg.Path();
        List<Point> outline = drawing.contactOutline();
        for (int i = 0; i < outline.size(); i++) {
            Point p = outline.get(i);
            if (i == 0) {
                contact.moveTo(x(p.xMm()), y(p.yMm()));
            } else {
                contact.lineTo(x(p.xMm()), y(p.yMm()));
            }
        }
        svg.path(contact.close(), CONTACT);
        svg.clipTo(id + "-on-pad", x(-hx), y(hy), pad.planXMm() * scale, pad.planYMm() * scale);
        drawing.controlPerimeterMm().ifPresent(a -> perimeter(svg, a));
        svg.endGroup();
        for (SectionLine s : drawing.sections()) {
            boolean shear = s.checkId().startsWith("shear");
            String style = shear ? Styles.SHEAR : FACE;
            if ("x".equals(s.axis())) {
                svg.line(x(s.positionMm()), y(hy), x(s.positionMm()), y(-hy), style);
            } else {
                svg.line(x(-hx), y(s.positionMm()), x(hx), y(s.positionMm()), style);
            }
        }
        column(svg, pad.column());
        svg.text(x(hx) + 8, y(hy) + 12, "Lx " + ReportNumbers.display(pad.planXMm(), "mm") + " mm", "start",
                Styles.TEXT);
        svg.text(x(hx) + 8, y(hy) + 26, "Ly " + ReportNumbers.display(pad.planYMm(), "mm") + " mm", "start",
                Styles.TEXT);
        svg.text(x(hx) + 8, y(hy) + 40, "h " + ReportNumbers.display(pad.depthMm(), "mm") + " mm", "start",
                Styles.TEXT);
        marginLabel(svg, x(hx) + 8, y(-hy), wrapped("contact under", drawing.pressureCase(), ""));
        return svg.done();
    }

    private static void marginLabel(Svg svg, double x, double y, List<String> lines) {
        for (int i = 0; i < lines.size(); i++) {
            svg.text(x, y + 13 * i, lines.get(i), "start", Styles.TEXT_SMALL);
        }
    }

    /**
     * {@code before}, the case's name and {@code after} (each may be empty) in lines that fit the right margin,
     * broken before each " + " of a generated combination's name (a part longer than a line keeps a line of its
     * own).
     */
    static List<String> wrapped(String before, String caseName, String after) {
        int fits = (int) ((RIGHT - 8) / MARGIN_CHAR_WIDTH);
        List<String> parts = new ArrayList<>();
        if (!before.isEmpty()) {
            parts.add(before);
        }
        String[] terms = caseName.split(" \\+ ");
        for (int i = 0; i < terms.length; i++) {
            parts.add((i == 0 ? "" : "+ ") + terms[i] + (i == terms.length - 1 && !after.isEmpty() ? ", " + after : ""));
        }
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String part : parts) {
            if (line.length() > 0 && line.length() + 1 + part.length() > fits) {
                lines.add(line.toString());
                line = new StringBuilder();
            }
            line.append(line.length() == 0 ? "" : " ").append(part);
        }
        lines.add(line.toString());
        return lines;
    }

    private void perimeter(Svg svg, double a) {
        Column c = pad.column();
        double px = c.position().xMm();
        double py = c.position().yMm();
        if (c.shape() == ColumnShape.CIRCULAR) {
            svg.circle(x(px), y(py), (c.cxMm() / 2 + a) * scale, Styles.PERIMETER);
            return;
        }
        double hx = c.cxMm() / 2;
        double hy = c.cyMm() / 2;
        double r = a * scale;
        Svg.Path p = new Svg.Path().moveTo(x(px - hx), y(py + hy + a)).lineTo(x(px + hx), y(py + hy + a))
                .arcTo(r, x(px + hx + a), y(py + hy), true).lineTo(x(px + hx + a), y(py - hy))
                .arcTo(r, x(px + hx), y(py - hy - a), true).lineTo(x(px - hx), y(py - hy - a))
                .arcTo(r, x(px - hx - a), y(py - hy), true).lineTo(x(px - hx - a), y(py + hy))
                .arcTo(r, x(px - hx), y(py + hy + a), true).close();
        svg.path(p, Styles.PERIMETER);
    }

    private void column(Svg svg, Column c) {
        if (c.shape() == ColumnShape.CIRCULAR) {
            svg.circle(x(c.position().xMm()), y(c.position().yMm()), c.cxMm() / 2 * scale, Styles.COLUMN_EDGE);
        } else {
            svg.rect(x(c.position().xMm() - c.cxMm() / 2), y(c.position().yMm() + c.cyMm() / 2), c.cxMm() * scale,
                    c.cyMm() * scale, Styles.COLUMN_EDGE);
        }
    }

    /** The pressure along x through the column centre, q drawn downwards from the base line. */
    private String pressure() {
        double hx = pad.planXMm() / 2;
        double yc = pad.column().position().yMm();
        int n = 80;
        double qMax = 0;
        for (int i = 0; i <= n; i++) {
            qMax = Math.max(qMax, drawing.pressureKpa(-hx + pad.planXMm() * i / n, yc));
        }
        double base = 30;
        Svg svg = new Svg(WIDTH, base + DIAGRAM + 30, "Ground pressure under " + pad.id() + " along x");
        svg.rect(x(-hx), base - 14, pad.planXMm() * scale, 14, Styles.CAP_SECTION);
        if (qMax > 0) {
            double k = DIAGRAM / qMax;
            Svg.Path p = new Svg.Path().moveTo(x(-hx), base);
            List<double[]> points = new ArrayList<>();
            for (int i = 0; i <= n; i++) {
                double xm = -hx + pad.planXMm() * i / n;
                points.add(new double[] {xm, drawing.pressureKpa(xm, yc)});
            }
            points.forEach(q -> p.lineTo(x(q[0]), base + q[1] * k));
            svg.path(p.lineTo(x(hx), base).close(), PRESSURE);
            svg.text(x(hx) + 8, base + DIAGRAM, "q,max " + ReportNumbers.display(qMax, "kPa") + " kPa", "start",
                    Styles.TEXT);
        }
        svg.text(x(-hx) - 8, base - 2, "q", "end", Styles.TEXT);
        marginLabel(svg, x(hx) + 8, base - 2, wrapped("", drawing.pressureCase(),
                "y = " + ReportNumbers.display(yc, "mm") + " mm"));
        return svg.done();
    }

    private static List<LegendRow> legend(String id, PadFootingDrawing drawing) {
        List<LegendRow> rows = new ArrayList<>();
        rows.add(new LegendRow(sample("pad", s -> s.rect(3, 3, 40, 12, Styles.CAP)), "Footing outline; the column"
                + " outlined on it."));
        rows.add(new LegendRow(sample("contact", s -> s.rect(3, 3, 40, 12, CONTACT)), "Zone in contact with the"
                + " ground under " + drawing.pressureCase() + " (column actions alone, no tension); below the plan,"
                + " that pressure along x through the column centre."));
        rows.add(new LegendRow(sample("face", s -> s.line(3, 9, 43, 9, FACE)), "Bending sections at the column"
                + " faces (bending-x, bending-y)."));
        rows.add(new LegendRow(sample("shear", s -> s.line(3, 9, 43, 9, Styles.SHEAR)), "One-way shear sections at"
                + " d from the column faces (shear-x, shear-y)."));
        drawing.controlPerimeterMm().ifPresent(a -> rows.add(new LegendRow(sample("perimeter",
                s -> s.rect(3, 3, 40, 12, Styles.PERIMETER + " rx=\"5\"")), "Governing control perimeter at a = "
                + ReportNumbers.display(a, "mm") + " mm from the column face; only the part on the footing counts.")));
        return rows;
    }

    private interface Painter {
        void paint(Svg svg);
    }

    private static String sample(String name, Painter painter) {
        Svg svg = new Svg(46, 18, "legend sample: " + name, "sample");
        painter.paint(svg);
        return svg.done();
    }
}
