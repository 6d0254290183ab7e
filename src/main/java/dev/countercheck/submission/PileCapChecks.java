package dev.countercheck.submission;

import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.Kind;

import java.util.List;

import static dev.countercheck.submission.CheckCatalogue.capacity;
import static dev.countercheck.submission.CheckCatalogue.demand;

/**
 * The checks of a pile cap (the contract of the results): id, title, clause, kind and quantities
 * with their units and safe sides. The one declaration the reader, the reviewer, the rulesets and
 * the report read.
 */
public final class PileCapChecks {

    /** The checks of a pile cap, in report order. */
    public static final CheckCatalogue CATALOGUE = CheckCatalogue.of(PileCap.TYPE, List.of(
            SharedCombinationsCheck.COMBINATIONS,
            new CheckSpec("pile-reactions", "Pile reactions, rigid cap", "linear distribution (common practice)",
                    Kind.STRENGTH, List.of(demand("max", "kN"), capacity("min", "kN"))),
            new CheckSpec("pile-reactions-deviation", "Pile reactions with piles off position",
                    "EN 1992-1-1 9.8.1(1); tolerance common practice", Kind.STRENGTH,
                    List.of(demand("max", "kN"), capacity("min", "kN"))),
            new CheckSpec("pile-spacing", "Pile spacing", "common practice",
                    Kind.DETAILING, List.of(capacity("min_spacing", "mm"))),
            new CheckSpec("edge-distance", "Pile edge distance", "EN 1992-1-1 9.8.1(1); minimum common practice",
                    Kind.DETAILING, List.of(capacity("min_edge", "mm"), capacity("min_edge_deviated", "mm"))),
            new CheckSpec("tie-x", "Tension tie, bars parallel to x", "EN 1992-1-1 6.5, 9.8.1(2), (3)",
                    Kind.STRENGTH, List.of(demand("force", "kN"), demand("moment", "kNm"), capacity("z", "mm"),
                            demand("as_required", "mm2"), capacity("as_provided", "mm2"),
                            capacity("as_provided_all", "mm2"))),
            new CheckSpec("tie-y", "Tension tie, bars parallel to y", "EN 1992-1-1 6.5, 9.8.1(2), (3)",
                    Kind.STRENGTH, List.of(demand("force", "kN"), demand("moment", "kNm"), capacity("z", "mm"),
                            demand("as_required", "mm2"), capacity("as_provided", "mm2"),
                            capacity("as_provided_all", "mm2"))),
            new CheckSpec("hogging-x", "Top steel over piles in tension, bars parallel to x", "EN 1992-1-1 6.1, 3.1.7(3)",
                    Kind.STRENGTH, List.of(demand("moment", "kNm"), demand("as_required", "mm2"),
                            capacity("as_provided", "mm2"))),
            new CheckSpec("hogging-y", "Top steel over piles in tension, bars parallel to y", "EN 1992-1-1 6.1, 3.1.7(3)",
                    Kind.STRENGTH, List.of(demand("moment", "kNm"), demand("as_required", "mm2"),
                            capacity("as_provided", "mm2"))),
            new CheckSpec("shear-x", "One-way shear, sections across x", "EN 1992-1-1 6.2.2",
                    Kind.STRENGTH, List.of(demand("av", "mm"), demand("beta", "-"), demand("ved", "kN"),
                            demand("ved_unreduced", "kN"), capacity("vrd_max", "kN"), capacity("vrdc", "kN"),
                            capacity("b", "mm"))),
            new CheckSpec("shear-y", "One-way shear, sections across y", "EN 1992-1-1 6.2.2",
                    Kind.STRENGTH, List.of(demand("av", "mm"), demand("beta", "-"), demand("ved", "kN"),
                            demand("ved_unreduced", "kN"), capacity("vrd_max", "kN"), capacity("vrdc", "kN"),
                            capacity("b", "mm"))),
            new CheckSpec("punching-face", "Punching at the column face", "EN 1992-1-1 6.4.5(3)",
                    Kind.STRENGTH, List.of(capacity("u0", "mm"), demand("beta", "-"), demand("ved", "kN"),
                            capacity("vrd_max", "kN"))),
            new CheckSpec("punching-perimeter", "Punching at the governing control perimeter within 2d",
                    "EN 1992-1-1 6.4.4(2)", Kind.STRENGTH, List.of(demand("a", "mm"), capacity("u", "mm"),
                            demand("ved", "kN"), capacity("vrd", "kN"))),
            new CheckSpec("node-column", "Compression node under the column", "EN 1992-1-1 6.5.4(4)a",
                    Kind.STRENGTH, List.of(demand("stress", "MPa"), capacity("limit", "MPa"))),
            new CheckSpec("node-pile", "Node over the most heavily loaded pile", "EN 1992-1-1 6.5.4(4)b, c",
                    Kind.STRENGTH, List.of(demand("stress", "MPa"), capacity("limit", "MPa"), capacity("strut_angle", "deg"))),
            new CheckSpec("min-steel-x", "Minimum tie steel, bars parallel to x", "EN 1992-1-1 9.2.1.1, 9.8.1(3)",
                    Kind.DETAILING, List.of(demand("as_min", "mm2"), capacity("as_provided", "mm2"))),
            new CheckSpec("min-steel-y", "Minimum tie steel, bars parallel to y", "EN 1992-1-1 9.2.1.1, 9.8.1(3)",
                    Kind.DETAILING, List.of(demand("as_min", "mm2"), capacity("as_provided", "mm2"))),
            SharedDetailingChecks.MAX_STEEL,
            SharedDetailingChecks.BAR_SPACING_X,
            SharedDetailingChecks.BAR_SPACING_Y,
            SharedDetailingChecks.COVER,
            new CheckSpec("anchorage-x", "Anchorage of the x ties beyond the piles", "EN 1992-1-1 8.4, 9.8.1(5)",
                    Kind.DETAILING, List.of(demand("lb_rqd", "mm"), demand("lbd", "mm"), capacity("available", "mm"))),
            new CheckSpec("anchorage-y", "Anchorage of the y ties beyond the piles", "EN 1992-1-1 8.4, 9.8.1(5)",
                    Kind.DETAILING, List.of(demand("lb_rqd", "mm"), demand("lbd", "mm"), capacity("available", "mm"))),
            new CheckSpec("lap-x", "Laps of the bottom x-bars", "EN 1992-1-1 8.7.3", Kind.DETAILING,
                    List.of(demand("lb_rqd", "mm"), demand("l0", "mm"), capacity("provided", "mm"))),
            new CheckSpec("lap-y", "Laps of the bottom y-bars", "EN 1992-1-1 8.7.3", Kind.DETAILING,
                    List.of(demand("lb_rqd", "mm"), demand("l0", "mm"), capacity("provided", "mm"))),
            SharedDetailingChecks.ANCHORAGE_STARTERS,
            SharedDetailingChecks.CRACK_CONTROL));

    private PileCapChecks() {
    }
}
