package dev.countercheck.report;

import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.List;

/**
 * The dimensions of a plan, in mm: overall length above and width at the left, and chains of the
 * pile positions from edge to edge below (along x) and at the right (along y).
 */
final class PlanDimensions {

    /** Coordinates closer than this are one position of the chain, mm. */
    private static final double SAME_MM = 0.5;

    private PlanDimensions() {
    }

    static void draw(Svg svg, PlanFrame f) {
        PileCap cap = f.cap();
        double overallY = f.top() - 48;
        Annotations.extension(svg, f.left(), f.top() - 4, f.left(), overallY - 4);
        Annotations.extension(svg, f.right(), f.top() - 4, f.right(), overallY - 4);
        Annotations.horizontal(svg, f.left(), f.right(), overallY, mm(cap.planXMm()), Styles.DIMENSION);
        double overallX = f.left() - 56;
        Annotations.extension(svg, f.left() - 4, f.top(), overallX - 4, f.top());
        Annotations.extension(svg, f.left() - 4, f.bottom(), overallX - 4, f.bottom());
        Annotations.vertical(svg, overallX, f.bottom(), f.top(), mm(cap.planYMm()), Styles.DIMENSION);
        alongX(svg, f);
        alongY(svg, f);
    }

    private static void alongX(Svg svg, PlanFrame f) {
        List<Double> xs = chain(f.cap().piles().positions().stream().map(Point::xMm).toList(), f.cap().planXMm());
        double at = f.bottom() + 26;
        for (int i = 0; i < xs.size(); i++) {
            boolean edge = i == 0 || i == xs.size() - 1;
            // From below the pile's reaction label, or from the cap edge when that is nearer.
            double from = edge ? f.bottom() + 4 : f.y(lowestAt(f.cap(), xs.get(i))) + f.pileRadius() + 16;
            Annotations.extension(svg, f.x(xs.get(i)), Math.min(from, f.bottom() + 4), f.x(xs.get(i)), at + 4);
            if (i > 0) {
                Annotations.horizontal(svg, f.x(xs.get(i - 1)), f.x(xs.get(i)), at, mm(xs.get(i) - xs.get(i - 1)),
                        Styles.DIMENSION);
            }
        }
    }

    private static void alongY(Svg svg, PlanFrame f) {
        List<Double> ys = chain(f.cap().piles().positions().stream().map(Point::yMm).toList(), f.cap().planYMm());
        double at = f.right() + 30;
        for (int i = 0; i < ys.size(); i++) {
            boolean edge = i == 0 || i == ys.size() - 1;
            double from = edge ? f.right() + 4 : f.x(rightmostAt(f.cap(), ys.get(i))) + f.pileRadius() + 2;
            Annotations.extension(svg, Math.min(from, f.right() + 4), f.y(ys.get(i)), at + 4, f.y(ys.get(i)));
            if (i > 0) {
                Annotations.vertical(svg, at, f.y(ys.get(i - 1)), f.y(ys.get(i)), mm(ys.get(i) - ys.get(i - 1)),
                        Styles.DIMENSION);
            }
        }
    }

    /** The cap's edges and the distinct pile coordinates between them, in order. */
    static List<Double> chain(List<Double> coordinates, double length) {
        List<Double> sorted = new ArrayList<>(coordinates);
        sorted.sort(Double::compare);
        List<Double> chain = new ArrayList<>();
        chain.add(-length / 2);
        for (double c : sorted) {
            if (c - chain.get(chain.size() - 1) > SAME_MM && length / 2 - c > SAME_MM) {
                chain.add(c);
            }
        }
        chain.add(length / 2);
        return chain;
    }

    /** The y of the lowest pile centre at x, so that its extension line starts below that pile. */
    private static double lowestAt(PileCap cap, double xMm) {
        return cap.piles().positions().stream().filter(p -> Math.abs(p.xMm() - xMm) <= SAME_MM)
                .mapToDouble(Point::yMm).min().orElse(-cap.planYMm() / 2);
    }

    /** The x of the rightmost pile centre at y. */
    private static double rightmostAt(PileCap cap, double yMm) {
        return cap.piles().positions().stream().filter(p -> Math.abs(p.yMm() - yMm) <= SAME_MM)
                .mapToDouble(Point::xMm).max().orElse(cap.planXMm() / 2);
    }

    private static String mm(double value) {
        return ReportNumbers.display(value, "mm");
    }
}
