package dev.countercheck.statics;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Pile reactions under a rigid cap, distributed linearly (common practice):
 * P_i = V/n + a·(x_i − x̄) + b·(y_i − ȳ), with (a, b) from
 * [Σdx² Σdxdy; Σdxdy Σdy²]·[a; b] = [My*; Mx*], which also serves groups that are not symmetric.
 * A collinear group (two piles, a single row) carries only the moment in its own line; the moment
 * about the line is returned as {@link Distribution#unresistedKnm()} for the reviewer to report.
 */
public final class PileGroupReactions {

    /** A vertical load (kN, downwards positive) at a plan position (mm). */
    public record Load(String name, double forceKn, PlanPoint at) {
    }

    /**
     * The result for one set of loads.
     *
     * @param totalKn      V, the sum of the vertical loads
     * @param mxStarKnm    Mx* about the pile-group centroid
     * @param myStarKnm    My* about the pile-group centroid
     * @param reactionsKn  P_i in pile order
     * @param unresistedKnm the moment about the line of a collinear group (0 otherwise)
     * @param plane        the reaction plane P_i = V/n + a·dx_i + b·dy_i that gave the reactions
     */
    public record Distribution(double totalKn, double mxStarKnm, double myStarKnm, double[] reactionsKn,
                        double unresistedKnm, Plane plane) {

        public double max() {
            return java.util.Arrays.stream(reactionsKn).max().orElse(0);
        }

        public double min() {
            return java.util.Arrays.stream(reactionsKn).min().orElse(0);
        }
    }

    /**
     * The plane of the reactions: slopes a along x and b along y (kN per m), each pile's offset from
     * the group centroid (mm), and the second moments of the offsets (m²) the slopes were solved
     * from; {@code collinear} when the group lies on one line (the slopes then carry the moment in
     * that line only).
     */
    public record Plane(double aKnPerM, double bKnPerM, double[] dxMm, double[] dyMm, double sxxM2, double syyM2,
                        double sxyM2, boolean collinear) {
    }

    private PileGroupReactions() {
    }

    public static Distribution solve(List<PlanPoint> piles, List<Load> loads, double mxKnm, double myKnm) {
        return solve(piles, loads, mxKnm, myKnm, lineOf(piles));
    }

    /**
     * The distribution with the group treated as lying on {@code line} (a unit direction) when one is
     * given: a group that is collinear as designed stays so when a pile is moved off position, so
     * that the moment about its line stays unresisted rather than being carried on a lever arm of
     * the tolerance.
     */
    public static Distribution solve(List<PlanPoint> piles, List<Load> loads, double mxKnm, double myKnm,
                              Optional<double[]> line) {
        return group(piles).solve(loads, mxKnm, myKnm, line);
    }

    /** The piles at {@code piles} about their centroid, prepared once for the loads of several cases. */
    public static Group group(List<PlanPoint> piles) {
        return new Group(piles);
    }

    /**
     * A pile group's positions, their centroid, offsets and second moments, which do not depend on the loads:
     * formed once for every case (and, off position, for both factors on the cap's own weight).
     */
    public static final class Group {

        private final List<PlanPoint> piles;
        private final double xBar;
        private final double yBar;
        private final double[] dx;
        private final double[] dy;
        private final Spread g;

        private Group(List<PlanPoint> piles) {
            this.piles = List.copyOf(piles);
            int n = piles.size();
            xBar = piles.stream().mapToDouble(PlanPoint::xMm).average().orElse(0);
            yBar = piles.stream().mapToDouble(PlanPoint::yMm).average().orElse(0);
            dx = new double[n];
            dy = new double[n];
            for (int i = 0; i < n; i++) {
                dx[i] = piles.get(i).xMm() - xBar;
                dy[i] = piles.get(i).yMm() - yBar;
            }
            g = Spread.of(piles, xBar, yBar);
        }

        /** As {@link PileGroupReactions#solve(List, List, double, double, Optional)} for these piles. */
        public Distribution solve(List<Load> loads, double mxKnm, double myKnm, Optional<double[]> line) {
            int n = piles.size();
            double v = 0;
            double mx = mxKnm;
            double my = myKnm;
            for (Load load : loads) {
                v += load.forceKn();
                mx += load.forceKn() * (load.at().yMm() - yBar) / 1000.0;
                my += load.forceKn() * (load.at().xMm() - xBar) / 1000.0;
            }
            double[] p = new double[n];
            if (n == 1) {
                p[0] = v;
                return new Distribution(v, mx, my, p, Math.hypot(mx, my), g.plane(0, 0, dx, dy, true));
            }
            if (line.isPresent()) {
                double ux = line.get()[0];
                double uy = line.get()[1];
                double inLine = (my * ux + mx * uy) * 1000.0;
                double ss = 0;
                double[] s = new double[n];
                for (int i = 0; i < n; i++) {
                    s[i] = dx[i] * ux + dy[i] * uy;
                    ss += s[i] * s[i];
                }
                for (int i = 0; i < n; i++) {
                    p[i] = v / n + inLine * s[i] / ss;
                }
                double slope = inLine / ss * 1000.0;
                return new Distribution(v, mx, my, p, Math.abs(mx * ux - my * uy),
                        g.plane(slope * ux, slope * uy, dx, dy, true));
            }
            double det = g.sxx * g.syy - g.sxy * g.sxy;
            double a = (my * 1000.0 * g.syy - mx * 1000.0 * g.sxy) / det;
            double b = (mx * 1000.0 * g.sxx - my * 1000.0 * g.sxy) / det;
            for (int i = 0; i < n; i++) {
                p[i] = v / n + a * dx[i] + b * dy[i];
            }
            return new Distribution(v, mx, my, p, 0.0, g.plane(a * 1000.0, b * 1000.0, dx, dy, false));
        }
    }

    /** The unit direction of a group of two or more piles on one line; empty when they span an area. */
    public static Optional<double[]> lineOf(List<PlanPoint> piles) {
        if (piles.size() < 2) {
            return Optional.empty();
        }
        Spread g = Spread.of(piles);
        if (g.sxx * g.syy - g.sxy * g.sxy > 1e-9 * (g.sxx + g.syy) * (g.sxx + g.syy)) {
            return Optional.empty();
        }
        double len = g.sxx >= g.syy ? Math.hypot(g.sxx, g.sxy) : Math.hypot(g.sxy, g.syy);
        return Optional.of(g.sxx >= g.syy ? new double[] {g.sxx / len, g.sxy / len}
                : new double[] {g.sxy / len, g.syy / len});
    }

    /** Second moments of the pile positions about their centroid: Σdx², Σdy², Σdx·dy (mm²). */
    private record Spread(double sxx, double syy, double sxy) {

        Plane plane(double aKnPerM, double bKnPerM, double[] dx, double[] dy, boolean collinear) {
            return new Plane(aKnPerM, bKnPerM, dx, dy, sxx / 1e6, syy / 1e6, sxy / 1e6, collinear);
        }

        static Spread of(List<PlanPoint> piles) {
            return of(piles, piles.stream().mapToDouble(PlanPoint::xMm).average().orElse(0),
                    piles.stream().mapToDouble(PlanPoint::yMm).average().orElse(0));
        }

        /** About the centroid (x̄, ȳ) of {@code piles}, found by the caller. */
        static Spread of(List<PlanPoint> piles, double xBar, double yBar) {
            double sxx = 0;
            double syy = 0;
            double sxy = 0;
            for (PlanPoint pile : piles) {
                double dx = pile.xMm() - xBar;
                double dy = pile.yMm() - yBar;
                sxx += dx * dx;
                syy += dy * dy;
                sxy += dx * dy;
            }
            return new Spread(sxx, syy, sxy);
        }
    }

    /**
     * Trace steps of a distribution: V, Mx*, My*, the slopes a and b of the reaction plane (each
     * defined where it first appears) and every P_i with its numbers.
     */
    public static List<Step> trace(Distribution d, String caseName) {
        String basis = "rigid cap, linear distribution (common practice)";
        String c = " (" + caseName + ")";
        Plane pl = d.plane();
        int n = d.reactionsKn().length;
        List<Step> steps = new ArrayList<>();
        steps.add(Step.of("V" + c, "Σ vertical loads", Num.f(d.totalKn()), d.totalKn(), "kN", basis));
        steps.add(Step.of("Mx*" + c, "Mx + Hy·h + Σ F·(y_F − ȳ)", Num.f(d.mxStarKnm()),
                d.mxStarKnm(), "kNm", basis));
        steps.add(Step.of("My*" + c, "My + Hx·h + Σ F·(x_F − x̄)", Num.f(d.myStarKnm()),
                d.myStarKnm(), "kNm", basis));
        if (pl.collinear()) {
            steps.add(Step.of("a" + c, "a, b: slopes of the reactions along x and y, the group on one line"
                    + " carrying the moment in its line: (a, b) = M_line/Σs²·(ux, uy), s_i the offset along the line",
                    "Σdx² = " + Num.f(pl.sxxM2()) + " m², Σdy² = " + Num.f(pl.syyM2()) + " m²",
                    pl.aKnPerM(), "kN/m", basis));
            steps.add(Step.of("b" + c, "b: slope of the reactions along y, as for a", "as for a",
                    pl.bKnPerM(), "kN/m", basis));
        } else {
            String system = "Σdx² = " + Num.f(pl.sxxM2()) + " m², Σdy² = " + Num.f(pl.syyM2()) + " m², Σdx·dy = "
                    + Num.f(pl.sxyM2()) + " m²; My* = " + Num.f(d.myStarKnm()) + ", Mx* = "
                    + Num.f(d.mxStarKnm()) + " kNm";
            steps.add(Step.of("a" + c, "a: slope of the reactions along x, from Σdx²·a + Σdx·dy·b = My*,"
                    + " Σdx·dy·a + Σdy²·b = Mx* (dx, dy: pile offsets from the group centroid, in m)",
                    system, pl.aKnPerM(), "kN/m", basis));
            steps.add(Step.of("b" + c, "b: slope of the reactions along y, from the same two equations", system,
                    pl.bKnPerM(), "kN/m", basis));
        }
        double[] p = d.reactionsKn();
        for (int i = 0; i < n; i++) {
            steps.add(Step.of("P" + (i + 1) + c, "V/n + a·dx_i + b·dy_i",
                    Num.f(d.totalKn()) + "/" + n + " + " + term(pl.aKnPerM()) + "·" + term(pl.dxMm()[i] / 1000.0)
                            + " + " + term(pl.bKnPerM()) + "·" + term(pl.dyMm()[i] / 1000.0),
                    p[i], "kN", basis));
        }
        return steps;
    }

    /** A number as a factor: in brackets when negative. */
    private static String term(double value) {
        return value < 0 ? "(" + Num.f(value) + ")" : Num.f(value);
    }
}
