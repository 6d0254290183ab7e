package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.element.CombinationsCheck;
import dev.countercheck.element.CombinedRuns;
import dev.countercheck.element.DetailingVariables;
import dev.countercheck.element.RuleChecks;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.OutOfRangeException;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.Drawing;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.PadFooting;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;

import static dev.countercheck.submission.PadFootingChecks.CATALOGUE;

/** Reviews one pad footing: every check of docs/pad-footing.md that this version performs. */
final class PadFootingReviewer {

    /** What a pad footing is called in messages and rule texts (the rules' variable {@code element}). */
    static final String NOUN = "footing";

    /** What a pad-footing review assumes of the combinations it generates (after {@code Combinations.ASSUMPTION}). */
    static final String COMBINATIONS_ASSUMPTION = "A pad footing's overburden takes the same factor as its own"
            + " weight. Its bearing resistance and sliding take both"
            + " combinations of design approach 1, the worse governing (EN 1997-1 2.4.7.3.4.2): combination 1 on the STR"
            + " combinations (EN 1990 Table A1.2(B)), combination 2 on the GEO ones (Table A1.2(C)); its overturning"
            + " takes the EQU combinations (Table A1.2(A)) with the footing's and the overburden's weight always ×"
            + " γG,inf (they only stabilise).";

    /** The assumptions every pad-footing review makes, for the report. */
    static final List<String> ASSUMPTIONS = List.of(
            "The side faces of a pad footing are taken as cast against formwork: the side cover is checked"
                    + " against cnom, not against the 75 mm of EN 1992-1-1 4.4.1.3(4) for concrete cast against"
                    + " soil; where the sides are cast against the excavation, check the side cover by hand.",
            "Pad footings are rigid: the ground pressure varies linearly over the base and the ground takes no"
                    + " tension (common practice); where the resultant leaves the kern, the contact zone is solved"
                    + " for equilibrium.",
            "The footing's own weight (γconc × plan area × h) and the soil over it (unit weight × overburden ×"
                    + " (plan area − column area)) act at the base centre: unfactored for the bearing pressure,"
                    + " with the favourable γG for the eccentricity, with γG,sup for hogging.",
            "Bending, one-way shear, punching and the anchorage force use the pressure of the column actions"
                    + " alone (the weights are uniform and cause no bending: common practice), over the full width"
                    + " of the footing beyond the column face (bending), d beyond it (shear) or h/2 from the edge"
                    + " (anchorage, EN 1992-1-1 9.8.2.2(5)).",
            "Punching: control perimeters from d/50 to 2d from the column face, clipped to the plan; the ground"
                    + " pressure inside each is deducted; β from the column's own moments with W of the whole"
                    + " perimeter, its moment part taken on the share of the perimeter on the plan; ρ from the bars within the column width + 3d on each side.",
            "Concrete properties come from the expressions of EN 1992-1-1 Table 3.1, unrounded.");

    /** The ruleset parameters the pad-footing checks read. */
    static final Set<String> PARAMETERS = Set.of("gamma_c", "gamma_s", "gamma_g", "gamma_g_inf", "alpha_cc",
            "alpha_cc_shear", "alpha_ct", "c_rdc_factor", "v_min_coefficient", "punching_vrd_max_factor",
            "punching_search_step", "circular_column_square", "stress_block_lambda", "xi_limit",
            "concrete_unit_weight", "anchorage_alpha5", "footing_anchorage_x", "footing_column_inset",
            "footing_zi_factor", "footing_rigidity_ratio", "geo_gamma_phi", "geo_gamma_c", "geo_gamma_cu",
            "geo_gamma_rv", "geo_gamma_rh", "equ_g_inf_factor", "water_unit_weight");

    /** What the detailing rules of a ruleset may use and define for pad footings: the checks not computed in Java. */
    static final ElementRules RULE_VOCABULARY = new ElementRules(PadScopes.SCOPES, DetailingVariables.subjects(),
            CATALOGUE.quantityUnits(id -> !checks().containsKey(id) && !id.equals(CombinationsCheck.ID)));

    private final ElementAssembler assembler;

    PadFootingReviewer(ElementAssembler assembler) {
        this.assembler = assembler;
    }

    ElementReview review(PadFooting pad, Ruleset rules) {
        CombinedRuns<Run> runs = new CombinedRuns<>(CATALOGUE, cases -> run(pad.withActions(cases), rules), Run::outcomes);
        CombinedRuns.Result<Run> result = runs.review(pad, pad.actions(), rules);
        List<CheckOutcome> outcomes = runs.inOrder(result);
        return assembler.assemble(pad.id(), CATALOGUE, pad.description(), outcomes, pad.claims(),
                result.shown().map(r -> cautions(r.ctx)).orElse(List.of()),
                result.shown().flatMap(r -> DrawingNotes.of(r.ctx, outcomes)).<Drawing>map(d -> d))
                .withCombinations(result.generated());
    }

    /** The context and the outcomes of every check but {@code combinations}, in catalogue order. */
    private record Run(PadContext ctx, List<CheckOutcome> outcomes) {
    }

    private static Run run(PadFooting pad, Ruleset rules) {
        PadContext ctx = new PadContext(pad, rules);
        Map<String, CheckOutcome> done = new LinkedHashMap<>();
        checks().forEach((id, check) -> done.put(id, guarded(id, check, ctx)));
        Map<Axis, Double> asRequired = RuleChecks.asRequired(done, "bending");
        List<CheckOutcome> outcomes = RuleChecks.inCatalogueOrder(CATALOGUE, done, ctx.rules, PadScopes.SCOPES,
                PadScopes.forRun(ctx, asRequired));
        return new Run(ctx, outcomes);
    }

    /** Element cautions: the linear pressure assumes a rigid footing (common practice: overhang ≤ ratio·h). */
    private static List<String> cautions(PadContext ctx) {
        double ratio = ctx.rules.number("footing_rigidity_ratio");
        double overhang = 0;
        for (Axis axis : Axis.values()) {
            for (int sign : new int[] {1, -1}) {
                overhang = Math.max(overhang, axis.length(ctx.pad) / 2 - sign * ctx.face(axis, sign));
            }
        }
        if (overhang <= ratio * ctx.pad.depthMm()) {
            return List.of();
        }
        return List.of("The footing " + ctx.pad.id() + " overhangs the column face by " + Num.f(overhang) + " mm, more than " + Num.f(ratio) + "·h = "
                + Num.f(ratio * ctx.pad.depthMm()) + " mm: it may not act as rigid, and"
                + " the linear ground pressure the review assumes may misstate the moments and shears ("
                + ctx.clauseOf("footing_rigidity_ratio") + ").");
    }

    /** The checks computed in Java, in catalogue order; the others come from the ruleset. */
    private static Map<String, Function<PadContext, CheckOutcome>> checks() {
        Map<String, Function<PadContext, CheckOutcome>> m = new LinkedHashMap<>();
        m.put("bearing-pressure", BearingCheck::run);
        m.put("eccentricity", EccentricityCheck::run);
        m.put("bending-x", c -> SaggingChecks.bending(c, Axis.X));
        m.put("bending-y", c -> SaggingChecks.bending(c, Axis.Y));
        m.put("hogging-x", c -> HoggingCheck.run(c, Axis.X));
        m.put("hogging-y", c -> HoggingCheck.run(c, Axis.Y));
        m.put("shear-x", c -> SaggingChecks.shear(c, Axis.X));
        m.put("shear-y", c -> SaggingChecks.shear(c, Axis.Y));
        m.put("punching-face", PunchingChecks::face);
        m.put("punching-perimeter", PunchingChecks::perimeter);
        m.put("anchorage-x", c -> AnchorageCheck.run(c, Axis.X));
        m.put("anchorage-y", c -> AnchorageCheck.run(c, Axis.Y));
        m.put("bearing-resistance", GeotechnicalChecks::bearingResistance);
        m.put("sliding", GeotechnicalChecks::sliding);
        m.put("overturning", GeotechnicalChecks::overturning);
        return m;
    }


    /**
     * A formula asked outside its valid range, or a contact pressure the solver could not find, makes the check
     * not-checked, with the reason (never a silently wrong value).
     */
    private static CheckOutcome guarded(String id, Function<PadContext, CheckOutcome> check, PadContext ctx) {
        try {
            return check.apply(ctx);
        } catch (OutOfRangeException | ArithmeticException e) {
            return Checks.builder(id).notChecked(e.getMessage()).build();
        }
    }
}
