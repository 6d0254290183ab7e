package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.Column.StarterBars;
import dev.countercheck.submission.Values.Bound;

import java.util.List;
import java.util.Optional;

/** Reads the {@code column:} block and rejects a column that does not stand on the element's plan. */
final class ColumnBinder {

    static final List<String> KEYS = List.of("shape", "size", "position", "starter_bars");
    private static final List<String> STARTER_KEYS = List.of("count", "diameter");

    private final Values values;

    ColumnBinder(Values values) {
        this.values = values;
    }

    Optional<Column> read(Fields f, Optional<Plan> plan) {
        Optional<ColumnShape> shape = f.requiredChoice("shape", Values.options(ColumnShape.values()));
        Optional<Node> sizeNode = f.require("size", "[cx, cy] in mm, or [D] for a circular column");
        Optional<List<Double>> size = shape.flatMap(s -> sizeNode.flatMap(n -> s == ColumnShape.CIRCULAR
                ? values.lengths(n, f.path("size"), 1, 1, Bound.POSITIVE, "a circular column's size is [D]")
                : values.lengths(n, f.path("size"), 2, 2, Bound.POSITIVE, "a rectangular column's size is [cx, cy]")));
        Optional<Point> position = f.has("position")
                ? f.get("position").flatMap(n -> values.point(n, f.path("position")))
                : Optional.of(new Point(0, 0));
        Optional<Optional<StarterBars>> starters = f.has("starter_bars")
                ? f.fields("starter_bars", STARTER_KEYS).flatMap(this::starterBars).map(Optional::of)
                : Optional.of(Optional.empty());
        if (shape.isEmpty() || size.isEmpty() || position.isEmpty() || starters.isEmpty()) {
            return Optional.empty();
        }
        double cx = size.get().get(0);
        double cy = size.get().get(size.get().size() - 1);
        Column column = new Column(shape.get(), cx, cy, position.get(), starters.get());
        plan.ifPresent(p -> checkOnPlan(f, column, p));
        return Optional.of(column);
    }

    private Optional<StarterBars> starterBars(Fields f) {
        Optional<Integer> count = f.requiredCount("count", Limits.STARTER_BARS, "starter bars");
        Optional<Double> diameter = f.requiredQuantity("diameter", Dimension.LENGTH, Bound.POSITIVE);
        return count.flatMap(n -> diameter.map(d -> new StarterBars(n, d)));
    }

    private void checkOnPlan(Fields f, Column column, Plan plan) {
        double overhang = plan.overhangMm(column.position(), column.cxMm() / 2, column.cyMm() / 2);
        if (overhang <= 0) {
            return;
        }
        String size = column.shape() == ColumnShape.CIRCULAR ? "diameter " + Values.format(column.cxMm()) + " mm"
                : Values.format(column.cxMm()) + " × " + Values.format(column.cyMm()) + " mm";
        String where = plan.containsCentre(column.position()) ? "reaches " + Values.format(overhang)
                + " mm beyond the cap edge" : "stands outside the cap";
        SourceLocation at = f.get("position").map(Node::location).orElse(f.location());
        values.problems().add(at, f.has("position") ? f.path("position") : f.path(), "the column (" + size + ") at "
                + Plan.describe(column.position()) + " " + where + " (" + plan.extent() + ")");
    }
}
