package dev.countercheck.submission;

import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.Kind;
import dev.countercheck.submission.CheckCatalogue.QuantitySpec;

import java.util.List;

import static dev.countercheck.submission.CheckCatalogue.capacity;
import static dev.countercheck.submission.CheckCatalogue.demand;

/**
 * The checks of a pad footing (the contract of the results): id, title, clause, kind and quantities
 * with their units and safe sides. The one declaration the reader, the reviewer, the rulesets and the
 * report read.
 */
public final class PadFootingChecks {

    /** The checks of a pad footing, in report order. */
    public static final CheckCatalogue CATALOGUE = CheckCatalogue.of(PadFooting.TYPE, List.of(
            SharedCombinationsCheck.COMBINATIONS,
            new CheckSpec("bearing-pressure", "Ground pressure under characteristic actions",
                    "linear no-tension contact under a rigid footing (common practice); allowable pressure as stated",
                    Kind.STRENGTH, List.of(demand("q_max", "kPa"), capacity("q_min", "kPa"),
                            capacity("allowable", "kPa"), capacity("contact_fraction", "-"))),
            new CheckSpec("eccentricity", "Eccentricity of the resultant on the base", "EN 1997-1 6.5.4",
                    Kind.DETAILING, List.of(demand("e_x", "mm"), demand("e_y", "mm"),
                            capacity("contact_fraction", "-"))),
            bending("bending-x", "x"),
            bending("bending-y", "y"),
            hogging("hogging-x", "x"),
            hogging("hogging-y", "y"),
            shear("shear-x", "x"),
            shear("shear-y", "y"),
            new CheckSpec("punching-face", "Punching at the column face", "EN 1992-1-1 6.4.5(3)",
                    Kind.STRENGTH, List.of(capacity("u0", "mm"), demand("beta", "-"), demand("ved", "kN"),
                            capacity("vrd_max", "kN"))),
            new CheckSpec("punching-perimeter", "Punching at the governing control perimeter within 2d",
                    "EN 1992-1-1 6.4.4(2)", Kind.STRENGTH, List.of(demand("a", "mm"), capacity("u", "mm"),
                            demand("beta", "-"), demand("ved", "kN"), capacity("vrd", "kN"))),
            anchorage("anchorage-x", "x"),
            anchorage("anchorage-y", "y"),
            SharedDetailingChecks.ANCHORAGE_STARTERS,
            new CheckSpec("bearing-resistance", "Bearing resistance of the ground", "EN 1997-1 6.5.2, Annex D",
                    Kind.STRENGTH, List.of(demand("vd", "kN"), capacity("rd", "kN"), capacity("b_eff", "mm"),
                            capacity("l_eff", "mm"))),
            new CheckSpec("sliding", "Sliding on the base", "EN 1997-1 6.5.3",
                    Kind.STRENGTH, List.of(demand("hd", "kN"), capacity("rd", "kN"))),
            new CheckSpec("overturning", "Overturning about a base edge (EQU)", "EN 1997-1 2.4.7.2; EN 1990 Table A1.2(A)",
                    Kind.STRENGTH, List.of(demand("m_dst", "kNm"), capacity("m_stb", "kNm"))),
            new CheckSpec("min-steel-x", "Minimum steel, bottom bars parallel to x", "EN 1992-1-1 9.2.1.1, 9.8.2.1",
                    Kind.DETAILING, List.of(demand("as_min", "mm2"), capacity("as_provided", "mm2"))),
            new CheckSpec("min-steel-y", "Minimum steel, bottom bars parallel to y", "EN 1992-1-1 9.2.1.1, 9.8.2.1",
                    Kind.DETAILING, List.of(demand("as_min", "mm2"), capacity("as_provided", "mm2"))),
            SharedDetailingChecks.MAX_STEEL,
            SharedDetailingChecks.BAR_SPACING_X,
            SharedDetailingChecks.BAR_SPACING_Y,
            SharedDetailingChecks.COVER,
            SharedDetailingChecks.CRACK_CONTROL));

    private PadFootingChecks() {
    }

    private static CheckSpec bending(String id, String dir) {
        return new CheckSpec(id, "Bending at the column face, bottom bars parallel to " + dir, "EN 1992-1-1 6.1, 3.1.7(3)",
                Kind.STRENGTH, steel());
    }

    private static CheckSpec hogging(String id, String dir) {
        return new CheckSpec(id, "Hogging of the cantilever under partial contact, top bars parallel to " + dir,
                "EN 1992-1-1 6.1, 3.1.7(3)", Kind.STRENGTH, steel());
    }

    private static List<QuantitySpec> steel() {
        return List.of(demand("moment", "kNm"), demand("as_required", "mm2"), capacity("as_provided", "mm2"));
    }

    private static CheckSpec shear(String id, String dir) {
        return new CheckSpec(id, "One-way shear at d from the column face, sections across " + dir,
                "EN 1992-1-1 6.2.2", Kind.STRENGTH, List.of(demand("ved", "kN"), capacity("vrdc", "kN"),
                capacity("b", "mm")));
    }

    private static CheckSpec anchorage(String id, String dir) {
        return new CheckSpec(id, "Anchorage of the bottom " + dir + "-bars at the footing edge",
                "EN 1992-1-1 9.8.2.2, 8.4", Kind.DETAILING, List.of(demand("force", "kN"), demand("lb_rqd", "mm"),
                demand("lbd", "mm"), capacity("available", "mm")));
    }
}
