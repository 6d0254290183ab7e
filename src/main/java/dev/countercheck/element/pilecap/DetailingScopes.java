package dev.countercheck.element.pilecap;

import dev.countercheck.element.Axis;
import dev.countercheck.element.DetailingVariables;
import dev.countercheck.element.DetailingVariables.Values;
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
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.BiFunction;

import static dev.countercheck.element.DetailingVariables.BARS;
import static dev.countercheck.element.DetailingVariables.SECTION;
import static dev.countercheck.element.DetailingVariables.STARTERS;

/**
 * The variables a pile cap offers the ruleset's detailing rules, by scope: {@code section} (the whole
 * element: concrete, covers and bars), {@code bottom-bars} (one direction of bottom bars, subjects x
 * and y) and {@code starters} (the column's starter bars). The names are shared with every element
 * type that has such parts. Every scope also sees the section's variables. The engine computes geometry
 * and actions here (As,req from the tie check, available lengths, the quasi-permanent steel
 * stress); what is required of them is the ruleset's business.
 */
final class DetailingScopes {

    private DetailingScopes() {
    }

    /** The section's variable a cap has and a footing has not: the pile heads cast into it. */
    private static final String EMBEDMENT = "embedment";

    /** The variables of each scope, with units, descriptions and example values. */
    static final Map<String, Map<String, Variable>> SCOPES = scopes();

    private static Map<String, Map<String, Variable>> scopes() {
        Map<String, Variable> cap = DetailingVariables.section(PileCapReviewer.NOUN,
                Variable.text("what the side faces are cast against: soil or formwork"
                        + " (formwork when the submission does not say)", "formwork"));
        cap.put(EMBEDMENT, Variable.number("mm", "pile head cast into the cap", 75));
        Map<String, Variable> bars = new LinkedHashMap<>(cap);
        bars.put("phi", Variable.number("mm", "bar diameter", 25).written("φ"));
        bars.put("count", Variable.number("-", "number of bars", 12).written("n"));
        bars.put("layer", Variable.number("-", "layer (1 nearest the soffit)", 1));
        bars.put("bent", Variable.bool("the bars have bent or hooked ends"));
        bars.put("as_provided", Variable.number("mm2", "area of the bars of this direction", 5890).written("As,prov"));
        bars.put("as_required", Variable.number("mm2", "As,req of this direction's tie (0 when not computed)", 4700).written("As,req"));
        bars.put("d", Variable.number("mm", "effective depth of these bars", 1100));
        bars.put("b_t", Variable.number("mm", "cap width across these bars", 2700).written("bt"));
        bars.put("leg", Variable.number("mm", "vertical leg of bent ends: stated, else h − c_bottom − c_top", 1000));
        bars.put("available_from_pile_centre", Variable.number("mm",
                "length along the bar from the outermost pile centre, moved outward by the plan tolerance δ"
                        + " (EN 1992-1-1 9.8.1(1)), to the bar end (shorter side)", 600));
        bars.put("has_lap", Variable.bool("the submission declares laps for these bars"));
        bars.put("lap_percent", Variable.number("-", "share of the bars lapped at one section, % (0 without laps)", 50).written("ρ1"));
        bars.put("lap_length", Variable.number("mm", "lap length provided (0 without laps)", 1200).written("l0,prov"));
        return Map.of(SECTION, cap, BARS, bars, STARTERS, DetailingVariables.starters(cap));
    }

    /**
     * The values of each scope and subject of one run's detailing rules; the section's, which hold σs,qp from
     * {@code asRequired}, are formed once for them all.
     *
     * @param asRequired As,req of each direction's tie as the tie checks computed it (mm², 0 when not computed)
     */
    static BiFunction<String, String, Values> forRun(PileCapContext ctx, Map<Axis, Double> asRequired) {
        DetailingVariables.Once section = new DetailingVariables.Once();
        return (scope, subject) -> values(ctx, scope, subject, asRequired, section);
    }

    private static Values values(PileCapContext ctx, String scope, String subject, Map<Axis, Double> asRequired,
                                 DetailingVariables.Once section) {
        PileCap cap = ctx.cap;
        if (cap.reinforcement().isEmpty() || ctx.section.isEmpty()) {
            return Values.missing("no reinforcement given");
        }
        Reinforcement r = cap.reinforcement().get();
        Map<String, Object> v = new LinkedHashMap<>(section.get(() -> capValues(ctx, r, asRequired)));
        if (BARS.equals(scope)) {
            Axis axis = "x".equals(subject) ? Axis.X : Axis.Y;
            List<BarSet> sets = DetailingVariables.bars(ctx.section.get(), axis);
            if (sets.isEmpty()) {
                return Values.missing("no bottom " + subject + "-bars given");
            }
            v.putAll(barValues(ctx, r, axis, sets, asRequired.getOrDefault(axis, 0.0)));
        } else if (STARTERS.equals(scope)) {
            Optional<StarterBars> starters = cap.column().starterBars();
            if (starters.isEmpty()) {
                return Values.missing("the column starter bars are not given");
            }
            v.putAll(DetailingVariables.starterValues(r, starters.get()));
        }
        return new Values(v, Optional.empty());
    }

    private static Map<String, Object> capValues(PileCapContext ctx, Reinforcement r, Map<Axis, Double> asRequired) {
        PileCap cap = ctx.cap;
        Section s = ctx.section.orElseThrow();
        Map<String, Object> v = DetailingVariables.sectionValues(new DetailingVariables.SectionFacts(
                PileCapReviewer.NOUN, cap, cap.depthMm(), cap.materials(), r, s, ctx.fck.value(), ctx.fctm.value(),
                ctx.fctd.value(), ctx.fyd.value(),
                cap.castAgainst().bottom().name().toLowerCase(Locale.ROOT),
                cap.castAgainst().sides().name().toLowerCase(Locale.ROOT), ctx.rules.number("cover_deviation"),
                cap.actions().stream().anyMatch(a -> a.kind() == ActionCase.Kind.SLS_QUASI_PERMANENT),
                axis -> sigmaQp(ctx, axis, DetailingVariables.bars(s, axis), asRequired.getOrDefault(axis, 0.0))));
        v.put(EMBEDMENT, cap.piles().embedmentMm());
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
        v.put("b_t", axis.width(cap));
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
        OptionalDouble nQp = ctx.cap.actions().stream().filter(a -> a.kind() == ActionCase.Kind.SLS_QUASI_PERMANENT)
                .mapToDouble(ActionCase::nKn).max();
        if (nQp.isEmpty()) {
            return Optional.empty();
        }
        double nUls = TieCheck.governingAxialForce(ctx, axis);
        return nUls > 0 ? Optional.of(nQp.getAsDouble() / nUls) : Optional.empty();
    }

    /** σs ≈ fyd·(N_qp/N_uls)·(As,req/As,prov) (crack-control), 0 without a QP case. */
    private static double sigmaQp(PileCapContext ctx, Axis axis, List<BarSet> sets, double asRequired) {
        double provided = sets.stream().mapToDouble(BarSet::areaMm2).sum();
        return quasiPermanentRatio(ctx, axis).filter(q -> provided > 0)
                .map(q -> ctx.fyd.value() * q * asRequired / provided).orElse(0.0);
    }
}
