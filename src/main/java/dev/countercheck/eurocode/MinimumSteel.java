package dev.countercheck.eurocode;

/** Minimum and maximum longitudinal reinforcement, EN 1992-1-1 9.2.1.1. */
public final class MinimumSteel {

    private MinimumSteel() {
    }

    /**
     * Minimum tension reinforcement, EN 1992-1-1 9.2.1.1(1), Exp. (9.1N):
     * As,min = max(c·fctm/fyk; ρfloor)·bt·d (NDPs: c = 0.26, ρfloor = 0.0013 recommended).
     * The remark says which term governs.
     *
     * @param coefficient c, -, &gt; 0
     * @param floorRatio  ρfloor, -, ≥ 0
     * @param fctmMpa     fctm from {@link Materials#fctm}, MPa, &gt; 0
     * @param fykMpa      fyk, MPa, &gt; 0
     * @param btMm        mean width of the tension zone bt, mm, &gt; 0
     * @param dMm         effective depth d, mm, &gt; 0
     * @return As,min, mm²
     */
    public static Step asMin(double coefficient, double floorRatio, double fctmMpa, double fykMpa, double btMm,
                             double dMm) {
        String clause = "EN 1992-1-1 9.2.1.1(1), Exp. (9.1N)";
        Bounds.positive("c", coefficient, "-", clause);
        Bounds.nonNegative("ρfloor", floorRatio, "-", clause);
        Bounds.positive("fctm", fctmMpa, "MPa", clause);
        Bounds.positive("fyk", fykMpa, "MPa", clause);
        Bounds.positive("bt", btMm, "mm", clause);
        Bounds.positive("d", dMm, "mm", clause);
        double strengthRatio = coefficient * fctmMpa / fykMpa;
        String governs = strengthRatio >= floorRatio
                ? "c·fctm/fyk = " + Num.f(strengthRatio) + " governs"
                : "the floor ρfloor = " + Num.f(floorRatio) + " governs (c·fctm/fyk = " + Num.f(strengthRatio) + ")";
        return Step.withRemark("As,min", "max(c·fctm/fyk; ρfloor)·bt·d",
                "max(" + Num.f(coefficient) + "·" + Num.f(fctmMpa) + "/" + Num.f(fykMpa) + "; " + Num.f(floorRatio)
                        + ")·" + Num.f(btMm) + "·" + Num.f(dMm),
                Math.max(strengthRatio, floorRatio) * btMm * dMm, "mm2", clause, governs);
    }

    /**
     * Maximum tension or compression reinforcement outside lap locations, EN 1992-1-1 9.2.1.1(3):
     * As,max = ρmax·Ac (NDP: ρmax = 0.04 recommended).
     *
     * @param ratio            ρmax, -, 0 &lt; ρmax ≤ 1
     * @param concreteAreaMm2  cross-sectional area of concrete Ac, mm², &gt; 0
     * @return As,max, mm²
     */
    public static Step asMax(double ratio, double concreteAreaMm2) {
        String clause = "EN 1992-1-1 9.2.1.1(3)";
        Bounds.positiveAtMost("ρmax", ratio, "-", 1.0, clause);
        Bounds.positive("Ac", concreteAreaMm2, "mm2", clause);
        return Step.of("As,max", "ρmax·Ac", Num.f(ratio) + "·" + Num.f(concreteAreaMm2), ratio * concreteAreaMm2,
                "mm2", clause);
    }
}
