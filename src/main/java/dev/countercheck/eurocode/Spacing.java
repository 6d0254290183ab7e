package dev.countercheck.eurocode;

/** Spacing of bars, EN 1992-1-1 8.2, and the even layout of a bar set across a width. */
public final class Spacing {

    private Spacing() {
    }

    /**
     * Minimum clear distance between parallel bars, EN 1992-1-1 8.2(2): max(k1·φ; dg + k2; 20 mm).
     * The remark says which term governs.
     *
     * @param k1          k1 (NDP, recommended 1.0), -, &gt; 0
     * @param k2Mm        k2 (NDP, recommended 5 mm), mm, ≥ 0
     * @param phiMm       bar diameter φ, mm, &gt; 0
     * @param aggregateMm maximum aggregate size dg, mm, &gt; 0
     * @return the minimum clear distance smin, mm
     */
    public static Step minClearSpacing(double k1, double k2Mm, double phiMm, double aggregateMm) {
        String clause = "EN 1992-1-1 8.2(2)";
        Bounds.positive("k1", k1, "-", clause);
        Bounds.nonNegative("k2", k2Mm, "mm", clause);
        Bounds.positive("φ", phiMm, "mm", clause);
        Bounds.positive("dg", aggregateMm, "mm", clause);
        double bar = k1 * phiMm;
        double aggregate = aggregateMm + k2Mm;
        double value = Math.max(Math.max(bar, aggregate), 20);
        String governs = value == bar ? "k1·φ governs" : value == aggregate ? "dg + k2 governs" : "20 mm governs";
        return Step.withRemark("smin", "max(k1·φ; dg + k2; 20)",
                "max(" + Num.f(k1) + "·" + Num.f(phiMm) + "; " + Num.f(aggregateMm) + " + " + Num.f(k2Mm) + "; 20)",
                value, "mm", clause, governs);
    }

    /**
     * Centre-to-centre spacing of n bars spread evenly over a width less the side covers (common practice
     * layout): s = (b − 2·c − φ)/(n − 1).
     *
     * @param widthMm     width b across the bars, mm, &gt; 0
     * @param sideCoverMm side cover c to the outer bars, mm, ≥ 0
     * @param phiMm       bar diameter φ, mm, &gt; 0
     * @param count       number of bars n, ≥ 2
     * @return s, mm, &gt; 0 (the bars must fit within the width)
     */
    public static Step centreSpacing(double widthMm, double sideCoverMm, double phiMm, int count) {
        String clause = "common practice (bars evenly spread over the width less the side covers)";
        Bounds.positive("b", widthMm, "mm", clause);
        Bounds.nonNegative("c", sideCoverMm, "mm", clause);
        Bounds.positive("φ", phiMm, "mm", clause);
        Bounds.atLeast("n", count, "bars", 2, clause);
        double span = widthMm - 2 * sideCoverMm - phiMm;
        Bounds.positive("b − 2·c − φ", span, "mm", clause);
        return Step.of("s", "(b − 2·c − φ)/(n − 1)",
                "(" + Num.f(widthMm) + " − 2·" + Num.f(sideCoverMm) + " − " + Num.f(phiMm) + ")/(" + count + " − 1)",
                span / (count - 1), "mm", clause);
    }
}
