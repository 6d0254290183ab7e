package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.OutOfRangeException;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.CheckCatalogue;
import dev.countercheck.submission.PileCap;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;

/** Reviews one pile cap: every check of pile-cap-method.md that this version performs. */
public final class PileCapReviewer {

    /** The assumptions every pile-cap review makes, for the report. */
    public static final List<String> ASSUMPTIONS = List.of(
            "Pile caps are rigid: pile reactions vary linearly with position (common practice). The cap's own"
                    + " weight (γconc × plan area × h, factored by γG) is added at the cap centre unless the"
                    + " submission says it is included in the actions.",
            "Horizontal forces at the top of the cap add H·h to the moment at pile-head level; piles are taken"
                    + " to carry no moment.",
            "Ties: strut-and-tie model with one node under the column centre and lever arm z = (z/d)·d; the tie"
                    + " force uses the full pile reactions, including the cap's own weight (conservative).",
            "One-way shear: the critical section lies 0.2φ inside the face of the nearest pile beyond the"
                    + " column face (common practice); each pile's reaction is reduced by its own β = av/2d"
                    + " with av ≥ 0.5d (EN 1992-1-1 6.2.2(6)); the full cap width resists.",
            "Punching at the column face uses the full column perimeter (an internal column) and β as stated,"
                    + " else 1.0. At the basic control perimeter only the part of u1 on the cap counts; the"
                    + " reactions there are those of the column actions alone.",
            "Pile heads are circular with the stated diameter; node stresses use the largest reaction.",
            "Concrete properties come from the expressions of EN 1992-1-1 Table 3.1, unrounded.");

    /** The ruleset parameters the pile-cap checks read. */
    public static final Set<String> PARAMETERS = Set.of("gamma_c", "gamma_s", "gamma_g", "alpha_cc",
            "alpha_cc_shear", "alpha_ct", "c_rdc_factor", "v_min_coefficient", "punching_vrd_max_factor", "node_k1",
            "node_k2", "node_k3", "k_prime", "concrete_unit_weight", "lever_arm_factor", "pile_tolerance",
            "min_edge_distance", "pile_spacing_factor", "pile_spacing_factor_end_bearing", "strut_angle_min");

    private final ElementAssembler assembler;

    public PileCapReviewer(ElementAssembler assembler) {
        this.assembler = assembler;
    }

    public ElementReview review(PileCap cap, Ruleset rules) {
        PileCapContext ctx = new PileCapContext(cap, rules);
        List<CheckOutcome> outcomes = new ArrayList<>();
        Map<String, Function<PileCapContext, CheckOutcome>> checks = checks();
        for (String id : CheckCatalogue.checksOf(PileCap.TYPE).keySet()) {
            Function<PileCapContext, CheckOutcome> check = checks.get(id);
            outcomes.add(check == null ? notInThisVersion(id) : guarded(id, check, ctx));
        }
        return assembler.assemble(cap.id(), cap.type(), cap.description(), outcomes, cap.claims(), List.of(),
                Optional.of(DrawingNotes.of(ctx)));
    }

    private static Map<String, Function<PileCapContext, CheckOutcome>> checks() {
        return Map.ofEntries(
                Map.entry("pile-reactions", ReactionsCheck::run),
                Map.entry("pile-reactions-deviation", DeviationCheck::run),
                Map.entry("pile-spacing", GeometryChecks::spacing),
                Map.entry("edge-distance", GeometryChecks::edgeDistance),
                Map.entry("tie-x", c -> TieCheck.run(c, Axis.X)),
                Map.entry("tie-y", c -> TieCheck.run(c, Axis.Y)),
                Map.entry("shear-x", c -> ShearCheck.run(c, Axis.X)),
                Map.entry("shear-y", c -> ShearCheck.run(c, Axis.Y)),
                Map.entry("punching-face", PunchingChecks::face),
                Map.entry("punching-perimeter", PunchingChecks::perimeter),
                Map.entry("node-column", NodeChecks::column),
                Map.entry("node-pile", NodeChecks::pile),
                Map.entry("anchorage-starters", StarterAnchorageCheck::run));
    }

    /** A formula asked outside its valid range makes the check not-checked, with the reason. */
    private static CheckOutcome guarded(String id, Function<PileCapContext, CheckOutcome> check, PileCapContext ctx) {
        try {
            return check.apply(ctx);
        } catch (OutOfRangeException e) {
            return Checks.builder(id).notChecked(e.getMessage()).build();
        }
    }

    private static CheckOutcome notInThisVersion(String id) {
        CheckBuilder b = Checks.builder(id);
        return b.notChecked("detailing rule not yet applied by this version of countercheck").build();
    }
}
