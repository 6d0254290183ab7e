package dev.countercheck.statics;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.OutOfRangeException;
import dev.countercheck.eurocode.Step;
import dev.countercheck.statics.PileGroupReactions.Load;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Overturning of a rigid rectangular footing about an edge of its base, a loss of static equilibrium (EQU,
 * EN 1990 6.4.2(1)P, Exp. (6.7): Ed,dst ≤ Ed,stb): about each of the four edges, the design moment of the
 * vertical loads that hold the footing down against the design moment that turns it over. The caller
 * factors the actions (EN 1990 Table A1.2(A): favourable permanent loads by γG,inf, the turning moments by
 * γG,sup and γQ) and gives the moments about the base centre including H·h.
 */
public final class Overturning {

    private static final String CLAUSE = "EN 1990 6.4.2(1)P, Exp. (6.7) (EQU)";

    private Overturning() {
    }

    /**
     * The moments about one edge.
     *
     * @param edge the edge: {@code "x = +Lx/2"}, {@code "x = −Lx/2"}, {@code "y = +Ly/2"}, {@code "y = −Ly/2"}
     * @param mStb Ed,stb, the moment holding the footing down, kNm, ≥ 0
     * @param mDst Ed,dst, the moment turning it over that edge, kNm, ≥ 0
     */
    public record Edge(String edge, Step mStb, Step mDst) {

        /** Ed,dst/Ed,stb (infinite when something turns it and nothing holds it). */
        public double utilisation() {
            if (mStb.value() == 0) {
                return mDst.value() == 0 ? 0 : Double.POSITIVE_INFINITY;
            }
            return mDst.value() / mStb.value();
        }
    }

    /**
     * The four edges of a footing Lx × Ly centred on the origin. A vertical load F at (x, y) gives F·(Lx/2 − x)
     * about the edge x = +Lx/2: stabilising when positive (a downward load inside the plan), destabilising
     * when negative (an uplift). A moment My* turns the footing over x = +Lx/2 when positive and over
     * x = −Lx/2 when negative; Mx* likewise over y = ±Ly/2.
     *
     * @param lxMm     plan side along x, mm, &gt; 0
     * @param lyMm     plan side along y, mm, &gt; 0
     * @param loads    the design vertical loads (kN, downwards positive) at their positions
     * @param mxDstKnm design moment Mx* about the base centre (turning towards +y when positive), kNm
     * @param myDstKnm design moment My* (towards +x when positive), kNm
     * @param caseName the EQU case, named in the trace
     */
    public static List<Edge> aboutEdges(double lxMm, double lyMm, List<Load> loads, double mxDstKnm,
                                        double myDstKnm, String caseName) {
        OutOfRangeException.requirePositive("Lx", lxMm, "mm", CLAUSE);
        OutOfRangeException.requirePositive("Ly", lyMm, "mm", CLAUSE);
        List<Edge> edges = new ArrayList<>();
        edges.add(edge("x = +Lx/2", loads, p -> lxMm / 2 - p.xMm(), myDstKnm, "My*", caseName));
        edges.add(edge("x = −Lx/2", loads, p -> lxMm / 2 + p.xMm(), -myDstKnm, "−My*", caseName));
        edges.add(edge("y = +Ly/2", loads, p -> lyMm / 2 - p.yMm(), mxDstKnm, "Mx*", caseName));
        edges.add(edge("y = −Ly/2", loads, p -> lyMm / 2 + p.yMm(), -mxDstKnm, "−Mx*", caseName));
        return edges;
    }

    /** The edge of greatest Ed,dst/Ed,stb. */
    public static Edge governing(List<Edge> edges) {
        return edges.stream().max(Comparator.comparingDouble(Edge::utilisation)).orElseThrow();
    }

    private static Edge edge(String name, List<Load> loads, java.util.function.ToDoubleFunction<PlanPoint> arm,
                             double moment, String momentName, String caseName) {
        double stb = 0;
        double dst = Math.max(0, moment);
        List<String> holding = new ArrayList<>();
        List<String> turning = new ArrayList<>();
        turning.add(momentName + " = " + Num.f(moment));
        for (Load load : loads) {
            double m = load.forceKn() * arm.applyAsDouble(load.at()) / 1000;
            String term = Num.f(load.forceKn()) + "·" + Num.f(arm.applyAsDouble(load.at())) + "/1000";
            if (m >= 0) {
                stb += m;
                holding.add(term);
            } else {
                dst -= m;
                turning.add(term);
            }
        }
        String suffix = BaseActions.suffix(caseName);
        return new Edge(name,
                Step.of("Ed,stb" + suffix, "Σ F·(arm to the edge " + name + "), F holding down",
                        holding.isEmpty() ? "0" : String.join(" + ", holding), stb, "kNm", CLAUSE),
                Step.of("Ed,dst" + suffix, "max(0; moment towards the edge " + name + ") + uplift·arm",
                        String.join("; ", turning), dst, "kNm", CLAUSE));
    }
}
