package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Covers;
import dev.countercheck.submission.Reinforcement.Direction;
import dev.countercheck.submission.Reinforcement.SideBars;
import dev.countercheck.submission.Values.Bound;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Reads the {@code reinforcement:} block. A bar set without {@code layer} takes the place of its
 * direction in the listing: the direction listed first is layer 1 (nearest the face), the other
 * layer 2. All bars of one direction lie in one layer and the two directions in different layers
 * (crossing bars cannot share a level); several sets of one direction in one layer are fine.
 * Covers and bars must fit in the depth, and each layer's bars across the width between side covers.
 */
final class ReinforcementBinder {

    static final List<String> KEYS = List.of("cover", "bottom", "top", "sides");
    private static final List<String> COVER_KEYS = List.of("bottom", "top", "side");
    private static final List<String> BAR_KEYS = List.of("direction", "count", "diameter", "layer", "ends", "leg",
            "lap");
    private static final List<String> LAP_KEYS = List.of("percent", "length");
    private static final List<String> SIDE_KEYS = List.of("diameter", "spacing");
    private static final Map<String, Direction> DIRECTIONS = Values.options(Direction.values());
    private static final Map<String, BarEnds> ENDS = Values.options(BarEnds.values());

    /** A bar set as written, before its layer is settled. */
    private record Written(Fields fields, Direction direction, int count, double diameterMm, Optional<Integer> layer,
                           BarEnds ends, Optional<Double> legMm, Optional<Reinforcement.Lap> lap) {
    }

    private final Values values;

    ReinforcementBinder(Values values) {
        this.values = values;
    }

    Optional<Reinforcement> read(Fields f, Optional<Plan> plan, Optional<Double> depthMm) {
        Optional<Covers> cover = f.requiredFields("cover", COVER_KEYS).flatMap(this::covers);
        Optional<List<BarSet>> bottom = f.require("bottom", "a list of bar sets").flatMap(n -> values.nonEmptyList(n, f.path("bottom"),
                Limits.BAR_SETS, "bar sets", "bar set")).flatMap(items -> face(items, f.path("bottom"), plan, cover));
        Optional<List<BarSet>> top = f.has("top")
                ? f.get("top").flatMap(n -> values.list(n, f.path("top"), Limits.BAR_SETS, "bar sets")).flatMap(items -> face(items, f.path("top"),
                plan, cover))
                : Optional.of(List.of());
        Optional<Optional<SideBars>> sides = f.has("sides")
                ? f.fields("sides", SIDE_KEYS).flatMap(this::sideBars).map(Optional::of)
                : Optional.of(Optional.empty());
        if (cover.isEmpty() || bottom.isEmpty() || top.isEmpty() || sides.isEmpty()) {
            return Optional.empty();
        }
        depthMm.ifPresent(h -> checkDepth(f, cover.get(), bottom.get(), top.get(), h));
        return Optional.of(new Reinforcement(cover.get(), bottom.get(), top.get(), sides.get()));
    }

    private Optional<Covers> covers(Fields f) {
        Optional<Double> bottom = f.requiredQuantity("bottom", Dimension.LENGTH, Bound.POSITIVE);
        Optional<Double> top = f.requiredQuantity("top", Dimension.LENGTH, Bound.POSITIVE);
        Optional<Double> side = f.requiredQuantity("side", Dimension.LENGTH, Bound.POSITIVE);
        return bottom.flatMap(b -> top.flatMap(t -> side.map(s -> new Covers(b, t, s))));
    }

    private Optional<SideBars> sideBars(Fields f) {
        Optional<Double> diameter = f.requiredQuantity("diameter", Dimension.LENGTH, Bound.POSITIVE);
        Optional<Double> spacing = f.requiredQuantity("spacing", Dimension.LENGTH, Bound.POSITIVE);
        return diameter.flatMap(d -> spacing.map(s -> new SideBars(d, s)));
    }

    /** The bar sets of one face, with their layers settled and checked. */
    private Optional<List<BarSet>> face(List<Node> items, String path, Optional<Plan> plan, Optional<Covers> cover) {
        Optional<List<Written>> written = values.each(items, path,
                (item, itemPath) -> Fields.of(item, itemPath, values, BAR_KEYS).flatMap(this::barSet));
        if (written.isEmpty()) {
            return Optional.empty();
        }
        List<Direction> order = written.get().stream().map(Written::direction).distinct().toList();
        List<BarSet> sets = new ArrayList<>();
        for (Written w : written.get()) {
            sets.add(new BarSet(w.direction(), w.count(), w.diameterMm(),
                    w.layer().orElse(order.indexOf(w.direction()) + 1), w.ends(), w.legMm(), w.lap()));
        }
        boolean layersOk = checkLayers(written.get(), sets);
        if (layersOk && plan.isPresent() && cover.isPresent()) {
            checkWidth(written.get(), sets, plan.get(), cover.get().sideMm());
        }
        return layersOk ? Optional.of(List.copyOf(sets)) : Optional.empty();
    }

    private Optional<Written> barSet(Fields f) {
        Optional<Direction> direction = f.requiredChoice("direction", DIRECTIONS);
        Optional<Integer> count = f.requiredCount("count", Limits.BARS_IN_A_SET, "bars in one set");
        Optional<Double> diameter = f.requiredQuantity("diameter", Dimension.LENGTH, Bound.POSITIVE);
        Optional<Optional<Integer>> layer = f.has("layer")
                ? f.get("layer").flatMap(n -> layer(n, f.path("layer"))).map(Optional::of)
                : Optional.of(Optional.empty());
        Optional<BarEnds> ends = f.choice("ends", ENDS, BarEnds.STRAIGHT);
        Optional<Double> leg = f.quantity("leg", Dimension.LENGTH, Bound.POSITIVE);
        if (leg.isPresent() && ends.isPresent() && ends.get() == BarEnds.STRAIGHT) {
            values.error(f.get("leg").orElseThrow(), f.path("leg"),
                    "a leg is given but the bars have straight ends: state 'ends: bent' or 'ends: hooked'");
            return Optional.empty();
        }
        Optional<Optional<Reinforcement.Lap>> lap = f.has("lap")
                ? f.fields("lap", LAP_KEYS).flatMap(this::lap).map(Optional::of)
                : Optional.of(Optional.empty());
        if (direction.isEmpty() || count.isEmpty() || diameter.isEmpty() || layer.isEmpty() || ends.isEmpty()
                || (f.has("leg") && leg.isEmpty()) || lap.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Written(f, direction.get(), count.get(), diameter.get(), layer.get(), ends.get(), leg,
                lap.get()));
    }

    /** {@code lap: {percent, length}}: the share of bars lapped at one section (0 < % ≤ 100) and the lap length. */
    private Optional<Reinforcement.Lap> lap(Fields f) {
        Optional<Double> percent = f.requiredQuantity("percent", Dimension.NUMBER, Bound.POSITIVE);
        Optional<Double> length = f.requiredQuantity("length", Dimension.LENGTH, Bound.POSITIVE);
        return percent.flatMap(pc -> length.map(l -> new Reinforcement.Lap(pc, l)));
    }

    private Optional<Integer> layer(Node node, String path) {
        return values.wholeNumber(node, path).filter(n -> {
            if (n != 1 && n != 2) {
                values.error(node, path, "the layer must be 1 (nearest the face) or 2, found " + n);
            }
            return n == 1 || n == 2;
        });
    }

    /** One layer per direction, one direction per layer, and layer 1 before layer 2. */
    private boolean checkLayers(List<Written> written, List<BarSet> sets) {
        Map<Direction, Integer> layerOf = new HashMap<>();
        Map<Integer, Integer> firstInLayer = new HashMap<>();
        boolean ok = true;
        for (int i = 0; i < sets.size(); i++) {
            BarSet set = sets.get(i);
            Fields f = written.get(i).fields();
            String dir = label(set.direction());
            Integer layer = layerOf.putIfAbsent(set.direction(), set.layer());
            Integer first = firstInLayer.putIfAbsent(set.layer(), i);
            if (layer != null && layer != set.layer()) {
                layerError(f, "the " + dir + " bars are listed in layer " + layer + " and here in layer " + set.layer()
                        + ": all bars of one direction lie in one layer");
                ok = false;
            } else if (first != null && sets.get(first).direction() != set.direction()) {
                layerError(f, "the " + dir + " bars share layer " + set.layer() + " with the "
                        + label(sets.get(first).direction()) + " bars at line "
                        + written.get(first).fields().location().line()
                        + ": crossing bars lie in different layers");
                ok = false;
            }
        }
        if (ok && layerOf.containsValue(2) && !layerOf.containsValue(1)) {
            Fields f = written.get(firstInLayer.get(2)).fields();
            layerError(f, "bars are given in layer 2 but none in layer 1, the layer nearest the face");
            ok = false;
        }
        return ok;
    }

    private void layerError(Fields f, String message) {
        SourceLocation at = f.get("layer").map(Node::location).orElse(f.location());
        values.problems().add(at, f.has("layer") ? f.path("layer") : f.path(), message);
    }

    /** Each layer's bars of a direction must fit side by side between the side covers. */
    private void checkWidth(List<Written> written, List<BarSet> sets, Plan plan, double sideCoverMm) {
        Map<String, Double> widthOfBars = new LinkedHashMap<>();
        Map<String, Integer> firstOf = new HashMap<>();
        for (int i = 0; i < sets.size(); i++) {
            BarSet set = sets.get(i);
            String group = label(set.direction()) + " bars of layer " + set.layer();
            widthOfBars.merge(group, set.count() * set.diameterMm(), Double::sum);
            firstOf.putIfAbsent(group, i);
        }
        widthOfBars.forEach((group, width) -> {
            BarSet first = sets.get(firstOf.get(group));
            double available = (first.direction() == Direction.X ? plan.yMm() : plan.xMm()) - 2 * sideCoverMm;
            if (width > available) {
                Fields f = written.get(firstOf.get(group)).fields();
                values.problems().add(f.location(), f.path(), "the " + group + " need " + Values.format(width)
                        + " mm side by side, more than the " + Values.format(available)
                        + " mm between the side covers");
            }
        });
    }

    /** Covers and bar layers, bottom and top, must leave concrete between them within the depth. */
    private void checkDepth(Fields f, Covers cover, List<BarSet> bottom, List<BarSet> top, double depthMm) {
        double needed = cover.bottomMm() + layersThickness(bottom) + layersThickness(top) + cover.topMm();
        if (needed >= depthMm) {
            values.problems().add(f.get("cover").orElseThrow().location(), f.path("cover"), "the covers and bar layers take "
                    + Values.format(needed) + " mm, which does not fit in the depth of " + Values.format(depthMm)
                    + " mm");
        }
    }

    /** The sum over layers of the largest bar in each layer, mm. */
    private static double layersThickness(List<BarSet> sets) {
        Map<Integer, Double> largest = new HashMap<>();
        sets.forEach(s -> largest.merge(s.layer(), s.diameterMm(), Math::max));
        return largest.values().stream().mapToDouble(Double::doubleValue).sum();
    }

    private static String label(Direction direction) {
        return direction == Direction.X ? "x" : "y";
    }
}
