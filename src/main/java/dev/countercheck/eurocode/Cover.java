package dev.countercheck.eurocode;

/** Concrete cover, EN 1992-1-1 4.4.1. */
public final class Cover {

    private Cover() {
    }

    /**
     * Minimum cover for bond, EN 1992-1-1 4.4.1.2(3), Table 4.2 (separated bars): cmin,b = φ, plus 5 mm when the
     * nominal maximum aggregate size dg exceeds 32 mm. The remark records the addition.
     *
     * @param phiMm       bar diameter φ, mm, &gt; 0
     * @param aggregateMm nominal maximum aggregate size dg, mm, &gt; 0
     * @return cmin,b, mm
     */
    public static Step cMinB(double phiMm, double aggregateMm) {
        String clause = "EN 1992-1-1 4.4.1.2(3), Table 4.2";
        Bounds.positive("φ", phiMm, "mm", clause);
        Bounds.positive("dg", aggregateMm, "mm", clause);
        if (aggregateMm > 32) {
            return Step.withRemark("cmin,b", "φ + 5 (dg > 32 mm)", Num.f(phiMm) + " + 5", phiMm + 5, "mm", clause,
                    "dg = " + Num.f(aggregateMm) + " mm > 32 mm: 5 mm added");
        }
        return Step.of("cmin,b", "φ (dg ≤ 32 mm)", Num.f(phiMm), phiMm, "mm", clause);
    }

    /**
     * Minimum cover, EN 1992-1-1 4.4.1.2(2), Exp. (4.2):
     * cmin = max(cmin,b; cmin,dur + Δcdur,γ − Δcdur,st − Δcdur,add; 10 mm). The remark says which term governs.
     *
     * @param cMinB      cmin,b from {@link #cMinB}, mm, ≥ 0
     * @param cMinDur    cmin,dur (Table 4.4N or the National Annex), mm, ≥ 0
     * @param dcDurGamma additive safety element Δcdur,γ (NDP, recommended 0), mm, ≥ 0
     * @param dcDurSt    reduction for stainless steel Δcdur,st (NDP, recommended 0), mm, ≥ 0
     * @param dcDurAdd   reduction for additional protection Δcdur,add (NDP, recommended 0), mm, ≥ 0
     * @return cmin, mm
     */
    public static Step cMin(double cMinB, double cMinDur, double dcDurGamma, double dcDurSt, double dcDurAdd) {
        String clause = "EN 1992-1-1 4.4.1.2(2), Exp. (4.2)";
        Bounds.nonNegative("cmin,b", cMinB, "mm", clause);
        Bounds.nonNegative("cmin,dur", cMinDur, "mm", clause);
        Bounds.nonNegative("Δcdur,γ", dcDurGamma, "mm", clause);
        Bounds.nonNegative("Δcdur,st", dcDurSt, "mm", clause);
        Bounds.nonNegative("Δcdur,add", dcDurAdd, "mm", clause);
        double durability = cMinDur + dcDurGamma - dcDurSt - dcDurAdd;
        double value = Math.max(Math.max(cMinB, durability), 10);
        String governs = value == cMinB ? "bond (cmin,b) governs"
                : value == durability ? "durability governs" : "the 10 mm minimum governs";
        return Step.withRemark("cmin", "max(cmin,b; cmin,dur + Δcdur,γ − Δcdur,st − Δcdur,add; 10)",
                "max(" + Num.f(cMinB) + "; " + Num.f(cMinDur) + " + " + Num.f(dcDurGamma) + " − " + Num.f(dcDurSt)
                        + " − " + Num.f(dcDurAdd) + "; 10)",
                value, "mm", clause, governs);
    }

    /**
     * Nominal cover, EN 1992-1-1 4.4.1.1(2), Exp. (4.1): cnom = cmin + Δcdev.
     *
     * @param cMinMm  cmin from {@link #cMin}, mm, ≥ 0
     * @param dcDevMm allowance for deviation Δcdev (NDP, recommended 10 mm, 4.4.1.3(1)P), mm, ≥ 0
     * @return cnom, mm
     */
    public static Step cNom(double cMinMm, double dcDevMm) {
        String clause = "EN 1992-1-1 4.4.1.1(2), Exp. (4.1)";
        Bounds.nonNegative("cmin", cMinMm, "mm", clause);
        Bounds.nonNegative("Δcdev", dcDevMm, "mm", clause);
        return Step.of("cnom", "cmin + Δcdev", Num.f(cMinMm) + " + " + Num.f(dcDevMm), cMinMm + dcDevMm, "mm",
                clause);
    }
}
