package dev.countercheck.element.padfooting;

import dev.countercheck.element.padfooting.PadContext.Resultant;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.submission.ActionCase;

import java.util.Optional;

/**
 * {@code eccentricity} (EN 1997-1 6.5.4): the eccentricity of the resultant on the base over every case,
 * the footing's and the overburden's weight with the favourable γG of each case (γG,inf under ULS, 1.0
 * otherwise). Outside the kern under a quasi-permanent case: a note; beyond a third of the width under any
 * case: a rule not met ("special precautions"); at or beyond the edge: no equilibrium.
 */
final class EccentricityCheck {

    /** The resultant may lie within this share of the width from the centre without special precautions. */
    private static final double THIRD = 1.0 / 3;

    private EccentricityCheck() {
    }

    static CheckOutcome run(PadContext ctx) {
        CheckBuilder b = Checks.builder("eccentricity");
        double lx = ctx.pad.planXMm();
        double ly = ctx.pad.planYMm();
        Resultant ex = null;
        Resultant ey = null;
        Ground.Contact least = null;
        String outsideThird = null;
        String beyondEdge = null;
        String quasiOutsideKern = null;
        String governing = null;
        double largest = -1;
        for (ActionCase a : ctx.pad.actions()) {
            double gamma = a.kind() == ActionCase.Kind.ULS ? ctx.rules.number("gamma_g_inf") : 1.0;
            Resultant r = ctx.resultant(a, gamma);
            if (r.vKn() <= 0) {
                beyondEdge = beyondEdge == null ? a.name() + " (V = " + Num.f(r.vKn()) + " kN lifts the footing)"
                        : beyondEdge;
                continue;
            }
            if (ex == null || Math.abs(r.exMm()) > Math.abs(ex.exMm())) {
                ex = r;
            }
            if (ey == null || Math.abs(r.eyMm()) > Math.abs(ey.eyMm())) {
                ey = r;
            }
            double sx = Math.abs(r.exMm()) / lx;
            double sy = Math.abs(r.eyMm()) / ly;
            if (Math.max(sx, sy) > largest) {
                largest = Math.max(sx, sy);
                governing = a.name();
            }
            Optional<Ground.Contact> c = ctx.contact(r);
            if (c.isEmpty()) {
                beyondEdge = beyondEdge == null ? a.name() : beyondEdge;
                continue;
            }
            if (least == null || c.get().contactFraction() < least.contactFraction()) {
                least = c.get();
            }
            if ((sx > THIRD || sy > THIRD) && outsideThird == null) {
                outsideThird = a.name();
            }
            if (a.kind() == ActionCase.Kind.SLS_QUASI_PERMANENT && 6 * (sx + sy) > 1 + 1e-9
                    && quasiOutsideKern == null) {
                quasiOutsideKern = a.name();
            }
        }
        if (ex == null) {
            return b.fail(FindingKind.CAPACITY, "no-equilibrium", "No case presses the footing onto the ground: "
                    + beyondEdge + ".").build();
        }
        b.governing(governing).trace(ctx.footingWeight);
        b.trace(ctx.overburdenWeight);
        b.value("e_x", Step.of("e,x", "|My*/V|, largest over the cases", ex.exTerms(), Math.abs(ex.exMm()), "mm",
                "EN 1997-1 6.5.4"));
        b.value("e_y", Step.of("e,y", "|Mx*/V|, largest over the cases", ey.eyTerms(), Math.abs(ey.eyMm()), "mm",
                "EN 1997-1 6.5.4"));
        if (least != null) {
            b.value("contact_fraction", least.solved().contactFraction());
        }
        if (beyondEdge != null) {
            return b.fail(FindingKind.CAPACITY, "no-equilibrium", "Under " + beyondEdge + " the resultant lies at or"
                    + " beyond the footing edge: there is no equilibrium.").build();
        }
        if (outsideThird != null) {
            b.fail(FindingKind.RULE, "outside-third", "Under " + outsideThird + " the resultant lies more than a third"
                    + " of the width from the centre: special precautions are needed (EN 1997-1 6.5.4).");
        }
        if (quasiOutsideKern != null) {
            b.finding(FindingKind.REMARK, "outside-kern", "Under the quasi-permanent case " + quasiOutsideKern
                    + " the resultant lies outside the middle third: the base is not in full contact under"
                    + " permanent loads (common practice: keep it within).");
        }
        return b.pass().build();
    }
}
