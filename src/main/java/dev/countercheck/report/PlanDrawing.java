package dev.countercheck.report;

import dev.countercheck.report.DrawingMarks.Item;
import dev.countercheck.review.Drawing;
import dev.countercheck.review.Drawing.SectionLine;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Direction;

import java.util.ArrayList;
import java.util.List;

/**
 * The plan of a pile cap, to scale: outline, bottom and top bars, piles with their numbers and
 * largest reactions, the 45° spread ring over each pile, the column, the basic control perimeter
 * (the part on the cap), the critical shear sections, the cut of the section view, dimensions in
 * mm, and the tags of what fails. x to the right, y up, as in the submission.
 */
final class PlanDrawing {

    static final double WIDTH = 800;
    static final double LEFT = 92;
    static final double RIGHT = 160;
    private static final double TOP = 76;
    private static final double BOTTOM = 116;
    private static final double MAX_HEIGHT = 420;

    private final PileCap cap;
    private final Drawing drawing;
    private final DrawingMarks marks;
    private final String id;
    private final double scale;
    private final double centreX;
    private final double centreY;
    private final Svg svg;
    /** Labels and tags, drawn last so that no line or pile hides them. */
    private final List<Runnable> overlay = new ArrayList<>();

    private PlanDrawing(String id, Drawing drawing, DrawingMarks marks) {
        this.id = id;
        this.drawing = drawing;
        this.cap = drawing.cap();
        this.marks = marks;
        this.scale = scale(cap);
        this.centreX = centreX();
        this.centreY = TOP + cap.planYMm() * scale / 2;
        this.svg = new Svg(WIDTH, TOP + cap.planYMm() * scale + BOTTOM, "Plan of pile cap " + cap.id());
    }

    /** The SVG text of the plan; {@code id} makes its pattern and clip ids unique on the page. */
    static String svg(String id, Drawing drawing, DrawingMarks marks) {
        return new PlanDrawing(id, drawing, marks).draw();
    }

    /** Canvas units per mm: the cap fills the width between the margins, or {@value #MAX_HEIGHT} units of height. */
    static double scale(PileCap cap) {
        return Math.min((WIDTH - LEFT - RIGHT) / cap.planXMm(), MAX_HEIGHT / cap.planYMm());
    }

    /** The canvas x of the cap's centre line (shared with the section, so that the two line up). */
    static double centreX() {
        return LEFT + (WIDTH - LEFT - RIGHT) / 2;
    }

    private double x(double mm) {
        return centreX + mm * scale;
    }

    private double y(double mm) {
        return centreY - mm * scale;
    }

    private String draw() {
        double left = x(-cap.planXMm() / 2);
        double right = x(cap.planXMm() / 2);
        double top = y(cap.planYMm() / 2);
        double bottom = y(-cap.planYMm() / 2);
        svg.hatch(id + "-hatch", 6, Styles.HATCH_COLOUR);
        svg.rect(left, top, right - left, bottom - top, Styles.CAP);
        cap.reinforcement().ifPresent(this::bars);
        svg.clipTo(id + "-on-cap", left, top, right - left, bottom - top);
        perimeter();
        svg.endGroup();
        drawing.shearSections().forEach(s -> shearSection(s, left, right, top, bottom));
        cutLine(left, right);
        columnHatch();
        piles();
        columnEdge();
        dimensions(left, right, top, bottom);
        cap.reinforcement().ifPresent(r -> barLabels(r, left, top, bottom));
        axesAndScale(left, bottom);
        overlay.forEach(Runnable::run);
        return svg.done();
    }

    private void bars(Reinforcement r) {
        double side = r.cover().sideMm();
        for (BarSet set : r.bottom()) {
            String style = barStyle(set.direction());
            barLines(set, side, style);
        }
        for (BarSet set : r.top()) {
            barLines(set, side, Styles.BAR_TOP);
        }
    }

    private String barStyle(Direction direction) {
        Item item = direction == Direction.X ? Item.BARS_X : Item.BARS_Y;
        if (!marks.tags(item).isEmpty()) {
            return Styles.BAR_FAIL;
        }
        return direction == Direction.X ? Styles.BAR_X : Styles.BAR_Y;
    }

    /** The bars of a set, evenly spread across the cap between the side covers. */
    private void barLines(BarSet set, double side, String style) {
        boolean alongX = set.direction() == Direction.X;
        double length = alongX ? cap.planXMm() : cap.planYMm();
        double across = alongX ? cap.planYMm() : cap.planXMm();
        for (double at : BarLayout.positions(set.count(), across, side, set.diameterMm())) {
            if (alongX) {
                svg.line(x(-length / 2 + side), y(at), x(length / 2 - side), y(at), style);
            } else {
                svg.line(x(at), y(-length / 2 + side), x(at), y(length / 2 - side), style);
            }
        }
    }

    private void perimeter() {
        if (drawing.controlPerimeterMm().isEmpty()) {
            return;
        }
        double a = drawing.controlPerimeterMm().getAsDouble();
        Column c = cap.column();
        String style = marks.tags(Item.PERIMETER).isEmpty() ? Styles.PERIMETER : Styles.PERIMETER_FAIL;
        if (c.shape() == ColumnShape.CIRCULAR) {
            svg.circle(x(c.position().xMm()), y(c.position().yMm()), (c.cxMm() / 2 + a) * scale, style);
            return;
        }
        double l = x(c.position().xMm() - c.cxMm() / 2);
        double r = x(c.position().xMm() + c.cxMm() / 2);
        double t = y(c.position().yMm() + c.cyMm() / 2);
        double b = y(c.position().yMm() - c.cyMm() / 2);
        double s = a * scale;
        svg.path(new Svg.Path().moveTo(l, t - s).lineTo(r, t - s).arcTo(s, r + s, t, true).lineTo(r + s, b)
                .arcTo(s, r, b + s, true).lineTo(l, b + s).arcTo(s, l - s, b, true).lineTo(l - s, t)
                .arcTo(s, l, t - s, true).close(), style);
    }

    private void shearSection(SectionLine line, double left, double right, double top, double bottom) {
        Item item = "x".equals(line.axis()) ? Item.SHEAR_X : Item.SHEAR_Y;
        String tags = marks.tags(item);
        String style = tags.isEmpty() ? Styles.SHEAR : Styles.SHEAR_FAIL;
        if ("x".equals(line.axis())) {
            double at = x(line.positionMm());
            svg.line(at, top - 8, at, bottom + 8, style);
            overlay.add(() -> Annotations.label(svg, at + 3, top + 11, line.checkId(), "start", Styles.TEXT_SMALL));
            if (!tags.isEmpty()) {
                overlay.add(() -> Annotations.tag(svg, at + 3, top + 24, tags));
            }
        } else {
            double at = y(line.positionMm());
            svg.line(left - 8, at, right + 8, at, style);
            overlay.add(() -> Annotations.label(svg, left + 3, at - 4, line.checkId(), "start", Styles.TEXT_SMALL));
            if (!tags.isEmpty()) {
                overlay.add(() -> Annotations.tag(svg, left + 3 + line.checkId().length() * 5.6 + 4, at - 8, tags));
            }
        }
    }

    /** The cut of section A–A: along x through the column centre, looking in +y. */
    private void cutLine(double left, double right) {
        double at = y(cap.column().position().yMm());
        svg.line(left - 22, at, right + 12, at, Styles.CUT);
        for (double end : new double[] {left - 22, right + 12}) {
            svg.path(new Svg.Path().moveTo(end - 4, at - 3).lineTo(end + 4, at - 3).lineTo(end, at - 11).close(),
                    "fill=\"" + Styles.INK + "\"");
            svg.text(end, at + 15, "A", "middle", Styles.TEXT_CUT);
        }
    }

    private void piles() {
        double radius = pileRadius();
        double spread = BarLayout.spreadMm(cap).orElse(0);
        List<Point> positions = cap.piles().positions();
        for (int i = 0; i < positions.size(); i++) {
            double px = x(positions.get(i).xMm());
            double py = y(positions.get(i).yMm());
            if (spread > 0) {
                svg.circle(px, py, radius + spread * scale, Styles.SPREAD);
            }
            String tags = marks.pileTags(i);
            svg.circle(px, py, radius, tags.isEmpty() ? Styles.PILE : Styles.PILE_FAIL);
            svg.text(px, py + 4.5, String.valueOf(i + 1), "middle", Styles.TEXT_PILE);
            if (i < drawing.pileReactionsKn().size()) {
                String reaction = ReportNumbers.display(drawing.pileReactionsKn().get(i), "kN") + " kN";
                overlay.add(() -> Annotations.label(svg, px, py + radius + 13, reaction, "middle",
                        tags.isEmpty() ? Styles.TEXT : Styles.TEXT_FAIL));
            }
            if (!tags.isEmpty()) {
                overlay.add(() -> Annotations.tag(svg, px + radius * 0.72, py - radius * 0.72 - 6, tags));
            }
        }
    }

    /** The column's hatched area, under the piles so that a pile beneath the column still shows. */
    private void columnHatch() {
        String fill = "fill=\"url(#" + Svg.escape(id) + "-hatch)\" stroke=\"none\"";
        columnShape("fill=\"#ffffff\"");
        columnShape(fill);
    }

    /** The column's outline, over the piles, and its fail tag. */
    private void columnEdge() {
        String tags = marks.tags(Item.COLUMN);
        columnShape(tags.isEmpty() ? Styles.COLUMN_EDGE : Styles.COLUMN_EDGE_FAIL);
        if (!tags.isEmpty()) {
            Column c = cap.column();
            double halfX = c.cxMm() / 2 * scale;
            double halfY = (c.shape() == ColumnShape.CIRCULAR ? c.cxMm() : c.cyMm()) / 2 * scale;
            overlay.add(() -> Annotations.tag(svg, x(c.position().xMm()) + halfX + 3,
                    y(c.position().yMm()) - halfY + 2, tags));
        }
    }

    private void columnShape(String style) {
        Column c = cap.column();
        double cx = x(c.position().xMm());
        double cy = y(c.position().yMm());
        double halfX = c.cxMm() / 2 * scale;
        if (c.shape() == ColumnShape.CIRCULAR) {
            svg.circle(cx, cy, halfX, style);
        } else {
            double halfY = c.cyMm() / 2 * scale;
            svg.rect(cx - halfX, cy - halfY, 2 * halfX, 2 * halfY, style);
        }
    }

    private void dimensions(double left, double right, double top, double bottom) {
        double overallY = top - 48;
        Annotations.extension(svg, left, top - 4, left, overallY - 4);
        Annotations.extension(svg, right, top - 4, right, overallY - 4);
        Annotations.horizontal(svg, left, right, overallY, ReportNumbers.display(cap.planXMm(), "mm"),
                Styles.DIMENSION);
        double overallX = left - 56;
        Annotations.extension(svg, left - 4, top, overallX - 4, top);
        Annotations.extension(svg, left - 4, bottom, overallX - 4, bottom);
        Annotations.vertical(svg, overallX, bottom, top, ReportNumbers.display(cap.planYMm(), "mm"),
                Styles.DIMENSION);
        List<Double> xs = chain(cap.piles().positions().stream().map(Point::xMm).toList(), cap.planXMm());
        double chainY = bottom + 26;
        for (int i = 0; i < xs.size(); i++) {
            double from = i == 0 || i == xs.size() - 1 ? bottom + 4 : y(lowestAt(xs.get(i))) + pileRadius() + 16;
            Annotations.extension(svg, x(xs.get(i)), Math.min(from, bottom + 4), x(xs.get(i)), chainY + 4);
            if (i > 0) {
                Annotations.horizontal(svg, x(xs.get(i - 1)), x(xs.get(i)), chainY,
                        ReportNumbers.display(xs.get(i) - xs.get(i - 1), "mm"), Styles.DIMENSION);
            }
        }
        List<Double> ys = chain(cap.piles().positions().stream().map(Point::yMm).toList(), cap.planYMm());
        double chainX = right + 30;
        for (int i = 0; i < ys.size(); i++) {
            double from = i == 0 || i == ys.size() - 1 ? right + 4 : x(rightmostAt(ys.get(i))) + pileRadius() + 2;
            Annotations.extension(svg, Math.min(from, right + 4), y(ys.get(i)), chainX + 4, y(ys.get(i)));
            if (i > 0) {
                Annotations.vertical(svg, chainX, y(ys.get(i - 1)), y(ys.get(i)),
                        ReportNumbers.display(ys.get(i) - ys.get(i - 1), "mm"), Styles.DIMENSION);
            }
        }
    }

    /** The cap's edges and the distinct pile coordinates between them, in order (coordinates within 0.5 mm are one). */
    private static List<Double> chain(List<Double> coordinates, double length) {
        List<Double> sorted = new ArrayList<>(coordinates);
        sorted.sort(Double::compare);
        List<Double> chain = new ArrayList<>();
        chain.add(-length / 2);
        for (double c : sorted) {
            if (c - chain.get(chain.size() - 1) > 0.5 && length / 2 - c > 0.5) {
                chain.add(c);
            }
        }
        chain.add(length / 2);
        return chain;
    }

    private double pileRadius() {
        return cap.piles().diameterMm() / 2 * scale;
    }

    /** The y of the lowest pile centre at x, so that its extension line starts at a pile. */
    private double lowestAt(double xMm) {
        return cap.piles().positions().stream().filter(p -> Math.abs(p.xMm() - xMm) <= 0.5)
                .mapToDouble(Point::yMm).min().orElse(-cap.planYMm() / 2);
    }

    /** The x of the rightmost pile centre at y. */
    private double rightmostAt(double yMm) {
        return cap.piles().positions().stream().filter(p -> Math.abs(p.yMm() - yMm) <= 0.5)
                .mapToDouble(Point::xMm).max().orElse(cap.planXMm() / 2);
    }

    private void barLabels(Reinforcement r, double left, double top, double bottom) {
        String xText = "x-bars: " + BarLayout.describe(r, Direction.X);
        svg.text(left, top - 12, xText, "start", Styles.TEXT);
        String xTags = marks.tags(Item.BARS_X);
        if (!xTags.isEmpty()) {
            Annotations.tag(svg, left + xText.length() * 6.1 + 6, top - 16, xTags);
        }
        String yText = "y-bars: " + BarLayout.describe(r, Direction.Y);
        svg.text(left, bottom + 52, yText, "start", Styles.TEXT);
        String yTags = marks.tags(Item.BARS_Y);
        if (!yTags.isEmpty()) {
            Annotations.tag(svg, left + yText.length() * 6.1 + 6, bottom + 48, yTags);
        }
    }

    private void axesAndScale(double left, double bottom) {
        double ox = left;
        double oy = bottom + 100;
        svg.line(ox, oy, ox + 26, oy, "stroke=\"" + Styles.INK + "\" stroke-width=\"1\"");
        svg.path(new Svg.Path().moveTo(ox + 30, oy).lineTo(ox + 24, oy - 3).lineTo(ox + 24, oy + 3).close(),
                "fill=\"" + Styles.INK + "\"");
        svg.text(ox + 34, oy + 4, "x", "start", Styles.TEXT);
        svg.line(ox, oy, ox, oy - 26, "stroke=\"" + Styles.INK + "\" stroke-width=\"1\"");
        svg.path(new Svg.Path().moveTo(ox, oy - 30).lineTo(ox - 3, oy - 24).lineTo(ox + 3, oy - 24).close(),
                "fill=\"" + Styles.INK + "\"");
        svg.text(ox, oy - 33, "y", "middle", Styles.TEXT);
        Annotations.scaleBar(svg, ox + 80, oy - 14, scale, WIDTH - LEFT - RIGHT);
    }
}
