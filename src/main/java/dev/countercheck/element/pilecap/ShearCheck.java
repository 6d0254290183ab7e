package dev.countercheck.element.pilecap;

import dev.countercheck.element.Axis;
import dev.countercheck.element.Section;

import dev.countercheck.element.pilecap.PileCapContext.UlsCase;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Shear;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.Drawing.SectionLine;
import dev.countercheck.review.FindingKind;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * {@code shear-x}, {@code shear-y}: one-way shear across the full cap width (6.2.2). On each side of
 * the column the piles whose centres lie beyond the column face load the section; each pile's
 * contribution is reduced by its own β = av/2d (6.2.2(6)), av measured to a point 0.2φ inside the
 * pile face (common practice) and not taken below 0.5d.
 */
final class ShearCheck {

    private ShearCheck() {
    }

    /**
     * One side of one case, by value: the piles beyond the face (their index and distance from it), each pile's β,
     * the reduced and unreduced sums and the nearest pile's av. Its trace (av and β of each pile, the sums written
     * out: {@code 0.39·1850 + ...}) is written for the side that governs alone.
     */
    private record Side(UlsCase u, int[] beyond, double[] distances, double[] betas, double vedSum,
                        double unreducedSum, double nearestAv, List<Point> piles) {

        double ved() {
            return Math.max(0, vedSum);
        }

        double unreduced() {
            return Math.max(0, unreducedSum);
        }

        String caseName() {
            return u.action().name();
        }

        /** The reduced sum written out. */
        String vedTerms() {
            double[] p = u.withSelfWeight().reactionsKn();
            List<String> terms = new ArrayList<>();
            for (int k = 0; k < beyond.length; k++) {
                terms.add(Num.f(betas[k]) + "·" + signed(p[beyond[k]]));
            }
            return sum(terms, vedSum);
        }

        /** The unreduced sum written out. */
        String unreducedTerms() {
            double[] p = u.withSelfWeight().reactionsKn();
            List<String> terms = new ArrayList<>();
            for (int k = 0; k < beyond.length; k++) {
                terms.add(signed(p[beyond[k]]));
            }
            return sum(terms, unreducedSum);
        }
    }

    /** The trace of the side that governs: av and β of each pile beyond the face, and those of the nearest. */
    private record SideTrace(List<Step> steps, Step av, Step beta) {
        static SideTrace of(PileCapContext ctx, Side side, double dMm) {
            List<Step> steps = new ArrayList<>();
            Step nearestAv = null;
            Step nearestBeta = null;
            for (int k = 0; k < side.beyond.length; k++) {
                Step raw = shearSpan(ctx, side.beyond[k] + 1, side.distances[k]);
                Step av = Shear.avFloored(raw.value(), dMm);
                Step beta = Shear.betaShortSpan(av.value(), dMm);
                steps.add(raw);
                steps.add(av);
                steps.add(beta);
                if (nearestAv == null || av.value() < nearestAv.value()) {
                    nearestAv = av;
                    nearestBeta = beta;
                }
            }
            return new SideTrace(steps, nearestAv, nearestBeta);
        }
    }

    static CheckOutcome run(PileCapContext ctx, Axis axis) {
        CheckBuilder b = Checks.builder("shear-" + axis.label());
        placeSections(ctx, axis, b);
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d and ρl are unknown").build();
        }
        Section section = ctx.section.get();
        Step d = b.trace(section.d(axis.bars()));
        ctx.equivalentSquare().ifPresent(b::trace);
        double gammaC = ctx.rules.number("gamma_c");
        double cRdcFactor = ctx.rules.number("c_rdc_factor");
        Step cRdc = Step.of("CRd,c", "0.18/γc", Num.f(cRdcFactor) + "/" + Num.f(gammaC), cRdcFactor / gammaC,
                "-", ctx.clauseOf("c_rdc_factor"));
        Step k = Shear.kSize(d.value());
        double fckV = ctx.fckShear.value();
        Step vMin = Shear.vMin(ctx.rules.number("v_min_coefficient"), k.value(), fckV);
        Side worst = null;
        Resistance worstResistance = null;
        Side worstUnreduced = null;
        // A side's section (its piles, width and steel) is the same in every case: its resistance is formed once.
        Resistance[] resistanceOfSide = new Resistance[2];
        for (UlsCase u : ctx.uls) {
            for (int sign : new int[] {1, -1}) {
                Side side = side(ctx, axis, sign, d.value(), u);
                if (side == null) {
                    continue;
                }
                int index = sign > 0 ? 0 : 1;
                if (resistanceOfSide[index] == null) {
                    resistanceOfSide[index] = Resistance.of(ShearWidth.of(ctx, axis, side.piles, section), d.value(),
                            cRdc, k, vMin, fckV);
                }
                Resistance r = resistanceOfSide[index];
                if (worst == null || governs(side, r, worst, worstResistance)) {
                    worst = side;
                    worstResistance = r;
                }
                if (worstUnreduced == null || side.unreduced() > worstUnreduced.unreduced()) {
                    worstUnreduced = side;
                }
            }
        }
        if (worst == null) {
            return b.notApplicable("no pile centre lies beyond the column face along " + axis.label()).build();
        }
        b.governing(worst.caseName());
        SideTrace trace = SideTrace.of(ctx, worst, d.value());
        trace.steps().forEach(b::trace);
        b.value("av", trace.av());
        b.value("beta", trace.beta());
        Step ved = b.value("ved", Step.of("VEd", "Σ β_i·P_i (piles beyond the face)", worst.vedTerms(),
                worst.ved(), "kN", "EN 1992-1-1 6.2.2(6)"));
        Step unreduced = b.value("ved_unreduced", Step.of("VEd,0", "Σ P_i (piles beyond the face)",
                worstUnreduced.unreducedTerms(), worstUnreduced.unreduced(), "kN", "EN 1992-1-1 6.2.2(6)"));
        ShearWidth effective = worstResistance.effective;
        double width = b.value("b", effective.width()).value();
        Step nu = b.trace(Shear.nu(ctx.fck.value()));
        b.trace(ctx.fcdShear);
        Step vMax = b.value("vrd_max", Shear.vEdMax(nu.value(), ctx.fcdShear.value(), width, d.value()));
        b.trace(effective.as());
        b.trace(worstResistance.rho);
        b.trace(k);
        b.trace(cRdc);
        b.trace(ctx.fckShear);
        b.trace(worstResistance.stress);
        b.trace(vMin);
        Step vrdc = b.value("vrdc", worstResistance.vrdc);
        b.require(ved.value(), vrdc.value(), FindingKind.CAPACITY, "capacity", "VEd = " + Num.f(ved.value()) + " kN exceeds VRd,c = "
                + Num.f(vrdc.value()) + " kN on the section across " + axis.label() + " (" + worst.caseName() + ").");
        b.require(unreduced.value(), vMax.value(), FindingKind.CAPACITY, "strut-crushing", "Unreduced VEd = " + Num.f(unreduced.value())
                + " kN exceeds 0.5·b·d·ν·fcd = " + Num.f(vMax.value()) + " kN (EN 1992-1-1 6.2.2(6)).");
        return b.build();
    }

    /**
     * Records the critical section on each side of the column that has a pile centre beyond its face:
     * av (before the 0.5d floor, which needs d) from the face towards the nearest such pile.
     */
    private static void placeSections(PileCapContext ctx, Axis axis, CheckBuilder b) {
        for (int sign : new int[] {1, -1}) {
            double face = axis.along(ctx.cap.column().position()) + sign * ctx.columnHalf(axis);
            double nearest = Double.POSITIVE_INFINITY;
            for (Point p : ctx.cap.piles().positions()) {
                double distance = sign * (axis.along(p) - face);
                if (distance > 0) {
                    nearest = Math.min(nearest, distance);
                }
            }
            if (Double.isFinite(nearest)) {
                double av = Math.max(0, shearSpan(ctx, 0, nearest).value());
                b.section(new SectionLine(axis.label(), face + sign * av, b.id()));
            }
        }
    }

    /**
     * The distance av from the column face to the critical section, taken a share of the pile diameter
     * inside the face of pile {@code pile} (ruleset parameter, common practice 0.2φ), before the 0.5d floor.
     */
    private static Step shearSpan(PileCapContext ctx, int pile, double faceToCentreMm) {
        double phi = ctx.cap.piles().diameterMm();
        double inside = ctx.rules.number("shear_section_inside_pile");
        return Step.of("av,raw,P" + pile, "(face to pile centre) − (0.5 − i)·φ",
                Num.f(faceToCentreMm) + " − (0.5 − " + Num.f(inside) + ")·" + Num.f(phi),
                shearSpanValue(faceToCentreMm, inside, phi), "mm", ctx.clauseOf("shear_section_inside_pile"));
    }

    /** The value of {@link #shearSpan}: {@code inside} is the ruleset's share i, {@code phi} the pile diameter. */
    private static double shearSpanValue(double faceToCentreMm, double inside, double phi) {
        return faceToCentreMm - (0.5 - inside) * phi;
    }

    /** The resistance VRd,c of one side's section: its effective width, ρl, the stress and the force. */
    private record Resistance(ShearWidth effective, Step rho, Step stress, Step vrdc) {
        static Resistance of(ShearWidth effective, double dMm, Step cRdc, Step k, Step vMin, double fckV) {
            double width = effective.width().value();
            Step rho = Shear.rhoL(effective.as().value(), width, dMm);
            Step stress = Shear.vRdcStress(cRdc.value(), k.value(), rho.value(), fckV);
            return new Resistance(effective, rho, stress, Shear.vRdc(stress, vMin, width, dMm));
        }
    }

    /**
     * Whether {@code side} governs over the one found so far: the greater VEd/VRd,c (over widely spaced
     * piles the two sides of a column have their own width and steel, so the side of the greater VEd
     * need not be the critical one), then the greater VEd, then the shorter av, so that the choice
     * depends on the cap and not on the order the sides are visited in.
     */
    private static boolean governs(Side side, Resistance r, Side worst, Resistance worstR) {
        double u = side.ved() / r.vrdc.value();
        double w = worst.ved() / worstR.vrdc.value();
        if (Math.abs(u - w) > 1e-9 * Math.max(1, Math.abs(w))) {
            return u > w;
        }
        if (Math.abs(side.ved() - worst.ved()) > 1e-9 * Math.max(1, Math.abs(worst.ved()))) {
            return side.ved() > worst.ved();
        }
        return side.nearestAv < worst.nearestAv - 1e-9;
    }

    /** The side {@code sign} (+1 beyond the +face, −1 beyond the −face) of case {@code u}, or null when empty. */
    private static Side side(PileCapContext ctx, Axis axis, int sign, double dMm, UlsCase u) {
        double face = axis.along(ctx.cap.column().position()) + sign * ctx.columnHalf(axis);
        double phi = ctx.cap.piles().diameterMm();
        double inside = ctx.rules.number("shear_section_inside_pile");
        List<Point> piles = ctx.cap.piles().positions();
        double[] p = u.withSelfWeight().reactionsKn();
        int[] beyond = new int[piles.size()];
        double[] distances = new double[piles.size()];
        double[] betas = new double[piles.size()];
        int count = 0;
        double ved = 0;
        double unreduced = 0;
        double nearestAv = Double.NaN;
        List<Point> loading = new ArrayList<>();
        for (int i = 0; i < piles.size(); i++) {
            double distance = sign * (axis.along(piles.get(i)) - face);
            if (distance <= 0) {
                continue;
            }
            double av = Shear.avFlooredValue(shearSpanValue(distance, inside, phi), dMm);
            double beta = Shear.betaShortSpanValue(av, dMm);
            loading.add(piles.get(i));
            beyond[count] = i;
            distances[count] = distance;
            betas[count++] = beta;
            ved += beta * p[i];
            unreduced += p[i];
            if (count == 1 || av < nearestAv) {
                nearestAv = av;
            }
        }
        if (count == 0) {
            return null;
        }
        return new Side(u, Arrays.copyOf(beyond, count), Arrays.copyOf(distances, count),
                Arrays.copyOf(betas, count), ved, unreduced, nearestAv, loading);
    }

    /** A pile's reaction as a term of a sum: a pull in brackets. */
    private static String signed(double kn) {
        return kn < 0 ? "(" + Num.f(kn) + ")" : Num.f(kn);
    }

    /** The terms added up, in max(0; ...) when the sum is a pull (taken as no shear). */
    private static String sum(List<String> terms, double total) {
        String text = String.join(" + ", terms);
        return total < 0 ? "max(0; " + text + ")" : text;
    }
}
