package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.element.Section;
import dev.countercheck.element.StressBlock;
import dev.countercheck.element.padfooting.PadContext.Resultant;
import dev.countercheck.eurocode.Bending;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Shear;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.Drawing.SectionLine;
import dev.countercheck.review.FindingKind;
import dev.countercheck.statics.PressureField;
import dev.countercheck.submission.ActionCase;

import java.util.Optional;

/**
 * {@code bending-x/y} (6.1) and {@code shear-x/y} (6.2.2) under the ground pressure of the column actions
 * alone (the footing's weight and the overburden are uniform and cause no bending: common practice),
 * linear without tension: the moment at the column face and the shear at d from it, over the full width
 * of the part beyond, the larger side and the worst ULS case.
 */
final class SaggingChecks {

    private SaggingChecks() {
    }

    /** The pressure on the part beyond a line of one side of one case. */
    private record Part(PressureField.Resultant resultant, String caseName, double lineMm, int sign) {
    }

    static CheckOutcome bending(PadContext ctx, Axis axis) {
        CheckBuilder b = Checks.builder("bending-" + axis.label());
        for (int sign : new int[] {1, -1}) {
            b.section(new SectionLine(axis.label(), ctx.face(axis, sign), b.id()));
        }
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d and As,prov are unknown").build();
        }
        Optional<String> unbalanced = unbalanced(ctx);
        if (unbalanced.isPresent()) {
            return b.notChecked(unbalanced.get()).build();
        }
        Section section = ctx.section.get();
        Step d = b.trace(section.d(axis.bars()));
        b.trace(ctx.fyd);
        ctx.equivalentSquare().ifPresent(b::trace);
        Part worst = worst(ctx, axis, 0, true);
        b.governing(worst.caseName);
        b.trace(worst.resultant.force());
        Step moment = b.value("moment", Step.of("MEd", "∫ q·(distance beyond the column face) dA",
                worst.resultant.moment().substituted() + " (" + worst.caseName + ")", worst.resultant.momentKnm(),
                "kNm", "EN 1992-1-1 6.1"));
        Step provided = b.value("as_provided", section.as(axis.bars()));
        Optional<Step> lever = StressBlock.leverArm(ctx.rules, ctx.fck.value(), b, moment.value(), axis.width(ctx.pad),
                d.value(), "");
        if (lever.isEmpty()) {
            return b.build();
        }
        b.trace(lever.get());
        Step required = b.value("as_required", Bending.asRequired(moment.value(), ctx.fyd.value(),
                lever.get().value()));
        return b.require(required.value(), provided.value(), FindingKind.CAPACITY, "capacity", "Bottom "
                + axis.label() + "-bars give " + Num.f(provided.value()) + " mm2, less than the "
                + Num.f(required.value()) + " mm2 the moment at the column face needs (" + worst.caseName + ").")
                .build();
    }

    static CheckOutcome shear(PadContext ctx, Axis axis) {
        CheckBuilder b = Checks.builder("shear-" + axis.label());
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d and ρl are unknown").build();
        }
        Section section = ctx.section.get();
        Step d = b.trace(section.d(axis.bars()));
        for (int sign : new int[] {1, -1}) {
            double at = ctx.face(axis, sign) + sign * d.value();
            if (Math.abs(at) < axis.length(ctx.pad) / 2) {
                b.section(new SectionLine(axis.label(), at, b.id()));
            }
        }
        Optional<String> unbalanced = unbalanced(ctx);
        if (unbalanced.isPresent()) {
            return b.notChecked(unbalanced.get()).build();
        }
        ctx.equivalentSquare().ifPresent(b::trace);
        Part worst = worst(ctx, axis, d.value(), false);
        b.governing(worst.caseName);
        Step ved = b.value("ved", Step.of("VEd", "∫ q dA beyond d from the column face",
                worst.resultant.force().substituted() + " (" + worst.caseName + ")", worst.resultant.forceKn(), "kN",
                "EN 1992-1-1 6.2.2"));
        double width = b.value("b", Step.of("b", axis == Axis.X ? "Ly" : "Lx", Num.f(axis.width(ctx.pad)),
                axis.width(ctx.pad), "mm", "EN 1992-1-1 6.2.2(1)")).value();
        Step rho = b.trace(Shear.rhoL(b.trace(section.as(axis.bars())).value(), width, d.value()));
        Step k = b.trace(Shear.kSize(d.value()));
        double gammaC = ctx.rules.number("gamma_c");
        double factor = ctx.rules.number("c_rdc_factor");
        Step cRdc = b.trace(Step.of("CRd,c", "0.18/γc", Num.f(factor) + "/" + Num.f(gammaC), factor / gammaC, "-",
                ctx.clauseOf("c_rdc_factor")));
        Step stress = b.trace(Shear.vRdcStress(cRdc.value(), k.value(), rho.value(), ctx.fck.value()));
        Step vMin = b.trace(Shear.vMin(ctx.rules.number("v_min_coefficient"), k.value(), ctx.fck.value()));
        Step vrdc = b.value("vrdc", Shear.vRdc(stress, vMin, width, d.value()));
        if (ved.value() == 0) {
            return b.pass().build();
        }
        return b.require(ved.value(), vrdc.value(), FindingKind.CAPACITY, "capacity", "VEd = " + Num.f(ved.value())
                + " kN exceeds VRd,c = " + Num.f(vrdc.value()) + " kN on the section across " + axis.label() + " ("
                + worst.caseName + ").").build();
    }

    /** Why the column actions alone give no pressure to design for, when a ULS case leaves the footing. */
    static Optional<String> unbalanced(PadContext ctx) {
        for (ActionCase a : ctx.cases(ActionCase.Kind.ULS)) {
            Resultant r = ctx.resultant(a, 0);
            if (r.vKn() <= 0 || ctx.contact(r).isEmpty()) {
                return Optional.of("under " + a.name() + " the column actions alone leave the footing (no"
                        + " equilibrium without its own weight): the pressure for the structural checks is undefined");
            }
        }
        return Optional.empty();
    }

    /**
     * The side and ULS case whose part beyond the line at {@code offset} from the column face carries the
     * largest moment ({@code byMoment}) or force.
     */
    private static Part worst(PadContext ctx, Axis axis, double offset, boolean byMoment) {
        Part worst = null;
        for (ActionCase a : ctx.cases(ActionCase.Kind.ULS)) {
            Ground.Contact c = ctx.contact(ctx.resultant(a, 0)).orElseThrow();
            for (int sign : new int[] {1, -1}) {
                double line = ctx.face(axis, sign) + sign * offset;
                PressureField.Resultant part = Ground.beyond(c, axis, line, sign);
                double value = byMoment ? part.momentKnm() : part.forceKn();
                double best = worst == null ? -1 : byMoment ? worst.resultant.momentKnm() : worst.resultant.forceKn();
                if (value > best) {
                    worst = new Part(part, a.name(), line, sign);
                }
            }
        }
        return worst;
    }
}
