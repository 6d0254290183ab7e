package dev.countercheck.element;

import dev.countercheck.ruleset.Variable;
import dev.countercheck.submission.Column.StarterBars;
import dev.countercheck.submission.Materials;
import dev.countercheck.submission.RectangularPlan;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;
import java.util.function.ToDoubleFunction;

/**
 * The detailing-rule scopes every element type shares, and the variables they have in common:
 * {@code section} (the whole element: concrete, covers and bars), {@code bottom-bars} (one direction of
 * bottom bars, subjects x and y) and {@code starters} (the column's starter bars). Every scope also sees
 * the section's variables. A type adds its own variables (a pile cap's pile heads, laps and pile
 * positions); what is required of them is the ruleset's business.
 */
public final class DetailingVariables {

    public static final String SECTION = "section";
    public static final String BARS = "bottom-bars";
    public static final String STARTERS = "starters";

    /** The variables of a scope for one subject, or why they cannot be formed. */
    public record Values(Map<String, Object> values, Optional<String> missing) {
        public static Values missing(String why) {
            return new Values(Map.of(), Optional.of(why));
        }
    }

    /**
     * What a type says of its element for the section's variables.
     *
     * @param noun             what the element is called in the rules' messages ({@code cap}, {@code footing})
     * @param castAgainstSides what the side faces are cast against, as the rules read it
     * @param sigmaQp          the quasi-permanent steel stress of each direction's bottom bars, MPa
     */
    public record SectionFacts(String noun, RectangularPlan plan, double depthMm, Materials materials, Reinforcement r, Section s,
                               double fck, double fctm, double fctd, double fyd, String castAgainst,
                               String castAgainstSides, double coverDeviationMm,
                               boolean hasQuasiPermanentCase, ToDoubleFunction<Axis> sigmaQp) {
    }

    /** The section's values of one run of an element's checks, formed the first time a scope needs them. */
    public static final class Once {
        private Map<String, Object> values;

        /** The values {@code form} gives the first time; the same values after. */
        public Map<String, Object> get(Supplier<Map<String, Object>> form) {
            if (values == null) {
                values = Collections.unmodifiableMap(form.get());
            }
            return values;
        }
    }

    private DetailingVariables() {
    }

    public static Map<String, List<String>> subjects() {
        return Map.of(SECTION, List.of(""), BARS, List.of("x", "y"), STARTERS, List.of(""));
    }

    /**
     * The section's variables with units, descriptions and example values (used to type-check rule
     * expressions at load); the one a type describes in its own words is passed in, and the type's noun
     * ({@code element}: what a rule's message calls the element, e.g. "the {element} gives {available} mm").
     */
    public static Map<String, Variable> section(String noun, Variable castAgainstSides) {
        Map<String, Variable> s = new LinkedHashMap<>();
        s.put("element", Variable.text("what the element is called in messages: cap or footing", noun));
        s.put("h", Variable.number("mm", "overall depth h", 1200));
        s.put("plan_x", Variable.number("mm", "plan length along x", 2700).written("Lx"));
        s.put("plan_y", Variable.number("mm", "plan length along y", 2700).written("Ly"));
        s.put("fck", Variable.number("MPa", "characteristic cylinder strength", 32));
        s.put("fyk", Variable.number("MPa", "characteristic yield strength of the bars", 500));
        s.put("fctm", Variable.number("MPa", "mean tensile strength (Table 3.1)", 3.0));
        s.put("fctd", Variable.number("MPa", "design tensile strength αct·fctk,0.05/γc", 1.4));
        s.put("fyd", Variable.number("MPa", "design yield strength fyk/γs", 435));
        s.put("dg", Variable.number("mm", "largest nominal aggregate size", 20));
        s.put("structural_class", Variable.number("-", "structural class as a number (S4 → 4)", 4));
        s.put("exposure", Variable.textList("exposure classes (Table 4.1)", List.of("XC2")));
        s.put("cast_against", Variable.text("what the bottom face is cast against: blinding, soil or formwork",
                "blinding"));
        s.put("cast_against_sides", castAgainstSides);
        s.put("cover_bottom", Variable.number("mm", "stated nominal bottom cover", 75).written("c_bottom"));
        s.put("cover_top", Variable.number("mm", "stated nominal top cover", 50).written("c_top"));
        s.put("cover_side", Variable.number("mm", "stated nominal side cover", 75).written("c_side"));
        s.put("delta_c_dev", Variable.number("mm", "Δc_dev as stated, else the ruleset's cover_deviation", 10).written("Δcdev"));
        s.put("phi_bottom", Variable.number("mm", "largest bar of the bottom layer 1", 25).written("φbottom"));
        s.put("phi_top", Variable.number("mm", "largest top bar (0 when none)", 16).written("φtop"));
        s.put("phi_side", Variable.number("mm", "side bars (else the largest bottom bar)", 12).written("φside"));
        s.put("as_x", Variable.number("mm2", "area of the bottom x-bars", 5000).written("As,x"));
        s.put("as_y", Variable.number("mm2", "area of the bottom y-bars", 5000).written("As,y"));
        s.put("ac_x", Variable.number("mm2", "concrete section across the x-bars: plan_y·h", 3.2e6).written("Ac,x"));
        s.put("ac_y", Variable.number("mm2", "concrete section across the y-bars: plan_x·h", 3.2e6).written("Ac,y"));
        s.put("has_sls_qp", Variable.bool("a sls-quasi-permanent action case is given"));
        s.put("sigma_qp_x", Variable.number("MPa", "quasi-permanent stress in the x-bars (0 without a QP case)", 250).written("σs,qp,x"));
        s.put("sigma_qp_y", Variable.number("MPa", "quasi-permanent stress in the y-bars (0 without a QP case)", 250).written("σs,qp,y"));
        s.put("phi_x", Variable.number("mm", "largest bottom x-bar", 25).written("φx"));
        s.put("phi_y", Variable.number("mm", "largest bottom y-bar", 25).written("φy"));
        s.put("spacing_x", Variable.number("mm", "centre spacing of the bottom x-bars", 200).written("sx"));
        s.put("spacing_y", Variable.number("mm", "centre spacing of the bottom y-bars", 200).written("sy"));
        return s;
    }

    /** The starter-bar scope: the section's variables and the starters'. */
    public static Map<String, Variable> starters(Map<String, Variable> section) {
        Map<String, Variable> starters = new LinkedHashMap<>(section);
        starters.put("phi", Variable.number("mm", "starter bar diameter", 25).written("φ"));
        starters.put("count", Variable.number("-", "number of starter bars", 8).written("n"));
        starters.put("phi_layer1", Variable.number("mm", "largest bottom bar of layer 1", 25).written("φ1"));
        starters.put("phi_layer2", Variable.number("mm", "largest bottom bar of layer 2 (0 when none)", 25).written("φ2"));
        return starters;
    }

    /** The section's values, in the order of {@link #section}. */
    public static Map<String, Object> sectionValues(SectionFacts f) {
        Reinforcement r = f.r();
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("element", f.noun());
        v.put("h", f.depthMm());
        v.put("plan_x", f.plan().planXMm());
        v.put("plan_y", f.plan().planYMm());
        v.put("fck", f.fck());
        v.put("fyk", f.materials().fykMpa());
        v.put("fctm", f.fctm());
        v.put("fctd", f.fctd());
        v.put("fyd", f.fyd());
        v.put("dg", f.materials().aggregateMm());
        v.put("structural_class", digits(f.materials().structuralClass()));
        v.put("exposure", f.materials().exposure());
        v.put("cast_against", f.castAgainst());
        v.put("cast_against_sides", f.castAgainstSides());
        v.put("cover_bottom", r.cover().bottomMm());
        v.put("cover_top", r.cover().topMm());
        v.put("cover_side", r.cover().sideMm());
        v.put("delta_c_dev", f.materials().coverDeviationMm().orElse(f.coverDeviationMm()));
        v.put("phi_bottom", layerDiameter(r, 1));
        v.put("phi_top", r.top().stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        v.put("phi_side", r.sides().map(Reinforcement.SideBars::diameterMm)
                .orElse(r.bottom().stream().mapToDouble(BarSet::diameterMm).max().orElse(0)));
        v.put("as_x", f.s().asX().value());
        v.put("as_y", f.s().asY().value());
        v.put("ac_x", f.plan().planYMm() * f.depthMm());
        v.put("ac_y", f.plan().planXMm() * f.depthMm());
        v.put("has_sls_qp", f.hasQuasiPermanentCase());
        for (Axis axis : Axis.values()) {
            List<BarSet> sets = bars(f.s(), axis);
            v.put("sigma_qp_" + axis.label(), f.sigmaQp().applyAsDouble(axis));
            v.put("phi_" + axis.label(), sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
            v.put("spacing_" + axis.label(), centreSpacing(axis.width(f.plan()), r.cover().sideMm(), sets));
        }
        return v;
    }

    /** The starter scope's own values (after the section's). */
    public static Map<String, Object> starterValues(Reinforcement r, StarterBars starters) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("phi", starters.diameterMm());
        v.put("count", (double) starters.count());
        v.put("phi_layer1", layerDiameter(r, 1));
        v.put("phi_layer2", layerDiameter(r, 2));
        return v;
    }

    /** The bottom bars of one direction. */
    public static List<BarSet> bars(Section s, Axis axis) {
        return axis == Axis.X ? s.xBars() : s.yBars();
    }

    private static double centreSpacing(double width, double sideCover, List<BarSet> sets) {
        int n = sets.stream().mapToInt(BarSet::count).sum();
        double phi = sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0);
        return n < 2 ? 0 : (width - 2 * sideCover - phi) / (n - 1);
    }

    /** The number the digits of {@code text} write ({@code S4} → 4). */
    private static double digits(String text) {
        StringBuilder digits = new StringBuilder(2);
        text.chars().filter(c -> c >= '0' && c <= '9').forEach(c -> digits.append((char) c));
        return Double.parseDouble(digits.toString());
    }

    private static double layerDiameter(Reinforcement r, int layer) {
        return r.bottom().stream().filter(b -> b.layer() == layer).mapToDouble(BarSet::diameterMm).max().orElse(0);
    }
}
