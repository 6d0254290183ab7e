package dev.countercheck.element.pilecap;

import dev.countercheck.element.Axis;
import dev.countercheck.element.DetailingVariables;
import dev.countercheck.element.CombinationsCheck;
import dev.countercheck.element.CombinedRuns;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.OutOfRangeException;
import dev.countercheck.element.RuleChecks;
import dev.countercheck.ruleset.RuleVocabulary.ElementRules;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.PileCap;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;

import static dev.countercheck.submission.PileCapChecks.CATALOGUE;

/** Reviews one pile cap: every check of docs/pile-cap.md that this version performs. */
final class PileCapReviewer {

    /** The assumptions every pile-cap review makes, for the report. */
    /** What a pile cap is called in messages and rule texts (the rules' variable {@code element}). */
    static final String NOUN = "cap";

    /** What a pile-cap review assumes of the combinations it generates (after {@code Combinations.ASSUMPTION}). */
    static final String COMBINATIONS_ASSUMPTION = "For pile caps the GEO and EQU combinations are listed only: the one"
            + " design resistance per pile the submission gives is compared with the STR reactions, never smaller than"
            + " the GEO ones; the piles' own geotechnical resistance (design approach 1, combination 2, with its"
            + " resistance factors) is the designer's pile design and is not checked.";

    static final List<String> ASSUMPTIONS = List.of(
            "Pile caps are rigid: pile reactions vary linearly with position (common practice). The cap's own"
                    + " weight (γconc × plan area × h) is added at the cap centre unless the submission says it is"
                    + " included in the actions, factored by γG,sup for the largest reactions and by γG,inf for"
                    + " the least (EN 1990 Table A1.2(B)).",
            "Horizontal forces at the top of the cap add H·h to the moment at pile-head level; piles are taken"
                    + " to carry no moment.",
            "Ties: strut-and-tie model with one node under the column centre and lever arm z = (z/d)·d; the tie"
                    + " force uses the full pile reactions, including the cap's own weight (conservative).",
            "One-way shear: the critical section lies a share of the pile diameter (ruleset, common practice"
                    + " 0.2φ) inside the face of the nearest pile beyond the column face; each pile's reaction is reduced by its own β = av/2d"
                    + " with av ≥ 0.5d (EN 1992-1-1 6.2.2(6)); the full cap width resists, except over widely spaced"
                    + " piles, where strips of 3φ about the piles beyond the section do (ruleset, common practice).",
            "Punching at the column face uses the full column perimeter (an internal column); β comes from the"
                    + " column moments Mx, My (EN 1992-1-1 Exp. (6.39), (6.42)), with u and W of the full perimeter"
                    + " even where a free edge cuts it. Control perimeters are searched from d/50 to 2d from the column face (step from"
                    + " the ruleset); only the part of a perimeter on the cap counts; a pile relieves the load by"
                    + " the share of its head area inside the perimeter; the reactions there are those of the"
                    + " column actions alone.",
            "Pile heads are circular with the stated diameter; node stresses use the largest reaction.",
            "Concrete properties come from the expressions of EN 1992-1-1 Table 3.1, unrounded.");

    /** The ruleset parameters the pile-cap checks read. */
    static final Set<String> PARAMETERS = Set.of("gamma_c", "gamma_s", "gamma_g", "gamma_g_inf", "alpha_cc",
            "alpha_cc_shear", "alpha_ct", "c_rdc_factor", "v_min_coefficient", "punching_vrd_max_factor",
            "punching_search_step", "node_k1", "node_k2", "node_k3", "circular_column_square", "steel_modulus",
            "eps_c2", "stress_block_lambda", "xi_limit", "concrete_unit_weight", "lever_arm_factor", "pile_tolerance",
            "min_edge_distance", "pile_spacing_factor", "pile_spacing_factor_end_bearing", "strut_angle_min",
            "shear_section_inside_pile", "band_spacing_limit", "band_half_width",
            "shear_strip_width", "cover_k2_soil", "fck_max_shear");

    /** The option that chooses the basis of the column node's limit. */
    static final String NODE_COLUMN_BASIS = "node_column_basis";

    /** The methods a ruleset chooses for pile caps, each with its choices (the default, recommended, first). */
    static final Map<String, List<String>> OPTIONS = Map.of(NODE_COLUMN_BASIS,
            List.of("effective-area", NodeChecks.PARTIALLY_LOADED));

    private final ElementAssembler assembler;

    PileCapReviewer(ElementAssembler assembler) {
        this.assembler = assembler;
    }

    /** What the detailing rules of a ruleset may use and define for pile caps: the checks not computed in Java. */
    static final ElementRules RULE_VOCABULARY = new ElementRules(DetailingScopes.SCOPES, DetailingVariables.subjects(),
            CATALOGUE.quantityUnits(id -> !checks().containsKey(id) && !id.equals(CombinationsCheck.ID)));

    ElementReview review(PileCap cap, Ruleset rules) {
        CombinedRuns<Run> runs = new CombinedRuns<>(CATALOGUE, cases -> run(cap.withActions(cases), rules), Run::outcomes);
        CombinedRuns.Result<Run> result = runs.review(cap, cap.actions(), rules);
        List<CheckOutcome> outcomes = runs.inOrder(result);
        return assembler.assemble(cap.id(), CATALOGUE, cap.description(), outcomes, cap.claims(),
                result.shown().map(r -> cautions(r.ctx)).orElse(List.of()),
                result.shown().map(r -> DrawingNotes.of(r.ctx, outcomes))).withCombinations(result.generated());
    }

    /** The context and the outcomes of every check but {@code combinations}, in catalogue order. */
    private record Run(PileCapContext ctx, List<CheckOutcome> outcomes) {
    }

    private Run run(PileCap cap, Ruleset rules) {
        PileCapContext ctx = new PileCapContext(cap, rules);
        Map<String, Function<PileCapContext, CheckOutcome>> checks = checks();
        Map<String, CheckOutcome> done = new LinkedHashMap<>();
        checks.forEach((id, check) -> done.put(id, guarded(id, check, ctx)));
        Map<Axis, Double> asRequired = RuleChecks.asRequired(done, "tie");
        List<CheckOutcome> outcomes = RuleChecks.inCatalogueOrder(CATALOGUE, done, ctx.rules, DetailingScopes.SCOPES,
                DetailingScopes.forRun(ctx, asRequired));
        return new Run(ctx, outcomes);
    }

    /** What the review took as given about the element as a whole. */
    private static List<String> cautions(PileCapContext ctx) {
        if (ctx.cap.castAgainst().sidesStated()) {
            return List.of();
        }
        return List.of("The side faces are taken as cast against formwork: the submission does not say what they"
                + " are cast against (cast_against names the bottom face only). A side cast against soil needs at"
                + " least k2 = " + Num.f(ctx.rules.number("cover_k2_soil")) + " mm cover (EN 1992-1-1 4.4.1.3(4));"
                + " say so with cast_against: {bottom: ..., sides: soil}.");
    }

    /** The checks computed in Java, in catalogue order; the others come from the ruleset. */
    private static Map<String, Function<PileCapContext, CheckOutcome>> checks() {
        return orderedEntries(
                Map.entry("pile-reactions", ReactionsCheck::run),
                Map.entry("pile-reactions-deviation", DeviationCheck::run),
                Map.entry("pile-spacing", GeometryChecks::spacing),
                Map.entry("edge-distance", GeometryChecks::edgeDistance),
                Map.entry("tie-x", c -> TieCheck.run(c, Axis.X)),
                Map.entry("tie-y", c -> TieCheck.run(c, Axis.Y)),
                Map.entry("hogging-x", c -> HoggingCheck.run(c, Axis.X)),
                Map.entry("hogging-y", c -> HoggingCheck.run(c, Axis.Y)),
                Map.entry("shear-x", c -> ShearCheck.run(c, Axis.X)),
                Map.entry("shear-y", c -> ShearCheck.run(c, Axis.Y)),
                Map.entry("punching-face", PunchingChecks::face),
                Map.entry("punching-perimeter", PunchingChecks::perimeter),
                Map.entry("node-column", NodeChecks::column),
                Map.entry("node-pile", NodeChecks::pile));
    }

    @SafeVarargs
    private static Map<String, Function<PileCapContext, CheckOutcome>> orderedEntries(
            Map.Entry<String, Function<PileCapContext, CheckOutcome>>... entries) {
        Map<String, Function<PileCapContext, CheckOutcome>> map = new LinkedHashMap<>();
        for (var e : entries) {
            map.put(e.getKey(), e.getValue());
        }
        return map;
    }


    /** A formula asked outside its valid range makes the check not-checked, with the reason. */
    private static CheckOutcome guarded(String id, Function<PileCapContext, CheckOutcome> check, PileCapContext ctx) {
        try {
            return check.apply(ctx);
        } catch (OutOfRangeException e) {
            return Checks.builder(id).notChecked(e.getMessage()).build();
        }
    }
}
