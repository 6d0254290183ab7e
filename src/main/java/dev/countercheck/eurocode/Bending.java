package dev.countercheck.eurocode;

/**
 * Bending of a singly reinforced rectangular section, EN 1992-1-1 6.1 with the rectangular stress block of
 * 3.1.7(3) (η = 1, valid for fck ≤ 50 MPa).
 */
public final class Bending {

    private static final String CLAUSE = "EN 1992-1-1 6.1, 3.1.7(3)";

    private Bending() {
    }

    /**
     * Normalised moment K = MEd/(b·d²·fck) (the design-guide parameter for the rectangular block of 3.1.7(3)),
     * MEd converted from kN·m to N·mm.
     *
     * @param momentKnm MEd, kN·m, ≥ 0
     * @param bMm       width b, mm, &gt; 0
     * @param dMm       effective depth d, mm, &gt; 0
     * @param fckMpa    fck, MPa, 12 ≤ fck ≤ 90
     * @return K, -
     */
    public static Step kFactor(double momentKnm, double bMm, double dMm, double fckMpa) {
        Bounds.nonNegative("MEd", momentKnm, "kNm", CLAUSE);
        Bounds.positive("b", bMm, "mm", CLAUSE);
        Bounds.positive("d", dMm, "mm", CLAUSE);
        Bounds.fck(fckMpa);
        return Step.of("K", "MEd/(b·d²·fck)",
                Num.f(momentKnm) + "·10^6/(" + Num.f(bMm) + "·" + Num.f(dMm) + "²·" + Num.f(fckMpa) + ")",
                momentKnm * 1e6 / (bMm * dMm * dMm * fckMpa), "-", CLAUSE);
    }

    /**
     * Lever arm of the rectangular stress block, EN 1992-1-1 3.1.7(3) with η = 1 (so valid for fck ≤ 50 MPa
     * only; the caller holds fck): z = (d/2)·[1 + √(1 − 2·K/(η·αcc/γc))] ≤ 0.95·d. The 0.95d limit is
     * common practice and is recorded in the remark when it governs. With αcc = 0.85 and γc = 1.5 this is
     * z = (d/2)·[1 + √(1 − 3.53·K)].
     *
     * @param kFactor K from {@link #kFactor}, -, 0 ≤ K ≤ η·αcc/(2·γc) (beyond it the root is negative and the
     *                section needs compression steel: OutOfRangeException)
     * @param dMm     effective depth d, mm, &gt; 0
     * @param alphaCc αcc (NDP), -, 0.8 ≤ αcc ≤ 1.0
     * @param gammaC  γc (NDP), -, &gt; 0
     * @return z, mm
     */
    public static Step leverArm(double kFactor, double dMm, double alphaCc, double gammaC) {
        Bounds.nonNegative("K", kFactor, "-", CLAUSE);
        Bounds.positive("d", dMm, "mm", CLAUSE);
        OutOfRangeException.requireWithin("αcc", alphaCc, "-", 0.8, 1.0, "EN 1992-1-1 3.1.6(1)");
        Bounds.positive("γc", gammaC, "-", CLAUSE);
        double blockStrength = alphaCc / gammaC;
        double root = 1 - 2 * kFactor / blockStrength;
        if (root < 0) {
            throw new OutOfRangeException("K", kFactor, "-",
                    "K ≤ η·αcc/(2·γc) = " + Num.f(blockStrength / 2)
                            + "; a larger K needs compression steel, which this check does not design", CLAUSE);
        }
        double z = dMm / 2 * (1 + Math.sqrt(root));
        String formula = "(d/2)·[1 + √(1 − 2·K/(η·αcc/γc))] ≤ 0.95·d";
        String substituted = "(" + Num.f(dMm) + "/2)·[1 + √(1 − 2·" + Num.f(kFactor) + "/(1·" + Num.f(alphaCc) + "/"
                + Num.f(gammaC) + "))]";
        double cap = 0.95 * dMm;
        if (z > cap) {
            return Step.withRemark("z", formula, "min(" + substituted + "; 0.95·" + Num.f(dMm) + ")", cap, "mm",
                    CLAUSE, "z = " + Num.f(z) + " mm limited to 0.95·d = " + Num.f(cap) + " mm (common practice)");
        }
        return Step.of("z", formula, substituted, z, "mm", CLAUSE);
    }

    /**
     * Limit on K for a section without compression steel, from the rectangular block of EN 1992-1-1
     * 3.1.7(3) with the neutral axis at its limit ξ = x/d: K' = (αcc/γc)·λ·ξ·(1 − λ·ξ/2).
     *
     * @param alphaCc αcc (NDP), -, 0.8 ≤ αcc ≤ 1.0
     * @param gammaC  γc (NDP), -, &gt; 0
     * @param lambda  λ, depth of the block over x (0.8 for fck ≤ 50 MPa, Exp. (3.19)), -, 0 &lt; λ ≤ 1
     * @param xiLimit ξ = x/d limit, -, 0 &lt; ξ ≤ 1
     * @return K', -
     */
    public static Step kPrime(double alphaCc, double gammaC, double lambda, double xiLimit) {
        String clause = "EN 1992-1-1 3.1.7(3); x/d limit of the ruleset";
        OutOfRangeException.requireWithin("αcc", alphaCc, "-", 0.8, 1.0, "EN 1992-1-1 3.1.6(1)");
        Bounds.positive("γc", gammaC, "-", clause);
        Bounds.positiveAtMost("λ", lambda, "-", 1.0, clause);
        Bounds.positiveAtMost("ξ", xiLimit, "-", 1.0, clause);
        return Step.of("K'", "(αcc/γc)·λ·ξ·(1 − λ·ξ/2)", "(" + Num.f(alphaCc) + "/" + Num.f(gammaC) + ")·"
                + Num.f(lambda) + "·" + Num.f(xiLimit) + "·(1 − " + Num.f(lambda) + "·" + Num.f(xiLimit) + "/2)",
                alphaCc / gammaC * lambda * xiLimit * (1 - lambda * xiLimit / 2), "-", clause);
    }

    /**
     * Tension steel area for a moment at lever arm z, EN 1992-1-1 6.1: As,req = MEd/(fyd·z),
     * MEd converted from kN·m to N·mm.
     *
     * @param momentKnm  MEd, kN·m, ≥ 0
     * @param fydMpa     fyd, MPa, &gt; 0
     * @param leverArmMm z, mm, &gt; 0
     * @return As,req, mm²
     */
    public static Step asRequired(double momentKnm, double fydMpa, double leverArmMm) {
        Bounds.nonNegative("MEd", momentKnm, "kNm", CLAUSE);
        Bounds.positive("fyd", fydMpa, "MPa", CLAUSE);
        Bounds.positive("z", leverArmMm, "mm", CLAUSE);
        return Step.of("As,req", "MEd/(fyd·z)",
                Num.f(momentKnm) + "·10^6/(" + Num.f(fydMpa) + "·" + Num.f(leverArmMm) + ")",
                momentKnm * 1e6 / (fydMpa * leverArmMm), "mm2", CLAUSE);
    }
}
