package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.element.PerimeterSearch;
import dev.countercheck.element.PlanGeometry;
import dev.countercheck.element.PunchingFace;
import dev.countercheck.element.Section;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Punching;
import dev.countercheck.eurocode.Shear;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.statics.ColumnOutline;
import dev.countercheck.statics.ControlPerimeter;
import dev.countercheck.statics.ControlRegion;
import dev.countercheck.statics.PressureField;
import dev.countercheck.submission.ActionCase;

import java.util.List;
import java.util.Optional;

/**
 * {@code punching-face} (6.4.5(3)) and {@code punching-perimeter} (6.4.4(2)) of a pad: the column load
 * less the ground pressure inside control perimeters at a from the column face, 0 &lt; a ≤ 2d, each
 * clipped to the plan (the part off the footing does not count), β from the column's own moments with
 * W of the whole perimeter and its moment part taken on the share u'/u of the perimeter on the plan
 * ({@link dev.countercheck.eurocode.Punching#betaOnPart}).
 */
final class PunchingChecks {

    private PunchingChecks() {
    }

    static CheckOutcome face(PadContext ctx) {
        return PunchingFace.check(Checks.builder("punching-face"), new PunchingFace.Inputs(ctx.section,
                ctx.pad.column(), ctx.cases(ActionCase.Kind.ULS), ctx.fck.value(), ctx.fcdShear, ctx.rules),
                PadFootingReviewer.NOUN);
    }

    /**
     * One control perimeter of one case: a, u on the plan, the case's ground pressure, VEd,red, β (by value:
     * the governing perimeter's trace is written once the search is over), and VRd.
     */
    private record Perimeter(double aMm, double uMm, PressureField field, double vEdRedKn, double beta, ActionCase c,
                             double vRdKn) {
        double utilisation() {
            return beta * vEdRedKn / vRdKn;
        }
    }

    static CheckOutcome perimeter(PadContext ctx) {
        CheckBuilder b = Checks.builder("punching-perimeter");
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d and ρ are unknown").build();
        }
        Optional<String> unbalanced = SaggingChecks.unbalanced(ctx);
        if (unbalanced.isPresent()) {
            return b.notChecked(unbalanced.get()).build();
        }
        Section section = ctx.section.get();
        Step d = b.trace(section.dMean());
        Step step = b.trace(ctx.rules.parameter("punching_search_step").asStep());
        Step rho = b.trace(Punching.rhoMean(bandRatio(ctx, Axis.X, d.value()), bandRatio(ctx, Axis.Y, d.value())));
        Step k = b.trace(Shear.kSize(d.value()));
        double cRdc = ctx.rules.number("c_rdc_factor") / ctx.rules.number("gamma_c");
        Step stress = b.trace(Shear.vRdcStress(cRdc, k.value(), rho.value(), ctx.fck.value()));
        Step vMin = b.trace(Shear.vMin(ctx.rules.number("v_min_coefficient"), k.value(), ctx.fck.value()));
        ColumnOutline outline = PlanGeometry.outline(ctx.pad.column());
        int count = (int) Math.ceil(2 / step.value() - 1e-9);
        List<ActionCase> cases = ctx.cases(ActionCase.Kind.ULS);
        List<PressureField> fields = cases.stream()
                .map(c -> ctx.contact(ctx.resultant(c, 0)).orElseThrow().field()).toList();
        Perimeter governing = PerimeterSearch.governing(count, new Perimeters(ctx, outline, cases, fields, d.value(),
                count, stress.value(), vMin.value()));
        if (governing == null) {
            return b.notApplicable("the ground pressure within 2d = " + Num.f(2 * d.value()) + " mm of the column"
                    + " face carries the whole column load in every ULS case").build();
        }
        Perimeter g = governing;
        b.governing(g.c.name());
        b.value("a", Step.of("a", "the distance of greatest β·VEd,red/VRd, searched in steps of (Δa/d)·d up to 2d",
                count + " perimeters", g.aMm, "mm", "EN 1992-1-1 6.4.4(2)"));
        Step full = ControlPerimeter.full(outline, g.aMm);
        Step u = new Step("u", full.formula(), full.substituted(), g.uMm, "mm", full.clause(), full.remark());
        if (g.uMm < full.value() - 1e-6) {
            u = u.remarked("only the " + Num.f(g.uMm) + " mm of the " + Num.f(full.value())
                    + " mm perimeter on the footing counts (EN 1992-1-1 6.4.2(4))");
        }
        b.value("u", u);
        Step deduction = b.trace(g.field.insidePerimeter(outline, g.aMm));
        Step reduced = b.trace(Step.of("VEd,red", "N − ΔVEd", Num.f(g.vEdRedKn + deduction.value())
                + " − " + Num.f(deduction.value()), g.vEdRedKn, "kN", "EN 1992-1-1 6.4.4(2), Exp. (6.48)"));
        Step betaWhole = ControlPerimeter.beta(outline, g.aMm, g.vEdRedKn, g.c.mxKnm(), g.c.myKnm());
        Step betaPart = Punching.betaOnPart(betaWhole, g.uMm, full.value());
        if (betaPart != betaWhole) {
            b.trace(betaWhole);
        }
        Step beta = b.value("beta", betaPart);
        Step ved = b.value("ved", Step.of("β·VEd,red", "β·VEd,red", Num.f(beta.value()) + "·"
                + Num.f(reduced.value()), beta.value() * reduced.value(), "kN", "EN 1992-1-1 6.4.4(2), Exp. (6.51)"));
        Step vRd = b.trace(Punching.vRdEnhanced(stress.value(), vMin.value(), d.value(), g.aMm));
        Step vrd = b.value("vrd", Step.of("VRd", "vRd·u·d", Num.f(vRd.value()) + "·" + Num.f(g.uMm) + "·"
                + Num.f(d.value()) + "/1000", g.vRdKn, "kN", "EN 1992-1-1 6.4.4(2)"));
        return b.require(ved.value(), vrd.value(), FindingKind.CAPACITY, "capacity", "β·VEd,red = "
                + Num.f(ved.value()) + " kN at the control perimeter a = " + Num.f(g.aMm) + " mm from the column"
                + " face exceeds VRd = " + Num.f(vrd.value()) + " kN (" + g.c.name() + ").").build();
    }

    /**
     * The perimeters at a = 2d·j/count (j = 1 … count) of one pad for {@link PerimeterSearch}: the relief is
     * the ground pressure inside the perimeter in each ULS case (never less at a greater a: the pressure is
     * nowhere negative), the perimeter that of the worst case. u, its whole length and VRd of every
     * perimeter are formed first, in order.
     */
    private static final class Perimeters implements PerimeterSearch.Perimeters<double[], Perimeter> {

        /**
         * How far below the computed pressure inside a smaller perimeter that inside a greater one may come out,
         * as a share of N plus the whole ground pressure: the rounding of the clipped polygons' integrals (about
         * 10⁻¹³ of the whole), widely covered.
         */
        private static final double INTEGRAL_ROUNDING = 1e-9;

        private final ColumnOutline outline;
        private final List<ActionCase> cases;
        private final List<PressureField> fields;
        /** Per case, |N| plus the whole ground pressure: the scale of the integrals' rounding. */
        private final double[] scale;
        private final double[] a;
        private final double[] u;
        private final double[] whole;
        private final double[] vRdKn;
        private final ControlPerimeter.BetaGeometry[] geometry;

        Perimeters(PadContext ctx, ColumnOutline outline, List<ActionCase> cases, List<PressureField> fields, double d,
                   int count, double stress, double vMin) {
            this.outline = outline;
            this.cases = cases;
            this.fields = fields;
            scale = new double[cases.size()];
            for (int i = 0; i < scale.length; i++) {
                scale[i] = Math.abs(cases.get(i).nKn()) + Math.abs(fields.get(i).total().value());
            }
            a = new double[count + 1];
            u = new double[count + 1];
            whole = new double[count + 1];
            vRdKn = new double[count + 1];
            geometry = new ControlPerimeter.BetaGeometry[count + 1];
            for (int j = 1; j <= count; j++) {
                a[j] = 2 * d * j / count;
                u[j] = ControlPerimeter.lengthInPlan(outline, a[j], ctx.pad.planXMm(), ctx.pad.planYMm());
                whole[j] = ControlPerimeter.fullValue(outline, a[j]);
                vRdKn[j] = Punching.vRdEnhancedValue(stress, vMin, d, a[j]) * u[j] * d / 1000;
                geometry[j] = ControlPerimeter.betaGeometry(outline, a[j]);
            }
        }

        @Override
        public double[] none() {
            return new double[cases.size()];
        }

        @Override
        public double[] relief(int j) {
            ControlRegion region = ControlRegion.of(outline, a[j]);
            double[] inside = none();
            for (int i = 0; i < inside.length; i++) {
                inside[i] = fields.get(i).forceInsidePerimeter(region);
            }
            return inside;
        }

        @Override
        public Perimeter perimeter(int j, double[] inside) {
            Perimeter worst = null;
            for (int i = 0; i < cases.size(); i++) {
                ActionCase c = cases.get(i);
                double reduced = c.nKn() - inside[i];
                if (reduced <= 1e-9 * Math.abs(c.nKn()) || u[j] <= 0) {
                    continue;
                }
                Perimeter p = new Perimeter(a[j], u[j], fields.get(i), reduced, beta(j, c, reduced), c, vRdKn[j]);
                if (worst == null || p.utilisation() > worst.utilisation()) {
                    worst = p;
                }
            }
            return worst;
        }

        @Override
        public double utilisation(Perimeter perimeter) {
            return perimeter.utilisation();
        }

        /** β·VEd,red/VRd of the worst case with the pressure inside the smaller perimeter, less its rounding. */
        @Override
        public double bound(int j, double[] least, double[] most) {
            double bound = 0;
            for (int i = 0; i < cases.size(); i++) {
                ActionCase c = cases.get(i);
                double reduced = c.nKn() - least[i] + INTEGRAL_ROUNDING * scale[i];
                if (reduced > 1e-9 * Math.abs(c.nKn()) && u[j] > 0) {
                    bound = Math.max(bound, beta(j, c, reduced) * reduced / vRdKn[j]);
                }
            }
            return bound;
        }

        /** β of case c at perimeter j for VEd,red, on the part of the perimeter on the plan (by value). */
        private double beta(int j, ActionCase c, double reduced) {
            double betaWhole = ControlPerimeter.betaValue(geometry[j], reduced, c.mxKnm(), c.myKnm());
            return Punching.betaOnPartValue(betaWhole, u[j], whole[j]);
        }
    }

    /**
     * ρ of one direction for punching (6.4.4(1)): the bars within the column width plus 3d on each side,
     * the bars spread evenly between the side covers, over that band's width (clipped to the footing).
     */
    private static double bandRatio(PadContext ctx, Axis axis, double dMean) {
        Section s = ctx.section.orElseThrow();
        Axis across = axis == Axis.X ? Axis.Y : Axis.X;
        double width = axis.width(ctx.pad);
        double centre = across.along(ctx.pad.column().position());
        double half = across.columnHalf(ctx.pad.column()) + 3 * dMean;
        double lo = Math.max(-width / 2, centre - half);
        double hi = Math.min(width / 2, centre + half);
        double cover = ctx.pad.reinforcement().orElseThrow().cover().sideMm();
        double spread = width - 2 * cover;
        double onBand = Math.max(0, Math.min(hi, width / 2 - cover) - Math.max(lo, -width / 2 + cover));
        double as = s.as(axis.bars()).value() * onBand / spread;
        return as / ((hi - lo) * s.d(axis.bars()).value());
    }
}
