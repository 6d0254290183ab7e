package dev.countercheck.eurocode;

/** Strut-and-tie nodes, EN 1992-1-1 6.5: stress limits and strut geometry. */
public final class Nodes {

    private Nodes() {
    }

    /**
     * Strength reduction factor for struts and nodes, EN 1992-1-1 6.5.2(2), Exp. (6.57N): ν' = 1 − fck/250.
     *
     * @param fckMpa fck, MPa, 12 ≤ fck ≤ 90
     * @return ν', -
     */
    public static Step nuPrime(double fckMpa) {
        Bounds.fck(fckMpa);
        return Step.of("ν'", "1 − fck/250", "1 − " + Num.f(fckMpa) + "/250", 1 - fckMpa / 250, "-",
                "EN 1992-1-1 6.5.2(2), Exp. (6.57N)");
    }

    /**
     * Design compressive stress limit of a node, EN 1992-1-1 6.5.4(4), Exps. (6.60) to (6.62):
     * σRd,max = k·ν'·fcd with k = k1 (CCC), k2 (CCT) or k3 (CTT), an NDP (recommended 1.0, 0.85, 0.75).
     *
     * @param type     node type, which names the k factor and the expression
     * @param kFactor  the node's k factor, -, 0 &lt; k ≤ 3 (3.0 is the triaxial k4 of 6.5.4(6))
     * @param nuPrime  ν' from {@link #nuPrime}, -, 0 &lt; ν' ≤ 1
     * @param fcdMpa   fcd, MPa, &gt; 0
     * @return σRd,max, MPa
     */
    public static Step nodeLimit(NodeType type, double kFactor, double nuPrime, double fcdMpa) {
        String clause = type.clause();
        String k = type.kSymbol();
        Bounds.positiveAtMost(k, kFactor, "-", 3.0, clause);
        Bounds.positiveAtMost("ν'", nuPrime, "-", 1.0, clause);
        Bounds.positive("fcd", fcdMpa, "MPa", clause);
        return Step.withRemark("σRd,max", k + "·ν'·fcd",
                Num.f(kFactor) + "·" + Num.f(nuPrime) + "·" + Num.f(fcdMpa), kFactor * nuPrime * fcdMpa, "MPa", clause,
                type.name() + ": " + type.description());
    }

    /**
     * Angle of a strut to the horizontal, from the strut-and-tie geometry of EN 1992-1-1 6.5.1:
     * θ = atan(z/l), z the lever arm between node and tie, l the plan distance between the nodes.
     *
     * @param leverArmMm    z, mm, &gt; 0
     * @param planDistanceMm l, mm, &gt; 0
     * @return θ, degrees, 0 &lt; θ &lt; 90
     */
    public static Step strutAngle(double leverArmMm, double planDistanceMm) {
        String clause = "EN 1992-1-1 6.5.1 (strut-and-tie geometry)";
        Bounds.positive("z", leverArmMm, "mm", clause);
        Bounds.positive("l", planDistanceMm, "mm", clause);
        return Step.of("θ", "atan(z/l)", "atan(" + Num.f(leverArmMm) + "/" + Num.f(planDistanceMm) + ")",
                Math.toDegrees(Math.atan(leverArmMm / planDistanceMm)), "deg", clause);
    }
}
