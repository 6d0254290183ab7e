package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.eurocode.Anchorage;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.statics.PressureField;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.List;
import java.util.Optional;

/**
 * {@code anchorage-x/y} (EN 1992-1-1 9.8.2.2): the force in the bottom bars at x from the edge,
 * Fs = R·ze/zi (Exp. (9.13)), R the ground pressure (column actions alone) on the strip of width x, ze from
 * R to the column force acting a share of the column width inside its face, zi = (zi/d)·d (Figure 9.13's
 * simplification; x, the share and zi/d from the ruleset). The bars need lbd for σsd = min(Fs/As, fyd) and
 * have x − c_side, plus the leg of bent ends.
 */
final class AnchorageCheck {

    private AnchorageCheck() {
    }

    /** The largest bar force over the sides and ULS cases, with its strip resultant and lever arm. */
    /** @param rMm the distance of R from the column's centre line, towards the edge */
    private record Side(double fsKn, PressureField.Resultant strip, double rMm, double zeMm, String caseName) {
    }

    static CheckOutcome run(PadContext ctx, Axis axis) {
        CheckBuilder b = Checks.builder("anchorage-" + axis.label());
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: the bars, d and As,prov are unknown").build();
        }
        List<BarSet> sets = axis == Axis.X ? ctx.section.get().xBars() : ctx.section.get().yBars();
        if (sets.isEmpty()) {
            return b.notChecked("no bottom " + axis.label() + "-bars given").build();
        }
        Optional<String> unbalanced = SaggingChecks.unbalanced(ctx);
        if (unbalanced.isPresent()) {
            return b.notChecked(unbalanced.get()).build();
        }
        Reinforcement r = ctx.pad.reinforcement().orElseThrow();
        Step d = b.trace(ctx.section.get().d(axis.bars()));
        Step xShare = b.trace(ctx.rules.parameter("footing_anchorage_x").asStep());
        Step inset = b.trace(ctx.rules.parameter("footing_column_inset").asStep());
        Step ziShare = b.trace(ctx.rules.parameter("footing_zi_factor").asStep());
        double x = xShare.value() * ctx.pad.depthMm();
        double zi = ziShare.value() * d.value();
        double half = ctx.columnHalf(axis);
        Side worst = null;
        for (ActionCase a : ctx.cases(ActionCase.Kind.ULS)) {
            Ground.Contact contact = ctx.contact(ctx.resultant(a, 0)).orElseThrow();
            for (int sign : new int[] {1, -1}) {
                double line = sign * (axis.length(ctx.pad) / 2 - x);
                PressureField.Resultant strip = Ground.beyond(contact, axis, line, sign);
                double centre = axis.along(ctx.pad.column().position());
                double column = centre + sign * (half - inset.value() * 2 * half);
                double ze = Math.max(0, sign * (Ground.along(axis, strip.centroid()) - column));
                double fromCentre = sign * (Ground.along(axis, strip.centroid()) - centre);
                double fs = strip.forceKn() * ze / zi;
                if (worst == null || fs > worst.fsKn) {
                    worst = new Side(fs, strip, fromCentre, ze, a.name());
                }
            }
        }
        b.governing(worst.caseName).trace(worst.strip.force());
        String c = axis == Axis.X ? "cx" : "cy";
        Step ze = b.trace(Step.of("ze", "max(0; xR − " + c + "/2 + (e/b)·" + c + ")", "max(0; " + Num.f(worst.rMm)
                + " − " + Num.f(2 * half) + "/2 + " + Num.f(inset.value()) + "·" + Num.f(2 * half) + ")", worst.zeMm,
                "mm", "EN 1992-1-1 9.8.2.2(3), Figure 9.13"));
        Step force = b.value("force", Step.of("Fs", "R·ze/zi", Num.f(worst.strip.forceKn()) + "·" + Num.f(ze.value())
                + "/(" + Num.f(ziShare.value()) + "·" + Num.f(d.value()) + ")", worst.fsKn, "kN",
                "EN 1992-1-1 9.8.2.2(2), Exp. (9.13)"));
        double phi = sets.stream().mapToDouble(BarSet::diameterMm).max().orElseThrow();
        int count = sets.stream().mapToInt(BarSet::count).sum();
        boolean bent = sets.stream().allMatch(s -> s.ends() != BarEnds.STRAIGHT);
        Step as = b.trace(ctx.section.get().as(axis.bars()));
        double sigma = Math.min(force.value() * 1000 / as.value(), ctx.fyd.value());
        Step sigmaSd = b.trace(Step.of("σsd", "min(Fs/As, fyd)", "min(" + Num.f(force.value()) + "·1000/"
                + Num.f(as.value()) + "; " + Num.f(ctx.fyd.value()) + ")", sigma, "MPa", "EN 1992-1-1 8.4.3(2)"));
        Step fbd = b.trace(Anchorage.bondStress(true, phi, ctx.fctd.value()));
        Step lbRqd = b.value("lb_rqd", Anchorage.basicLength(phi, sigmaSd.value(), fbd.value()));
        double width = axis.width(ctx.pad);
        double clear = (width - 2 * r.cover().sideMm() - phi) / Math.max(count - 1, 1) - phi;
        double cd = bent ? Math.min(clear / 2, r.cover().sideMm())
                : Math.min(Math.min(clear / 2, r.cover().sideMm()), r.cover().bottomMm());
        b.trace(Step.of("cd", bent ? "min(a/2; c_side)" : "min(a/2; c_side; c_bottom)", "min(" + Num.f(clear) + "/2; "
                + Num.f(r.cover().sideMm()) + (bent ? "" : "; " + Num.f(r.cover().bottomMm())) + ")",
                cd, "mm", "EN 1992-1-1 8.4.4, Figure 8.3"));
        Step alpha1 = b.trace(Anchorage.alpha1(bent, Math.max(0, cd), phi));
        Step alpha2 = b.trace(Anchorage.alpha2(bent, Math.max(0, cd), phi));
        Step alpha5 = b.trace(ctx.rules.parameter("anchorage_alpha5").asStep());
        Step lbd = b.value("lbd", Anchorage.designLength(alpha1.value(), alpha2.value() * alpha5.value(), 1.0,
                lbRqd.value(), phi, true));
        double leg = sets.stream().map(BarSet::legMm).flatMap(Optional::stream).mapToDouble(Double::doubleValue)
                .min().orElse(ctx.pad.depthMm() - r.cover().bottomMm() - r.cover().topMm());
        Step available = b.value("available", Step.of("l,avail", bent ? "x − c_side + leg" : "x − c_side",
                Num.f(x) + " − " + Num.f(r.cover().sideMm()) + (bent ? " + " + Num.f(leg) : ""),
                x - r.cover().sideMm() + (bent ? leg : 0), "mm", "EN 1992-1-1 9.8.2.2(5)"));
        if (force.value() <= 0) {
            return b.pass().build();
        }
        return b.require(lbd.value(), available.value(), FindingKind.RULE, "length", "Bottom " + axis.label()
                + "-bars need lbd = " + Num.f(lbd.value()) + " mm beyond the section at x = " + Num.f(x)
                + " mm from the edge but have " + Num.f(available.value()) + " mm (" + worst.caseName + ").").build();
    }
}
