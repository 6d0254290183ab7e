package dev.countercheck.eurocode;

/** Punching shear, EN 1992-1-1 6.4: perimeters, resistances and the eccentricity factor β. */
public final class Punching {

    private static final String C_6_4_5_3 = "EN 1992-1-1 6.4.5(3)";
    private static final String C_PERIMETER = "EN 1992-1-1 6.4.2(1), Figure 6.13; 6.4.4(2)";
    private static final String C_TABLE_6_1 = "EN 1992-1-1 6.4.3(3), Table 6.1";
    private static final String C_W1 = "EN 1992-1-1 6.4.3(3), Exp. (6.41), at distance a (6.4.4(2))";
    private static final String C_BETA = "EN 1992-1-1 6.4.3(3), Exp. (6.39); 6.4.4(2), Exp. (6.51)";
    private static final String C_BETA_CIRCULAR = "EN 1992-1-1 6.4.3(3), Exp. (6.42), at distance a (6.4.4(2))";
    private static final String C_VRD_ENHANCED = "EN 1992-1-1 6.4.4(2), Exp. (6.50)";
    /** Table 6.1: c1/c2 and k. */
    private static final double[] RATIO = {0.5, 1.0, 2.0, 3.0};
    private static final double[] K = {0.45, 0.60, 0.70, 0.80};

    private Punching() {
    }

    /**
     * Periphery of a rectangular column, EN 1992-1-1 6.4.5(3) (interior column): u0 = 2·(cx + cy).
     *
     * @param cxMm column side cx, mm, &gt; 0
     * @param cyMm column side cy, mm, &gt; 0
     * @return u0, mm
     */
    public static Step u0Rectangular(double cxMm, double cyMm) {
        Bounds.positive("cx", cxMm, "mm", C_6_4_5_3);
        Bounds.positive("cy", cyMm, "mm", C_6_4_5_3);
        return Step.of("u0", "2·(cx + cy)", "2·(" + Num.f(cxMm) + " + " + Num.f(cyMm) + ")", 2 * (cxMm + cyMm), "mm",
                C_6_4_5_3);
    }

    /**
     * Periphery of a circular column, EN 1992-1-1 6.4.5(3) (interior column): u0 = π·D.
     *
     * @param diameterMm column diameter D, mm, &gt; 0
     * @return u0, mm
     */
    public static Step u0Circular(double diameterMm) {
        Bounds.positive("D", diameterMm, "mm", C_6_4_5_3);
        return Step.of("u0", "π·D", "π·" + Num.f(diameterMm), Math.PI * diameterMm, "mm", C_6_4_5_3);
    }

    /**
     * Control perimeter at distance a from a rectangular column, with rounded corners, EN 1992-1-1 6.4.2(1),
     * Figure 6.13 (a = 2d gives the basic control perimeter u1) and 6.4.4(2) (foundations, a ≤ 2d):
     * u = 2·(cx + cy) + 2·π·a.
     *
     * @param cxMm column side cx, mm, &gt; 0
     * @param cyMm column side cy, mm, &gt; 0
     * @param aMm  distance a from the column face, mm, &gt; 0
     * @return u, mm
     */
    public static Step u1Rectangular(double cxMm, double cyMm, double aMm) {
        double u = u1RectangularValue(cxMm, cyMm, aMm);
        return Step.of("u", "2·(cx + cy) + 2·π·a",
                "2·(" + Num.f(cxMm) + " + " + Num.f(cyMm) + ") + 2·π·" + Num.f(aMm), u, "mm", C_PERIMETER);
    }

    /** The value of {@link #u1Rectangular} alone (no trace text: a search over many perimeters), mm. */
    public static double u1RectangularValue(double cxMm, double cyMm, double aMm) {
        Bounds.positive("cx", cxMm, "mm", C_PERIMETER);
        Bounds.positive("cy", cyMm, "mm", C_PERIMETER);
        Bounds.positive("a", aMm, "mm", C_PERIMETER);
        return 2 * (cxMm + cyMm) + 2 * Math.PI * aMm;
    }

    /**
     * Control perimeter at distance a from a circular column, EN 1992-1-1 6.4.2(1) and 6.4.4(2):
     * u = π·(D + 2·a).
     *
     * @param diameterMm column diameter D, mm, &gt; 0
     * @param aMm        distance a from the column face, mm, &gt; 0
     * @return u, mm
     */
    public static Step u1Circular(double diameterMm, double aMm) {
        return Step.of("u", "π·(D + 2·a)", "π·(" + Num.f(diameterMm) + " + 2·" + Num.f(aMm) + ")",
                u1CircularValue(diameterMm, aMm), "mm", C_PERIMETER);
    }

    /** The value of {@link #u1Circular} alone (no trace text: a search over many perimeters), mm. */
    public static double u1CircularValue(double diameterMm, double aMm) {
        Bounds.positive("D", diameterMm, "mm", C_PERIMETER);
        Bounds.positive("a", aMm, "mm", C_PERIMETER);
        return Math.PI * (diameterMm + 2 * aMm);
    }

    /**
     * Maximum punching resistance at the column periphery, EN 1992-1-1 6.4.5(3), Exp. (6.53):
     * VRd,max = f·ν·fcd·u0·d, where vRd,max = f·ν·fcd (NDP: f = 0.4 recommended by A1:2014, 0.5 before).
     *
     * @param factor f, -, 0 &lt; f ≤ 1
     * @param nu     ν from {@link Shear#nu}, -, 0 &lt; ν ≤ 0.6
     * @param fcdMpa fcd, MPa, &gt; 0
     * @param u0Mm   u0, mm, &gt; 0
     * @param dMm    mean effective depth d, mm, &gt; 0
     * @return VRd,max, kN
     */
    public static Step vRdMax(double factor, double nu, double fcdMpa, double u0Mm, double dMm) {
        String clause = "EN 1992-1-1 6.4.5(3), Exp. (6.53)";
        Bounds.positiveAtMost("f", factor, "-", 1.0, clause);
        Bounds.positiveAtMost("ν", nu, "-", 0.6, clause);
        Bounds.positive("fcd", fcdMpa, "MPa", clause);
        Bounds.positive("u0", u0Mm, "mm", clause);
        Bounds.positive("d", dMm, "mm", clause);
        return Step.of("VRd,max", "f·ν·fcd·u0·d",
                Num.f(factor) + "·" + Num.f(nu) + "·" + Num.f(fcdMpa) + "·" + Num.f(u0Mm) + "·" + Num.f(dMm) + "/1000",
                factor * nu * fcdMpa * u0Mm * dMm / 1000, "kN", clause);
    }

    /**
     * Mean tension steel ratio for punching, EN 1992-1-1 6.4.4(1):
     * ρl = √(ρly·ρlz) ≤ 0.02. The cap is recorded in the remark.
     *
     * @param rhoX ρly, ratio of the bars in one direction, -, ≥ 0
     * @param rhoY ρlz, ratio of the bars in the other direction, -, ≥ 0
     * @return ρl, -
     */
    public static Step rhoMean(double rhoX, double rhoY) {
        String clause = "EN 1992-1-1 6.4.4(1)";
        Bounds.nonNegative("ρly", rhoX, "-", clause);
        Bounds.nonNegative("ρlz", rhoY, "-", clause);
        return Shear.cappedRatio("ρl", "√(ρly·ρlz)", "√(" + Num.f(rhoX) + "·" + Num.f(rhoY) + ")",
                Math.sqrt(rhoX * rhoY), clause);
    }

    /**
     * Punching resistance of a column base at distance a from the column face, EN 1992-1-1 6.4.4(2),
     * Exp. (6.50): vRd = max(CRd,c·k·(100·ρ·fck)^(1/3); vmin)·2d/a. The remark says which governs.
     *
     * @param vRdcStress vRd,c = CRd,c·k·(100·ρ·fck)^(1/3) from {@link Shear#vRdcStress}, MPa, ≥ 0
     * @param vMinMpa    vmin from {@link Shear#vMin}, MPa, ≥ 0
     * @param dMm        mean effective depth d, mm, &gt; 0
     * @param aMm        distance a from the column face to the control perimeter, mm, 0 &lt; a ≤ 2d
     * @return vRd, MPa
     */
    public static Step vRdEnhanced(double vRdcStress, double vMinMpa, double dMm, double aMm) {
        return Step.withRemark("vRd", "max(vRd,c; vmin)·2·d/a",
                "max(" + Num.f(vRdcStress) + "; " + Num.f(vMinMpa) + ")·2·" + Num.f(dMm) + "/" + Num.f(aMm),
                vRdEnhancedValue(vRdcStress, vMinMpa, dMm, aMm), "MPa", C_VRD_ENHANCED,
                Shear.governing(vRdcStress, vMinMpa));
    }

    /** The value of {@link #vRdEnhanced} alone (no trace text: a search over many perimeters), MPa. */
    public static double vRdEnhancedValue(double vRdcStress, double vMinMpa, double dMm, double aMm) {
        Bounds.nonNegative("vRd,c", vRdcStress, "MPa", C_VRD_ENHANCED);
        Bounds.nonNegative("vmin", vMinMpa, "MPa", C_VRD_ENHANCED);
        Bounds.positive("d", dMm, "mm", C_VRD_ENHANCED);
        Bounds.positiveAtMost("a", aMm, "mm", 2 * dMm, C_VRD_ENHANCED);
        return Math.max(vRdcStress, vMinMpa) * 2 * dMm / aMm;
    }

    /**
     * Factor k for a rectangular column with moment, EN 1992-1-1 6.4.3(3), Table 6.1:
     * c1/c2 ≤ 0.5 → 0.45; 1.0 → 0.60; 2.0 → 0.70; ≥ 3.0 → 0.80, linear between.
     *
     * @param c1Mm column side parallel to the eccentricity c1, mm, &gt; 0
     * @param c2Mm column side perpendicular to the eccentricity c2, mm, &gt; 0
     * @return k, -
     */
    public static Step kEccentricity(double c1Mm, double c2Mm) {
        double k = kEccentricityValue(c1Mm, c2Mm);
        double ratio = c1Mm / c2Mm;
        String formula = "k(c1/c2), Table 6.1, linear between rows";
        String substituted = "k(" + Num.f(c1Mm) + "/" + Num.f(c2Mm) + " = " + Num.f(ratio) + ")";
        int row = upperRow(ratio);
        String remark = row == 0 ? "c1/c2 ≤ 0.5: k = 0.45" : row == RATIO.length ? "c1/c2 ≥ 3.0: k = 0.80"
                : "interpolated between c1/c2 = " + Num.f(RATIO[row - 1]) + " and " + Num.f(RATIO[row]);
        return Step.withRemark("k", formula, substituted, k, "-", C_TABLE_6_1, remark);
    }

    /** The value of {@link #kEccentricity} alone (no trace text: a search over many perimeters), -. */
    public static double kEccentricityValue(double c1Mm, double c2Mm) {
        Bounds.positive("c1", c1Mm, "mm", C_TABLE_6_1);
        Bounds.positive("c2", c2Mm, "mm", C_TABLE_6_1);
        double ratio = c1Mm / c2Mm;
        int i = upperRow(ratio);
        if (i == 0 || i == RATIO.length) {
            return K[Math.min(i, RATIO.length - 1)];
        }
        return K[i - 1] + (K[i] - K[i - 1]) * (ratio - RATIO[i - 1]) / (RATIO[i] - RATIO[i - 1]);
    }

    /**
     * The row of Table 6.1 above c1/c2 (k is interpolated from the row before it): 0 at or below the
     * first row, the number of rows at or above the last.
     */
    private static int upperRow(double ratio) {
        int last = RATIO.length - 1;
        if (ratio <= RATIO[0]) {
            return 0;
        }
        if (ratio >= RATIO[last]) {
            return RATIO.length;
        }
        int i = 1;
        while (ratio > RATIO[i]) {
            i++;
        }
        return i;
    }

    /**
     * Plastic shear distribution modulus of a control perimeter at distance a from a rectangular column,
     * EN 1992-1-1 6.4.3(3), Exp. (6.41) with 2d replaced by a (6.4.4(2), perimeters within 2d):
     * W = c1²/2 + c1·c2 + 2·c2·a + 4·a² + π·a·c1 (a = 2d gives W1 of Exp. (6.41)).
     *
     * @param c1Mm column side parallel to the eccentricity c1, mm, &gt; 0
     * @param c2Mm column side perpendicular to the eccentricity c2, mm, &gt; 0
     * @param aMm  distance a from the column face, mm, &gt; 0
     * @return W, mm²
     */
    public static Step w1Rectangular(double c1Mm, double c2Mm, double aMm) {
        double w = w1RectangularValue(c1Mm, c2Mm, aMm);
        String c1 = Num.f(c1Mm);
        String c2 = Num.f(c2Mm);
        String a = Num.f(aMm);
        return Step.of("W", "c1²/2 + c1·c2 + 2·c2·a + 4·a² + π·a·c1",
                c1 + "²/2 + " + c1 + "·" + c2 + " + 2·" + c2 + "·" + a + " + 4·" + a + "² + π·" + a + "·" + c1,
                w, "mm2", C_W1);
    }

    /** The value of {@link #w1Rectangular} alone (no trace text: a search over many perimeters), mm². */
    public static double w1RectangularValue(double c1Mm, double c2Mm, double aMm) {
        Bounds.positive("c1", c1Mm, "mm", C_W1);
        Bounds.positive("c2", c2Mm, "mm", C_W1);
        Bounds.positive("a", aMm, "mm", C_W1);
        return c1Mm * c1Mm / 2 + c1Mm * c2Mm + 2 * c2Mm * aMm + 4 * aMm * aMm + Math.PI * aMm * c1Mm;
    }

    /**
     * Eccentricity factor for punching, EN 1992-1-1 6.4.3(3), Exp. (6.39), and 6.4.4(2), Exp. (6.51):
     * β = 1 + k·(MEd/VEd)·(u/W), MEd converted from kN·m to kN·mm. The magnitude of MEd is used (its sign
     * does not change β).
     *
     * @param k      k from {@link #kEccentricity}, -, 0 &lt; k ≤ 1
     * @param mEdKnm MEd, kN·m (sign ignored)
     * @param vEdKn  VEd (or VEd,red for foundations), kN, &gt; 0
     * @param uMm    control perimeter u, mm, &gt; 0
     * @param wMm2   W for that perimeter, mm², &gt; 0
     * @return β, -, ≥ 1
     */
    public static Step betaEccentric(double k, double mEdKnm, double vEdKn, double uMm, double wMm2) {
        double beta = betaEccentricValue(k, mEdKnm, vEdKn, uMm, wMm2);
        return Step.of("β", "1 + k·(MEd/VEd)·(u/W)",
                "1 + " + Num.f(k) + "·(" + Num.f(Math.abs(mEdKnm)) + "·1000/" + Num.f(vEdKn) + ")·(" + Num.f(uMm) + "/"
                        + Num.f(wMm2) + ")", beta, "-", C_BETA);
    }

    /** The value of {@link #betaEccentric} alone (no trace text: a search over many perimeters), -. */
    public static double betaEccentricValue(double k, double mEdKnm, double vEdKn, double uMm, double wMm2) {
        Bounds.positiveAtMost("k", k, "-", 1.0, C_BETA);
        double moment = Math.abs(mEdKnm);
        Bounds.nonNegative("|MEd|", moment, "kNm", C_BETA);
        Bounds.positive("VEd", vEdKn, "kN", C_BETA);
        Bounds.positive("u", uMm, "mm", C_BETA);
        Bounds.positive("W", wMm2, "mm2", C_BETA);
        return 1 + k * (moment * 1000 / vEdKn) * (uMm / wMm2);
    }

    /**
     * β on the part of a control perimeter that lies on the element (EN 1992-1-1 6.4.4(2), Exp. (6.51): u is
     * the control perimeter considered, in vEd = VEd,red/(u·d) and in u/W alike; a free edge cuts it off,
     * 6.4.2(4)): β = 1 + (β(u) − 1)·u'/u, the moment term of β(u) being proportional to u, with W that of
     * the whole perimeter (the moment's shear stress k·MEd/(W·d) stays that of the whole perimeter).
     *
     * @param betaWhole β of the whole perimeter of length {@code uWholeMm}
     * @param uPartMm   the length of the perimeter on the element, mm, 0 &lt; u' ≤ u
     */
    public static Step betaOnPart(Step betaWhole, double uPartMm, double uWholeMm) {
        String clause = "EN 1992-1-1 6.4.4(2), Exp. (6.51); 6.4.2(4)";
        Bounds.positive("u", uWholeMm, "mm", clause);
        OutOfRangeException.requireWithin("u'", uPartMm, "mm", Double.MIN_VALUE, uWholeMm * (1 + 1e-9), clause);
        if (uPartMm >= uWholeMm) {
            return betaWhole;
        }
        return Step.withRemark("β", "1 + (β(u) − 1)·u'/u", "1 + (" + Num.f(betaWhole.value()) + " − 1)·"
                        + Num.f(uPartMm) + "/" + Num.f(uWholeMm), betaOnPartValue(betaWhole.value(), uPartMm, uWholeMm),
                "-", clause, "u' the part of the perimeter on the element; W of the whole perimeter");
    }

    /** The value of {@link #betaOnPart} without its trace, for searches over many perimeters. */
    public static double betaOnPartValue(double betaWhole, double uPartMm, double uWholeMm) {
        return uPartMm >= uWholeMm ? betaWhole : 1 + (betaWhole - 1) * uPartMm / uWholeMm;
    }

    /**
     * Eccentricity factor for a circular column, EN 1992-1-1 6.4.3(3), Exp. (6.42), at distance a from
     * the face (6.4.4(2)): β = 1 + 0.6·π·e/(D + 2·a), e = MEd/VEd the resultant eccentricity (a = 2d gives
     * the 1 + 0.6·π·e/(D + 4d) of Exp. (6.42)).
     *
     * @param eMm        resultant eccentricity e, mm, ≥ 0
     * @param diameterMm column diameter D, mm, &gt; 0
     * @param aMm        distance a from the column face, mm, &gt; 0
     * @return β, -, ≥ 1
     */
    public static Step betaCircular(double eMm, double diameterMm, double aMm) {
        double beta = betaCircularValue(eMm, diameterMm, aMm);
        return Step.of("β", "1 + 0.6·π·e/(D + 2·a)", "1 + 0.6·π·" + Num.f(eMm) + "/(" + Num.f(diameterMm) + " + 2·"
                + Num.f(aMm) + ")", beta, "-", C_BETA_CIRCULAR);
    }

    /** The value of {@link #betaCircular} alone (no trace text: a search over many perimeters), -. */
    public static double betaCircularValue(double eMm, double diameterMm, double aMm) {
        Bounds.nonNegative("e", eMm, "mm", C_BETA_CIRCULAR);
        Bounds.positive("D", diameterMm, "mm", C_BETA_CIRCULAR);
        Bounds.positive("a", aMm, "mm", C_BETA_CIRCULAR);
        return 1 + 0.6 * Math.PI * eMm / (diameterMm + 2 * aMm);
    }
}
