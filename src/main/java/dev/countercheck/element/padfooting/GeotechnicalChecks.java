package dev.countercheck.element.padfooting;

import dev.countercheck.element.PlanGeometry;
import dev.countercheck.element.padfooting.PadContext.Resultant;
import dev.countercheck.eurocode.BearingResistance;
import dev.countercheck.eurocode.BearingResistance.EffectiveArea;
import dev.countercheck.eurocode.BearingResistance.Resistance;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Sliding;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.statics.Overturning;
import dev.countercheck.statics.PileGroupReactions.Load;
import dev.countercheck.statics.PlanPoint;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.PadFooting.Soil;

import java.util.ArrayList;
import java.util.List;

/**
 * {@code bearing-resistance} (EN 1997-1 6.5.2, Annex D), {@code sliding} (6.5.3) and {@code overturning}
 * (EQU, EN 1990 Table A1.2(A)). Design Approach 1: combination 1 on the {@code uls} cases with the material
 * factors of M1 (1.0) and the weights × γG,sup and × γG,inf (the worse governs); combination 2 on the
 * {@code uls-geo} cases with M2 (ruleset) and the weights × 1.0; R1. Without the soil's strength or the cases
 * a check needs, it is not-checked, naming what is missing.
 */
final class GeotechnicalChecks {

    private GeotechnicalChecks() {
    }

    /** One design situation: a case, the factor on the weights, and the material factors applied. */
    private record Situation(Resultant load, String name, double gammaPhi, double gammaC, double gammaCu) {

        String caseName() {
            return load.action().name();
        }
    }

    static CheckOutcome bearingResistance(PadContext ctx) {
        CheckBuilder b = Checks.builder("bearing-resistance");
        List<String> missing = missing(ctx, true, ActionCase.Kind.ULS_GEO);
        if (!missing.isEmpty()) {
            return b.notChecked("not given: " + String.join(" and ", missing)).build();
        }
        Soil soil = ctx.pad.soil().orElseThrow();
        double gammaRv = ctx.rules.number("geo_gamma_rv");
        double depth = (soil.overburdenMm() + ctx.pad.depthMm()) / 1000;
        double gammaSoil = soil.gammaKKnM3().orElse(soil.unitWeightKnM3());
        double water = soil.groundwaterDepthMm().map(w -> w / 1000).orElse(Double.POSITIVE_INFINITY);
        double gammaW = ctx.rules.number("water_unit_weight");
        double qTotal = soil.unitWeightKnM3() * depth;
        double qEff = qTotal - gammaW * Math.max(0, depth - water);
        boolean submerged = water < depth + Math.min(ctx.pad.planXMm(), ctx.pad.planYMm()) / 1000;
        double gammaBelow = submerged ? gammaSoil - gammaW : gammaSoil;
        double worst = -1;
        Resistance governing = null;
        Situation governingSituation = null;
        EffectiveArea governingArea = null;
        for (Situation s : situations(ctx)) {
            Resultant r = s.load;
            if (r.vKn() <= 0) {
                continue;
            }
            EffectiveArea area = BearingResistance.effectiveArea(ctx.pad.planXMm(), ctx.pad.planYMm(), r.exMm(),
                    r.eyMm());
            List<Resistance> options = new ArrayList<>();
            if (soil.phiKDeg().isPresent()) {
                double phiD = BearingResistance.phiDesign(soil.phiKDeg().get(), s.gammaPhi).value();
                double cD = BearingResistance.strengthDesign("c'd", soil.cKKpa().orElse(0.0), s.gammaC).value();
                options.add(BearingResistance.drained(area, phiD, cD, qEff, gammaBelow, r.vKn(), r.action().hxKn(),
                        r.action().hyKn(), gammaRv));
            }
            if (soil.cuKKpa().isPresent()) {
                double cuD = BearingResistance.strengthDesign("cu,d", soil.cuKKpa().get(), s.gammaCu).value();
                options.add(BearingResistance.undrained(area, cuD, qTotal,
                        Math.hypot(r.action().hxKn(), r.action().hyKn()), gammaRv));
            }
            for (Resistance option : options) {
                double u = r.vKn() / option.rd().value();
                if (u > worst) {
                    worst = u;
                    governing = option;
                    governingSituation = s;
                    governingArea = area;
                }
            }
        }
        if (governing == null) {
            return b.notApplicable("no case presses the footing onto the ground").build();
        }
        Situation s = governingSituation;
        b.governing(s.caseName()).trace(ctx.footingWeight);
        b.trace(ctx.overburdenWeight);
        b.trace(Step.of("q", "γ·D (total overburden pressure at the base)", Num.f(soil.unitWeightKnM3()) + "·"
                + Num.f(depth), qTotal, "kPa", "EN 1997-1 Annex D"));
        b.trace(Step.of("q'", "γ·D − γw·(D − dw), water above the base", Num.f(qTotal) + " − " + Num.f(gammaW) + "·"
                + Num.f(Math.max(0, depth - water)), qEff, "kPa", "EN 1997-1 Annex D"));
        Step vd = b.value("vd", Step.of("Vd", "N + W (" + s.name + ")", s.load.vTerms(), s.load.vKn(), "kN",
                "EN 1997-1 6.5.2.1, Exp. (6.1)"));
        b.value("b_eff", governingArea.bEff());
        b.value("l_eff", governingArea.lEff());
        governing.trace().forEach(b::trace);
        Step rd = b.value("rd", governing.rd());
        if (soil.phiKDeg().isPresent() && submerged) {
            b.caution("The water table lies within about B below the base of " + ctx.pad.id() + ": the drained"
                    + " resistance used the submerged unit weight γ − γw below the base.");
        }
        return b.require(vd.value(), rd.value(), FindingKind.CAPACITY, "capacity", "Vd = " + Num.f(vd.value())
                + " kN exceeds Rd = " + Num.f(rd.value()) + " kN (" + s.name + ").").build();
    }

    static CheckOutcome sliding(PadContext ctx) {
        CheckBuilder b = Checks.builder("sliding");
        List<String> missing = missing(ctx, true, ActionCase.Kind.ULS_GEO);
        if (!missing.isEmpty()) {
            return b.notChecked("not given: " + String.join(" and ", missing)).build();
        }
        Soil soil = ctx.pad.soil().orElseThrow();
        double gammaRh = ctx.rules.number("geo_gamma_rh");
        double worst = -1;
        Step worstRd = null;
        Situation worstSituation = null;
        for (Situation s : situations(ctx)) {
            Resultant r = s.load;
            double hd = Math.hypot(r.action().hxKn(), r.action().hyKn());
            if (hd == 0 || r.vKn() <= 0) {
                continue;
            }
            Step rd = null;
            if (soil.phiKDeg().isPresent()) {
                double angle = soil.phiCvKDeg().orElse(soil.phiKDeg().get());
                Step phiD = BearingResistance.phiDesign(angle, s.gammaPhi);
                rd = Sliding.drained(r.vKn(), Sliding.deltaCastInPlace(phiD.value()).value(), gammaRh);
            }
            if (soil.cuKKpa().isPresent()) {
                double cuD = BearingResistance.strengthDesign("cu,d", soil.cuKKpa().get(), s.gammaCu).value();
                EffectiveArea area = BearingResistance.effectiveArea(ctx.pad.planXMm(), ctx.pad.planYMm(),
                        r.exMm(), r.eyMm());
                Step undrained = Sliding.undrained(area.area().value(), cuD, gammaRh, r.vKn(), true);
                rd = rd == null || undrained.value() < rd.value() ? undrained : rd;
            }
            if (hd / rd.value() > worst) {
                worst = hd / rd.value();
                worstRd = rd;
                worstSituation = s;
            }
        }
        if (worstRd == null) {
            return b.notApplicable("no case applies a horizontal force").build();
        }
        Situation s = worstSituation;
        b.governing(s.caseName());
        if (soil.phiKDeg().isPresent() && soil.phiCvKDeg().isEmpty()) {
            b.caution("Sliding of " + ctx.pad.id() + " used the peak φ'k for the interface, as no φ'cv,k is given:"
                    + " this is unconservative for concrete cast in place (EN 1997-1 6.5.3(10)).");
        }
        if (soil.cuKKpa().isPresent()) {
            b.caution("Undrained sliding of " + ctx.pad.id() + " limits Rd to 0.4·Vd, assuming water or air can reach"
                    + " the interface (EN 1997-1 6.5.3(12)).");
        }
        b.trace(ctx.footingWeight);
        b.trace(ctx.overburdenWeight);
        b.trace(Step.of("Vd", "N + W (least vertical load, " + s.name + ")", s.load.vTerms(), s.load.vKn(), "kN",
                "EN 1997-1 6.5.3(8)"));
        Step hd = b.value("hd", Step.of("Hd", "√(Hx² + Hy²)", "√(" + PadContext.squared(s.load.action().hxKn()) + " + "
                + PadContext.squared(s.load.action().hyKn()) + ")", Math.hypot(s.load.action().hxKn(), s.load.action().hyKn()), "kN",
                "EN 1997-1 6.5.3(2), Exp. (6.2)"));
        Step rd = b.value("rd", worstRd);
        return b.require(hd.value(), rd.value(), FindingKind.CAPACITY, "capacity", "Hd = " + Num.f(hd.value())
                + " kN exceeds the sliding resistance Rd = " + Num.f(rd.value()) + " kN (" + s.name + ").").build();
    }

    /**
     * Overturning under every {@code equ} case. The footing's and the overburden's weight only ever stabilise
     * (they act at the base centre), so they take γG,inf of EQU in every case, a generated case's γG,sup of the
     * column's permanent actions included: for static equilibrium the favourable and unfavourable parts of the
     * permanent actions are taken as separate actions (EN 1990 6.4.3.1(4) and its note).
     */
    static CheckOutcome overturning(PadContext ctx) {
        CheckBuilder b = Checks.builder("overturning");
        List<ActionCase> cases = ctx.cases(ActionCase.Kind.EQU);
        if (cases.isEmpty()) {
            return b.notChecked("not given: an action case of kind equ").build();
        }
        Step gammaInf = b.trace(ctx.rules.parameter("equ_g_inf_factor").asStep());
        double weights = gammaInf.value() * (ctx.footingWeight.value() + ctx.overburdenWeight.value());
        double h = ctx.pad.depthMm() / 1000;
        Overturning.Edge worst = null;
        String worstCase = "";
        for (ActionCase a : cases) {
            List<Load> loads = List.of(new Load("N", a.nKn(), PlanGeometry.point(ctx.pad.column().position())),
                    new Load("γG,inf·(Wf + Ws)", weights, new PlanPoint(0, 0)));
            Overturning.Edge e = Overturning.governing(Overturning.aboutEdges(ctx.pad.planXMm(), ctx.pad.planYMm(),
                    loads, a.mxKnm() + a.hyKn() * h, a.myKnm() + a.hxKn() * h, a.name()));
            if (worst == null || e.utilisation() > worst.utilisation()) {
                worst = e;
                worstCase = a.name();
            }
        }
        b.governing(worstCase).trace(ctx.footingWeight);
        b.trace(ctx.overburdenWeight);
        Step dst = b.value("m_dst", worst.mDst());
        Step stb = b.value("m_stb", worst.mStb());
        return b.require(dst.value(), stb.value(), FindingKind.CAPACITY, "capacity", "About the edge " + worst.edge()
                + " the destabilising moment " + Num.f(dst.value()) + " kNm exceeds the stabilising "
                + Num.f(stb.value()) + " kNm (" + worstCase + ").").build();
    }

    /**
     * Both combinations of Design Approach 1, the worse governing (EN 1997-1 2.4.7.3.4.2(1)P, Annex A): DA1-1 on
     * each {@code uls} case (A1 = EN 1990 Table A1.2(B), M1, R1; a designer's case with the weights × γG,sup and
     * × γG,inf, a generated one with its own factor on the permanent actions), DA1-2 on each {@code uls-geo} case
     * (A2 = Table A1.2(C), M2, R1; weights × the case's factor, 1.0 for a designer's case).
     */
    private static List<Situation> situations(PadContext ctx) {
        List<Situation> out = new ArrayList<>();
        for (ActionCase a : ctx.cases(ActionCase.Kind.ULS)) {
            if (a.generated()) {
                out.add(new Situation(ctx.resultant(a, 1.0), "DA1-1, " + a.name(), 1, 1, 1));
                continue;
            }
            out.add(new Situation(ctx.resultant(a, ctx.rules.number("gamma_g")), "DA1-1, " + a.name() + ", γG,sup",
                    1, 1, 1));
            out.add(new Situation(ctx.resultant(a, ctx.rules.number("gamma_g_inf")), "DA1-1, " + a.name()
                    + ", γG,inf", 1, 1, 1));
        }
        for (ActionCase a : ctx.cases(ActionCase.Kind.ULS_GEO)) {
            out.add(new Situation(ctx.resultant(a, 1.0), "DA1-2, " + a.name(), ctx.rules.number("geo_gamma_phi"),
                    ctx.rules.number("geo_gamma_c"), ctx.rules.number("geo_gamma_cu")));
        }
        return out;
    }

    private static List<String> missing(PadContext ctx, boolean needsStrength, ActionCase.Kind kind) {
        List<String> missing = new ArrayList<>();
        if (needsStrength && !ctx.pad.soil().map(Soil::hasStrength).orElse(false)) {
            missing.add("the soil's strength (soil.phi_k or soil.cu_k)");
        }
        if (ctx.cases(kind).isEmpty()) {
            missing.add("an action case of kind " + kind.label());
        }
        return missing;
    }
}
