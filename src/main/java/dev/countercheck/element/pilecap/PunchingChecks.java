package dev.countercheck.element.pilecap;

import dev.countercheck.element.PerimeterSearch;
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
        Perimeter governing = PerimeterSearch.governing(count, new Perimeters(ctx, d.value(), count, stress.value(),
                vMin.value()));
        if (governing == null) {
            return b.notApplicable("no control perimeter from the column face to 2d = " + Num.f(2 * d.value())
                    + " mm carries a load: the piles within it take the whole column load").build();
        }
        Perimeter g = governing;
        b.value("a", Step.of("a", "the distance of greatest VEd,red/VRd, searched in steps of (Δa/d)·d up to 2d",
                count + " perimeters", g.aMm, "mm", "EN 1992-1-1 6.4.4(2)"));
        ColumnOutline column = PlanGeometry.outline(ctx.cap.column());
        Step full = ControlPerimeter.full(column, g.aMm);
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

    /**
     * The perimeters at a = 2d·j/count (j = 1 … count) of one cap for {@link PerimeterSearch}: the relief is
     * the share of each pile head inside the perimeter (never less at a greater a), the perimeter that of the
     * worst ULS case (column actions alone). u and VRd of every perimeter are formed first, in order.
     */
    private static final class Perimeters implements PerimeterSearch.Perimeters<double[], Perimeter> {

        private final PileCapContext ctx;
        private final ColumnOutline column;
        private final ControlPerimeter.Heads heads;
        private final double[] a;
        private final double[] u;
        private final double[] vRdMpa;
        private final double[] vRdKn;
        private final ControlPerimeter.BetaGeometry[] geometry;

        Perimeters(PileCapContext ctx, double d, int count, double stress, double vMin) {
            this.ctx = ctx;
            this.column = PlanGeometry.outline(ctx.cap.column());
            this.heads = ControlPerimeter.heads(column, PlanGeometry.points(ctx.cap.piles().positions()),
                    ctx.cap.piles().diameterMm());
            a = new double[count + 1];
            u = new double[count + 1];
            vRdMpa = new double[count + 1];
            vRdKn = new double[count + 1];
            geometry = new ControlPerimeter.BetaGeometry[count + 1];
            for (int j = 1; j <= count; j++) {
                a[j] = 2 * d * j / count;
                vRdMpa[j] = Punching.vRdEnhancedValue(stress, vMin, d, a[j]);
                u[j] = ControlPerimeter.lengthInPlan(column, a[j], ctx.cap.planXMm(), ctx.cap.planYMm());
                vRdKn[j] = vRdMpa[j] * u[j] * d / 1000;
                geometry[j] = ControlPerimeter.betaGeometry(column, a[j]);
            }
        }

        @Override
        public double[] none() {
            return new double[ctx.cap.piles().positions().size()];
        }

        @Override
        public double[] relief(int j) {
            double[] shares = none();
            for (int i = 0; i < shares.length; i++) {
                shares[i] = heads.shareInside(i, a[j]);
            }
            return shares;
        }

        @Override
        public Perimeter perimeter(int j, double[] shares) {
            Perimeter worst = new Perimeter(a[j], u[j], shares, 0, 1, null, vRdMpa[j], vRdKn[j]);
            for (UlsCase c : ctx.uls) {
                double v = reduced(c, shares, shares);
                if (v > LOAD_RESIDUE * c.action().nKn()) {
                    Perimeter here = new Perimeter(a[j], u[j], shares, v, ControlPerimeter.betaValue(geometry[j], v,
                            c.action().mxKnm(), c.action().myKnm()), c, vRdMpa[j], vRdKn[j]);
                    if (here.utilisation() > worst.utilisation()) {
                        worst = here;
                    }
                }
            }
            return worst.vEdRedKn > 0 && worst.uMm > 0 ? worst : null;
        }

        @Override
        public double utilisation(Perimeter perimeter) {
            return perimeter.utilisation();
        }

        /** β·VEd,red/VRd of the worst case with the least share of each pile in compression, the most in tension. */
        @Override
        public double bound(int j, double[] least, double[] most) {
            double bound = 0;
            if (u[j] <= 0) {
                return bound;
            }
            for (UlsCase c : ctx.uls) {
                double v = reduced(c, least, most);
                if (v > LOAD_RESIDUE * c.action().nKn()) {
                    double beta = ControlPerimeter.betaValue(geometry[j], v, c.action().mxKnm(), c.action().myKnm());
                    bound = Math.max(bound, beta * v / vRdKn[j]);
                }
            }
            return bound;
        }

        /**
         * VEd,red = N − Σ P_i·share_i of case c, the share of a pile in compression from {@code compressed}, of one
         * in tension from {@code tensioned} (the same array for the perimeter's own shares).
         */
        private static double reduced(UlsCase c, double[] compressed, double[] tensioned) {
            double[] p = c.columnOnly().reactionsKn();
            double v = c.action().nKn();
            for (int i = 0; i < p.length; i++) {
                v -= p[i] * (p[i] > 0 ? compressed[i] : tensioned[i]);
            }
            return v;
        }
    }
}
