package dev.countercheck.report;

import dev.countercheck.report.DrawingMarks.Item;
import dev.countercheck.review.PileCapDrawing;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Direction;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;

/**
 * Section A–A of a pile cap: a vertical cut along x through the column centre, looking in +y, to
 * scale. It shows the overall depth, the covers, every bar layer (bars along x as lines, bars along
 * y as dots), the piles projected onto the cut with their embedment, the 45° spread from each pile
 * head's edge up to the lowest bars, and the column stub. Dimensions in mm.
 */
final class SectionDrawing {

    private static final double MAX_DEPTH = 300;
    private static final double TOP = 58;
    private static final double COLUMN_STUB = 42;
    private static final double PILE_STUB = 42;
    private static final double BOTTOM = 96;
    private static final double LABEL_GAP = 13;

    private final PileCap cap;
    private final DrawingMarks marks;
    private final String id;
    private final double scale;
    private final double soffit;
    private final Svg svg;

    private SectionDrawing(String id, PileCapDrawing drawing, DrawingMarks marks) {
        this.id = id;
        this.cap = drawing.cap();
        this.marks = marks;
        this.scale = Math.min(PlanDrawing.scale(cap), MAX_DEPTH / cap.depthMm());
        this.soffit = TOP + cap.depthMm() * scale;
        this.svg = new Svg(PlanDrawing.WIDTH, soffit + BOTTOM, "Section A-A of pile cap " + cap.id());
    }

    /** The SVG text of section A–A; {@code id} makes its pattern ids unique on the page. */
    static String svg(String id, PileCapDrawing drawing, DrawingMarks marks) {
        return new SectionDrawing(id, drawing, marks).draw();
    }

    private double x(double mm) {
        return PlanDrawing.centreX() + mm * scale;
    }

    /** Canvas y of a height above the soffit, mm. */
    private double z(double mm) {
        return soffit - mm * scale;
    }

    private String draw() {
        double left = x(-cap.planXMm() / 2);
        double right = x(cap.planXMm() / 2);
        svg.hatch(id + "-section-hatch", 6, Styles.HATCH_COLOUR);
        svg.rect(left, TOP, right - left, soffit - TOP, Styles.CAP_SECTION);
        column();
        piles();
        cap.reinforcement().ifPresent(r -> {
            spread();
            bars(r, right);
            covers(r, left, right);
        });
        depthAndEmbedment(left);
        Annotations.scaleBar(svg, left + 60, soffit + BOTTOM - 28, scale, PlanDrawing.WIDTH - PlanDrawing.LEFT
                - PlanDrawing.RIGHT);
        return svg.done();
    }

    private void column() {
        Column c = cap.column();
        double half = c.cxMm() / 2 * scale;
        double cx = x(c.position().xMm());
        double top = TOP - COLUMN_STUB;
        String tags = marks.tags(Item.COLUMN);
        svg.rect(cx - half, top, 2 * half, COLUMN_STUB, "fill=\"#ffffff\"");
        svg.rect(cx - half, top, 2 * half, COLUMN_STUB, "fill=\"url(#" + Svg.escape(id) + "-section-hatch)\"");
        svg.line(cx - half, top, cx - half, TOP, tags.isEmpty() ? Styles.COLUMN_EDGE : Styles.COLUMN_EDGE_FAIL);
        svg.line(cx + half, top, cx + half, TOP, tags.isEmpty() ? Styles.COLUMN_EDGE : Styles.COLUMN_EDGE_FAIL);
        Annotations.breakLine(svg, cx - half, cx + half, top);
        if (!tags.isEmpty()) {
            Annotations.tag(svg, cx + half + 4, top + 14, tags);
        }
    }

    /** The piles projected onto the cut, one outline per distinct x, numbered below. */
    private void piles() {
        double radius = cap.piles().diameterMm() / 2 * scale;
        double head = z(cap.piles().embedmentMm());
        for (List<Integer> column : pileColumns()) {
            double px = x(cap.piles().positions().get(column.get(0)).xMm());
            String tags = String.join(" ", column.stream().map(marks::pileTags).filter(t -> !t.isEmpty())
                    .distinct().toList());
            svg.rect(px - radius, head, 2 * radius, soffit + PILE_STUB - head,
                    tags.isEmpty() ? Styles.PILE_BELOW : Styles.PILE_FAIL);
            Annotations.breakLine(svg, px - radius, px + radius, soffit + PILE_STUB);
            String numbers = column.stream().map(i -> String.valueOf(i + 1)).collect(Collectors.joining(", "));
            svg.text(px, soffit + PILE_STUB + 20, "pile " + numbers, "middle", Styles.TEXT_SMALL);
            if (!tags.isEmpty()) {
                Annotations.tag(svg, px + radius + 4, soffit + 16, tags);
            }
        }
    }

    /** Pile indices grouped by x (within 0.5 mm), from left to right. */
    private List<List<Integer>> pileColumns() {
        List<Point> positions = cap.piles().positions();
        List<Integer> order = IntStream.range(0, positions.size()).boxed()
                .sorted(Comparator.comparingDouble((Integer i) -> positions.get(i).xMm())).toList();
        List<List<Integer>> columns = new ArrayList<>();
        for (int i : order) {
            List<Integer> last = columns.isEmpty() ? null : columns.get(columns.size() - 1);
            if (last != null && Math.abs(positions.get(last.get(0)).xMm() - positions.get(i).xMm()) <= 0.5) {
                last.add(i);
            } else {
                columns.add(new ArrayList<>(List.of(i)));
            }
        }
        return columns;
    }

    /** From each pile head's edges, 45° outwards up to the level of the lowest bars, where a dot marks the point. */
    private void spread() {
        if (BarLayout.spreadMm(cap).isEmpty()) {
            return;
        }
        double rise = BarLayout.spreadMm(cap).getAsDouble();
        double radius = cap.piles().diameterMm() / 2;
        double head = cap.piles().embedmentMm();
        for (List<Integer> column : pileColumns()) {
            double px = cap.piles().positions().get(column.get(0)).xMm();
            for (int side : new int[] {-1, 1}) {
                double from = px + side * radius;
                double to = from + side * rise;
                svg.line(x(from), z(head), x(to), z(head + rise), Styles.SPREAD_LINE);
                svg.circle(x(to), z(head + rise), 2.2, Styles.SPREAD_POINT);
            }
        }
    }

    private void bars(Reinforcement r, double right) {
        record Label(double level, String text, String tags) {
        }
        List<Label> bottom = new ArrayList<>();
        List<Label> top = new ArrayList<>();
        for (BarSet set : r.bottom()) {
            bottom.add(new Label(bar(r, set, true), BarLayout.name(set, "B") + " (" + axis(set) + ")", tags(set)));
        }
        for (BarSet set : r.top()) {
            top.add(new Label(bar(r, set, false), BarLayout.name(set, "T") + " (" + axis(set) + ")", ""));
        }
        bottom.sort(Comparator.comparingDouble(Label::level));
        top.sort(Comparator.comparingDouble(Label::level).reversed());
        double next = Double.POSITIVE_INFINITY;
        for (Label label : bottom) {
            double at = Math.min(z(label.level()), next);
            leader(right, z(label.level()), at, label.text(), label.tags());
            next = at - LABEL_GAP;
        }
        double previous = Double.NEGATIVE_INFINITY;
        for (Label label : top) {
            double at = Math.max(z(label.level()), previous);
            leader(right, z(label.level()), at, label.text(), "");
            previous = at + LABEL_GAP;
        }
    }

    private static String axis(BarSet set) {
        return set.direction() == Direction.X ? "x" : "y";
    }

    private String tags(BarSet set) {
        return marks.tags(set.direction() == Direction.X ? Item.BARS_X : Item.BARS_Y);
    }

    /** A leader from the bars to their label at the right; a fail tag stands before the label. */
    private void leader(double right, double from, double at, String text, String tags) {
        svg.line(right + 2, from, right + 12, at, Styles.LEADER);
        double x = right + 14;
        if (!tags.isEmpty()) {
            x += Annotations.tag(svg, x, at, tags) + 4;
        }
        svg.text(x, at + 4, text, "start", tags.isEmpty() ? Styles.TEXT : Styles.TEXT_FAIL);
    }

    /** Draws one set and returns its level above the soffit, mm. */
    private double bar(Reinforcement r, BarSet set, boolean bottom) {
        double level = BarLayout.levelMm(cap, r, set, bottom);
        boolean failing = bottom && !tags(set).isEmpty();
        double side = r.cover().sideMm();
        if (set.direction() == Direction.X) {
            double width = Math.max(set.diameterMm() * scale, 1.4);
            String colour = failing ? Styles.FAIL_COLOUR : (bottom ? Styles.BAR_COLOUR : Styles.BAR_TOP_COLOUR);
            String dash = failing ? " stroke-dasharray=\"7 3\"" : "";
            String style = "fill=\"none\" stroke=\"" + colour + "\" stroke-width=\"" + Svg.num(width) + "\"" + dash;
            double end = cap.planXMm() / 2 - side - set.diameterMm() / 2;
            Svg.Path path = new Svg.Path();
            if (bottom && set.ends() != BarEnds.STRAIGHT) {
                double leg = set.legMm().orElse(cap.depthMm() - r.cover().bottomMm() - r.cover().topMm());
                path.moveTo(x(-end), z(level + leg)).lineTo(x(-end), z(level)).lineTo(x(end), z(level))
                        .lineTo(x(end), z(level + leg));
            } else {
                path.moveTo(x(-end), z(level)).lineTo(x(end), z(level));
            }
            svg.path(path, style);
        } else {
            double radius = Math.max(set.diameterMm() / 2 * scale, 1.8);
            for (double at : BarLayout.positions(set.count(), cap.planXMm(), side, set.diameterMm())) {
                svg.circle(x(at), z(level), radius, failing ? Styles.BAR_FILL_FAIL
                        : bottom ? Styles.BAR_FILL : Styles.BAR_TOP_FILL);
            }
        }
        return level;
    }

    /** Bottom and top cover at the left, side cover at the right end of the bars, mid-depth. */
    private void covers(Reinforcement r, double left, double right) {
        String tags = marks.tags(Item.COVER);
        String style = tags.isEmpty() ? Styles.DIMENSION : Styles.DIMENSION_FAIL;
        double at = left - 16;
        Annotations.extension(svg, left - 3, z(r.cover().bottomMm()), at - 4, z(r.cover().bottomMm()));
        Annotations.vertical(svg, at, soffit, z(r.cover().bottomMm()), ReportNumbers.display(r.cover().bottomMm(), "mm"),
                style);
        Annotations.extension(svg, left - 3, z(cap.depthMm() - r.cover().topMm()), at - 4,
                z(cap.depthMm() - r.cover().topMm()));
        Annotations.vertical(svg, at, TOP, z(cap.depthMm() - r.cover().topMm()),
                ReportNumbers.display(r.cover().topMm(), "mm"), style);
        double mid = (TOP + soffit) / 2;
        double barEnd = x(cap.planXMm() / 2 - r.cover().sideMm());
        Annotations.horizontal(svg, barEnd, right, mid, ReportNumbers.display(r.cover().sideMm(), "mm"), style);
        if (!tags.isEmpty()) {
            Annotations.tag(svg, left - 16 - 66, soffit + 14, tags);
        }
    }

    private void depthAndEmbedment(double left) {
        double at = left - 50;
        Annotations.extension(svg, left - 3, TOP, at - 4, TOP);
        Annotations.extension(svg, left - 3, soffit, at - 4, soffit);
        Annotations.vertical(svg, at, soffit, TOP, ReportNumbers.display(cap.depthMm(), "mm"), Styles.DIMENSION);
        List<List<Integer>> columns = pileColumns();
        if (columns.isEmpty()) {
            return;
        }
        double rightEdge = x(cap.piles().positions().get(columns.get(0).get(0)).xMm() + cap.piles().diameterMm() / 2);
        Annotations.verticalLabelRight(svg, rightEdge + 7, soffit, z(cap.piles().embedmentMm()),
                ReportNumbers.display(cap.piles().embedmentMm(), "mm"), Styles.DIMENSION);
    }
}
