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
import dev.countercheck.statics.PileGroupReactions.Distribution;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * {@code hogging-x}, {@code hogging-y}: the top steel of one direction over piles in tension. On each
 * side of the column M = Σ |P_i|·(distance of pile i beyond the column face) over the tension piles,
 * plus the cap's own weight over the part beyond the face, the own weight taking the same γG in the
 * reactions and on the cantilever (γG,sup and γG,inf both tried, the worse governs; EN 1990 Table
 * A1.2(B)). As by the rectangular stress block (EN 1992-1-1 3.1.7(3)).
 */
final class HoggingCheck {

    private HoggingCheck() {
    }

    /** The governing side: moment (kNm), its substituted terms, case and γG. */
    private record Side(double momentKnm, String terms, String caseName, String action) {
    }

    static CheckOutcome run(PileCapContext ctx, Axis axis) {
        CheckBuilder b = Checks.builder("hogging-" + axis.label());
        Side worst = governing(ctx, axis);
        if (worst == null) {
            return b.notApplicable("no pile is in tension in any ULS case (own weight × γG,sup or γG,inf)").build();
        }
        b.governing(worst.action);
        if (ctx.cap.reinforcement().isEmpty()) {
            return b.notChecked("no reinforcement given: the top steel and its depth are unknown").build();
        }
        if (ctx.addsSelfWeight()) {
            b.trace(ctx.selfWeight);
            b.trace(ctx.rules.parameter("gamma_g").asStep());
            b.trace(ctx.rules.parameter("gamma_g_inf").asStep());
        }
        Reinforcement r = ctx.cap.reinforcement().get();
        List<BarSet> top = r.top();
        List<BarSet> sets = top.stream().filter(s -> s.direction() == axis.bars()).toList();
        double phi1 = top.stream().filter(s -> s.layer() == 1).mapToDouble(BarSet::diameterMm).max()
                .orElse(top.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        Step d = b.trace(Section.depth("d,top", sets, ctx.cap.depthMm(), r.cover().topMm(), phi1));
        b.trace(ctx.fyd);
        Step moment = b.value("moment", Step.of("M,hog", "Σ |P_i|·l_i + γG·γconc·b·h·L²/2 (tension side)",
                worst.terms + " (" + worst.caseName + ")", worst.momentKnm, "kNm", "EN 1992-1-1 6.1"));
        double width = axis.width(ctx.cap);
        double as = sets.stream().mapToDouble(BarSet::areaMm2).sum();
        Step provided = b.value("as_provided", Step.of("As,top", "Σ n·π·φ²/4 (top bars)", sets.isEmpty() ? "no bars"
                : String.join(" + ", sets.stream().map(s -> s.count() + "·π·" + Num.f(s.diameterMm()) + "²/4")
                .toList()), as, "mm2", "bar areas"));
        Optional<Step> lever = StressBlock.leverArm(ctx.rules, ctx.fck.value(), b, moment.value(), width, d.value(),
                " for the hogging moment");
        if (lever.isEmpty()) {
            return b.build();
        }
        Step z = b.trace(lever.get());
        Step required = b.value("as_required", Bending.asRequired(moment.value(), ctx.fyd.value(), z.value()));
        b.require(required.value(), provided.value(), FindingKind.CAPACITY, "capacity", "Top " + axis.label() + "-bars give "
                + Num.f(provided.value()) + " mm2, less than the " + Num.f(required.value())
                + " mm2 the hogging moment over the piles in tension needs.");
        return b.build();
    }

    /**
     * The side, case and γG with the largest hogging moment, over the sides that have a pile in tension
     * beyond the column face; null when there is none.
     */
    private static Side governing(PileCapContext ctx, Axis axis) {
        Side best = null;
        for (UlsCase u : ctx.uls) {
            for (boolean sup : new boolean[] {true, false}) {
                Distribution dist = sup ? u.withSelfWeight() : u.withFavourableSelfWeight();
                double gamma = sup ? ctx.gammaSup(u.action()) : ctx.gammaInf(u.action());
                String caseName = u.action().name() + (ctx.addsSelfWeight() && !u.action().generated()
                        ? (sup ? ", γG,sup" : ", γG,inf") : "");
                for (int sign : new int[] {1, -1}) {
                    Side side = side(ctx, axis, sign, dist.reactionsKn(), gamma, caseName, u.action().name());
                    if (side != null && (best == null || side.momentKnm > best.momentKnm)) {
                        best = side;
                    }
                }
            }
        }
        return best;
    }

    /** One side of one distribution, or null when no pile beyond the face on that side is in tension. */
    private static Side side(PileCapContext ctx, Axis axis, int sign, double[] p, double gamma, String caseName,
                             String action) {
        double face = axis.along(ctx.cap.column().position()) + sign * axis.columnHalf(ctx.cap.column());
        List<Point> piles = ctx.cap.piles().positions();
        double sum = 0;
        List<String> terms = new ArrayList<>();
        for (int i = 0; i < piles.size(); i++) {
            double lever = sign * (axis.along(piles.get(i)) - face);
            if (lever > 0 && p[i] < 0) {
                sum += -p[i] * lever / 1000;
                terms.add(Num.f(-p[i]) + "·" + Num.f(lever / 1000));
            }
        }
        if (terms.isEmpty()) {
            return null;
        }
        if (ctx.addsSelfWeight()) {
            double length = Math.max(0, axis.length(ctx.cap) / 2 - sign * face);
            double perMetre = gamma * ctx.rules.number("concrete_unit_weight") * axis.width(ctx.cap) / 1000
                    * ctx.cap.depthMm() / 1000;
            sum += perMetre * Math.pow(length / 1000, 2) / 2;
            terms.add(Num.f(gamma) + "·" + Num.f(ctx.rules.number("concrete_unit_weight")) + "·"
                    + Num.f(axis.width(ctx.cap) / 1000) + "·" + Num.f(ctx.cap.depthMm() / 1000) + "·"
                    + Num.f(length / 1000) + "²/2");
        }
        return new Side(sum, String.join(" + ", terms), caseName, action);
    }
}
