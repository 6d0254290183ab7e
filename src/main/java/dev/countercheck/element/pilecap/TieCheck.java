package dev.countercheck.element.pilecap;

import dev.countercheck.element.Axis;
import dev.countercheck.element.Section;
import dev.countercheck.element.StressBlock;

import dev.countercheck.element.pilecap.PileCapContext.UlsCase;
import dev.countercheck.eurocode.Bending;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.submission.PileCap.TieMethod;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * {@code tie-x}, {@code tie-y}: the bottom tie steel of one direction, by the truss method (single
 * node under the column centre) or, when the submission declares it, by the bending method at the
 * column face.
 */
final class TieCheck {

    private TieCheck() {
    }

    /** The governing side of one case: the sum Σ P_i·l_i (kN·mm), its terms for the trace, the case and its N. */
    private record Side(double sumKnMm, String terms, String caseName, double nKn) {
    }

    /** N (kN) of the ULS case that governs this direction's tie (crack control scales σs by it). */
    static double governingAxialForce(PileCapContext ctx, Axis axis) {
        boolean bending = ctx.cap.tieMethod() == TieMethod.BENDING;
        return governing(ctx, axis, bending ? ctx.columnHalf(axis) : 0.0).nKn;
    }

    static CheckOutcome run(PileCapContext ctx, Axis axis) {
        CheckBuilder b = Checks.builder("tie-" + axis.label());
        if (ctx.section.isEmpty()) {
            return b.notChecked("no bottom reinforcement given: d and As,prov are unknown").build();
        }
        Section section = ctx.section.get();
        Step d = b.trace(section.d(axis.bars()));
        b.trace(ctx.fyd);
        boolean bending = ctx.cap.tieMethod() == TieMethod.BENDING;
        double offset = bending ? ctx.columnHalf(axis) : 0.0;
        Side side = governing(ctx, axis, offset);
        b.governing(side.caseName);
        Step force;
        Step required;
        if (bending) {
            ctx.equivalentSquare().ifPresent(b::trace);
            b.caution("Ties of " + ctx.cap.id() + " were designed by the bending method (as declared): moments at the"
                    + " column face, rectangular stress block (EN 1992-1-1 3.1.7(3)).");
            Step moment = b.value("moment", Step.of("M", "Σ P_i·(distance beyond the column face)",
                    side.terms + " (" + side.caseName + ")", side.sumKnMm / 1000, "kNm", "EN 1992-1-1 6.1"));
            double width = axis.width(ctx.cap);
            Optional<Step> lever = StressBlock.leverArm(ctx.rules, ctx.fck.value(), b, moment.value(), width, d.value(), "");
            if (lever.isEmpty()) {
                return b.build();
            }
            Step z = b.value("z", lever.get());
            force = b.value("force", Truss.forceFromMoment(moment.value(), z.value()));
            required = b.value("as_required", Bending.asRequired(moment.value(), ctx.fyd.value(), z.value()));
        } else {
            Step z = b.value("z", Truss.leverArm(ctx.rules.number("lever_arm_factor"), d.value()));
            force = b.value("force", Truss.tieForce(side.sumKnMm, side.terms + " (" + side.caseName + ")", z.value()));
            required = b.value("as_required", Truss.tieArea(force.value(), ctx.fyd.value()));
        }
        Step all = section.as(axis.bars());
        Optional<TieBands> bands = TieBands.of(ctx, axis, axis == Axis.X ? section.xBars() : section.yBars(),
                all.value());
        Step provided;
        if (bands.isPresent()) {
            b.trace(ctx.rules.parameter("band_spacing_limit").asStep());
            b.trace(ctx.rules.parameter("band_half_width").asStep());
            b.value("as_provided_all", all);
            provided = b.value("as_provided", bands.get().counted());
            if (!bands.get().outside().isEmpty()) {
                b.caution("Piles more than " + Num.f(ctx.rules.number("band_spacing_limit")) + "φ apart: the tie"
                        + " steel belongs in bands over the piles (EN 1992-1-1 9.8.1(3)). Bottom " + axis.label()
                        + "-bars " + bands.get().outside().stream().map(String::valueOf)
                        .collect(java.util.stream.Collectors.joining(", ")) + " of " + bands.get().count()
                        + " (counted from the −" + (axis == Axis.X ? "y" : "x") + " edge) lie outside the bands and"
                        + " were not counted as tie steel.");
            }
        } else {
            provided = b.value("as_provided", all);
        }
        if (force.value() == 0) {
            return b.pass().build();
        }
        b.require(required.value(), provided.value(), FindingKind.CAPACITY, "capacity", "Bottom " + axis.label() + "-bars give "
                + Num.f(provided.value()) + " mm2, less than the " + Num.f(required.value()) + " mm2 the tie needs.");
        return b.build();
    }

    /**
     * The side and ULS case with the largest Σ P_i·l_i, l_i measured from the column centre plus
     * {@code offset} (0 for the truss node, half the column for the face), piles beyond it only.
     */
    private static Side governing(PileCapContext ctx, Axis axis, double offset) {
        double centre = axis.along(ctx.cap.column().position());
        List<Point> piles = ctx.cap.piles().positions();
        UlsCase bestCase = ctx.uls.get(0);
        int bestSign = 0;
        double bestSum = 0;
        for (UlsCase u : ctx.uls) {
            double[] p = u.withSelfWeight().reactionsKn();
            for (int sign : new int[] {1, -1}) {
                double sum = 0;
                for (int i = 0; i < piles.size(); i++) {
                    double lever = lever(axis, piles.get(i), centre, sign, offset);
                    if (lever > 0) {
                        sum += p[i] * lever;
                    }
                }
                if (sum > bestSum) {
                    bestCase = u;
                    bestSign = sign;
                    bestSum = sum;
                }
            }
        }
        if (bestSign == 0) {
            return new Side(0, "no pile beyond the column", bestCase.action().name(), bestCase.action().nKn());
        }
        // The terms are written for the governing side alone, with the levers its sum took.
        double[] p = bestCase.withSelfWeight().reactionsKn();
        List<String> terms = new ArrayList<>();
        for (int i = 0; i < piles.size(); i++) {
            double lever = lever(axis, piles.get(i), centre, bestSign, offset);
            if (lever > 0) {
                terms.add(Num.f(p[i]) + "·" + Num.f(lever));
            }
        }
        return new Side(bestSum, String.join(" + ", terms), bestCase.action().name(), bestCase.action().nKn());
    }

    /** The lever of a pile beyond the column centre plus {@code offset} on side {@code sign}; ≤ 0 when not beyond. */
    private static double lever(Axis axis, Point pile, double centre, int sign, double offset) {
        return sign * (axis.along(pile) - centre) - offset;
    }
}
