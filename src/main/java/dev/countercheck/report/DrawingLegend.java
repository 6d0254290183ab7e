package dev.countercheck.report;

import dev.countercheck.report.HtmlModel.LegendRow;
import dev.countercheck.report.HtmlModel.MarkRow;
import dev.countercheck.review.PileCapDrawing;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.List;

/**
 * The legend under an element's drawings: a sample of each kind of line with what it stands for,
 * in words (so that nothing depends on colour), and the list of fail tags.
 */
final class DrawingLegend {

    private static final double WIDTH = 46;
    private static final double HEIGHT = 18;

    private DrawingLegend() {
    }

    static List<LegendRow> rows(String id, PileCapDrawing drawing, boolean failing) {
        PileCap cap = drawing.cap();
        List<LegendRow> rows = new ArrayList<>();
        rows.add(new LegendRow(sample("cap", s -> s.rect(3, 3, WIDTH - 6, HEIGHT - 6, Styles.CAP)),
                "Cap outline: plan " + mm(cap.planXMm()) + " × " + mm(cap.planYMm()) + " mm, depth "
                        + mm(cap.depthMm()) + " mm."));
        rows.add(new LegendRow(sample("pile", s -> {
            s.circle(WIDTH / 2, HEIGHT / 2, 7, Styles.PILE);
            s.text(WIDTH / 2, HEIGHT / 2 + 3.5, "1", "middle", "font-size=\"9\" font-weight=\"bold\"");
        }), "Pile, numbered, φ" + mm(cap.piles().diameterMm()) + " mm, embedded " + mm(cap.piles().embedmentMm())
                + " mm; beside it its largest reaction over the ULS cases. Design resistance "
                + mm(cap.piles().compressionKn()) + " kN in compression, " + mm(cap.piles().tensionKn())
                + " kN in tension."));
        rows.add(new LegendRow(sample("column", s -> {
            s.hatch(id + "-legend-hatch", 5, Styles.HATCH_COLOUR);
            s.rect(WIDTH / 2 - 8, 2, 16, HEIGHT - 4, "fill=\"url(#" + Svg.escape(id) + "-legend-hatch)\"");
            s.rect(WIDTH / 2 - 8, 2, 16, HEIGHT - 4, Styles.COLUMN_EDGE);
        }), column(cap.column())));
        rows.add(new LegendRow(sample("bars-x", s -> s.line(3, HEIGHT / 2, WIDTH - 3, HEIGHT / 2, Styles.BAR_X)),
                "Bottom bars along x (solid). A bar set is named by count, φ diameter, face and layer (B1 bottom"
                        + " layer 1, nearest the soffit; B2 bottom layer 2; T1 top layer 1) and, in the section, the"
                        + " direction its bars run: 6 φ25 B1 (x)."));
        rows.add(new LegendRow(sample("bars-y", s -> s.line(3, HEIGHT / 2, WIDTH - 3, HEIGHT / 2, Styles.BAR_Y)),
                "Bottom bars along y (long dashes); in the section, bars along y are the dots."));
        rows.add(new LegendRow(sample("bars-top", s -> s.line(3, HEIGHT / 2, WIDTH - 3, HEIGHT / 2, Styles.BAR_TOP)),
                "Top bars (dotted)."));
        rows.add(new LegendRow(sample("shear", s -> s.line(3, HEIGHT / 2, WIDTH - 3, HEIGHT / 2, Styles.SHEAR)),
                "Critical one-way shear section, labelled with its check (shear-x, shear-y)."));
        drawing.controlPerimeterMm().ifPresent(a -> rows.add(new LegendRow(sample("perimeter",
                        s -> s.path(new Svg.Path().moveTo(3, HEIGHT - 3).lineTo(WIDTH - 14, HEIGHT - 3)
                                .arcTo(11, WIDTH - 3, 3, false), Styles.PERIMETER)),
                "Governing control perimeter u at a = " + mm(a) + " mm from the column face, rounded corners;"
                        + " only the part on the cap is drawn.")));
        BarLayout.spreadMm(cap).ifPresent(rise -> rows.add(new LegendRow(sample("spread", s -> {
            s.circle(WIDTH / 2, HEIGHT / 2, 7, Styles.SPREAD);
            s.line(WIDTH / 2 + 10, HEIGHT - 3, WIDTH / 2 + 18, 5, Styles.SPREAD_LINE);
        }), "45° spread from the edge of each pile head up to the lowest bottom bars: a ring " + mm(rise)
                + " mm outside the pile in plan, lines and end points in the section.")));
        rows.add(new LegendRow(sample("cut", s -> {
            s.line(3, HEIGHT / 2 + 2, WIDTH - 3, HEIGHT / 2 + 2, Styles.CUT);
            s.text(8, HEIGHT / 2 - 1, "A", "middle", "font-size=\"9\" font-weight=\"bold\"");
        }), "Cut of section A–A, along x through the column centre, looking in +y; the section projects every"
                + " pile onto the cut."));
        if (failing) {
            rows.add(new LegendRow(sample("fail", s -> {
                s.line(3, HEIGHT / 2, 22, HEIGHT / 2, Styles.SHEAR_FAIL);
                s.rect(25, 2, 19, 14, Styles.TAG_BOX + " rx=\"2\"");
                s.text(34.5, 13, "F1", "middle", "font-size=\"9\" font-weight=\"bold\" fill=\"" + Styles.FAIL_COLOUR
                        + "\"");
            }), "Fails: the item is drawn heavy and dashed and carries a boxed tag (F1, F2, …); the tags are"
                    + " listed below with their checks and findings."));
        }
        return rows;
    }

    /** The fail tags, each with its check, what it marks and its findings. */
    static List<MarkRow> marks(DrawingMarks marks) {
        return marks.all().stream().map(m -> new MarkRow(m.tag(), m.checkId(), m.checkTitle(), where(m),
                m.findingIds())).toList();
    }

    private static String where(DrawingMarks.Mark mark) {
        if (mark.piles().isEmpty()) {
            return mark.item().description();
        }
        List<String> numbers = mark.piles().stream().map(i -> String.valueOf(i + 1)).toList();
        return (numbers.size() == 1 ? "pile " : "piles ") + String.join(", ", numbers);
    }

    private static String column(Column c) {
        String size = c.shape() == ColumnShape.CIRCULAR ? "φ" + mm(c.cxMm()) : mm(c.cxMm()) + " × " + mm(c.cyMm());
        Point p = c.position();
        String bars = c.starterBars().map(b -> ", starter bars " + b.count() + " φ" + mm(b.diameterMm())).orElse("");
        return "Column (hatched) " + size + " mm, centre at x = " + mm(p.xMm()) + " mm, y = " + mm(p.yMm()) + " mm"
                + bars + ".";
    }

    private static String mm(double value) {
        return ReportNumbers.display(value, "mm");
    }

    private interface Painter {
        void paint(Svg svg);
    }

    private static String sample(String name, Painter painter) {
        Svg svg = new Svg(WIDTH, HEIGHT, "legend sample: " + name, "sample");
        painter.paint(svg);
        return svg.done();
    }
}
