package dev.countercheck.element.pilecap;

import dev.countercheck.element.PlanGeometry;
import dev.countercheck.element.PunchingFace;
import dev.countercheck.element.Section;
import dev.countercheck.element.pilecap.PileCapContext.UlsCase;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Punching;
import dev.countercheck.eurocode.Shear;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.statics.ColumnOutline;
import dev.countercheck.statics.ControlPerimeter;

import java.util.ArrayList;
import java.util.List;

/** {@code punching-face} (6.4.5(3)) and {@code punching-perimeter} (6.4.4). */
final class PunchingChecks {

    /** A reduced load below this share of N is the rounding residue of piles wholly inside the perimeter. */
    private static final double LOAD_RESIDUE = 1e-9;

    private PunchingChecks() {
    }

    static CheckOutcome face(PileCapContext ctx) {
        return PunchingFace.check(Checks.builder("punching-face"), new PunchingFace.Inputs(ctx.section,
                ctx.cap.column(), ctx.uls.stream().map(UlsCase::action).toList(), ctx.fck.value(), ctx.fcdShear,
                ctx.rules), PileCapReviewer.NOUN);
    }

    /**
     * One control perimeter at distance a: its length on the cap, the reduced load of its worst case, β by
     * value (the governing perimeter's trace is written once the search is over) and the resistance.
     */
    private record Perimeter(double aMm, double uMm, double[] shares, double vEdRedKn, double beta, UlsCase c,
                             double vRdMpa, double vRdKn) {
        double utilisation() {
            return beta * vEdRedKn / vRdKn;
        }
    }

    /**
     * The control perimeter of greatest VEd,red/VRd among those at a = Δa, 2Δa, ... 2d from the column
     * face (EN 1992-1-1 6.4.4(2), 6.4.2(4)); not applicable when none carries a reduced load.
     */
    static CheckOutcome perimeter(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("punching-perimeter");
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d and ρ are unknown").build();
        }
        Section section = ctx.section.get();
        Step d = b.trace(section.dMean());
        Step step = b.trace(ctx.rules.parameter("punching_search_step").asStep());
        double rhoX = section.asX().value() / (ctx.cap.planYMm() * section.dx().value());
        double rhoY = section.asY().value() / (ctx.cap.planXMm() * section.dy().value());
        Step rho = b.trace(Punching.rhoMean(rhoX, rhoY));
        Step k = b.trace(Shear.kSize(d.value()));
        double cRdc = ctx.rules.number("c_rdc_factor") / ctx.rules.number("gamma_c");
        double fckV = b.trace(ctx.fckShear).value();
        Step stress = b.trace(Shear.vRdcStress(cRdc, k.value(), rho.value(), fckV));
        Step vMin = b.trace(Shear.vMin(ctx.rules.number("v_min_coefficient"), k.value(), fckV));
        int count = (int) Math.ceil(2 / step.value() - 1e-9);
        ColumnOutline column = PlanGeometry.outline(ctx.cap.column());
        ControlPerimeter.Heads heads = ControlPerimeter.heads(column, PlanGeometry.points(ctx.cap.piles().positions()),
                ctx.cap.piles().diameterMm());
        Perimeter governing = null;
        for (int j = 1; j <= count; j++) {
            double a = 2 * d.value() * j / count;
            Perimeter p = at(ctx, column, heads, a, d.value(),
                    Punching.vRdEnhanced(stress.value(), vMin.value(), d.value(), a));
            if (p.vEdRedKn > 0 && p.uMm > 0 && (governing == null || p.utilisation() > governing.utilisation())) {
                governing = p;
            }
        }
        if (governing == null) {
            return b.notApplicable("no control perimeter from the column face to 2d = " + Num.f(2 * d.value())
                    + " mm carries a load: the piles within it take the whole column load").build();
        }
        Perimeter g = governing;
        b.value("a", Step.of("a", "the distance of greatest VEd,red/VRd, searched in steps of (Δa/d)·d up to 2d",
                count + " perimeters", g.aMm, "mm", "EN 1992-1-1 6.4.4(2)"));
        Step full = ControlPerimeter.full(PlanGeometry.outline(ctx.cap.column()), g.aMm);
        Step u = new Step("u", full.formula(), full.substituted(), g.uMm, "mm", full.clause(), full.remark());
        if (g.uMm < full.value() - 1e-6) {
            u = u.remarked("only the " + Num.f(g.uMm) + " mm of the " + Num.f(full.value())
                    + " mm perimeter on the cap counts (EN 1992-1-1 6.4.2(4))");
        }
        b.value("u", u);
        List<String> relief = new ArrayList<>();
        for (int i = 0; i < g.shares.length; i++) {
            if (g.shares[i] > 0) {
                relief.add("P" + (i + 1) + "·" + Num.f(g.shares[i]));
            }
        }
        String caseName = g.c.action().name();
        Step reduced = b.trace(Step.of("VEd,red", "N − Σ P_i·(share of the pile head inside u)",
                caseName + (relief.isEmpty() ? ", no pile inside" : ", inside: " + String.join(" + ", relief)),
                g.vEdRedKn, "kN", "EN 1992-1-1 6.4.4(2)"));
        Step beta = b.trace(ControlPerimeter.beta(column, g.aMm, g.vEdRedKn, g.c.action().mxKnm(),
                g.c.action().myKnm()));
        b.governing(caseName);
        Step ved = b.value("ved", Step.of("β·VEd,red", "β·VEd,red", Num.f(beta.value()) + "·"
                + Num.f(reduced.value()), beta.value() * reduced.value(), "kN", "EN 1992-1-1 6.4.4(2), Exp. (6.51)"));
        Step vRd = b.trace(Punching.vRdEnhanced(stress.value(), vMin.value(), d.value(), g.aMm));
        Step vrd = b.value("vrd", Step.of("VRd", "vRd·u·d", Num.f(vRd.value()) + "·" + Num.f(g.uMm) + "·"
                + Num.f(d.value()) + "/1000", g.vRdKn, "kN", "EN 1992-1-1 6.4.4(2)"));
        b.require(ved.value(), vrd.value(), FindingKind.CAPACITY, "capacity", "β·VEd,red = " + Num.f(ved.value()) + " kN at the"
                + " control perimeter a = " + Num.f(g.aMm) + " mm from the column face exceeds VRd = "
                + Num.f(vrd.value()) + " kN.");
        return b.build();
    }

    /** The perimeter at distance a, the worst ULS case (column actions alone) and its resistance. */
    private static Perimeter at(PileCapContext ctx, ColumnOutline column, ControlPerimeter.Heads heads, double a,
                                double d, Step vRd) {
        double u = ControlPerimeter.lengthInPlan(column, a, ctx.cap.planXMm(), ctx.cap.planYMm());
        double[] shares = new double[ctx.cap.piles().positions().size()];
        for (int i = 0; i < shares.length; i++) {
            shares[i] = heads.shareInside(i, a);
        }
        Perimeter worst = new Perimeter(a, u, shares, 0, 1, null, vRd.value(), vRd.value() * u * d / 1000);
        for (UlsCase c : ctx.uls) {
            double[] p = c.columnOnly().reactionsKn();
            double v = c.action().nKn();
            for (int i = 0; i < p.length; i++) {
                v -= p[i] * shares[i];
            }
            if (v > LOAD_RESIDUE * c.action().nKn()) {
                Perimeter here = new Perimeter(a, u, shares, v, ControlPerimeter.betaValue(column, a, v,
                        c.action().mxKnm(), c.action().myKnm()), c, vRd.value(), vRd.value() * u * d / 1000);
                if (here.utilisation() > worst.utilisation()) {
                    worst = here;
                }
            }
        }
        return worst;
    }
}
