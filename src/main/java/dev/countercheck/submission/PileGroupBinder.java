package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.submission.Values.Bound;

import java.util.List;
import java.util.Optional;

/**
 * Reads the {@code piles:} block of a pile cap and rejects piles that cannot be: none, two at one
 * place, overlapping, or outside the cap.
 */
final class PileGroupBinder {

    static final List<String> KEYS = List.of("diameter", "positions", "capacity", "embedment", "tolerance");
    private static final List<String> CAPACITY_KEYS = List.of("compression", "tension");

    private final Values values;

    PileGroupBinder(Values values) {
        this.values = values;
    }

    Optional<PileGroup> read(Fields f, Optional<Plan> plan, Optional<Double> depthMm) {
        Optional<Double> diameter = f.requiredQuantity("diameter", Dimension.LENGTH, Bound.POSITIVE);
        Optional<List<Node>> nodes = f.require("positions", "a list of pile centres [x, y] in mm")
                .flatMap(n -> values.nonEmptyList(n, f.path("positions"), Limits.PILES, "pile positions",
                        "pile position [x, y]"));
        Optional<List<Point>> positions = nodes.flatMap(items -> values.each(items, f.path("positions"),
                values::point));
        Optional<Fields> capacity = f.requiredFields("capacity", CAPACITY_KEYS);
        Optional<Double> compression = capacity.flatMap(c -> c.requiredQuantity("compression", Dimension.FORCE,
                Bound.POSITIVE));
        Optional<Double> tension = capacity.flatMap(c -> c.quantity("tension", Dimension.FORCE, Bound.NON_NEGATIVE, 0));
        Optional<Double> embedment = f.quantity("embedment", Dimension.LENGTH, Bound.NON_NEGATIVE, 0);
        Optional<Double> tolerance = f.quantity("tolerance", Dimension.LENGTH, Bound.NON_NEGATIVE);

        if (positions.isPresent()) {
            checkPlacement(f.path("positions"), nodes.get(), positions.get(), diameter, plan);
        }
        if (embedment.isPresent() && depthMm.isPresent() && embedment.get() >= depthMm.get()) {
            values.error(f.get("embedment").orElseThrow(), f.path("embedment"), "the pile embedment "
                    + Values.format(embedment.get()) + " mm is not less than the cap depth "
                    + Values.format(depthMm.get()) + " mm");
        }
        if (diameter.isEmpty() || positions.isEmpty() || compression.isEmpty() || tension.isEmpty()
                || embedment.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new PileGroup(diameter.get(), positions.get(), compression.get(), tension.get(),
                embedment.get(), tolerance));
    }

    private void checkPlacement(String path, List<Node> nodes, List<Point> piles, Optional<Double> diameter,
                                Optional<Plan> plan) {
        for (int i = 0; i < piles.size(); i++) {
            Point pile = piles.get(i);
            Node node = nodes.get(i);
            String at = path + "[" + i + "]";
            if (plan.isPresent()) {
                outsidePlan(node, at, pile, diameter, plan.get());
            }
            for (int j = 0; j < i; j++) {
                double spacing = pile.distanceTo(piles.get(j));
                String other = "the pile at line " + nodes.get(j).location().line() + " " + Plan.describe(piles.get(j));
                if (spacing == 0) {
                    values.error(node, at, "two piles at the same position: this one and " + other);
                } else if (diameter.isPresent() && spacing < diameter.get()) {
                    values.error(node, at, "this pile overlaps " + other + ": their centres are "
                            + Values.format(spacing) + " mm apart, less than the pile diameter "
                            + Values.format(diameter.get()) + " mm");
                }
            }
        }
    }

    private void outsidePlan(Node node, String at, Point pile, Optional<Double> diameter, Plan plan) {
        if (!plan.containsCentre(pile)) {
            values.error(node, at, "the pile centre " + Plan.describe(pile) + " lies outside the cap, which spans "
                    + plan.extent());
            return;
        }
        double radius = diameter.orElse(0.0) / 2;
        double overhang = plan.overhangMm(pile, radius, radius);
        if (overhang > 0) {
            values.error(node, at, "the pile at " + Plan.describe(pile) + " (diameter " + Values.format(2 * radius)
                    + " mm) reaches " + Values.format(overhang) + " mm beyond the cap edge (" + plan.extent() + ")");
        }
    }
}
