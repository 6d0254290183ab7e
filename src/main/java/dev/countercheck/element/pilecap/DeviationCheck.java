package dev.countercheck.element.pilecap;

import dev.countercheck.element.PlanGeometry;
import dev.countercheck.element.pilecap.PileCapContext.UlsCase;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.statics.PileGroupReactions;
import dev.countercheck.statics.PlanPoint;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.List;

/**
 * {@code pile-reactions-deviation}: each pile in turn moved by the plan tolerance δ in each of eight
 * directions (45° steps), the reactions recomputed for every ULS case; the largest reaction (own weight
 * × γG,sup) and the least (own weight × γG,inf, EN 1990 Table A1.2(B)) are reported. A caution, not a
 * failure, unless one exceeds the pile's resistance in compression or tension.
 */
final class DeviationCheck {

    private static final String BASIS = "EN 1992-1-1 9.8.1(1); 8 directions at 45° (common practice)";

    private DeviationCheck() {
    }

    static CheckOutcome run(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("pile-reactions-deviation");
        Step delta = b.trace(ctx.planTolerance());
        if (ctx.cap.piles().toleranceMm().isEmpty()) {
            b.caution("No pile positional tolerance was stated; " + Num.f(delta.value())
                    + " mm was assumed (common practice).");
        }
        List<Point> nominal = ctx.cap.piles().positions();
        if (ctx.addsSelfWeight()) {
            b.trace(ctx.rules.parameter("gamma_g").asStep());
            b.trace(ctx.rules.parameter("gamma_g_inf").asStep());
        }
        double worst = Double.NEGATIVE_INFINITY;
        Where worstAt = null;
        double least = Double.POSITIVE_INFINITY;
        Where leastAt = null;
        double nominalMax = Double.NEGATIVE_INFINITY;
        double[] offX = new double[8];
        double[] offY = new double[8];
        for (int dir = 0; dir < 8; dir++) {
            double angle = Math.toRadians(45.0 * dir);
            offX[dir] = delta.value() * Math.cos(angle);
            offY[dir] = delta.value() * Math.sin(angle);
        }
        // Each layout with one pile off position is prepared once for every case.
        List<PlanPoint> designed = PlanGeometry.points(nominal);
        PileGroupReactions.Group[][] groups = new PileGroupReactions.Group[nominal.size()][8];
        for (int moved = 0; moved < nominal.size(); moved++) {
            for (int dir = 0; dir < 8; dir++) {
                List<PlanPoint> shifted = new ArrayList<>(designed);
                Point p = nominal.get(moved);
                shifted.set(moved, new PlanPoint(p.xMm() + offX[dir], p.yMm() + offY[dir]));
                groups[moved][dir] = PileGroupReactions.group(shifted);
            }
        }
        for (UlsCase u : ctx.uls) {
            nominalMax = Math.max(nominalMax, u.withSelfWeight().max());
            for (int moved = 0; moved < nominal.size(); moved++) {
                for (int dir = 0; dir < 8; dir++) {
                    PileGroupReactions.Group group = groups[moved][dir];
                    double[] r = ctx.reactions(group, u.action(), ctx.gammaSup(u.action())).reactionsKn();
                    double[] rInf = ctx.reactions(group, u.action(), ctx.gammaInf(u.action())).reactionsKn();
                    for (int i = 0; i < r.length; i++) {
                        if (r[i] > worst) {
                            worst = r[i];
                            worstAt = new Where(i, u, moved, dir);
                        }
                        if (rInf[i] < least) {
                            least = rInf[i];
                            leastAt = new Where(i, u, moved, dir);
                        }
                    }
                }
            }
        }
        String where = worstAt == null ? "" : worstAt.text(delta);
        String whereLeast = leastAt == null ? "" : leastAt.text(delta);
        String worstCase = worstAt == null ? "" : worstAt.u().action().name();
        String leastCase = leastAt == null ? "" : leastAt.u().action().name();
        b.value("max", Step.of("P,max,δ", "max P_i with one pile off position by δ (own weight × γG,sup)", where,
                worst, "kN", BASIS));
        b.value("min", Step.of("P,min,δ", "min P_i with one pile off position by δ (own weight × γG,inf)",
                whereLeast, least, "kN", BASIS));
        double rc = ctx.cap.piles().compressionKn();
        b.governing(least < 0 && -least / ctx.cap.piles().tensionKn() > worst / rc ? leastCase : worstCase);
        b.require(worst, rc, FindingKind.CAPACITY, "capacity", capitalised(where) + " carries " + Num.f(worst)
                + " kN, more than its design resistance " + Num.f(rc) + " kN.");
        if (least < 0) {
            double rt = ctx.cap.piles().tensionKn();
            b.require(-least, rt, FindingKind.CAPACITY, "tension", capitalised(whereLeast) + " is in tension, " + Num.f(-least)
                    + " kN, beyond its tension resistance " + Num.f(rt) + " kN.");
        }
        double rise = (worst - nominalMax) / nominalMax;
        if (worst <= rc && rise > 0) {
            b.caution("With one pile " + Num.f(delta.value()) + " mm off position the largest reaction rises to "
                    + Num.f(worst) + " kN (+" + Num.f(rise * 100) + " %: " + where + "); check the as-built positions.");
        }
        return b.build();
    }

    private static String capitalised(String text) {
        return Character.toUpperCase(text.charAt(0)) + text.substring(1);
    }

    /** Where a reaction was found: pile i in case u when pile {@code moved} is δ off position in direction {@code dir}. */
    private record Where(int i, UlsCase u, int moved, int dir) {

        /** In words, written once the search is over. */
        String text(Step delta) {
            return "pile " + (i + 1) + " in " + u.action().name() + " when pile " + (moved + 1) + " is "
                    + Num.f(delta.value()) + " mm off position at " + (45 * dir) + "° from +x";
        }
    }
}
