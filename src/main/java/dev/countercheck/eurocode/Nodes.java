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
     * Resistance of a partially loaded area per unit of the loaded area, EN 1992-1-1 6.7(2), Exp. (6.63):
     * FRdu/Ac0 = fcd·√(Ac1/Ac0) ≤ 3.0·fcd, Ac1 the largest design distribution area similar to Ac0 and
     * concentric with it (Figure 6.29).
     *
     * @param fcdMpa fcd, MPa, &gt; 0
     * @param ac1Mm2 Ac1, mm², ≥ Ac0
     * @param ac0Mm2 Ac0, the loaded area, mm², &gt; 0
     * @return FRdu/Ac0, MPa; the remark says when the 3.0·fcd cap applied
     */
    public static Step partiallyLoadedLimit(double fcdMpa, double ac1Mm2, double ac0Mm2) {
        String clause = "EN 1992-1-1 6.7(2), Exp. (6.63)";
        Bounds.positive("fcd", fcdMpa, "MPa", clause);
        Bounds.positive("Ac0", ac0Mm2, "mm2", clause);
        OutOfRangeException.requireWithin("Ac1/Ac0", ac1Mm2 / ac0Mm2, "-", 1.0 - 1e-9, Double.MAX_VALUE, clause);
        double ratio = Math.sqrt(ac1Mm2 / ac0Mm2);
        String substituted = Num.f(fcdMpa) + "·√(" + Num.f(ac1Mm2) + "/" + Num.f(ac0Mm2) + ")";
        if (ratio > 3.0) {
            return Step.withRemark("FRdu/Ac0", "fcd·√(Ac1/Ac0) ≤ 3.0·fcd", substituted, 3.0 * fcdMpa, "MPa", clause,
                    "capped at 3.0·fcd");
        }
        return Step.of("FRdu/Ac0", "fcd·√(Ac1/Ac0) ≤ 3.0·fcd", substituted, fcdMpa * ratio, "MPa", clause);
    }

    /**
     * Stress in compressed reinforcement at the concrete's strain limit, EN 1992-1-1 3.1.7 and 3.2.7:
     * σsc = min(fyd; Es·εc2).
     *
     * @param fydMpa fyd, MPa, &gt; 0
     * @param esMpa  Es, MPa, &gt; 0
     * @param epsC2  εc2, -, &gt; 0
     * @return σsc, MPa
     */
    public static Step steelCompressionStress(double fydMpa, double esMpa, double epsC2) {
        String clause = "EN 1992-1-1 3.1.7, 3.2.7(4), Table 3.1 (εc2)";
        Bounds.positive("fyd", fydMpa, "MPa", clause);
        Bounds.positive("Es", esMpa, "MPa", clause);
        Bounds.positive("εc2", epsC2, "-", clause);
        return Step.of("σsc", "min(fyd; Es·εc2)", "min(" + Num.f(fydMpa) + "; " + Num.f(esMpa) + "·" + Num.f(epsC2)
                + ")", Math.min(fydMpa, esMpa * epsC2), "MPa", clause);
    }

    /**
     * Bearing stress of a column node under an eccentric resultant, EN 1992-1-1 6.5.4: the load on the
     * effective area centred on the resultant, less the starter bars' share, floored at 0:
     * σ = N/A_eff − (As/Ac)·σsc.
     *
     * @param nKn    N, kN, &gt; 0
     * @param aEffMm2 A_eff = (cx − 2|ex|)·(cy − 2|ey|), mm², &gt; 0
     * @param asMm2  starter bar area, mm², ≥ 0
     * @param acMm2  column area, mm², &gt; 0
     * @param sigmaScMpa σsc from {@link #steelCompressionStress}, MPa, ≥ 0
     * @return σEd, MPa
     */
    public static Step eccentricNodeStress(double nKn, double aEffMm2, double asMm2, double acMm2, double sigmaScMpa) {
        String clause = "EN 1992-1-1 6.5.4; effective area under the eccentric resultant";
        Bounds.positive("N", nKn, "kN", clause);
        Bounds.positive("A_eff", aEffMm2, "mm2", clause);
        Bounds.nonNegative("As", asMm2, "mm2", clause);
        Bounds.positive("Ac", acMm2, "mm2", clause);
        Bounds.nonNegative("σsc", sigmaScMpa, "MPa", clause);
        double sigma = nKn * 1000 / aEffMm2 - asMm2 / acMm2 * sigmaScMpa;
        Step step = Step.of("σEd", "max(0; N/A_eff − (As/Ac)·σsc)", Num.f(nKn) + "·1000/" + Num.f(aEffMm2) + " − ("
                + Num.f(asMm2) + "/" + Num.f(acMm2) + ")·" + Num.f(sigmaScMpa), Math.max(0, sigma), "MPa", clause);
        return sigma < 0 ? step.remarked("the starter bars carry the whole load: floored at 0") : step;
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
