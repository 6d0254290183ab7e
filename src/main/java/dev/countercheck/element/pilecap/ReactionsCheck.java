package dev.countercheck.element.pilecap;

import dev.countercheck.element.pilecap.PileCapContext.UlsCase;
import dev.countercheck.statics.PileGroupReactions;
import dev.countercheck.statics.PileGroupReactions.Distribution;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.review.Slugs;

/**
 * {@code pile-reactions}: the largest and least pile reactions over the ULS cases, against the
 * piles' design resistances in compression and tension. The cap's own weight takes γG,sup for the
 * largest reaction and γG,inf for the least (EN 1990 Table A1.2(B)).
 */
final class ReactionsCheck {

    private static final String BASIS = "rigid cap, linear distribution (common practice)";

    private ReactionsCheck() {
    }

    static CheckOutcome run(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("pile-reactions");
        if (ctx.addsSelfWeight()) {
            b.trace(ctx.selfWeight);
            b.trace(ctx.rules.parameter("gamma_g").asStep());
            b.trace(ctx.rules.parameter("gamma_g_inf").asStep());
        }
        Extreme max = Extreme.over(ctx, true);
        Extreme min = Extreme.over(ctx, false);
        PileGroupReactions.trace(max.distribution, max.caseName).forEach(b::trace);
        if (ctx.addsSelfWeight() || !min.caseName.equals(max.caseName)) {
            String label = ctx.addsSelfWeight() ? min.caseName + ", γG,inf" : min.caseName;
            PileGroupReactions.trace(min.distribution, label).forEach(b::trace);
        }
        b.value("max", Step.of("P,max", "max P_i over piles and ULS cases",
                "pile " + max.pile + " in " + max.caseName + governing(max.distribution), max.value, "kN", BASIS));
        b.value("min", Step.of("P,min", "min P_i over piles and ULS cases (own weight × γG,inf)",
                "pile " + min.pile + " in " + min.caseName + governing(min.distribution), min.value, "kN", BASIS));
        double rc = ctx.cap.piles().compressionKn();
        double rt = ctx.cap.piles().tensionKn();
        b.governing(min.value < 0 && -min.value / rt > max.value / rc ? min.caseName : max.caseName);
        b.require(max.value, rc, FindingKind.CAPACITY, "compression", "Pile " + max.pile + " carries " + show(max.value) + " in "
                + max.caseName + ", more than its design resistance " + show(rc) + ".");
        if (min.value < 0) {
            b.require(-min.value, rt, FindingKind.CAPACITY, "tension", "Pile " + min.pile + " is in tension, " + show(-min.value)
                    + " in " + min.caseName + ", beyond its tension resistance " + show(rt) + ".");
        }
        for (UlsCase u : ctx.uls) {
            double m = u.withSelfWeight().unresistedKnm();
            if (m > 0.5) {
                b.finding(FindingKind.RULE, "unrestrained-" + Slugs.of(u.action().name()), "The piles lie on one line: in " + u.action().name() + " a moment of "
                        + CheckBuilder.show(m, "kNm") + " about that line is not resisted by the pile group. "
                        + "It needs tie beams or another restraint, which this review did not check.");
            }
        }
        ForcePlausibility.meganewtonSlips(ctx.cap).forEach(slip -> b.finding(FindingKind.REMARK,
                "force-unit-" + Slugs.of(slip.caseName()), slip.message()));
        return b.build();
    }

    private static String show(double kn) {
        return Num.f(kn) + " kN";
    }

    /**
     * The governing reaction of one kind over all ULS cases: the largest with the own weight × γG,sup,
     * the least with the own weight × γG,inf.
     */
    private record Extreme(double value, int pile, String caseName, Distribution distribution) {

        static Extreme over(PileCapContext ctx, boolean largest) {
            Extreme best = null;
            for (UlsCase u : ctx.uls) {
                Distribution d = largest ? u.withSelfWeight() : u.withFavourableSelfWeight();
                double[] p = d.reactionsKn();
                for (int i = 0; i < p.length; i++) {
                    boolean better = best == null || (largest ? p[i] > best.value : p[i] < best.value);
                    if (better) {
                        best = new Extreme(p[i], i + 1, u.action().name(), d);
                    }
                }
            }
            return best;
        }
    }

    /** The governing case written out as numbers: " (V = 3000 kN, Mx* = 0 kNm, My* = 90 kNm)". */
    private static String governing(PileGroupReactions.Distribution d) {
        return " (V = " + Num.f(d.totalKn()) + " kN, Mx* = " + Num.f(d.mxStarKnm()) + " kNm, My* = "
                + Num.f(d.myStarKnm()) + " kNm)";
    }
}
