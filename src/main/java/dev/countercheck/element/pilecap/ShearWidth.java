package dev.countercheck.element.pilecap;

import dev.countercheck.element.Axis;
import dev.countercheck.element.Section;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement.BarSet;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The width of a one-way shear section over widely spaced piles (common practice): the length of the
 * union of strips {@code shear_strip_width}·φ wide centred on each pile beyond the section, clipped to
 * the cap; ρl then uses the bars whose centres lie within those strips.
 *
 * @param width the effective width b, mm
 * @param as    As of the bars within it, mm2
 */
record ShearWidth(Step width, Step as) {

    /** The width and steel of the section across {@code axis} loaded by {@code piles}; the full cap when not widely spaced. */
    static ShearWidth of(PileCapContext ctx, Axis axis, List<Point> piles, Section section) {
        double capWidth = axis.width(ctx.cap);
        Step all = section.as(axis.bars());
        if (!TieBands.widelySpaced(ctx)) {
            return new ShearWidth(Step.of("b", "cap width", Num.f(capWidth), capWidth, "mm", "EN 1992-1-1 6.2.2(1)"),
                    all);
        }
        double factor = ctx.rules.number("shear_strip_width");
        double half = factor * ctx.cap.piles().diameterMm() / 2;
        List<double[]> strips = new ArrayList<>();
        for (Point p : piles) {
            double c = TieBands.across(axis, p);
            strips.add(new double[] {Math.max(-capWidth / 2, c - half), Math.min(capWidth / 2, c + half)});
        }
        strips.sort(Comparator.comparingDouble(s -> s[0]));
        List<double[]> union = new ArrayList<>();
        for (double[] s : strips) {
            if (!union.isEmpty() && s[0] <= union.get(union.size() - 1)[1]) {
                union.get(union.size() - 1)[1] = Math.max(union.get(union.size() - 1)[1], s[1]);
            } else {
                union.add(s.clone());
            }
        }
        double b = union.stream().mapToDouble(s -> Math.max(0, s[1] - s[0])).sum();
        List<BarSet> sets = axis == Axis.X ? section.xBars() : section.yBars();
        double[] centres = TieBands.barCentres(ctx.cap, axis, sets);
        int inside = 0;
        for (double c : centres) {
            inside += withinAny(c, union) ? 1 : 0;
        }
        double as = centres.length == 0 ? 0 : all.value() * inside / centres.length;
        String strips2 = String.join(" ∪ ", union.stream().map(s -> "[" + Num.f(s[0]) + ", " + Num.f(s[1]) + "]")
                .toList());
        Step width = Step.of("b", "length of ∪ strips " + Num.f(factor) + "·φ about the piles beyond the section",
                strips2, b, "mm", ctx.clauseOf("shear_strip_width"));
        Step steel = Step.of("As,b", "(bars within b)·As/n", inside + "·" + Num.f(all.value()) + "/" + centres.length,
                as, "mm2", ctx.clauseOf("shear_strip_width"));
        return new ShearWidth(width, steel);
    }

    /** Whether {@code c} lies within one of the strips (to 10⁻⁶ mm). */
    private static boolean withinAny(double c, List<double[]> strips) {
        for (double[] s : strips) {
            if (c >= s[0] - 1e-6 && c <= s[1] + 1e-6) {
                return true;
            }
        }
        return false;
    }
}
