package dev.countercheck.element.pilecap;

import dev.countercheck.element.Section;

import dev.countercheck.ruleset.Variable;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Column.StarterBars;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The variables a pile cap offers the ruleset's detailing rules, by scope: {@code section} (the whole
 * element: concrete, covers and bars), {@code bottom-bars} (one direction of bottom bars, subjects x
 * and y) and {@code starters} (the column's starter bars). The names are shared with every element
 * type that has such parts. Every scope also sees the section's variables. The engine computes geometry
 * and actions here (As,req from the tie check, available lengths, the quasi-permanent steel
 * stress); what is required of them is the ruleset's business.
 */
final class DetailingScopes {

    static final String SECTION = "section";
    static final String BARS = "bottom-bars";
    static final String STARTERS = "starters";

    /** The variables of a scope for one subject, or why they cannot be formed. */
    record Values(Map<String, Object> values, Optional<String> missing) {
        static Values missing(String why) {
            return new Values(Map.of(), Optional.of(why));
        }
    }

    private DetailingScopes() {
    }

    /** The variables of each scope, with units, descriptions and example values. */
    static final Map<String, Map<String, Variable>> SCOPES = scopes();

    private static Map<String, Map<String, Variable>> scopes() {
        Map<String, Variable> cap = new LinkedHashMap<>();
        cap.put("h", Variable.number("mm", "overall depth h", 1200));
        cap.put("plan_x", Variable.number("mm", "plan length along x", 2700));
        cap.put("plan_y", Variable.number("mm", "plan length along y", 2700));
        cap.put("fck", Variable.number("MPa", "characteristic cylinder strength", 32));
        cap.put("fyk", Variable.number("MPa", "characteristic yield strength of the bars", 500));
        cap.put("fctm", Variable.number("MPa", "mean tensile strength (Table 3.1)", 3.0));
        cap.put("fctd", Variable.number("MPa", "design tensile strength αct·fctk,0.05/γc", 1.4));
        cap.put("fyd", Variable.number("MPa", "design yield strength fyk/γs", 435));
        cap.put("dg", Variable.number("mm", "largest nominal aggregate size", 20));
        cap.put("structural_class", Variable.number("-", "structural class as a number (S4 → 4)", 4));
        cap.put("exposure", Variable.textList("exposure classes (Table 4.1)", List.of("XC2")));
        cap.put("cast_against", Variable.text("what the bottom face is cast against: blinding, soil or formwork",
                "blinding"));
        cap.put("cast_against_sides", Variable.text("what the side faces are cast against: soil or formwork"
                + " (formwork when the submission does not say)", "formwork"));
        cap.put("cover_bottom", Variable.number("mm", "stated nominal bottom cover", 75));
        cap.put("cover_top", Variable.number("mm", "stated nominal top cover", 50));
        cap.put("cover_side", Variable.number("mm", "stated nominal side cover", 75));
        cap.put("delta_c_dev", Variable.number("mm", "Δc_dev as stated, else the ruleset's cover_deviation", 10));
        cap.put("embedment", Variable.number("mm", "pile head cast into the cap", 75));
        cap.put("phi_bottom", Variable.number("mm", "largest bar of the bottom layer 1", 25));
        cap.put("phi_top", Variable.number("mm", "largest top bar (0 when none)", 16));
        cap.put("phi_side", Variable.number("mm", "side bars (else the largest bottom bar)", 12));
        cap.put("as_x", Variable.number("mm2", "area of the bottom x-bars", 5000));
        cap.put("as_y", Variable.number("mm2", "area of the bottom y-bars", 5000));
        cap.put("ac_x", Variable.number("mm2", "concrete section across the x-bars: plan_y·h", 3.2e6));
        cap.put("ac_y", Variable.number("mm2", "concrete section across the y-bars: plan_x·h", 3.2e6));
        cap.put("has_sls_qp", Variable.bool("a sls-quasi-permanent action case is given"));
        cap.put("sigma_qp_x", Variable.number("MPa", "quasi-permanent stress in the x-bars (0 without a QP case)", 250));
        cap.put("sigma_qp_y", Variable.number("MPa", "quasi-permanent stress in the y-bars (0 without a QP case)", 250));
        cap.put("phi_x", Variable.number("mm", "largest bottom x-bar", 25));
        cap.put("phi_y", Variable.number("mm", "largest bottom y-bar", 25));
        cap.put("spacing_x", Variable.number("mm", "centre spacing of the bottom x-bars", 200));
        cap.put("spacing_y", Variable.number("mm", "centre spacing of the bottom y-bars", 200));
        Map<String, Variable> bars = new LinkedHashMap<>(cap);
        bars.put("phi", Variable.number("mm", "bar diameter", 25));
        bars.put("count", Variable.number("-", "number of bars", 12));
        bars.put("layer", Variable.number("-", "layer (1 nearest the soffit)", 1));
        bars.put("bent", Variable.bool("the bars have bent or hooked ends"));
        bars.put("as_provided", Variable.number("mm2", "area of the bars of this direction", 5890));
        bars.put("as_required", Variable.number("mm2", "As,req of this direction's tie (0 when not computed)", 4700));
        bars.put("d", Variable.number("mm", "effective depth of these bars", 1100));
        bars.put("b_t", Variable.number("mm", "cap width across these bars", 2700));
        bars.put("leg", Variable.number("mm", "vertical leg of bent ends: stated, else h − c_bottom − c_top", 1000));
        bars.put("available_from_pile_centre", Variable.number("mm",
                "length along the bar from the outermost pile centre, moved outward by the plan tolerance δ"
                        + " (EN 1992-1-1 9.8.1(1)), to the bar end (shorter side)", 600));
        bars.put("has_lap", Variable.bool("the submission declares laps for these bars"));
        bars.put("lap_percent", Variable.number("-", "share of the bars lapped at one section, % (0 without laps)", 50));
        bars.put("lap_length", Variable.number("mm", "lap length provided (0 without laps)", 1200));
        Map<String, Variable> starters = new LinkedHashMap<>(cap);
        starters.put("phi", Variable.number("mm", "starter bar diameter", 25));
        starters.put("count", Variable.number("-", "number of starter bars", 8));
        starters.put("phi_layer1", Variable.number("mm", "largest bottom bar of layer 1", 25));
        starters.put("phi_layer2", Variable.number("mm", "largest bottom bar of layer 2 (0 when none)", 25));
        return Map.of(SECTION, cap, BARS, bars, STARTERS, starters);
    }

    static Map<String, List<String>> subjects() {
        return Map.of(SECTION, List.of(""), BARS, List.of("x", "y"), STARTERS, List.of(""));
    }

    /**
     * @param asRequired As,req of each direction's tie as the tie checks computed it (mm², 0 when not computed)
     */
    static Values values(PileCapContext ctx, String scope, String subject, Map<Axis, Double> asRequired) {
        PileCap cap = ctx.cap;
        if (cap.reinforcement().isEmpty() || ctx.section.isEmpty()) {
            return Values.missing("no reinforcement given");
        }
        Reinforcement r = cap.reinforcement().get();
        Map<String, Object> v = capValues(ctx, r, asRequired);
        if (BARS.equals(scope)) {
            Axis axis = "x".equals(subject) ? Axis.X : Axis.Y;
            List<BarSet> sets = axis == Axis.X ? ctx.section.get().xBars() : ctx.section.get().yBars();
            if (sets.isEmpty()) {
                return Values.missing("no bottom " + subject + "-bars given");
            }
            v.putAll(barValues(ctx, r, axis, sets, asRequired.getOrDefault(axis, 0.0)));
        } else if (STARTERS.equals(scope)) {
            Optional<StarterBars> starters = cap.column().starterBars();
            if (starters.isEmpty()) {
                return Values.missing("the column starter bars are not given");
            }
            v.put("phi", starters.get().diameterMm());
            v.put("count", (double) starters.get().count());
            v.put("phi_layer1", layerDiameter(r, 1));
            v.put("phi_layer2", layerDiameter(r, 2));
        }
        return new Values(v, Optional.empty());
    }

    private static Map<String, Object> capValues(PileCapContext ctx, Reinforcement r, Map<Axis, Double> asRequired) {
        PileCap cap = ctx.cap;
        Section s = ctx.section.orElseThrow();
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("h", cap.depthMm());
        v.put("plan_x", cap.planXMm());
        v.put("plan_y", cap.planYMm());
        v.put("fck", ctx.fck.value());
        v.put("fyk", cap.materials().fykMpa());
        v.put("fctm", ctx.fctm.value());
        v.put("fctd", ctx.fctd.value());
        v.put("fyd", ctx.fyd.value());
        v.put("dg", cap.materials().aggregateMm());
        v.put("structural_class", Double.parseDouble(cap.materials().structuralClass().replaceAll("[^0-9]", "")));
        v.put("exposure", cap.materials().exposure());
        v.put("cast_against", cap.castAgainst().bottom().name().toLowerCase(java.util.Locale.ROOT));
        v.put("cast_against_sides", cap.castAgainst().sides().name().toLowerCase(java.util.Locale.ROOT));
        v.put("cover_bottom", r.cover().bottomMm());
        v.put("cover_top", r.cover().topMm());
        v.put("cover_side", r.cover().sideMm());
        v.put("delta_c_dev", cap.materials().coverDeviationMm().orElse(ctx.rules.number("cover_deviation")));
        v.put("embedment", cap.piles().embedmentMm());
        v.put("phi_bottom", layerDiameter(r, 1));
        v.put("phi_top", r.top().stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        v.put("phi_side", r.sides().map(Reinforcement.SideBars::diameterMm)
                .orElse(r.bottom().stream().mapToDouble(BarSet::diameterMm).max().orElse(0)));
        v.put("as_x", s.asX().value());
        v.put("as_y", s.asY().value());
        v.put("ac_x", cap.planYMm() * cap.depthMm());
        v.put("ac_y", cap.planXMm() * cap.depthMm());
        v.put("has_sls_qp", ctx.cap.actions().stream().anyMatch(a -> a.kind() == ActionCase.Kind.SLS_QUASI_PERMANENT));
        for (Axis axis : Axis.values()) {
            List<BarSet> sets = axis == Axis.X ? s.xBars() : s.yBars();
            v.put("sigma_qp_" + axis.label(), sigmaQp(ctx, axis, sets, asRequired.getOrDefault(axis, 0.0)));
            v.put("phi_" + axis.label(), sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
            v.put("spacing_" + axis.label(), centreSpacing(axis.capWidth(cap), r.cover().sideMm(), sets));
        }
        return v;
    }

    private static Map<String, Object> barValues(PileCapContext ctx, Reinforcement r, Axis axis, List<BarSet> sets,
                                                 double asRequired) {
        PileCap cap = ctx.cap;
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("phi", sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        v.put("count", (double) sets.stream().mapToInt(BarSet::count).sum());
        v.put("layer", (double) sets.get(0).layer());
        v.put("bent", sets.stream().allMatch(b -> b.ends() != BarEnds.STRAIGHT));
        v.put("as_provided", ctx.section.get().as(axis.bars()).value());
        v.put("as_required", asRequired);
        v.put("d", ctx.section.get().d(axis.bars()).value());
        v.put("b_t", axis.capWidth(cap));
        v.put("leg", sets.stream().map(BarSet::legMm).flatMap(Optional::stream).mapToDouble(Double::doubleValue).min()
                .orElse(cap.depthMm() - r.cover().bottomMm() - r.cover().topMm()));
        double end = (axis == Axis.X ? cap.planXMm() : cap.planYMm()) / 2 - r.cover().sideMm();
        double far = cap.piles().positions().stream().mapToDouble(axis::along).max().orElse(0);
        double near = cap.piles().positions().stream().mapToDouble(axis::along).min().orElse(0);
        v.put("available_from_pile_centre", Math.min(end - far, end + near) - ctx.planTolerance().value());
        Optional<Reinforcement.Lap> lap = sets.stream().map(BarSet::lap).flatMap(Optional::stream).findFirst();
        v.put("has_lap", lap.isPresent());
        v.put("lap_percent", lap.map(Reinforcement.Lap::percentLapped).orElse(0.0));
        v.put("lap_length", lap.map(Reinforcement.Lap::lengthMm).orElse(0.0));
        return v;
    }

    /**
     * N_qp/N_uls, the largest quasi-permanent N over N of the ULS case that governs this direction's tie,
     * when a quasi-permanent case is given (common approximation).
     */
    private static Optional<Double> quasiPermanentRatio(PileCapContext ctx, Axis axis) {
        double nUls = TieCheck.governingAxialForce(ctx, axis);
        return ctx.cap.actions().stream().filter(a -> a.kind() == ActionCase.Kind.SLS_QUASI_PERMANENT)
                .mapToDouble(ActionCase::nKn).max().stream().boxed().findFirst()
                .filter(q -> nUls > 0).map(q -> q / nUls);
    }

    /** σs ≈ fyd·(N_qp/N_uls)·(As,req/As,prov) (crack-control), 0 without a QP case. */
    private static double sigmaQp(PileCapContext ctx, Axis axis, List<BarSet> sets, double asRequired) {
        double provided = sets.stream().mapToDouble(BarSet::areaMm2).sum();
        return quasiPermanentRatio(ctx, axis).filter(q -> provided > 0)
                .map(q -> ctx.fyd.value() * q * asRequired / provided).orElse(0.0);
    }

    private static double centreSpacing(double width, double sideCover, List<BarSet> sets) {
        int n = sets.stream().mapToInt(BarSet::count).sum();
        double phi = sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0);
        return n < 2 ? 0 : (width - 2 * sideCover - phi) / (n - 1);
    }

    private static double layerDiameter(Reinforcement r, int layer) {
        return r.bottom().stream().filter(b -> b.layer() == layer).mapToDouble(BarSet::diameterMm).max().orElse(0);
    }

}
