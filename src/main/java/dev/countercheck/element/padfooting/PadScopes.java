package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.element.DetailingVariables;
import dev.countercheck.element.DetailingVariables.Values;
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
import java.util.function.BiFunction;

import static dev.countercheck.element.DetailingVariables.BARS;
import static dev.countercheck.element.DetailingVariables.SECTION;
import static dev.countercheck.element.DetailingVariables.STARTERS;

/**
 * The variables a pad footing offers the ruleset's detailing rules, by scope, under the names every
 * element type shares: {@code section} (the whole footing), {@code bottom-bars} (one direction, subjects x
 * and y) and {@code starters}. The engine computes geometry and actions here (As,req from the bending
 * checks, the quasi-permanent steel stress); what is required of them is the ruleset's business.
 */
final class PadScopes {

    private PadScopes() {
    }

    static final Map<String, Map<String, Variable>> SCOPES = scopes();

    private static Map<String, Map<String, Variable>> scopes() {
        Map<String, Variable> s = DetailingVariables.section(PadFootingReviewer.NOUN,
                Variable.text("what the side faces are cast against: formwork for pads (the submission has no"
                        + " field for it; a listed assumption)", "formwork"));
        Map<String, Variable> bars = new LinkedHashMap<>(s);
        bars.put("phi", Variable.number("mm", "bar diameter", 16).written("φ"));
        bars.put("count", Variable.number("-", "number of bars", 12).written("n"));
        bars.put("as_provided", Variable.number("mm2", "area of the bars of this direction", 2400).written("As,prov"));
        bars.put("as_required", Variable.number("mm2", "As,req of this direction's bending check (0 when not computed)",
                1800).written("As,req"));
        bars.put("d", Variable.number("mm", "effective depth of these bars", 540));
        bars.put("b_t", Variable.number("mm", "footing width across these bars", 2200).written("bt"));
        return Map.of(SECTION, s, BARS, bars, STARTERS, DetailingVariables.starters(s));
    }

    /**
     * The values of each scope and subject of one run's detailing rules; the section's, which hold σs,qp from
     * {@code asRequired}, are formed once for them all.
     *
     * @param asRequired As,req of each direction as the bending checks computed it (mm², 0 when not computed)
     */
    static BiFunction<String, String, Values> forRun(PadContext ctx, Map<Axis, Double> asRequired) {
        DetailingVariables.Once section = new DetailingVariables.Once();
        return (scope, subject) -> values(ctx, scope, subject, asRequired, section);
    }

    private static Values values(PadContext ctx, String scope, String subject, Map<Axis, Double> asRequired,
                                 DetailingVariables.Once section) {
        if (ctx.pad.reinforcement().isEmpty() || ctx.section.isEmpty()) {
            return Values.missing("no reinforcement given");
        }
        Reinforcement r = ctx.pad.reinforcement().get();
        Map<String, Object> v = new LinkedHashMap<>(section.get(() -> sectionValues(ctx, r, asRequired)));
        if (BARS.equals(scope)) {
            Axis axis = "x".equals(subject) ? Axis.X : Axis.Y;
            List<BarSet> sets = DetailingVariables.bars(ctx.section.get(), axis);
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
            v.putAll(DetailingVariables.starterValues(r, starters.get()));
        }
        return new Values(v, Optional.empty());
    }

    private static Map<String, Object> sectionValues(PadContext ctx, Reinforcement r, Map<Axis, Double> asRequired) {
        PadFooting pad = ctx.pad;
        Section s = ctx.section.orElseThrow();
        return DetailingVariables.sectionValues(new DetailingVariables.SectionFacts(PadFootingReviewer.NOUN,
                pad, pad.depthMm(),
                pad.materials(), r, s, ctx.fck.value(), ctx.fctm.value(), ctx.fctd.value(), ctx.fyd.value(),
                pad.castAgainst().name().toLowerCase(Locale.ROOT), "formwork",
                ctx.rules.number("cover_deviation"), !ctx.cases(ActionCase.Kind.SLS_QUASI_PERMANENT).isEmpty(),
                axis -> sigmaQp(ctx, DetailingVariables.bars(s, axis), asRequired.getOrDefault(axis, 0.0))));
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


}
