package dev.countercheck.element.pilecap;

import dev.countercheck.element.pilecap.PileCapContext.UlsCase;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Punching;
import dev.countercheck.eurocode.Shear;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.List;

/** {@code punching-face} (6.4.5(3)) and {@code punching-perimeter} (6.4.4). */
final class PunchingChecks {

    private PunchingChecks() {
    }

    static CheckOutcome face(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("punching-face");
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d is unknown").build();
        }
        Step d = b.trace(ctx.section.get().dMean());
        Column c = ctx.cap.column();
        Step beta = b.trace(ctx.cap.punchingBeta()
                .map(v -> Step.of("β", "stated by the submission", Num.f(v), v, "-", "EN 1992-1-1 6.4.3(3)"))
                .orElse(Step.of("β", "no moment transfer assumed", "1.0", 1.0, "-", "EN 1992-1-1 6.4.3(3)")));
        if (ctx.cap.punchingBeta().isEmpty() && ctx.anyMoment()) {
            b.caution("Moments act on the column but no punching β was given: β = 1.0 was used at the column face,"
                    + " which understates vEd (EN 1992-1-1 6.4.3(3)).");
        }
        double nMax = ctx.maxColumnN();
        Step ved = b.value("ved", Step.of("VEd", "β·N,max", Num.f(beta.value()) + "·" + Num.f(nMax),
                beta.value() * nMax, "kN", "EN 1992-1-1 6.4.3(3)"));
        Step u0 = b.value("u0", c.shape() == ColumnShape.CIRCULAR
                ? Punching.u0Circular(c.cxMm()) : Punching.u0Rectangular(c.cxMm(), c.cyMm()));
        Step nu = b.trace(Shear.nu(ctx.fck.value()));
        b.trace(ctx.fcdShear);
        Step factor = b.trace(ctx.rules.parameter("punching_vrd_max_factor").asStep());
        Step vrdMax = b.value("vrd_max", Punching.vRdMax(factor.value(), nu.value(), ctx.fcdShear.value(),
                u0.value(), d.value()));
        b.require(ved.value(), vrdMax.value(), FindingKind.CAPACITY, "capacity", "VEd = " + Num.f(ved.value())
                + " kN at the column face exceeds vRd,max·u0·d = " + Num.f(vrdMax.value()) + " kN.");
        return b.build();
    }

    static CheckOutcome perimeter(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("punching-perimeter");
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d and ρ are unknown").build();
        }
        CapSection section = ctx.section.get();
        Step d = b.trace(section.dMean());
        double a = 2 * d.value();
        Column column = ctx.cap.column();
        List<Point> piles = ctx.cap.piles().positions();
        List<Integer> inside = new ArrayList<>();
        for (int i = 0; i < piles.size(); i++) {
            if (ControlPerimeter.distanceFromColumn(column, piles.get(i)) <= a) {
                inside.add(i);
            }
        }
        if (inside.size() == piles.size()) {
            return b.notApplicable("every pile centre lies within 2d = " + Num.f(a)
                    + " mm of the column face: the load goes straight to the piles by struts").build();
        }
        Step full = ControlPerimeter.full(column, a);
        double onCap = ControlPerimeter.lengthOnCap(ctx.cap, a);
        Step u1 = new Step("u1", full.formula() + ", a = 2d", full.substituted(), onCap, "mm", full.clause(),
                full.remark());
        if (onCap < full.value() - 1e-6) {
            u1 = u1.remarked("only the " + Num.f(onCap) + " mm of the " + Num.f(full.value())
                    + " mm perimeter on the cap counts");
        }
        b.value("u1", u1);
        double worst = Double.NEGATIVE_INFINITY;
        String worstCase = "";
        for (UlsCase u : ctx.uls) {
            double[] p = u.columnOnly().reactionsKn();
            double v = u.action().nKn();
            for (int i : inside) {
                v -= p[i];
            }
            if (v > worst) {
                worst = v;
                worstCase = u.action().name();
            }
        }
        List<String> names = inside.stream().map(i -> "P" + (i + 1)).toList();
        Step ved = b.value("ved", Step.of("VEd,red", "N − Σ P_i inside u1 (column actions alone)",
                worstCase + (names.isEmpty() ? ", no pile inside" : ", inside: " + String.join(", ", names)),
                Math.max(0, worst), "kN", "EN 1992-1-1 6.4.4(2)"));
        double rhoX = section.asX().value() / (ctx.cap.planYMm() * section.dx().value());
        double rhoY = section.asY().value() / (ctx.cap.planXMm() * section.dy().value());
        Step rho = b.trace(Punching.rhoMean(rhoX, rhoY));
        Step k = b.trace(Shear.kSize(d.value()));
        double cRdc = ctx.rules.number("c_rdc_factor") / ctx.rules.number("gamma_c");
        Step stress = b.trace(Shear.vRdcStress(cRdc, k.value(), rho.value(), ctx.fck.value()));
        Step vMin = b.trace(Shear.vMin(ctx.rules.number("v_min_coefficient"), k.value(), ctx.fck.value()));
        Step vRd = b.trace(Punching.vRdEnhanced(stress.value(), vMin.value(), d.value(), a));
        Step vrd = b.value("vrd", Step.of("VRd", "vRd·u1·d", Num.f(vRd.value()) + "·" + Num.f(u1.value()) + "·"
                + Num.f(d.value()) + "/1000", vRd.value() * u1.value() * d.value() / 1000, "kN", "EN 1992-1-1 6.4.4"));
        b.require(ved.value(), vrd.value(), FindingKind.CAPACITY, "capacity", "VEd,red = " + Num.f(ved.value())
                + " kN at the basic control perimeter exceeds VRd = " + Num.f(vrd.value()) + " kN.");
        return b.build();
    }
}
