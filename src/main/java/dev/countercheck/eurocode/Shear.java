package dev.countercheck.eurocode;

/**
 * Shear resistance of members without shear reinforcement, EN 1992-1-1 6.2.2
 * (no axial force: σcp = 0 throughout), and the short-shear-span rules of 6.2.2(6).
 */
public final class Shear {

    private static final String C_6_2_2_1 = "EN 1992-1-1 6.2.2(1)";
    private static final String C_6_2_2_6 = "EN 1992-1-1 6.2.2(6)";
    /** Upper limit of the longitudinal steel ratio, 6.2.2(1) and 6.4.4(1). */
    static final double RHO_L_LIMIT = 0.02;

    private Shear() {
    }

    /**
     * Size factor, EN 1992-1-1 6.2.2(1): k = 1 + √(200/d) ≤ 2.0 (d in mm). The cap is recorded in the remark.
     *
     * @param dMm effective depth d, mm, &gt; 0
     * @return k, -
     */
    public static Step kSize(double dMm) {
        Bounds.positive("d", dMm, "mm", C_6_2_2_1);
        double k = 1 + Math.sqrt(200 / dMm);
        String substituted = "1 + √(200/" + Num.f(dMm) + ")";
        if (k > 2.0) {
            return Step.withRemark("k", "1 + √(200/d) ≤ 2.0", "min(" + substituted + "; 2.0)", 2.0, "-", C_6_2_2_1,
                    "k = " + Num.f(k) + " capped at 2.0 (d < 200 mm)");
        }
        return Step.of("k", "1 + √(200/d) ≤ 2.0", substituted, k, "-", C_6_2_2_1);
    }

    /**
     * Longitudinal tension steel ratio, EN 1992-1-1 6.2.2(1): ρl = Asl/(bw·d) ≤ 0.02. The cap is recorded
     * in the remark.
     *
     * @param asMm2 area of tension steel Asl extending beyond the section, mm², ≥ 0
     * @param bMm   smallest width of the section in the tensile area bw, mm, &gt; 0
     * @param dMm   effective depth d, mm, &gt; 0
     * @return ρl, -
     */
    public static Step rhoL(double asMm2, double bMm, double dMm) {
        Bounds.nonNegative("Asl", asMm2, "mm2", C_6_2_2_1);
        Bounds.positive("bw", bMm, "mm", C_6_2_2_1);
        Bounds.positive("d", dMm, "mm", C_6_2_2_1);
        return cappedRatio("ρl", "Asl/(bw·d)", Num.f(asMm2) + "/(" + Num.f(bMm) + "·" + Num.f(dMm) + ")",
                asMm2 / (bMm * dMm), C_6_2_2_1);
    }

    /**
     * Shear stress resistance without shear reinforcement, EN 1992-1-1 6.2.2(1), Exp. (6.2a) with σcp = 0:
     * vRd,c = CRd,c·k·(100·ρl·fck)^(1/3).
     *
     * @param cRdc   CRd,c (NDP; recommended 0.18/γc), -, &gt; 0
     * @param k      size factor k, -, 1 ≤ k ≤ 2 (from {@link #kSize})
     * @param rhoL   ρl, -, 0 ≤ ρl ≤ 0.02 (from {@link #rhoL} or {@link Punching#rhoMean})
     * @param fckMpa fck, MPa, 12 ≤ fck ≤ 90
     * @return vRd,c, MPa
     */
    public static Step vRdcStress(double cRdc, double k, double rhoL, double fckMpa) {
        String clause = "EN 1992-1-1 6.2.2(1), Exp. (6.2a)";
        Bounds.positive("CRd,c", cRdc, "-", clause);
        requireK(k, clause);
        OutOfRangeException.requireWithin("ρl", rhoL, "-", 0, RHO_L_LIMIT, clause);
        Bounds.fck(fckMpa);
        return Step.of("vRd,c", "CRd,c·k·(100·ρl·fck)^(1/3)",
                Num.f(cRdc) + "·" + Num.f(k) + "·(100·" + Num.f(rhoL) + "·" + Num.f(fckMpa) + ")^(1/3)",
                cRdc * k * Math.cbrt(100 * rhoL * fckMpa), "MPa", clause);
    }

    /**
     * Minimum shear stress resistance, EN 1992-1-1 6.2.2(1), Exp. (6.3N): vmin = c·k^(3/2)·fck^(1/2).
     *
     * @param coefficient c, the NDP coefficient of Exp. (6.3N) (recommended 0.035), -, &gt; 0
     * @param k           size factor k, -, 1 ≤ k ≤ 2
     * @param fckMpa      fck, MPa, 12 ≤ fck ≤ 90
     * @return vmin, MPa
     */
    public static Step vMin(double coefficient, double k, double fckMpa) {
        String clause = "EN 1992-1-1 6.2.2(1), Exp. (6.3N)";
        Bounds.positive("c", coefficient, "-", clause);
        requireK(k, clause);
        Bounds.fck(fckMpa);
        return Step.of("vmin", "c·k^(3/2)·fck^(1/2)",
                Num.f(coefficient) + "·" + Num.f(k) + "^(3/2)·" + Num.f(fckMpa) + "^(1/2)",
                coefficient * Math.pow(k, 1.5) * Math.sqrt(fckMpa), "MPa", clause);
    }

    /**
     * Design shear resistance, EN 1992-1-1 6.2.2(1), Exps. (6.2a) and (6.2b) with σcp = 0:
     * VRd,c = max(vRd,c; vmin)·bw·d. The remark says which governs.
     *
     * @param vRdcStress vRd,c from {@link #vRdcStress}, MPa
     * @param vMin       vmin from {@link #vMin}, MPa
     * @param bMm        bw, mm, &gt; 0
     * @param dMm        d, mm, &gt; 0
     * @return VRd,c, kN
     */
    public static Step vRdc(Step vRdcStress, Step vMin, double bMm, double dMm) {
        String clause = "EN 1992-1-1 6.2.2(1), Exps. (6.2a), (6.2b)";
        Bounds.inUnit(vRdcStress, "MPa");
        Bounds.inUnit(vMin, "MPa");
        Bounds.positive("bw", bMm, "mm", clause);
        Bounds.positive("d", dMm, "mm", clause);
        double v = Math.max(vRdcStress.value(), vMin.value());
        return Step.withRemark("VRd,c", "max(vRd,c; vmin)·bw·d",
                "max(" + Num.f(vRdcStress.value()) + "; " + Num.f(vMin.value()) + ")·" + Num.f(bMm) + "·"
                        + Num.f(dMm) + "/1000",
                v * bMm * dMm / 1000, "kN", clause, governing(vRdcStress.value(), vMin.value()));
    }

    /**
     * Shear span for the short-span rule, EN 1992-1-1 6.2.2(6): where av &lt; 0.5d, av = 0.5d is used.
     * The remark records the floor when applied.
     *
     * @param avMm distance av from the edge of the support to the load, mm (zero or negative when the load
     *             overlaps the support: it is raised to 0.5d)
     * @param dMm  d, mm, &gt; 0
     * @return av, mm
     */
    public static Step avFloored(double avMm, double dMm) {
        double av = avFlooredValue(avMm, dMm);
        String substituted = "max(" + Num.f(avMm) + "; 0.5·" + Num.f(dMm) + ")";
        if (avMm < 0.5 * dMm) {
            return Step.withRemark("av", "max(av; 0.5·d)", substituted, av, "mm", C_6_2_2_6,
                    "av = " + Num.f(avMm) + " mm < 0.5·d: raised to 0.5·d = " + Num.f(av) + " mm");
        }
        return Step.of("av", "max(av; 0.5·d)", substituted, av, "mm", C_6_2_2_6);
    }

    /**
     * The value of {@link #avFloored} alone (no trace text: the piles of every side and case, of which one
     * governs), with the same range checks, mm.
     */
    public static double avFlooredValue(double avMm, double dMm) {
        Bounds.positive("d", dMm, "mm", C_6_2_2_6);
        if (Double.isNaN(avMm) || Double.isInfinite(avMm)) {
            throw new OutOfRangeException("av", avMm, "mm", "av finite", C_6_2_2_6);
        }
        double floor = 0.5 * dMm;
        return avMm < floor ? floor : avMm;
    }

    /**
     * Reduction factor for loads near a support, EN 1992-1-1 6.2.2(6): β = av/(2d) for av ≤ 2d, else 1.0
     * (no reduction). Valid only where the longitudinal steel is fully anchored at the support.
     *
     * @param avMm av after {@link #avFloored}, mm, ≥ 0.5·d
     * @param dMm  d, mm, &gt; 0
     * @return β, -, 0.25 ≤ β ≤ 1
     */
    public static Step betaShortSpan(double avMm, double dMm) {
        double beta = betaShortSpanValue(avMm, dMm);
        if (avMm <= 2 * dMm) {
            return Step.withRemark("β", "av/(2·d)", Num.f(avMm) + "/(2·" + Num.f(dMm) + ")", beta, "-",
                    C_6_2_2_6, "av ≤ 2·d: β = av/(2·d)");
        }
        return Step.withRemark("β", "1.0", "1.0", beta, "-", C_6_2_2_6, "av > 2·d: no reduction, β = 1.0");
    }

    /** The value of {@link #betaShortSpan} alone (no trace text), with the same range checks, -. */
    public static double betaShortSpanValue(double avMm, double dMm) {
        Bounds.positive("d", dMm, "mm", C_6_2_2_6);
        Bounds.atLeast("av", avMm, "mm", 0.5 * dMm, C_6_2_2_6);
        return avMm <= 2 * dMm ? avMm / (2 * dMm) : 1.0;
    }

    /**
     * Strength reduction factor for concrete cracked in shear, EN 1992-1-1 6.2.2(6), Exp. (6.6N):
     * ν = 0.6·(1 − fck/250).
     *
     * @param fckMpa fck, MPa, 12 ≤ fck ≤ 90
     * @return ν, -
     */
    public static Step nu(double fckMpa) {
        Bounds.fck(fckMpa);
        return Step.of("ν", "0.6·(1 − fck/250)", "0.6·(1 − " + Num.f(fckMpa) + "/250)", 0.6 * (1 - fckMpa / 250),
                "-", "EN 1992-1-1 6.2.2(6), Exp. (6.6N)");
    }

    /**
     * Upper limit of the shear force (unreduced by β), EN 1992-1-1 6.2.2(6), Exp. (6.5):
     * VEd ≤ 0.5·bw·d·ν·fcd.
     *
     * @param nu     ν from {@link #nu}, -, 0 &lt; ν ≤ 0.6
     * @param fcdMpa fcd, MPa, &gt; 0
     * @param bMm    bw, mm, &gt; 0
     * @param dMm    d, mm, &gt; 0
     * @return the limit VEd,max, kN
     */
    public static Step vEdMax(double nu, double fcdMpa, double bMm, double dMm) {
        String clause = "EN 1992-1-1 6.2.2(6), Exp. (6.5)";
        Bounds.positiveAtMost("ν", nu, "-", 0.6, clause);
        Bounds.positive("fcd", fcdMpa, "MPa", clause);
        Bounds.positive("bw", bMm, "mm", clause);
        Bounds.positive("d", dMm, "mm", clause);
        return Step.of("VEd,max", "0.5·bw·d·ν·fcd",
                "0.5·" + Num.f(bMm) + "·" + Num.f(dMm) + "·" + Num.f(nu) + "·" + Num.f(fcdMpa) + "/1000",
                0.5 * bMm * dMm * nu * fcdMpa / 1000, "kN", clause);
    }

    /** A steel ratio capped at 0.02, the cap recorded in the remark (6.2.2(1), 6.4.4(1)). */
    static Step cappedRatio(String symbol, String formula, String substituted, double ratio, String clause) {
        String cappedFormula = formula + " ≤ 0.02";
        if (ratio > RHO_L_LIMIT) {
            return Step.withRemark(symbol, cappedFormula, "min(" + substituted + "; 0.02)", RHO_L_LIMIT, "-", clause,
                    symbol + " = " + Num.f(ratio) + " capped at 0.02");
        }
        return Step.of(symbol, cappedFormula, substituted, ratio, "-", clause);
    }

    /** Which of vRd,c (Exp. (6.2a)) and vmin (Exp. (6.2b)) governs their maximum. */
    static String governing(double vRdcMpa, double vMinMpa) {
        return vRdcMpa >= vMinMpa
                ? "vRd,c governs (vRd,c = " + Num.f(vRdcMpa) + " ≥ vmin = " + Num.f(vMinMpa) + " MPa)"
                : "vmin governs (vmin = " + Num.f(vMinMpa) + " > vRd,c = " + Num.f(vRdcMpa) + " MPa)";
    }

    private static void requireK(double k, String clause) {
        OutOfRangeException.requireWithin("k", k, "-", 1.0, 2.0, clause);
    }
}
