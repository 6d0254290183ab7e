package dev.countercheck.eurocode;

/**
 * Anchorage of reinforcing bars, EN 1992-1-1 8.4: the design bond stress, the basic required
 * anchorage length and the design anchorage length. Shared by every element that anchors bars
 * (the ties of a pile cap, the bottom bars of a pad footing, column starters).
 */
public final class Anchorage {

    private static final String C_8_4_2 = "EN 1992-1-1 8.4.2(2), Exp. (8.2)";
    private static final String C_8_4_3 = "EN 1992-1-1 8.4.3(2), Exp. (8.3)";
    private static final String C_8_4_4 = "EN 1992-1-1 8.4.4(1), Exp. (8.4), (8.6), (8.7)";
    /** Bars up to this diameter have η2 = 1 (8.4.2(2)). */
    private static final String TABLE_8_2 = "EN 1992-1-1 8.4.4, Table 8.2";
    private static final double ETA2_LIMIT_MM = 32;

    private Anchorage() {
    }

    /**
     * Ultimate bond stress, EN 1992-1-1 8.4.2(2), Exp. (8.2): fbd = 2.25·η1·η2·fctd, with η1 = 1.0 in good
     * bond conditions and 0.7 otherwise, η2 = 1.0 for φ ≤ 32 mm and (132 − φ)/100 above.
     *
     * @param goodBond whether the bar is in good bond conditions (Figure 8.2)
     * @param phiMm    bar diameter φ, mm, 0 &lt; φ ≤ 132
     * @param fctdMpa  design tensile strength fctd, MPa, &gt; 0
     * @return fbd, MPa
     */
    public static Step bondStress(boolean goodBond, double phiMm, double fctdMpa) {
        Bounds.positiveAtMost("φ", phiMm, "mm", 132, C_8_4_2);
        Bounds.positive("fctd", fctdMpa, "MPa", C_8_4_2);
        double eta1 = goodBond ? 1.0 : 0.7;
        double eta2 = phiMm <= ETA2_LIMIT_MM ? 1.0 : (132 - phiMm) / 100;
        return Step.withRemark("fbd", "2.25·η1·η2·fctd", "2.25·" + Num.f(eta1) + "·" + Num.f(eta2) + "·"
                        + Num.f(fctdMpa), 2.25 * eta1 * eta2 * fctdMpa, "MPa", C_8_4_2,
                (goodBond ? "η1 = 1.0 (good bond)" : "η1 = 0.7 (not good bond)")
                        + (phiMm <= ETA2_LIMIT_MM ? "; η2 = 1.0 (φ ≤ 32 mm)" : "; η2 = (132 − φ)/100"));
    }

    /**
     * Basic required anchorage length, EN 1992-1-1 8.4.3(2), Exp. (8.3): lb,rqd = (φ/4)·(σsd/fbd).
     *
     * @param phiMm      bar diameter φ, mm, &gt; 0
     * @param sigmaSdMpa design stress of the bar where the anchorage starts σsd, MPa, ≥ 0
     * @param fbdMpa     ultimate bond stress fbd, MPa, &gt; 0 (from {@link #bondStress})
     * @return lb,rqd, mm
     */
    public static Step basicLength(double phiMm, double sigmaSdMpa, double fbdMpa) {
        Bounds.positive("φ", phiMm, "mm", C_8_4_3);
        Bounds.nonNegative("σsd", sigmaSdMpa, "MPa", C_8_4_3);
        Bounds.positive("fbd", fbdMpa, "MPa", C_8_4_3);
        return Step.of("lb,rqd", "(φ/4)·(σsd/fbd)", "(" + Num.f(phiMm) + "/4)·(" + Num.f(sigmaSdMpa) + "/"
                + Num.f(fbdMpa) + ")", phiMm / 4 * sigmaSdMpa / fbdMpa, "mm", C_8_4_3);
    }

    /**
     * Design anchorage length, EN 1992-1-1 8.4.4(1), Exp. (8.4): lbd = α1·(α2·α3·α5)·α4·lb,rqd ≥ lb,min,
     * with α2·α3·α5 ≥ 0.7 (Exp. (8.5)) and lb,min = max(0.3·lb,rqd; 10φ; 100 mm) in tension (Exp. (8.6)),
     * max(0.6·lb,rqd; 10φ; 100 mm) in compression (Exp. (8.7)). Floors applied are recorded in the remark.
     *
     * @param alpha1   α1 (form of the bars, Table 8.2), -, 0 &lt; α1 ≤ 1
     * @param alpha235 the product α2·α3·α5 (Table 8.2), -, 0 &lt; α2·α3·α5 ≤ 1
     * @param alpha4   α4 (welded transverse bars, Table 8.2), -, 0 &lt; α4 ≤ 1
     * @param lbRqdMm  lb,rqd, mm, ≥ 0 (from {@link #basicLength})
     * @param phiMm    bar diameter φ, mm, &gt; 0
     * @param tension  whether the bar is anchored in tension (else in compression)
     * @return lbd, mm
     */
    public static Step designLength(double alpha1, double alpha235, double alpha4, double lbRqdMm, double phiMm,
                                    boolean tension) {
        Bounds.positiveAtMost("α1", alpha1, "-", 1, C_8_4_4);
        Bounds.positiveAtMost("α2·α3·α5", alpha235, "-", 1, C_8_4_4);
        Bounds.positiveAtMost("α4", alpha4, "-", 1, C_8_4_4);
        Bounds.nonNegative("lb,rqd", lbRqdMm, "mm", C_8_4_4);
        Bounds.positive("φ", phiMm, "mm", C_8_4_4);
        double product = Math.max(0.7, alpha235);
        double share = tension ? 0.3 : 0.6;
        double lbMin = Math.max(Math.max(share * lbRqdMm, 10 * phiMm), 100);
        double lbd = alpha1 * product * alpha4 * lbRqdMm;
        String substituted = "max(" + Num.f(alpha1) + "·" + Num.f(product) + "·" + Num.f(alpha4) + "·"
                + Num.f(lbRqdMm) + "; max(" + Num.f(share) + "·" + Num.f(lbRqdMm) + "; 10·" + Num.f(phiMm) + "; 100))";
        String remark = (product > alpha235 ? "α2·α3·α5 = " + Num.f(alpha235) + " raised to 0.7; " : "")
                + (lbMin > lbd ? "lb,min = " + Num.f(lbMin) + " mm governs" : "lb,min = " + Num.f(lbMin) + " mm")
                + (tension ? " (tension)" : " (compression)");
        return Step.withRemark("lbd", "max(α1·α2·α3·α5·α4·lb,rqd; lb,min)", substituted, Math.max(lbd, lbMin),
                "mm", C_8_4_4, remark);
    }

    /**
     * α1 for the form of the bars, EN 1992-1-1 8.4.4, Table 8.2 (tension): 0.7 for bent or hooked ends with
     * cd &gt; 3φ, otherwise 1.0.
     *
     * @param bent  whether the bars end in a bend or hook
     * @param cdMm  cd of Figure 8.3, mm, ≥ 0
     * @param phiMm bar diameter φ, mm, &gt; 0
     * @return α1, -
     */
    public static Step alpha1(boolean bent, double cdMm, double phiMm) {
        Bounds.nonNegative("cd", cdMm, "mm", TABLE_8_2);
        Bounds.positive("φ", phiMm, "mm", TABLE_8_2);
        double alpha = bent && cdMm > 3 * phiMm ? 0.7 : 1.0;
        return Step.of("α1", bent ? "0.7 if cd > 3φ, else 1.0" : "1.0 (straight bars)", bent ? Num.f(cdMm) + " vs 3·"
                + Num.f(phiMm) : "straight", alpha, "-", TABLE_8_2);
    }

    /**
     * α2 for the concrete cover, EN 1992-1-1 8.4.4, Table 8.2 (tension): 1 − 0.15·(cd − φ)/φ for straight
     * bars, 1 − 0.15·(cd − 3φ)/φ for bent or hooked ends, within 0.7 ≤ α2 ≤ 1.0 (the bound applied is in the
     * remark).
     *
     * @param bent  whether the bars end in a bend or hook
     * @param cdMm  cd of Figure 8.3, mm, ≥ 0
     * @param phiMm bar diameter φ, mm, &gt; 0
     * @return α2, -
     */
    public static Step alpha2(boolean bent, double cdMm, double phiMm) {
        Bounds.nonNegative("cd", cdMm, "mm", TABLE_8_2);
        Bounds.positive("φ", phiMm, "mm", TABLE_8_2);
        double k = bent ? 3 : 1;
        double raw = 1 - 0.15 * (cdMm - k * phiMm) / phiMm;
        double alpha = Math.max(0.7, Math.min(1.0, raw));
        String formula = bent ? "1 − 0.15·(cd − 3φ)/φ, 0.7…1.0" : "1 − 0.15·(cd − φ)/φ, 0.7…1.0";
        String substituted = "1 − 0.15·(" + Num.f(cdMm) + " − " + (bent ? "3·" : "") + Num.f(phiMm) + ")/"
                + Num.f(phiMm);
        return alpha == raw ? Step.of("α2", formula, substituted, alpha, "-", TABLE_8_2)
                : Step.withRemark("α2", formula, substituted, alpha, "-", TABLE_8_2, Num.f(raw) + " bounded to "
                + Num.f(alpha));
    }
}
