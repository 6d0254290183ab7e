package dev.countercheck.element;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Punching;
import dev.countercheck.eurocode.Shear;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.statics.ColumnOutline;
import dev.countercheck.statics.ControlPerimeter;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;

import java.util.List;
import java.util.Optional;

/**
 * {@code punching-face} (EN 1992-1-1 6.4.5(3)) of any element under a column, one implementation for every
 * kind: VEd = β·N of the ULS case of greatest β·N, β of that case at the basic control perimeter (a = 2d,
 * 6.4.3(3)), against vRd,max·u0·d at the column perimeter u0. The column load is not reduced by what lies
 * inside u0 (nothing does: u0 is the column's own outline).
 */
public final class PunchingFace {

    /** What a kind hands the face check: its section, column, ULS cases and concrete strengths. */
    public record Inputs(Optional<Section> section, Column column, List<ActionCase> uls, double fckMpa,
                         Step fcdShear, Ruleset rules) {
    }

    private PunchingFace() {
    }

    /**
     * @param element what the element is called in the reasons, e.g. {@code cap} or {@code footing}
     */
    public static CheckOutcome check(CheckBuilder b, Inputs in, String element) {
        if (in.section().isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d is unknown").build();
        }
        Step d = b.trace(in.section().get().dMean());
        Column c = in.column();
        ColumnOutline outline = PlanGeometry.outline(c);
        // β by value for every case (the same double as its trace: PunchingBetaTest); the worst case's is traced.
        ControlPerimeter.BetaGeometry face = ControlPerimeter.betaGeometry(outline, 2 * d.value());
        ActionCase governing = null;
        double worst = Double.NEGATIVE_INFINITY;
        for (ActionCase a : in.uls()) {
            double n = a.nKn();
            if (n <= 0) {
                continue;
            }
            double caseBeta = ControlPerimeter.betaValue(face, n, a.mxKnm(), a.myKnm());
            if (caseBeta * n > worst) {
                worst = caseBeta * n;
                governing = a;
            }
        }
        if (governing == null) {
            return b.notApplicable("no ULS case presses the column onto the " + element).build();
        }
        String worstCase = governing.name();
        Step beta = b.value("beta", ControlPerimeter.beta(outline, 2 * d.value(), governing.nKn(), governing.mxKnm(),
                governing.myKnm()));
        b.governing(worstCase);
        Step ved = b.value("ved", Step.of("VEd", "β·N", Num.f(beta.value()) + "·" + Num.f(worst / beta.value())
                + " (" + worstCase + ")", worst, "kN", "EN 1992-1-1 6.4.3(3), 6.4.5(3)"));
        Step u0 = b.value("u0", c.shape() == ColumnShape.CIRCULAR
                ? Punching.u0Circular(c.cxMm()) : Punching.u0Rectangular(c.cxMm(), c.cyMm()));
        Step nu = b.trace(Shear.nu(in.fckMpa()));
        b.trace(in.fcdShear());
        Step factor = b.trace(in.rules().parameter("punching_vrd_max_factor").asStep());
        Step vrdMax = b.value("vrd_max", Punching.vRdMax(factor.value(), nu.value(), in.fcdShear().value(),
                u0.value(), d.value()));
        b.require(ved.value(), vrdMax.value(), FindingKind.CAPACITY, "capacity", "VEd = " + Num.f(ved.value())
                + " kN at the column face exceeds vRd,max·u0·d = " + Num.f(vrdMax.value()) + " kN.");
        return b.build();
    }
}
