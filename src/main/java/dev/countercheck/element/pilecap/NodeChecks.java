package dev.countercheck.element.pilecap;

import dev.countercheck.element.pilecap.PileCapContext.UlsCase;
import dev.countercheck.eurocode.NodeType;
import dev.countercheck.eurocode.Nodes;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.ruleset.RuleOption;
import dev.countercheck.submission.Column;
import dev.countercheck.statics.PileGroupReactions;
import dev.countercheck.submission.Point;

/** {@code node-column} and {@code node-pile}: node stresses of the strut-and-tie model (6.5.4). */
final class NodeChecks {

    /** The choice of {@code node_column_basis} that bears the column node as a partially loaded area. */
    static final String PARTIALLY_LOADED = "partially-loaded-area";

    private NodeChecks() {
    }

    /**
     * The column node under the worst ULS case: bearing on the effective area under the eccentric
     * resultant (ex = My/N, ey = Mx/N; a circular column as the square of equal area, D·√π/2, with the
     * resultant eccentricity along one side), less the starter bars' share at σsc.
     */
    static CheckOutcome column(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("node-column");
        Column c = ctx.cap.column();
        double as = c.starterBars().map(Column.StarterBars::areaMm2).orElse(0.0);
        if (c.starterBars().isEmpty()) {
            b.caution("No column starter bars were given: the column node was checked on concrete alone.");
        }
        boolean circular = c.shape() == Column.ColumnShape.CIRCULAR;
        Step area = b.trace(Step.of("Ac,col", circular ? "π·D²/4" : "cx·cy",
                Num.f(c.cxMm()) + (circular ? "" : "·" + Num.f(c.cyMm())), c.areaMm2(), "mm2", "column size"));
        Step sigmaSc = b.trace(Nodes.steelCompressionStress(ctx.fyd.value(),
                b.trace(ctx.rules.parameter("steel_modulus").asStep()).value(),
                b.trace(ctx.rules.parameter("eps_c2").asStep()).value()));
        double side = Math.sqrt(c.areaMm2());
        Step worst = null;
        Step worstArea = null;
        String worstCase = "";
        for (UlsCase u : ctx.uls) {
            double n = u.action().nKn();
            if (n <= 0) {
                continue;
            }
            double ex = Math.abs(u.action().myKnm()) * 1000 / n;
            double ey = Math.abs(u.action().mxKnm()) * 1000 / n;
            Step aEff = circular
                    ? Step.of("A_eff", "(s − 2·e)·s, s = D·√π/2", "(" + Num.f(side) + " − 2·" + Num.f(Math.hypot(ex, ey))
                            + ")·" + Num.f(side) + " (" + u.action().name() + ")", (side - 2 * Math.hypot(ex, ey)) * side,
                            "mm2", "EN 1992-1-1 6.5.4")
                    : Step.of("A_eff", "(cx − 2·|ex|)·(cy − 2·|ey|)", "(" + Num.f(c.cxMm()) + " − 2·" + Num.f(ex) + ")·("
                            + Num.f(c.cyMm()) + " − 2·" + Num.f(ey) + ") (" + u.action().name() + ")",
                            (c.cxMm() - 2 * ex) * (c.cyMm() - 2 * ey), "mm2", "EN 1992-1-1 6.5.4");
            boolean outside = circular ? 2 * Math.hypot(ex, ey) >= side : 2 * ex >= c.cxMm() || 2 * ey >= c.cyMm();
            if (outside) {
                return b.notChecked("in " + u.action().name() + " the resultant of N and the column moments lies"
                        + " outside the column section (ex = " + Num.f(ex) + " mm, ey = " + Num.f(ey) + " mm): the"
                        + " column's own design governs the bearing there").build();
            }
            Step stress = Nodes.eccentricNodeStress(n, aEff.value(), as, area.value(), sigmaSc.value());
            if (worst == null || stress.value() > worst.value()) {
                worst = stress;
                worstArea = aEff;
                worstCase = u.action().name();
            }
        }
        if (worst == null) {
            return b.notApplicable("no ULS case presses the column onto the cap").build();
        }
        b.trace(worstArea);
        b.governing(worstCase);
        Step stress = b.value("stress", worst);
        RuleOption basis = ctx.rules.option(PileCapReviewer.NODE_COLUMN_BASIS);
        Step limit = b.value("limit", (PARTIALLY_LOADED.equals(basis.value())
                ? partiallyLoaded(ctx, b, area) : limit(ctx, b, NodeType.CCC, "node_k1"))
                .remarked(basis.name() + ": " + basis.value() + " (" + basis.origin() + ")"));
        b.require(stress.value(), limit.value(), FindingKind.CAPACITY, "capacity", "Column node stress " + Num.f(stress.value())
                + " MPa exceeds σRd,max = " + Num.f(limit.value()) + " MPa.");
        return b.build();
    }

    static CheckOutcome pile(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("node-pile");
        int n = ctx.cap.piles().count();
        double pMax = maxReaction(ctx);
        ctx.uls.stream().filter(u -> u.withSelfWeight().max() == pMax).findFirst()
                .ifPresent(u -> b.governing(u.action().name()));
        double phi = ctx.cap.piles().diameterMm();
        Step area = b.trace(Step.of("Ap", "π·φ²/4", "π·" + Num.f(phi) + "²/4", Math.PI * phi * phi / 4, "mm2",
                "circular pile head"));
        Step stress = b.value("stress", Step.of("σEd", "P,max/Ap", Num.f(pMax) + "·1000/" + Num.f(area.value()),
                pMax * 1000 / area.value(), "MPa", "EN 1992-1-1 6.5.4"));
        NodeType type = n >= 3 ? NodeType.CTT : n == 2 ? NodeType.CCT : NodeType.CCC;
        String k = n >= 3 ? "node_k3" : n == 2 ? "node_k2" : "node_k1";
        Step limit = b.value("limit", limit(ctx, b, type, k));
        b.require(stress.value(), limit.value(), FindingKind.CAPACITY, "capacity", "Pile node stress " + Num.f(stress.value())
                + " MPa exceeds σRd,max = " + Num.f(limit.value()) + " MPa (" + type + " node).");
        if (ctx.section.isPresent()) {
            Point col = ctx.cap.column().position();
            double far = ctx.cap.piles().positions().stream().mapToDouble(p -> p.distanceTo(col)).max().orElse(0);
            if (far > 0) {
                Step z = b.trace(Truss.leverArm(ctx.rules.number("lever_arm_factor"),
                        ctx.section.get().dMean().value()));
                Step angle = b.value("strut_angle", Nodes.strutAngle(z.value(), far));
                Step min = b.trace(ctx.rules.parameter("strut_angle_min").asStep());
                if (angle.value() < min.value()) {
                    b.caution("The strut to the most distant pile is at " + Num.f(angle.value()) + "° to the horizontal,"
                            + " flatter than " + Num.f(min.value()) + "°: the truss model is doubtful for this cap"
                            + " (common practice).");
                }
            }
        }
        return b.build();
    }

    /**
     * The column node's limit as a partially loaded area (6.7(2)): Ac1 is the column's section scaled about
     * its centre as far as it fits in the plan and within the depth rule of Figure 6.29 (b2 − b1 ≤ h and
     * d2 − d1 ≤ h).
     */
    private static Step partiallyLoaded(PileCapContext ctx, CheckBuilder b, Step ac0) {
        Column c = ctx.cap.column();
        double h = ctx.cap.depthMm();
        double toEdgeX = ctx.cap.planXMm() / 2 - Math.abs(c.position().xMm());
        double toEdgeY = ctx.cap.planYMm() / 2 - Math.abs(c.position().yMm());
        boolean circular = c.shape() == Column.ColumnShape.CIRCULAR;
        double scale = circular
                ? Math.min(2 * Math.min(toEdgeX, toEdgeY) / c.cxMm(), 1 + h / c.cxMm())
                : Math.min(Math.min(2 * toEdgeX / c.cxMm(), 2 * toEdgeY / c.cyMm()),
                        Math.min(1 + h / c.cxMm(), 1 + h / c.cyMm()));
        Step ac1 = b.trace(Step.of("Ac1", circular
                        ? "λ²·Ac0, λ = min(2·e,min/D; 1 + h/D)"
                        : "λ²·Ac0, λ = min(2·ex,edge/cx; 2·ey,edge/cy; 1 + h/cx; 1 + h/cy)",
                "λ = " + Num.f(scale) + " (e,edge " + Num.f(toEdgeX) + ", " + Num.f(toEdgeY) + " mm; h " + Num.f(h)
                        + " mm)", scale * scale * ac0.value(), "mm2", "EN 1992-1-1 6.7(2), (3), Figure 6.29"));
        b.trace(ctx.fcd);
        return Nodes.partiallyLoadedLimit(ctx.fcd.value(), ac1.value(), ac0.value());
    }

    private static Step limit(PileCapContext ctx, CheckBuilder b, NodeType type, String kParameter) {
        Step nuPrime = b.trace(Nodes.nuPrime(ctx.fck.value()));
        b.trace(ctx.fcd);
        Step k = b.trace(ctx.rules.parameter(kParameter).asStep());
        return Nodes.nodeLimit(type, k.value(), nuPrime.value(), ctx.fcd.value());
    }

    static double maxReaction(PileCapContext ctx) {
        return ctx.uls.stream().map(UlsCase::withSelfWeight).mapToDouble(PileGroupReactions.Distribution::max)
                .max().orElse(0);
    }
}
