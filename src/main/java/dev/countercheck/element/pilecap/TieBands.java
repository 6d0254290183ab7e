package dev.countercheck.element.pilecap;

import dev.countercheck.element.Axis;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Tie steel concentrated over widely spaced piles (EN 1992-1-1 9.8.1(3)): when the least pile spacing
 * exceeds {@code band_spacing_limit}·φ, only the bars of a direction whose centre lies within
 * {@code band_half_width}·φ of a pile centre (measured across the bars) count as tie steel. The bars
 * of a direction are placed evenly across the cap as for the bar spacing: the first centre at
 * c_side + φ/2 from the edge, the spacing (W − 2·c_side − φ)/(n − 1); each bar carries As/n.
 *
 * @param counted   As of the bars within the bands, mm2
 * @param outside   the bars (1-based, counted from the −y edge for x-bars, from −x for y-bars) that do not count
 * @param count     the number of bars of the direction
 */
record TieBands(Step counted, List<Integer> outside, int count) {

    /** The bands of {@code axis}'s bars, or empty when the piles are not widely spaced (or the cap has one pile). */
    static Optional<TieBands> of(PileCapContext ctx, Axis axis, List<BarSet> sets, double asAll) {
        PileCap cap = ctx.cap;
        double phi = cap.piles().diameterMm();
        double limit = ctx.rules.number("band_spacing_limit");
        if (sets.isEmpty() || !widelySpaced(ctx)) {
            return Optional.empty();
        }
        double halfWidth = ctx.rules.number("band_half_width") * phi;
        double[] centres = barCentres(cap, axis, sets);
        int n = centres.length;
        double spacing = n < 2 ? 0 : centres[1] - centres[0];
        List<Integer> outside = new ArrayList<>();
        int inside = 0;
        for (int i = 0; i < n; i++) {
            double at = centres[i];
            boolean over = cap.piles().positions().stream().anyMatch(p -> Math.abs(across(axis, p) - at) <= halfWidth + 1e-6);
            if (over) {
                inside++;
            } else {
                outside.add(i + 1);
            }
        }
        double counted = asAll * inside / n;
        Step step = Step.of("As,band", "(bars within " + Num.f(ctx.rules.number("band_half_width")) + "φ of a pile centre)"
                        + "·As/n", inside + "·" + Num.f(asAll) + "/" + n, counted, "mm2",
                ctx.clauseOf("band_spacing_limit"))
                .remarked("least pile spacing " + Num.f(GeometryChecks.minSpacing(cap)) + " mm > "
                        + Num.f(limit) + "·φ = " + Num.f(limit * phi) + " mm: bars placed evenly at "
                        + Num.f(spacing) + " mm, bands ±" + Num.f(halfWidth) + " mm about the pile centres");
        return Optional.of(new TieBands(step, List.copyOf(outside), n));
    }

    /** Whether the piles are widely spaced: least spacing above band_spacing_limit·φ (and two or more piles). */
    static boolean widelySpaced(PileCapContext ctx) {
        PileCap cap = ctx.cap;
        return cap.piles().count() > 1 && GeometryChecks.minSpacing(cap)
                > ctx.rules.number("band_spacing_limit") * cap.piles().diameterMm() + 1e-6;
    }

    /**
     * The centres of the bars of {@code sets} across the cap (y for x-bars, x for y-bars), placed evenly as
     * for the bar spacing: the first at c_side + φ/2 from the edge, then (W − 2·c_side − φ)/(n − 1) apart.
     */
    static double[] barCentres(PileCap cap, Axis axis, List<BarSet> sets) {
        int n = sets.stream().mapToInt(BarSet::count).sum();
        double barPhi = sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(0);
        double width = axis.width(cap);
        double side = cap.reinforcement().orElseThrow().cover().sideMm();
        double spacing = n < 2 ? 0 : (width - 2 * side - barPhi) / (n - 1);
        double first = n < 2 ? 0 : -width / 2 + side + barPhi / 2;
        double[] centres = new double[n];
        for (int i = 0; i < n; i++) {
            centres[i] = first + i * spacing;
        }
        return centres;
    }

    /** The coordinate of {@code p} across the bars of {@code axis}: y for x-bars, x for y-bars. */
    static double across(Axis axis, Point p) {
        return axis == Axis.X ? p.yMm() : p.xMm();
    }
}
