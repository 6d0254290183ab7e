package dev.countercheck.submission;

import dev.countercheck.input.Node;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The check ids and quantity names of each element type, with the unit of each quantity and
 * the side on which a claim is unconservative. This is the vocabulary of
 * {@code claims.<check-id>.<quantity>} in a submission and of {@code checks[].values} in a result.
 */
public final class CheckCatalogue {

    /** Which way a claimed value errs when it is unconservative. */
    public enum SafeSide {
        /** An action or a requirement: a claim smaller than the computed value is unconservative. */
        DEMAND,
        /** A resistance, a provision or a length available: a larger claim is unconservative. */
        CAPACITY
    }

    /** One quantity of a check: its name, unit and safe side. */
    public record QuantitySpec(String name, String unit, SafeSide safeSide) {
    }

    /**
     * What a check protects: a failing strength check, or an unconservative claim on one, is
     * critical; a detailing or geometry rule not met is major (results.md).
     */
    public enum Kind { STRENGTH, DETAILING }

    /** One check: id, title, clause, kind, and its quantities in report order. */
    public record CheckSpec(String id, String title, String basis, Kind kind, List<QuantitySpec> quantities) {

        public Optional<QuantitySpec> quantity(String name) {
            return quantities.stream().filter(q -> q.name().equals(name)).findFirst();
        }
    }

    private static QuantitySpec demand(String name, String unit) {
        return new QuantitySpec(name, unit, SafeSide.DEMAND);
    }

    private static QuantitySpec capacity(String name, String unit) {
        return new QuantitySpec(name, unit, SafeSide.CAPACITY);
    }

    private static final Map<String, CheckSpec> PILE_CAP = index(List.of(
            new CheckSpec("pile-reactions", "Pile reactions, rigid cap", "linear distribution (common practice)",
                    Kind.STRENGTH, List.of(demand("max", "kN"), capacity("min", "kN"))),
            new CheckSpec("pile-reactions-deviation", "Pile reactions with piles off position",
                    "EN 1992-1-1 9.8.1(1); tolerance common practice", Kind.STRENGTH, List.of(demand("max", "kN"))),
            new CheckSpec("pile-spacing", "Pile spacing", "common practice",
                    Kind.DETAILING, List.of(capacity("min_spacing", "mm"))),
            new CheckSpec("edge-distance", "Pile edge distance", "EN 1992-1-1 9.8.1(1); minimum common practice",
                    Kind.DETAILING, List.of(capacity("min_edge", "mm"))),
            new CheckSpec("tie-x", "Tension tie, bars parallel to x", "EN 1992-1-1 6.5, 9.8.1(2)",
                    Kind.STRENGTH, List.of(demand("force", "kN"), demand("moment", "kNm"), capacity("z", "mm"),
                            demand("as_required", "mm2"), capacity("as_provided", "mm2"))),
            new CheckSpec("tie-y", "Tension tie, bars parallel to y", "EN 1992-1-1 6.5, 9.8.1(2)",
                    Kind.STRENGTH, List.of(demand("force", "kN"), demand("moment", "kNm"), capacity("z", "mm"),
                            demand("as_required", "mm2"), capacity("as_provided", "mm2"))),
            new CheckSpec("shear-x", "One-way shear, sections across x", "EN 1992-1-1 6.2.2",
                    Kind.STRENGTH, List.of(demand("av", "mm"), demand("beta", "-"), demand("ved", "kN"),
                            demand("ved_unreduced", "kN"), capacity("vrd_max", "kN"), capacity("vrdc", "kN"))),
            new CheckSpec("shear-y", "One-way shear, sections across y", "EN 1992-1-1 6.2.2",
                    Kind.STRENGTH, List.of(demand("av", "mm"), demand("beta", "-"), demand("ved", "kN"),
                            demand("ved_unreduced", "kN"), capacity("vrd_max", "kN"), capacity("vrdc", "kN"))),
            new CheckSpec("punching-face", "Punching at the column face", "EN 1992-1-1 6.4.5(3)",
                    Kind.STRENGTH, List.of(capacity("u0", "mm"), demand("ved", "kN"), capacity("vrd_max", "kN"))),
            new CheckSpec("punching-perimeter", "Punching at the basic control perimeter", "EN 1992-1-1 6.4.4",
                    Kind.STRENGTH, List.of(capacity("u1", "mm"), demand("ved", "kN"), capacity("vrd", "kN"))),
            new CheckSpec("node-column", "Compression node under the column", "EN 1992-1-1 6.5.4(4)a",
                    Kind.STRENGTH, List.of(demand("stress", "MPa"), capacity("limit", "MPa"))),
            new CheckSpec("node-pile", "Node over the most heavily loaded pile", "EN 1992-1-1 6.5.4(4)b, c",
                    Kind.STRENGTH, List.of(demand("stress", "MPa"), capacity("limit", "MPa"), capacity("strut_angle", "deg"))),
            new CheckSpec("min-steel-x", "Minimum tie steel, bars parallel to x", "EN 1992-1-1 9.2.1.1, 9.8.1(3)",
                    Kind.DETAILING, List.of(demand("as_min", "mm2"), capacity("as_provided", "mm2"))),
            new CheckSpec("min-steel-y", "Minimum tie steel, bars parallel to y", "EN 1992-1-1 9.2.1.1, 9.8.1(3)",
                    Kind.DETAILING, List.of(demand("as_min", "mm2"), capacity("as_provided", "mm2"))),
            new CheckSpec("max-steel", "Maximum steel", "EN 1992-1-1 9.2.1.1(3)",
                    Kind.DETAILING, List.of(capacity("as_max", "mm2"), demand("as_provided", "mm2"))),
            new CheckSpec("bar-spacing-x", "Bar spacing, bars parallel to x", "EN 1992-1-1 8.2, 7.3.3",
                    Kind.DETAILING, List.of(demand("spacing", "mm"), capacity("clear", "mm"), demand("min_clear", "mm"),
                            capacity("max_spacing", "mm"))),
            new CheckSpec("bar-spacing-y", "Bar spacing, bars parallel to y", "EN 1992-1-1 8.2, 7.3.3",
                    Kind.DETAILING, List.of(demand("spacing", "mm"), capacity("clear", "mm"), demand("min_clear", "mm"),
                            capacity("max_spacing", "mm"))),
            new CheckSpec("cover", "Concrete cover", "EN 1992-1-1 4.4.1",
                    Kind.DETAILING, List.of(demand("required", "mm"), capacity("provided", "mm"))),
            new CheckSpec("anchorage-x", "Anchorage of the x ties beyond the piles", "EN 1992-1-1 8.4, 9.8.1(5)",
                    Kind.DETAILING, List.of(demand("lb_rqd", "mm"), demand("lbd", "mm"), capacity("available", "mm"))),
            new CheckSpec("anchorage-y", "Anchorage of the y ties beyond the piles", "EN 1992-1-1 8.4, 9.8.1(5)",
                    Kind.DETAILING, List.of(demand("lb_rqd", "mm"), demand("lbd", "mm"), capacity("available", "mm"))),
            new CheckSpec("lap-x", "Laps of the bottom x-bars", "EN 1992-1-1 8.7.3", Kind.DETAILING,
                    List.of(demand("lb_rqd", "mm"), demand("l0", "mm"), capacity("provided", "mm"))),
            new CheckSpec("lap-y", "Laps of the bottom y-bars", "EN 1992-1-1 8.7.3", Kind.DETAILING,
                    List.of(demand("lb_rqd", "mm"), demand("l0", "mm"), capacity("provided", "mm"))),
            new CheckSpec("anchorage-starters", "Anchorage of the column starter bars in compression",
                    "EN 1992-1-1 8.4",
                    Kind.DETAILING, List.of(demand("lb_rqd", "mm"), demand("lbd", "mm"), capacity("available", "mm"))),
            new CheckSpec("crack-control", "Crack control without direct calculation", "EN 1992-1-1 7.3.3",
                    Kind.DETAILING, List.of(demand("sigma_s", "MPa"), capacity("max_diameter", "mm"),
                            capacity("max_spacing", "mm")))));

    private static Map<String, CheckSpec> index(List<CheckSpec> specs) {
        Map<String, CheckSpec> map = new LinkedHashMap<>();
        specs.forEach(s -> map.put(s.id(), s));
        return java.util.Collections.unmodifiableMap(map);
    }

    private CheckCatalogue() {
    }

    /** The checks of an element type, in report order; empty for an unknown type. */
    public static Map<String, CheckSpec> checksOf(String elementType) {
        return PileCap.TYPE.equals(elementType) ? PILE_CAP : Map.of();
    }

    /** The check {@code id} of {@code elementType}; throws when there is none (a programming error). */
    public static CheckSpec check(String elementType, String id) {
        CheckSpec spec = checksOf(elementType).get(id);
        if (spec == null) {
            throw new IllegalArgumentException("no check '" + id + "' for " + elementType);
        }
        return spec;
    }
}
