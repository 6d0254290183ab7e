package dev.countercheck.eurocode;

/** Material strengths of EN 1992-1-1 section 3: Table 3.1, 3.1.6 and 3.2.7. */
public final class Materials {

    private static final String TABLE_3_1 = "EN 1992-1-1 3.1.2(3), Table 3.1";

    private Materials() {
    }

    /**
     * Mean axial tensile strength of concrete, EN 1992-1-1 Table 3.1.
     * fctm = 0.30·fck^(2/3) for fck ≤ 50 MPa; fctm = 2.12·ln(1 + fcm/10), fcm = fck + 8, for 50 < fck ≤ 90 MPa.
     * The unrounded expression is returned, not the table's value rounded to 0.1 MPa.
     *
     * @param fckMpa characteristic cylinder strength fck, MPa, 12 ≤ fck ≤ 90
     * @return fctm, MPa
     */
    public static Step fctm(double fckMpa) {
        Bounds.fck(fckMpa);
        if (fckMpa <= 50) {
            return Step.withRemark("fctm", "0.30·fck^(2/3)", "0.30·" + Num.f(fckMpa) + "^(2/3)",
                    0.30 * Math.pow(fckMpa, 2.0 / 3.0), "MPa", TABLE_3_1, "fck ≤ 50 MPa: expression for ≤ C50/60");
        }
        return Step.withRemark("fctm", "2.12·ln(1 + (fck + 8)/10)", "2.12·ln(1 + (" + Num.f(fckMpa) + " + 8)/10)",
                2.12 * Math.log(1 + (fckMpa + 8) / 10), "MPa", TABLE_3_1, "fck > 50 MPa: expression for > C50/60");
    }

    /**
     * Characteristic 5 % fractile axial tensile strength, EN 1992-1-1 Table 3.1: fctk,0.05 = 0.7·fctm.
     *
     * @param fctmMpa mean tensile strength fctm, MPa, &gt; 0
     * @return fctk,0.05, MPa
     */
    public static Step fctk005(double fctmMpa) {
        Bounds.positive("fctm", fctmMpa, "MPa", TABLE_3_1);
        return Step.of("fctk,0.05", "0.7·fctm", "0.7·" + Num.f(fctmMpa), 0.7 * fctmMpa, "MPa", TABLE_3_1);
    }

    /**
     * Design compressive strength, EN 1992-1-1 3.1.6(1), Exp. (3.15): fcd = αcc·fck/γc.
     *
     * @param alphaCc αcc (NDP; recommended 1.0, the Note to 3.1.6(1) puts it between 0.8 and 1.0), -
     * @param fckMpa  fck, MPa, 12 ≤ fck ≤ 90
     * @param gammaC  partial factor γc (NDP, Table 2.1N), -, &gt; 0
     * @return fcd, MPa
     */
    public static Step fcd(double alphaCc, double fckMpa, double gammaC) {
        String clause = "EN 1992-1-1 3.1.6(1), Exp. (3.15)";
        OutOfRangeException.requireWithin("αcc", alphaCc, "-", 0.8, 1.0, clause);
        Bounds.fck(fckMpa);
        Bounds.positive("γc", gammaC, "-", clause);
        return Step.of("fcd", "αcc·fck/γc", Num.f(alphaCc) + "·" + Num.f(fckMpa) + "/" + Num.f(gammaC),
                alphaCc * fckMpa / gammaC, "MPa", clause);
    }

    /**
     * The fck that enters the shear resistance of concrete without shear reinforcement (vRd,c, vmin of
     * 6.2.2(1) and 6.4.4(1)): fck,v = min(fck, fck,max,v). EN 1992-1-1 allows classes up to Cmax = C90/105
     * (3.1.2(2)P, an NDP); a National Annex may limit the class taken in shear (the UK annex to C50/60).
     *
     * @param fckMpa    fck, MPa, 12 ≤ fck ≤ 90
     * @param fckMaxMpa the largest fck taken in shear (ruleset), MPa, &gt; 0
     * @param clause    where the limit is set (the ruleset parameter's clause)
     * @return fck,v, MPa; the remark says when the limit applied
     */
    public static Step fckShear(double fckMpa, double fckMaxMpa, String clause) {
        Bounds.fck(fckMpa);
        Bounds.positive("fck,max,v", fckMaxMpa, "MPa", clause);
        String substituted = "min(" + Num.f(fckMpa) + ", " + Num.f(fckMaxMpa) + ")";
        if (fckMpa > fckMaxMpa) {
            return Step.withRemark("fck,v", "min(fck, fck,max,v)", substituted, fckMaxMpa, "MPa", clause,
                    "fck limited to " + Num.f(fckMaxMpa) + " MPa in shear");
        }
        return Step.of("fck,v", "min(fck, fck,max,v)", substituted, fckMpa, "MPa", clause);
    }

    /**
     * Design tensile strength, EN 1992-1-1 3.1.6(2), Exp. (3.16): fctd = αct·fctk,0.05/γc.
     *
     * @param alphaCt     αct (NDP; recommended 1.0), -, 0 &lt; αct ≤ 1.0
     * @param fctk005Mpa  fctk,0.05, MPa, &gt; 0
     * @param gammaC      γc, -, &gt; 0
     * @return fctd, MPa
     */
    public static Step fctd(double alphaCt, double fctk005Mpa, double gammaC) {
        String clause = "EN 1992-1-1 3.1.6(2), Exp. (3.16)";
        Bounds.positiveAtMost("αct", alphaCt, "-", 1.0, clause);
        Bounds.positive("fctk,0.05", fctk005Mpa, "MPa", clause);
        Bounds.positive("γc", gammaC, "-", clause);
        return Step.of("fctd", "αct·fctk,0.05/γc", Num.f(alphaCt) + "·" + Num.f(fctk005Mpa) + "/" + Num.f(gammaC),
                alphaCt * fctk005Mpa / gammaC, "MPa", clause);
    }

    /**
     * Design yield strength of reinforcement, EN 1992-1-1 3.2.7(2), Figure 3.8: fyd = fyk/γs.
     *
     * @param fykMpa characteristic yield strength fyk, MPa, 400 ≤ fyk ≤ 600 (the range of 3.2.2(3)P)
     * @param gammaS partial factor γs (NDP, Table 2.1N), -, &gt; 0
     * @return fyd, MPa
     */
    public static Step fyd(double fykMpa, double gammaS) {
        String clause = "EN 1992-1-1 3.2.7(2)";
        OutOfRangeException.requireWithin("fyk", fykMpa, "MPa", 400, 600, "EN 1992-1-1 3.2.2(3)P");
        Bounds.positive("γs", gammaS, "-", clause);
        return Step.of("fyd", "fyk/γs", Num.f(fykMpa) + "/" + Num.f(gammaS), fykMpa / gammaS, "MPa", clause);
    }
}
