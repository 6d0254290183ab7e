package dev.countercheck.eurocode;

/** Anchorage and lap lengths of ribbed bars, EN 1992-1-1 8.4 and 8.7.3. */
public final class Anchorage {

    private static final String C_8_4_2_2 = "EN 1992-1-1 8.4.2(2)";
    private static final String C_TABLE_8_2 = "EN 1992-1-1 8.4.4(1), Table 8.2";
    /** Lower bound of every α of Table 8.2 and of the product α2·α3·α5, Exp. (8.5). */
    private static final double ALPHA_FLOOR = 0.7;

    private Anchorage() {
    }

    /**
     * Bar-size coefficient for bond, EN 1992-1-1 8.4.2(2): η2 = 1.0 for φ ≤ 32 mm, (132 − φ)/100 for φ &gt; 32 mm.
     *
     * @param phiMm bar diameter φ, mm, 0 &lt; φ &lt; 132
     * @return η2, -
     */
    public static Step eta2(double phiMm) {
        Bounds.positive("φ", phiMm, "mm", C_8_4_2_2);
        if (phiMm >= 132) {
            throw new OutOfRangeException("φ", phiMm, "mm", "φ < 132 mm, where (132 − φ)/100 > 0", C_8_4_2_2);
        }
        if (phiMm <= 32) {
            return Step.withRemark("η2", "1.0 (φ ≤ 32 mm)", "1.0", 1.0, "-", C_8_4_2_2, "φ ≤ 32 mm: η2 = 1.0");
        }
        return Step.withRemark("η2", "(132 − φ)/100", "(132 − " + Num.f(phiMm) + ")/100", (132 - phiMm) / 100, "-",
                C_8_4_2_2, "φ > 32 mm: η2 = (132 − φ)/100");
    }

    /**
     * Ultimate bond stress, EN 1992-1-1 8.4.2(2), Exp. (8.2): fbd = 2.25·η1·η2·fctd.
     *
     * @param eta1     η1, -, 1.0 for good bond, 0.7 otherwise (0.7 ≤ η1 ≤ 1.0)
     * @param eta2     η2 from {@link #eta2}, -, 0 &lt; η2 ≤ 1
     * @param fctdMpa  fctd from {@link Materials#fctd}, MPa, &gt; 0
     * @return fbd, MPa
     */
    public static Step fbd(double eta1, double eta2, double fctdMpa) {
        String clause = "EN 1992-1-1 8.4.2(2), Exp. (8.2)";
        OutOfRangeException.requireWithin("η1", eta1, "-", 0.7, 1.0, clause);
        Bounds.positiveAtMost("η2", eta2, "-", 1.0, clause);
        Bounds.positive("fctd", fctdMpa, "MPa", clause);
        return Step.of("fbd", "2.25·η1·η2·fctd", "2.25·" + Num.f(eta1) + "·" + Num.f(eta2) + "·" + Num.f(fctdMpa),
                2.25 * eta1 * eta2 * fctdMpa, "MPa", clause);
    }

    /**
     * Basic required anchorage length, EN 1992-1-1 8.4.3(2), Exp. (8.3): lb,rqd = (φ/4)·(σsd/fbd).
     *
     * @param phiMm      φ, mm, &gt; 0
     * @param sigmaSdMpa design stress of the bar at the start of the anchorage σsd, MPa, ≥ 0
     * @param fbdMpa     fbd from {@link #fbd}, MPa, &gt; 0
     * @return lb,rqd, mm
     */
    public static Step lbRqd(double phiMm, double sigmaSdMpa, double fbdMpa) {
        String clause = "EN 1992-1-1 8.4.3(2), Exp. (8.3)";
        Bounds.positive("φ", phiMm, "mm", clause);
        Bounds.nonNegative("σsd", sigmaSdMpa, "MPa", clause);
        Bounds.positive("fbd", fbdMpa, "MPa", clause);
        return Step.of("lb,rqd", "(φ/4)·(σsd/fbd)",
                "(" + Num.f(phiMm) + "/4)·(" + Num.f(sigmaSdMpa) + "/" + Num.f(fbdMpa) + ")",
                phiMm / 4 * (sigmaSdMpa / fbdMpa), "mm", clause);
    }

    /**
     * Minimum anchorage length in tension, EN 1992-1-1 8.4.4(1), Exp. (8.6):
     * lb,min = max(0.3·lb,rqd; 10·φ; 100 mm). The remark says which term governs.
     *
     * @param lbRqdMm lb,rqd, mm, ≥ 0
     * @param phiMm   φ, mm, &gt; 0
     * @return lb,min, mm
     */
    public static Step lbMinTension(double lbRqdMm, double phiMm) {
        return lbMin(0.3, lbRqdMm, phiMm, "EN 1992-1-1 8.4.4(1), Exp. (8.6)");
    }

    /**
     * Minimum anchorage length in compression, EN 1992-1-1 8.4.4(1), Exp. (8.7):
     * lb,min = max(0.6·lb,rqd; 10·φ; 100 mm). The remark says which term governs.
     *
     * @param lbRqdMm lb,rqd, mm, ≥ 0
     * @param phiMm   φ, mm, &gt; 0
     * @return lb,min, mm
     */
    public static Step lbMinCompression(double lbRqdMm, double phiMm) {
        return lbMin(0.6, lbRqdMm, phiMm, "EN 1992-1-1 8.4.4(1), Exp. (8.7)");
    }

    /**
     * Coefficient for the shape of the bar, EN 1992-1-1 Table 8.2 (bars in tension): α1 = 0.7 for bent or hooked
     * ends when cd &gt; 3φ, else 1.0. The remark gives the branch.
     *
     * @param bentOrHooked whether the bar end is bent or hooked (Figure 8.1 b to d)
     * @param cdMm         cd of Figure 8.3, mm, ≥ 0
     * @param phiMm        φ, mm, &gt; 0
     * @return α1, -
     */
    public static Step alpha1(boolean bentOrHooked, double cdMm, double phiMm) {
        Bounds.nonNegative("cd", cdMm, "mm", C_TABLE_8_2);
        Bounds.positive("φ", phiMm, "mm", C_TABLE_8_2);
        String formula = "0.7 if bent or hooked and cd > 3·φ, else 1.0";
        if (!bentOrHooked) {
            return Step.withRemark("α1", formula, "1.0", 1.0, "-", C_TABLE_8_2, "straight bar: α1 = 1.0");
        }
        String comparison = "cd = " + Num.f(cdMm) + " mm, 3·φ = " + Num.f(3 * phiMm) + " mm";
        if (cdMm > 3 * phiMm) {
            return Step.withRemark("α1", formula, "0.7", 0.7, "-", C_TABLE_8_2,
                    "bent or hooked, cd > 3·φ (" + comparison + "): α1 = 0.7");
        }
        return Step.withRemark("α1", formula, "1.0", 1.0, "-", C_TABLE_8_2,
                "bent or hooked, cd ≤ 3·φ (" + comparison + "): α1 = 1.0");
    }

    /**
     * Coefficient for concrete cover, EN 1992-1-1 Table 8.2 (bars in tension): straight bars
     * α2 = 1 − 0.15·(cd − φ)/φ, bent or hooked bars α2 = 1 − 0.15·(cd − 3φ)/φ, in both cases
     * 0.7 ≤ α2 ≤ 1.0. A bound applied is recorded in the remark.
     *
     * @param bentOrHooked whether the bar end is bent or hooked
     * @param cdMm         cd of Figure 8.3, mm, ≥ 0
     * @param phiMm        φ, mm, &gt; 0
     * @return α2, -
     */
    public static Step alpha2(boolean bentOrHooked, double cdMm, double phiMm) {
        Bounds.nonNegative("cd", cdMm, "mm", C_TABLE_8_2);
        Bounds.positive("φ", phiMm, "mm", C_TABLE_8_2);
        double offset = bentOrHooked ? 3 * phiMm : phiMm;
        String formula = bentOrHooked ? "1 − 0.15·(cd − 3·φ)/φ, 0.7 ≤ α2 ≤ 1.0" : "1 − 0.15·(cd − φ)/φ, 0.7 ≤ α2 ≤ 1.0";
        String body = "1 − 0.15·(" + Num.f(cdMm) + " − " + (bentOrHooked ? "3·" : "") + Num.f(phiMm) + ")/"
                + Num.f(phiMm);
        String shape = bentOrHooked ? "bent or hooked bar" : "straight bar";
        double raw = 1 - 0.15 * (cdMm - offset) / phiMm;
        String bounded = "min(max(" + body + "; 0.7); 1.0)";
        if (raw < ALPHA_FLOOR) {
            return Step.withRemark("α2", formula, bounded, ALPHA_FLOOR, "-", C_TABLE_8_2,
                    shape + ": α2 = " + Num.f(raw) + " raised to the lower bound 0.7");
        }
        if (raw > 1.0) {
            return Step.withRemark("α2", formula, bounded, 1.0, "-", C_TABLE_8_2,
                    shape + ": α2 = " + Num.f(raw) + " limited to the upper bound 1.0");
        }
        return Step.withRemark("α2", formula, body, raw, "-", C_TABLE_8_2, shape);
    }

    /**
     * Design anchorage length, EN 1992-1-1 8.4.4(1), Exps. (8.4) and (8.5):
     * lbd = α1·α2·α3·α4·α5·lb,rqd ≥ lb,min with α2·α3·α5 ≥ 0.7. Each floor applied is recorded in the remark.
     *
     * @param alpha1  α1, -, 0.7 ≤ α1 ≤ 1.0 (Table 8.2)
     * @param alpha2  α2, -, 0.7 ≤ α2 ≤ 1.0
     * @param alpha3  α3 (confinement by transverse steel), -, 0.7 ≤ α3 ≤ 1.0
     * @param alpha4  α4 (welded transverse bars), -, 0.7 ≤ α4 ≤ 1.0
     * @param alpha5  α5 (transverse pressure), -, 0.7 ≤ α5 ≤ 1.0
     * @param lbRqdMm lb,rqd from {@link #lbRqd}, mm, ≥ 0
     * @param lbMinMm lb,min from {@link #lbMinTension} or {@link #lbMinCompression}, mm, &gt; 0
     * @return lbd, mm
     */
    public static Step lbd(double alpha1, double alpha2, double alpha3, double alpha4, double alpha5,
                           double lbRqdMm, double lbMinMm) {
        String clause = "EN 1992-1-1 8.4.4(1), Exps. (8.4), (8.5)";
        requireAlpha("α1", alpha1, clause);
        requireAlpha("α2", alpha2, clause);
        requireAlpha("α3", alpha3, clause);
        requireAlpha("α4", alpha4, clause);
        requireAlpha("α5", alpha5, clause);
        Bounds.nonNegative("lb,rqd", lbRqdMm, "mm", clause);
        Bounds.positive("lb,min", lbMinMm, "mm", clause);
        Floored product = floored(alpha2, alpha3, alpha5);
        double length = alpha1 * alpha4 * product.value() * lbRqdMm;
        return floorLength(Step.of("lbd", "max(α1·α4·max(α2·α3·α5; 0.7)·lb,rqd; lb,min)",
                        "max(" + Num.f(alpha1) + "·" + Num.f(alpha4) + "·" + product.substituted() + "·"
                                + Num.f(lbRqdMm) + "; " + Num.f(lbMinMm) + ")",
                        Math.max(length, lbMinMm), "mm", clause),
                product, length, lbMinMm, "lb,min");
    }

    /**
     * Coefficient for the proportion of bars lapped in one section, EN 1992-1-1 8.7.3(1), Table 8.3:
     * α6 = (ρ1/25)^0.5 with 1.0 ≤ α6 ≤ 1.5. A bound applied is recorded in the remark.
     *
     * @param percentLapped ρ1, percentage of bars lapped within 0.65·l0 of the lap centre, %, 0 ≤ ρ1 ≤ 100
     * @return α6, -
     */
    public static Step alpha6(double percentLapped) {
        String clause = "EN 1992-1-1 8.7.3(1), Table 8.3";
        OutOfRangeException.requireWithin("ρ1", percentLapped, "%", 0, 100, clause);
        double raw = Math.sqrt(percentLapped / 25);
        String formula = "(ρ1/25)^0.5, 1.0 ≤ α6 ≤ 1.5";
        String body = "(" + Num.f(percentLapped) + "/25)^0.5";
        if (raw < 1.0) {
            return Step.withRemark("α6", formula, "max(" + body + "; 1.0)", 1.0, "-", clause,
                    "α6 = " + Num.f(raw) + " raised to the lower bound 1.0");
        }
        if (raw > 1.5) {
            return Step.withRemark("α6", formula, "min(" + body + "; 1.5)", 1.5, "-", clause,
                    "α6 = " + Num.f(raw) + " limited to the upper bound 1.5");
        }
        return Step.of("α6", formula, body, raw, "-", clause);
    }

    /**
     * Design lap length, EN 1992-1-1 8.7.3(1), Exps. (8.10) and (8.11): l0 = α1·α2·α3·α5·α6·lb,rqd ≥ l0,min,
     * l0,min = max(0.3·α6·lb,rqd; 15·φ; 200 mm), with α2·α3·α5 ≥ 0.7 (Exp. (8.5) of Table 8.2, from which
     * 8.7.3(1) takes α1, α2, α3, α5). Each floor applied is recorded in the remark.
     *
     * @param alpha1  α1, -, 0.7 ≤ α1 ≤ 1.0
     * @param alpha2  α2, -, 0.7 ≤ α2 ≤ 1.0
     * @param alpha3  α3, -, 0.7 ≤ α3 ≤ 1.0
     * @param alpha5  α5, -, 0.7 ≤ α5 ≤ 1.0
     * @param alpha6  α6 from {@link #alpha6}, -, 1.0 ≤ α6 ≤ 1.5
     * @param lbRqdMm lb,rqd, mm, ≥ 0
     * @param phiMm   φ, mm, &gt; 0
     * @return l0, mm
     */
    public static Step lapLength(double alpha1, double alpha2, double alpha3, double alpha5, double alpha6,
                                 double lbRqdMm, double phiMm) {
        String clause = "EN 1992-1-1 8.7.3(1), Exps. (8.10), (8.11)";
        requireAlpha("α1", alpha1, clause);
        requireAlpha("α2", alpha2, clause);
        requireAlpha("α3", alpha3, clause);
        requireAlpha("α5", alpha5, clause);
        OutOfRangeException.requireWithin("α6", alpha6, "-", 1.0, 1.5, clause);
        Bounds.nonNegative("lb,rqd", lbRqdMm, "mm", clause);
        Bounds.positive("φ", phiMm, "mm", clause);
        Floored product = floored(alpha2, alpha3, alpha5);
        double length = alpha1 * alpha6 * product.value() * lbRqdMm;
        double l0Min = Math.max(Math.max(0.3 * alpha6 * lbRqdMm, 15 * phiMm), 200);
        return floorLength(Step.of("l0",
                        "max(α1·α6·max(α2·α3·α5; 0.7)·lb,rqd; l0,min), l0,min = max(0.3·α6·lb,rqd; 15·φ; 200)",
                        "max(" + Num.f(alpha1) + "·" + Num.f(alpha6) + "·" + product.substituted() + "·"
                                + Num.f(lbRqdMm) + "; max(0.3·" + Num.f(alpha6) + "·" + Num.f(lbRqdMm) + "; 15·"
                                + Num.f(phiMm) + "; 200))",
                        Math.max(length, l0Min), "mm", clause),
                product, length, l0Min, "l0,min");
    }

    private static Step lbMin(double factor, double lbRqdMm, double phiMm, String clause) {
        Bounds.nonNegative("lb,rqd", lbRqdMm, "mm", clause);
        Bounds.positive("φ", phiMm, "mm", clause);
        double share = factor * lbRqdMm;
        double bars = 10 * phiMm;
        double value = Math.max(Math.max(share, bars), 100);
        String governs = value == share ? Num.f(factor) + "·lb,rqd governs" : value == bars ? "10·φ governs"
                : "100 mm governs";
        return Step.withRemark("lb,min", "max(" + Num.f(factor) + "·lb,rqd; 10·φ; 100)",
                "max(" + Num.f(factor) + "·" + Num.f(lbRqdMm) + "; 10·" + Num.f(phiMm) + "; 100)", value, "mm",
                clause, governs);
    }

    /** The product α2·α3·α5 after the 0.7 floor of Exp. (8.5), with how it was substituted. */
    private record Floored(double raw, double value, String substituted) {
        boolean raised() {
            return value > raw;
        }
    }

    private static Floored floored(double alpha2, double alpha3, double alpha5) {
        double raw = alpha2 * alpha3 * alpha5;
        return new Floored(raw, Math.max(raw, ALPHA_FLOOR),
                "max(" + Num.f(alpha2) + "·" + Num.f(alpha3) + "·" + Num.f(alpha5) + "; 0.7)");
    }

    /** Adds the remarks for the floors a length step applied: the α2·α3·α5 product and the minimum length. */
    private static Step floorLength(Step step, Floored product, double length, double minimum, String minSymbol) {
        Step result = step;
        if (product.raised()) {
            result = result.remarked("α2·α3·α5 = " + Num.f(product.raw()) + " raised to 0.7 (Exp. (8.5))");
        }
        if (length < minimum) {
            result = result.remarked(Num.f(length) + " mm raised to " + minSymbol + " = " + Num.f(minimum) + " mm");
        }
        return result;
    }

    /** Every α of Table 8.2 lies between 0.7 and 1.0. */
    private static void requireAlpha(String symbol, double alpha, String clause) {
        OutOfRangeException.requireWithin(symbol, alpha, "-", ALPHA_FLOOR, 1.0, clause);
    }
}
