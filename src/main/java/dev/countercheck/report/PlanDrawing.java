package dev.countercheck.report;

import dev.countercheck.report.DrawingMarks.Item;
import dev.countercheck.review.PileCapDrawing;
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
    private final PileCapDrawing drawing;
    private final DrawingMarks marks;
    private final String id;
    private final PlanFrame frame;
    private final double scale;
    private final Svg svg;
    /** Labels and tags, drawn last so that no line or pile hides them. */
    private final List<Runnable> overlay = new ArrayList<>();

    private PlanDrawing(String id, PileCapDrawing drawing, DrawingMarks marks) {
        this.id = id;
        this.drawing = drawing;
        this.cap = drawing.cap();
        this.marks = marks;
        this.scale = scale(cap);
        this.frame = new PlanFrame(cap, scale, centreX(), TOP + cap.planYMm() * scale / 2);
        this.svg = new Svg(WIDTH, TOP + cap.planYMm() * scale + BOTTOM, "Plan of pile cap " + cap.id());
    }

    /** The SVG text of the plan; {@code id} makes its pattern and clip ids unique on the page. */
    static String svg(String id, PileCapDrawing drawing, DrawingMarks marks) {
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
        return frame.x(mm);
    }

    private double y(double mm) {
        return frame.y(mm);
    }

    private String draw() {
        double left = frame.left();
        double right = frame.right();
        double top = frame.top();
        double bottom = frame.bottom();
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
        PlanDimensions.draw(svg, frame);
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
                    Styles.ARROW_HEAD);
            svg.text(end, at + 15, "A", "middle", Styles.TEXT_CUT);
        }
    }

    private void piles() {
        double radius = frame.pileRadius();
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

    /** The column's hatched area, under the piles, so that a pile beneath the column shows within its outline. */
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
        svg.line(ox, oy, ox + 26, oy, Styles.ARROW_SHAFT);
        svg.path(new Svg.Path().moveTo(ox + 30, oy).lineTo(ox + 24, oy - 3).lineTo(ox + 24, oy + 3).close(),
                Styles.ARROW_HEAD);
        svg.text(ox + 34, oy + 4, "x", "start", Styles.TEXT);
        svg.line(ox, oy, ox, oy - 26, Styles.ARROW_SHAFT);
        svg.path(new Svg.Path().moveTo(ox, oy - 30).lineTo(ox - 3, oy - 24).lineTo(ox + 3, oy - 24).close(),
                Styles.ARROW_HEAD);
        svg.text(ox, oy - 33, "y", "middle", Styles.TEXT);
        Annotations.scaleBar(svg, ox + 80, oy - 14, scale, WIDTH - LEFT - RIGHT);
    }
}
