package dev.countercheck.eurocode;

/**
 * Sliding resistance of a spread foundation on its base, EN 1997-1:2004 6.5.3 (the passive resistance in
 * front of it, Rp;d of Exp. (6.2), is left out: conservative). Forces kN, areas m², pressures kPa, angles in
 * degrees. Partial factors are arguments read from the ruleset.
 */
public final class Sliding {

    private static final String C_DRAINED = "EN 1997-1:2004 6.5.3(8), Exp. (6.3a), (6.3b)";
    private static final String C_UNDRAINED = "EN 1997-1:2004 6.5.3(11), Exp. (6.4a), (6.4b)";
    private static final String C_LIMIT = "EN 1997-1:2004 6.5.3(12)P, Exp. (6.5)";
    private static final String C_DELTA = "EN 1997-1:2004 6.5.3(10)";

    private Sliding() {
    }

    /**
     * Design base friction angle for a foundation cast in place, EN 1997-1 6.5.3(10): δd = φ'cv;d (a precast
     * smooth base would take 2/3 of it). Given a peak angle instead of φ'cv the value is unconservative: the
     * caller says so.
     *
     * @param phiCvDDeg φ'cv;d, degrees, 0 &lt; · ≤ 50
     * @return δd, degrees
     */
    public static Step deltaCastInPlace(double phiCvDDeg) {
        Bounds.positiveAtMost("φ'cv;d", phiCvDDeg, "°", 50, C_DELTA);
        return Step.withRemark("δd", "φ'cv;d", Num.f(phiCvDDeg), phiCvDDeg, "°", C_DELTA,
                "concrete cast against the soil");
    }

    /**
     * Drained sliding resistance, EN 1997-1 6.5.3(8), Exp. (6.3a) and (6.3b): Rd = V'd·tan δd/γR;h
     * (γR;h = 1.0 in Design Approaches 1 and 3 gives (6.3a); a characteristic δ with the factor gives (6.3b)).
     *
     * @param vdKn     V'd, the least effective design vertical load, kN, ≥ 0
     * @param deltaDeg δ (design or characteristic, see above), degrees, 0 ≤ δ ≤ 50
     * @param gammaRh  γR;h (Table A.5), ≥ 1
     * @return Rd, kN
     */
    public static Step drained(double vdKn, double deltaDeg, double gammaRh) {
        Bounds.nonNegative("V'd", vdKn, "kN", C_DRAINED);
        OutOfRangeException.requireWithin("δ", deltaDeg, "°", 0, 50, C_DRAINED);
        Bounds.atLeast("γR;h", gammaRh, "-", 1, C_DRAINED);
        return Step.of("Rd", "V'd·tan δ/γR;h", Num.f(vdKn) + "·tan " + Num.f(deltaDeg) + "°/" + Num.f(gammaRh),
                vdKn * Math.tan(Math.toRadians(deltaDeg)) / gammaRh, "kN", C_DRAINED);
    }

    /**
     * Undrained sliding resistance, EN 1997-1 6.5.3(11), Exp. (6.4a), (6.4b): Rd = Ac·cu/γR;h, and where
     * water or air can reach the interface between the foundation and an undrained clay, Rd ≤ 0.4·Vd
     * (6.5.3(12)P, Exp. (6.5)); the remark says whether that limit governs.
     *
     * @param acM2           Ac, the base area in compression, m², ≥ 0
     * @param cuKpa          cu (design, or characteristic with γR;h), kPa, ≥ 0
     * @param gammaRh        γR;h, ≥ 1
     * @param vdKn           Vd, the design vertical load, kN, ≥ 0
     * @param interfaceOpen  whether water or air can reach the interface (the 0.4·Vd limit applies)
     * @return Rd, kN
     */
    public static Step undrained(double acM2, double cuKpa, double gammaRh, double vdKn, boolean interfaceOpen) {
        Bounds.nonNegative("Ac", acM2, "m2", C_UNDRAINED);
        Bounds.nonNegative("cu", cuKpa, "kPa", C_UNDRAINED);
        Bounds.atLeast("γR;h", gammaRh, "-", 1, C_UNDRAINED);
        Bounds.nonNegative("Vd", vdKn, "kN", C_LIMIT);
        double rd = acM2 * cuKpa / gammaRh;
        String sub = Num.f(acM2) + "·" + Num.f(cuKpa) + "/" + Num.f(gammaRh);
        if (!interfaceOpen) {
            return Step.withRemark("Rd", "Ac·cu/γR;h", sub, rd, "kN", C_UNDRAINED,
                    "interface closed to water and air: no 0.4·Vd limit");
        }
        double limit = 0.4 * vdKn;
        return Step.withRemark("Rd", "min(Ac·cu/γR;h; 0.4·Vd)", "min(" + sub + "; 0.4·" + Num.f(vdKn) + ")",
                Math.min(rd, limit), "kN", C_UNDRAINED + "; " + C_LIMIT,
                rd > limit ? "0.4·Vd governs (water or air can reach the interface)" : "Ac·cu/γR;h governs");
    }
}
