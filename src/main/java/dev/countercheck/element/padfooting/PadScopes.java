package dev.countercheck.element.padfooting;

import dev.countercheck.element.Section;
import dev.countercheck.ruleset.Variable;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Column.StarterBars;
import dev.countercheck.submission.PadFooting;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The variables a pad footing offers the ruleset's detailing rules, by scope, under the names every
 * element type shares: {@code section} (the whole footing), {@code bottom-bars} (one direction, subjects x
 * and y) and {@code starters}. The engine computes geometry and actions here (As,req from the bending
 * checks, the quasi-permanent steel stress); what is required of them is the ruleset's business.
 */
final class PadScopes {

    static final String SECTION = "section";
    static final String BARS = "bottom-bars";
    static final String STARTERS = "starters";

    /** The variables of a scope for one subject, or why they cannot be formed. */
    record Values(Map<String, Object> values, Optional<String> missing) {
        static Values missing(String why) {
            return new Values(Map.of(), Optional.of(why));
        }
    }

    private PadScopes() {
    }

    static final Map<String, Map<String, Variable>> SCOPES = scopes();

    private static Map<String, Map<String, Variable>> scopes() {
        Map<String, Variable> s = new LinkedHashMap<>();
        s.put("h", Variable.number("mm", "overall depth h", 600));
        s.put("plan_x", Variable.number("mm", "plan length along x", 2600));
        s.put("plan_y", Variable.number("mm", "plan length along y", 2200));
        s.put("fck", Variable.number("MPa", "characteristic cylinder strength", 30));
        s.put("fyk", Variable.number("MPa", "characteristic yield strength of the bars", 500));
        s.put("fctm", Variable.number("MPa", "mean tensile strength (Table 3.1)", 2.9));
        s.put("fctd", Variable.number("MPa", "design tensile strength αct·fctk,0.05/γc", 1.35));
        s.put("fyd", Variable.number("MPa", "design yield strength fyk/γs", 435));
        s.put("dg", Variable.number("mm", "largest nominal aggregate size", 20));
        s.put("structural_class", Variable.number("-", "structural class as a number (S4 → 4)", 4));
        s.put("exposure", Variable.textList("exposure classes (Table 4.1)", List.of("XC2")));
        s.put("cast_against", Variable.text("blinding, soil or formwork", "blinding"));
        s.put("cover_bottom", Variable.number("mm", "stated nominal bottom cover", 50));
        s.put("cover_top", Variable.number("mm", "stated nominal top cover", 50));
        s.put("cover_side", Variable.number("mm", "stated nominal side cover", 50));
        s.put("delta_c_dev", Variable.number("mm", "Δc_dev as stated, else the ruleset's cover_deviation", 10));
        s.put("embedment", Variable.number("mm", "pile heads cast into the element: none under a pad (0)", 0));
        s.put("phi_bottom", Variable.number("mm", "largest bar of the bottom layer 1", 16));
        s.put("phi_top", Variable.number("mm", "largest top bar (0 when none)", 0));
        s.put("phi_side", Variable.number("mm", "side bars (else the largest bottom bar)", 16));
        s.put("as_x", Variable.number("mm2", "area of the bottom x-bars", 2400));
        s.put("as_y", Variable.number("mm2", "area of the bottom y-bars", 2400));
        s.put("ac_x", Variable.number("mm2", "concrete section across the x-bars: plan_y·h", 1.3e6));
        s.put("ac_y", Variable.number("mm2", "concrete section across the y-bars: plan_x·h", 1.6e6));
        s.put("has_sls_qp", Variable.bool("a sls-quasi-permanent action case is given"));
        s.put("sigma_qp_x", Variable.number("MPa", "quasi-permanent stress in the x-bars (0 without a QP case)", 250));
        s.put("sigma_qp_y", Variable.number("MPa", "quasi-permanent stress in the y-bars (0 without a QP case)", 250));
        s.put("phi_x", Variable.number("mm", "largest bottom x-bar", 16));
        s.put("phi_y", Variable.number("mm", "largest bottom y-bar", 16));
        s.put("spacing_x", Variable.number("mm", "centre spacing of the bottom x-bars", 180));
        s.put("spacing_y", Variable.number("mm", "centre spacing of the bottom y-bars", 180));
        Map<String, Variable> bars = new LinkedHashMap<>(s);
        bars.put("phi", Variable.number("mm", "bar diameter", 16));
        bars.put("count", Variable.number("-", "number of bars", 12));
        bars.put("as_provided", Variable.number("mm2", "area of the bars of this direction", 2400));
        bars.put("as_required", Variable.number("mm2", "As,req of this direction's bending check (0 when not computed)",
                1800));
        bars.put("d", Variable.number("mm", "effective depth of these bars", 540));
        bars.put("b_t", Variable.number("mm", "footing width across these bars", 2200));
        Map<String, Variable> starters = new LinkedHashMap<>(s);
        starters.put("phi", Variable.number("mm", "starter bar diameter", 20));
        starters.put("count", Variable.number("-", "number of starter bars", 6));
        starters.put("phi_layer1", Variable.number("mm", "largest bottom bar of layer 1", 16));
        starters.put("phi_layer2", Variable.number("mm", "largest bottom bar of layer 2 (0 when none)", 16));
        return Map.of(SECTION, s, BARS, bars, STARTERS, starters);
    }

    static Map<String, List<String>> subjects() {
        return Map.of(SECTION, List.of(""), BARS, List.of("x", "y"), STARTERS, List.of(""));
    }

    /** @param asRequired As,req of each direction as the bending checks computed it (mm², 0 when not computed) */
    static Values values(PadContext ctx, String scope, String subject, Map<Axis, Double> asRequired) {
        if (ctx.pad.reinforcement().isEmpty() || ctx.section.isEmpty()) {
            return Values.missing("no reinforcement given");
        }
        Reinforcement r = ctx.pad.reinforcement().get();
        Map<String, Object> v = sectionValues(ctx, r, asRequired);
        if (BARS.equals(scope)) {
            Axis axis = "x".equals(subject) ? Axis.X : Axis.Y;
            List<BarSet> sets = bars(ctx.section.get(), axis);
            if (sets.isEmpty()) {
                return Values.missing("no bottom " + subject + "-bars given");
            }
            v.put("phi", sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
            v.put("count", (double) sets.stream().mapToInt(BarSet::count).sum());
            v.put("as_provided", ctx.section.get().as(axis.bars()).value());
            v.put("as_required", asRequired.getOrDefault(axis, 0.0));
            v.put("d", ctx.section.get().d(axis.bars()).value());
            v.put("b_t", axis.width(ctx.pad));
        } else if (STARTERS.equals(scope)) {
            Optional<StarterBars> starters = ctx.pad.column().starterBars();
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

    private static Map<String, Object> sectionValues(PadContext ctx, Reinforcement r, Map<Axis, Double> asRequired) {
        PadFooting pad = ctx.pad;
        Section s = ctx.section.orElseThrow();
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("h", pad.depthMm());
        v.put("plan_x", pad.planXMm());
        v.put("plan_y", pad.planYMm());
        v.put("fck", ctx.fck.value());
        v.put("fyk", pad.materials().fykMpa());
        v.put("fctm", ctx.fctm.value());
        v.put("fctd", ctx.fctd.value());
        v.put("fyd", ctx.fyd.value());
        v.put("dg", pad.materials().aggregateMm());
        v.put("structural_class", Double.parseDouble(pad.materials().structuralClass().replaceAll("[^0-9]", "")));
        v.put("exposure", pad.materials().exposure());
        v.put("cast_against", pad.castAgainst().name().toLowerCase(Locale.ROOT));
        v.put("cover_bottom", r.cover().bottomMm());
        v.put("cover_top", r.cover().topMm());
        v.put("cover_side", r.cover().sideMm());
        v.put("delta_c_dev", pad.materials().coverDeviationMm().orElse(ctx.rules.number("cover_deviation")));
        v.put("embedment", 0.0);
        v.put("phi_bottom", layerDiameter(r, 1));
        v.put("phi_top", r.top().stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        v.put("phi_side", r.sides().map(Reinforcement.SideBars::diameterMm)
                .orElse(r.bottom().stream().mapToDouble(BarSet::diameterMm).max().orElse(0)));
        v.put("as_x", s.asX().value());
        v.put("as_y", s.asY().value());
        v.put("ac_x", pad.planYMm() * pad.depthMm());
        v.put("ac_y", pad.planXMm() * pad.depthMm());
        v.put("has_sls_qp", !ctx.cases(ActionCase.Kind.SLS_QUASI_PERMANENT).isEmpty());
        for (Axis axis : Axis.values()) {
            List<BarSet> sets = bars(s, axis);
            v.put("sigma_qp_" + axis.label(), sigmaQp(ctx, sets, asRequired.getOrDefault(axis, 0.0)));
            v.put("phi_" + axis.label(), sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
            v.put("spacing_" + axis.label(), centreSpacing(axis.width(pad), r.cover().sideMm(), sets));
        }
        return v;
    }

    private static List<BarSet> bars(Section s, Axis axis) {
        return axis == Axis.X ? s.xBars() : s.yBars();
    }

    /**
     * σs ≈ fyd·(N_qp/N_uls)·(As,req/As,prov), the largest quasi-permanent N over the largest ULS N (common
     * approximation), 0 without a quasi-permanent case.
     */
    private static double sigmaQp(PadContext ctx, List<BarSet> sets, double asRequired) {
        double provided = sets.stream().mapToDouble(BarSet::areaMm2).sum();
        double nUls = ctx.cases(ActionCase.Kind.ULS).stream().mapToDouble(ActionCase::nKn).max().orElse(0);
        return ctx.cases(ActionCase.Kind.SLS_QUASI_PERMANENT).stream().mapToDouble(ActionCase::nKn).max().stream()
                .filter(q -> nUls > 0 && provided > 0).map(q -> ctx.fyd.value() * q / nUls * asRequired / provided)
                .findFirst().orElse(0.0);
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
