package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.element.Section;
import dev.countercheck.element.StressBlock;
import dev.countercheck.element.padfooting.PadContext.Resultant;
import dev.countercheck.eurocode.Bending;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.statics.PressureField;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.List;
import java.util.Optional;

/**
 * {@code hogging-x/y}: under partial contact the cantilever beyond the column face may hog: its own weight
 * and the overburden (γG,sup) less the ULS ground pressure on it, the pressure solved with those weights
 * included. Where it hogs the top bars are sized by the rectangular stress block (3.1.7(3)); without top
 * bars the check fails. Not applicable where every ULS case keeps the whole base in contact.
 */
final class HoggingCheck {

    private HoggingCheck() {
    }

    /** The net hogging moment of one side of one case, kNm, with its terms. */
    private record Side(double momentKnm, String terms, String caseName) {
    }

    static CheckOutcome run(PadContext ctx, Axis axis) {
        CheckBuilder b = Checks.builder("hogging-" + axis.label());
        double gamma = ctx.rules.number("gamma_g");
        double cover = ctx.pad.soil().map(s -> s.overburdenMm()).orElse(0.0);
        double soil = ctx.pad.soil().map(s -> s.unitWeightKnM3()).orElse(0.0);
        double unfactored = (ctx.rules.number("concrete_unit_weight") * ctx.pad.depthMm() + soil * cover) / 1000;
        double width = axis.width(ctx.pad);
        boolean partial = false;
        Side worst = null;
        for (ActionCase a : ctx.cases(ActionCase.Kind.ULS)) {
            Resultant r = ctx.resultant(a, gamma);
            double load = PadContext.weightFactor(a, gamma) * unfactored;
            Optional<Ground.Contact> contact = ctx.contact(r);
            if (contact.isEmpty() || contact.get().contactFraction() >= 1) {
                continue;
            }
            partial = true;
            for (int sign : new int[] {1, -1}) {
                double face = ctx.face(axis, sign);
                double length = Math.max(0, axis.length(ctx.pad) / 2 - sign * face) / 1000;
                PressureField.Resultant ground = Ground.beyond(contact.get(), axis, face, sign);
                double weight = load * width / 1000 * length * length / 2;
                double net = weight - ground.momentKnm();
                if (worst == null || net > worst.momentKnm) {
                    worst = new Side(net, Num.f(load) + "·" + Num.f(width / 1000) + "·" + Num.f(length) + "²/2 − "
                            + Num.f(ground.momentKnm()), a.name());
                }
            }
        }
        if (!partial) {
            return b.notApplicable("the whole base is in contact in every ULS case (with the weights × γG,sup)")
                    .build();
        }
        if (worst.momentKnm <= 0) {
            return b.notApplicable("under partial contact the ground pressure on each cantilever outweighs its own"
                    + " weight and the overburden: no hogging").build();
        }
        b.trace(ctx.footingWeight);
        b.trace(ctx.overburdenWeight);
        b.governing(worst.caseName).trace(ctx.rules.parameter("gamma_g").asStep());
        Step moment = b.value("moment", Step.of("M,hog", "γG·(γconc·h + γsoil·hs)·b·l²/2 − ∫ q·(distance beyond the"
                + " face) dA", worst.terms + " (" + worst.caseName + ")", worst.momentKnm, "kNm", "EN 1992-1-1 6.1"));
        Optional<Reinforcement> r = ctx.pad.reinforcement();
        List<BarSet> sets = r.map(x -> x.top().stream().filter(s -> s.direction() == axis.bars()).toList())
                .orElse(List.of());
        double as = sets.stream().mapToDouble(BarSet::areaMm2).sum();
        Step provided = b.value("as_provided", Step.of("As,top", "Σ n·π·φ²/4 (top bars)", sets.isEmpty() ? "no bars"
                : String.join(" + ", sets.stream().map(s -> s.count() + "·π·" + Num.f(s.diameterMm()) + "²/4")
                .toList()), as, "mm2", "bar areas"));
        if (sets.isEmpty()) {
            return b.fail(FindingKind.CAPACITY, "no-top-bars", "The cantilever hogs by " + Num.f(moment.value())
                    + " kNm under partial contact (" + worst.caseName + ") but no top " + axis.label()
                    + "-bars are given.").build();
        }
        List<BarSet> top = r.get().top();
        double phi1 = top.stream().filter(s -> s.layer() == 1).mapToDouble(BarSet::diameterMm).max()
                .orElse(top.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        Step d = b.trace(Section.depth("d,top", sets, ctx.pad.depthMm(), r.get().cover().topMm(), phi1));
        b.trace(ctx.fyd);
        Optional<Step> lever = StressBlock.leverArm(ctx.rules, ctx.fck.value(), b, moment.value(), width, d.value(),
                " for the hogging moment");
        if (lever.isEmpty()) {
            return b.build();
        }
        Step required = b.value("as_required", Bending.asRequired(moment.value(), ctx.fyd.value(),
                b.trace(lever.get()).value()));
        return b.require(required.value(), provided.value(), FindingKind.CAPACITY, "capacity", "Top " + axis.label()
                + "-bars give " + Num.f(provided.value()) + " mm2, less than the " + Num.f(required.value())
                + " mm2 the hogging moment needs.").build();
    }
}
