package dev.countercheck.eurocode;

import java.util.ArrayList;
import java.util.List;

/**
 * Bearing resistance of a spread foundation, EN 1997-1:2004 Annex D (informative): the effective area
 * (D.1), the undrained (D.3, Exp. (D.1)) and drained (D.4, Exp. (D.2)) expressions with their bearing,
 * shape and load-inclination factors. The base is level: the base-inclination factors bc, bq, bγ are 1
 * (every step that uses them says so). Depth and ground-inclination factors are not part of Annex D.
 * Angles in degrees, lengths mm, areas m², pressures kPa, forces kN. Partial factors are arguments: the
 * caller reads them from the ruleset (Design Approach and National Annex).
 */
public final class BearingResistance {

    private static final String D1 = "EN 1997-1:2004 Annex D, D.1";
    private static final String D3 = "EN 1997-1:2004 Annex D, D.3";
    private static final String D4 = "EN 1997-1:2004 Annex D, D.4";
    private static final String DESIGN = "EN 1997-1:2004 2.4.6.2(2)P, Exp. (2.2); Table A.4";
    private static final String LEVEL = "level base: bc = bq = bγ = 1";
    /** The drained expressions hold for 0 &lt; φ' ≤ this, degrees (beyond it no soil is credible). */
    private static final double PHI_MAX = 50;

    private BearingResistance() {
    }

    /**
     * The effective foundation area, EN 1997-1 Annex D, D.1: B' = B − 2·e_B, L' = L − 2·e_L, A' = B'·L',
     * B' the smaller of the two.
     *
     * @param bEff          B', mm
     * @param lEff          L', mm (≥ B')
     * @param area          A', m²
     * @param widthAlongX   whether B' lies along the plan's x axis
     */
    public record EffectiveArea(Step bEff, Step lEff, Step area, boolean widthAlongX) {

        /** B'/L', -. */
        public double ratio() {
            return bEff.value() / lEff.value();
        }
    }

    /**
     * The effective area of a rectangular footing Lx × Ly under a resultant at (e_x, e_y), EN 1997-1 Annex D,
     * D.1: the reduced sides Lx − 2·|e_x| and Ly − 2·|e_y|, the smaller named B'.
     *
     * @param lxMm side along x, mm, &gt; 0
     * @param lyMm side along y, mm, &gt; 0
     * @param exMm eccentricity along x, mm, |e_x| &lt; Lx/2
     * @param eyMm eccentricity along y, mm, |e_y| &lt; Ly/2
     */
    public static EffectiveArea effectiveArea(double lxMm, double lyMm, double exMm, double eyMm) {
        Bounds.positive("Lx", lxMm, "mm", D1);
        Bounds.positive("Ly", lyMm, "mm", D1);
        double rx = lxMm - 2 * Math.abs(exMm);
        double ry = lyMm - 2 * Math.abs(eyMm);
        Bounds.positive("Lx − 2·|e_x|", rx, "mm", D1);
        Bounds.positive("Ly − 2·|e_y|", ry, "mm", D1);
        boolean alongX = rx <= ry;
        Step x = Step.of(alongX ? "B'" : "L'", "Lx − 2·|e_x|", Num.f(lxMm) + " − 2·" + Num.f(Math.abs(exMm)), rx,
                "mm", D1);
        Step y = Step.of(alongX ? "L'" : "B'", "Ly − 2·|e_y|", Num.f(lyMm) + " − 2·" + Num.f(Math.abs(eyMm)), ry,
                "mm", D1);
        Step b = alongX ? x : y;
        Step l = alongX ? y : x;
        Step a = Step.of("A'", "B'·L'", Num.f(b.value()) + "·" + Num.f(l.value()) + "/10⁶",
                b.value() * l.value() / 1e6, "m2", D1);
        return new EffectiveArea(b, l, a, alongX);
    }

    /**
     * Design angle of shearing resistance, EN 1997-1 2.4.6.2(2)P, Exp. (2.2): φ'd = atan(tan φ'k/γφ').
     *
     * @param phiKDeg   φ'k, degrees, 0 ≤ φ'k ≤ 50
     * @param gammaPhi  γφ' (Table A.4: M1 1.0, M2 1.25), ≥ 1
     * @return φ'd, degrees
     */
    public static Step phiDesign(double phiKDeg, double gammaPhi) {
        OutOfRangeException.requireWithin("φ'k", phiKDeg, "°", 0, PHI_MAX, DESIGN);
        Bounds.atLeast("γφ'", gammaPhi, "-", 1, DESIGN);
        double d = Math.toDegrees(Math.atan(Math.tan(Math.toRadians(phiKDeg)) / gammaPhi));
        return Step.of("φ'd", "atan(tan φ'k/γφ')", "atan(tan " + Num.f(phiKDeg) + "°/" + Num.f(gammaPhi) + ")", d,
                "°", DESIGN);
    }

    /**
     * A design strength, EN 1997-1 2.4.6.2(2)P, Exp. (2.2): Xd = Xk/γM (c'd = c'k/γc', cu,d = cu,k/γcu).
     *
     * @param symbol    the design symbol, e.g. {@code "c'd"}
     * @param valueKpa  Xk, kPa, ≥ 0
     * @param gammaM    γM (Table A.4), ≥ 1
     * @return Xd, kPa
     */
    public static Step strengthDesign(String symbol, double valueKpa, double gammaM) {
        Bounds.nonNegative(symbol, valueKpa, "kPa", DESIGN);
        Bounds.atLeast("γM", gammaM, "-", 1, DESIGN);
        return Step.of(symbol, "Xk/γM", Num.f(valueKpa) + "/" + Num.f(gammaM), valueKpa / gammaM, "kPa", DESIGN);
    }

    /**
     * Bearing factor, EN 1997-1 Annex D, D.4: Nq = e^(π·tan φ')·tan²(45° + φ'/2).
     *
     * @param phiDeg φ', degrees, 0 &lt; φ' ≤ 50
     */
    public static Step nq(double phiDeg) {
        double phi = phi(phiDeg);
        double t = Math.tan(Math.toRadians(45 + phiDeg / 2));
        return Step.of("Nq", "e^(π·tan φ')·tan²(45° + φ'/2)", "e^(π·tan " + Num.f(phiDeg) + "°)·tan²(45° + "
                + Num.f(phiDeg) + "°/2)", Math.exp(Math.PI * Math.tan(phi)) * t * t, "-", D4);
    }

    /**
     * Bearing factor, EN 1997-1 Annex D, D.4: Nc = (Nq − 1)·cot φ'.
     *
     * @param nq     Nq from {@link #nq}, -
     * @param phiDeg φ', degrees, 0 &lt; φ' ≤ 50
     */
    public static Step nc(double nq, double phiDeg) {
        double phi = phi(phiDeg);
        return Step.of("Nc", "(Nq − 1)·cot φ'", "(" + Num.f(nq) + " − 1)·cot " + Num.f(phiDeg) + "°",
                (nq - 1) / Math.tan(phi), "-", D4);
    }

    /**
     * Bearing factor, EN 1997-1 Annex D, D.4: Nγ = 2·(Nq − 1)·tan φ' (a rough base, δ ≥ φ'/2).
     *
     * @param nq     Nq from {@link #nq}, -
     * @param phiDeg φ', degrees, 0 &lt; φ' ≤ 50
     */
    public static Step nGamma(double nq, double phiDeg) {
        double phi = phi(phiDeg);
        return Step.withRemark("Nγ", "2·(Nq − 1)·tan φ'", "2·(" + Num.f(nq) + " − 1)·tan " + Num.f(phiDeg) + "°",
                2 * (nq - 1) * Math.tan(phi), "-", D4, "rough base (δ ≥ φ'/2)");
    }

    /** Shape factor, Annex D, D.4: sq = 1 + (B'/L')·sin φ' (rectangular; B'/L' = 1 square or circular). */
    public static Step sq(double bOverL, double phiDeg) {
        ratio(bOverL);
        double phi = phi(phiDeg);
        return Step.of("sq", "1 + (B'/L')·sin φ'", "1 + " + Num.f(bOverL) + "·sin " + Num.f(phiDeg) + "°",
                1 + bOverL * Math.sin(phi), "-", D4);
    }

    /** Shape factor, Annex D, D.4: sγ = 1 − 0.3·(B'/L') (rectangular; B'/L' = 1 square or circular). */
    public static Step sGamma(double bOverL) {
        ratio(bOverL);
        return Step.of("sγ", "1 − 0.3·(B'/L')", "1 − 0.3·" + Num.f(bOverL), 1 - 0.3 * bOverL, "-", D4);
    }

    /** Shape factor, Annex D, D.4: sc = (sq·Nq − 1)/(Nq − 1). */
    public static Step scDrained(double sq, double nq) {
        Bounds.atLeast("Nq", nq, "-", 1 + 1e-9, D4);
        return Step.of("sc", "(sq·Nq − 1)/(Nq − 1)", "(" + Num.f(sq) + "·" + Num.f(nq) + " − 1)/(" + Num.f(nq)
                + " − 1)", (sq * nq - 1) / (nq - 1), "-", D4);
    }

    /** Shape factor, Annex D, D.3 (undrained): sc = 1 + 0.2·(B'/L') (1.2 square or circular). */
    public static Step scUndrained(double bOverL) {
        ratio(bOverL);
        return Step.of("sc", "1 + 0.2·(B'/L')", "1 + 0.2·" + Num.f(bOverL), 1 + 0.2 * bOverL, "-", D3);
    }

    /**
     * Exponent of the inclination factors, Annex D, D.4: mB = (2 + B'/L')/(1 + B'/L') for H along B',
     * mL = (2 + L'/B')/(1 + L'/B') along L', and m = mL·cos²θ + mB·sin²θ for H at θ to L'.
     *
     * @param bOverL B'/L', 0 &lt; · ≤ 1
     * @param hbKn   component of H along B', kN
     * @param hlKn   component of H along L', kN
     */
    public static Step m(double bOverL, double hbKn, double hlKn) {
        ratio(bOverL);
        double mB = (2 + bOverL) / (1 + bOverL);
        double mL = (2 + 1 / bOverL) / (1 + 1 / bOverL);
        double h2 = hbKn * hbKn + hlKn * hlKn;
        double cos2 = h2 == 0 ? 0 : hlKn * hlKn / h2;
        double m = mL * cos2 + mB * (1 - cos2);
        String sub = Num.f(mL) + "·" + Num.f(cos2) + " + " + Num.f(mB) + "·" + Num.f(1 - cos2);
        return h2 == 0
                ? Step.withRemark("m", "mL·cos²θ + mB·sin²θ", sub, m, "-", D4, "no horizontal load: m = mB (unused)")
                : Step.of("m", "mL·cos²θ + mB·sin²θ", sub, m, "-", D4);
    }

    /**
     * Load-inclination factor, Annex D, D.4: iq = [1 − H/(V + A'·c'·cot φ')]^m.
     *
     * @param hKn     H, kN, ≥ 0
     * @param vKn     V, kN, &gt; 0
     * @param aEffM2  A', m², &gt; 0
     * @param cKpa    c', kPa, ≥ 0
     * @param phiDeg  φ', degrees
     * @param m       m from {@link #m}
     */
    public static Step iq(double hKn, double vKn, double aEffM2, double cKpa, double phiDeg, double m) {
        double base = inclinationBase(hKn, vKn, aEffM2, cKpa, phiDeg);
        return Step.of("iq", "[1 − H/(V + A'·c'·cot φ')]^m", substitution(hKn, vKn, aEffM2, cKpa, phiDeg, Num.f(m)),
                Math.pow(base, m), "-", D4);
    }

    /** Load-inclination factor, Annex D, D.4: iγ = [1 − H/(V + A'·c'·cot φ')]^(m + 1); arguments as {@link #iq}. */
    public static Step iGamma(double hKn, double vKn, double aEffM2, double cKpa, double phiDeg, double m) {
        double base = inclinationBase(hKn, vKn, aEffM2, cKpa, phiDeg);
        return Step.of("iγ", "[1 − H/(V + A'·c'·cot φ')]^(m + 1)",
                substitution(hKn, vKn, aEffM2, cKpa, phiDeg, Num.f(m) + " + 1"), Math.pow(base, m + 1), "-", D4);
    }

    /** Load-inclination factor, Annex D, D.4: ic = iq − (1 − iq)/(Nc·tan φ'). */
    public static Step icDrained(double iq, double nc, double phiDeg) {
        double phi = phi(phiDeg);
        return Step.of("ic", "iq − (1 − iq)/(Nc·tan φ')", Num.f(iq) + " − (1 − " + Num.f(iq) + ")/(" + Num.f(nc)
                + "·tan " + Num.f(phiDeg) + "°)", iq - (1 - iq) / (nc * Math.tan(phi)), "-", D4);
    }

    /**
     * Load-inclination factor, Annex D, D.3 (undrained): ic = ½·(1 + √(1 − H/(A'·cu))), valid for H ≤ A'·cu
     * (beyond it the footing slides: the sliding check governs).
     */
    public static Step icUndrained(double hKn, double aEffM2, double cuKpa) {
        Bounds.nonNegative("H", hKn, "kN", D3);
        Bounds.positive("A'", aEffM2, "m2", D3);
        Bounds.positive("cu", cuKpa, "kPa", D3);
        OutOfRangeException.requireWithin("H", hKn, "kN", 0, aEffM2 * cuKpa, D3 + " (H ≤ A'·cu)");
        return Step.of("ic", "½·(1 + √(1 − H/(A'·cu)))", "0.5·(1 + √(1 − " + Num.f(hKn) + "/(" + Num.f(aEffM2) + "·"
                + Num.f(cuKpa) + ")))", 0.5 * (1 + Math.sqrt(1 - hKn / (aEffM2 * cuKpa))), "-", D3);
    }

    /**
     * Undrained bearing resistance per unit effective area, Annex D, D.3, Exp. (D.1):
     * R/A' = (π + 2)·cu·bc·sc·ic + q, bc = 1 (level base).
     *
     * @param cuKpa cu (design value), kPa, &gt; 0
     * @param sc    sc from {@link #scUndrained}
     * @param ic    ic from {@link #icUndrained}
     * @param qKpa  total overburden pressure at the foundation base q, kPa, ≥ 0
     * @return R/A', kPa
     */
    public static Step undrainedPerArea(double cuKpa, double sc, double ic, double qKpa) {
        Bounds.positive("cu", cuKpa, "kPa", D3);
        Bounds.nonNegative("q", qKpa, "kPa", D3);
        return Step.withRemark("R/A'", "(π + 2)·cu·bc·sc·ic + q", "(π + 2)·" + Num.f(cuKpa) + "·1·" + Num.f(sc) + "·"
                + Num.f(ic) + " + " + Num.f(qKpa), (Math.PI + 2) * cuKpa * sc * ic + qKpa, "kPa",
                D3 + ", Exp. (D.1)", LEVEL);
    }

    /**
     * Drained bearing resistance per unit effective area, Annex D, D.4, Exp. (D.2):
     * R/A' = c'·Nc·bc·sc·ic + q'·Nq·bq·sq·iq + 0.5·γ'·B'·Nγ·bγ·sγ·iγ, b = 1 (level base).
     *
     * @param cohesion  the c' term's factors: c' (kPa), Nc, sc, ic
     * @param surcharge the q' term's factors: q' (kPa), Nq, sq, iq
     * @param weight    the γ' term's factors: γ'·B' (kN/m³ × m = kPa), Nγ, sγ, iγ
     * @return R/A', kPa
     */
    public static Step drainedPerArea(Term cohesion, Term surcharge, Term weight) {
        return Step.withRemark("R/A'", "c'·Nc·bc·sc·ic + q'·Nq·bq·sq·iq + 0.5·γ'·B'·Nγ·bγ·sγ·iγ",
                cohesion.text() + " + " + surcharge.text() + " + 0.5·" + weight.text(),
                cohesion.value() + surcharge.value() + 0.5 * weight.value(), "kPa", D4 + ", Exp. (D.2)", LEVEL);
    }

    /**
     * One term of Exp. (D.2): a pressure times its bearing, shape and inclination factors.
     *
     * @param pressureKpa c', q' or γ'·B', kPa, ≥ 0
     */
    public record Term(double pressureKpa, double n, double s, double i) {

        public Term {
            Bounds.nonNegative("pressure", pressureKpa, "kPa", D4);
        }

        double value() {
            return pressureKpa * n * s * i;
        }

        String text() {
            return Num.f(pressureKpa) + "·" + Num.f(n) + "·1·" + Num.f(s) + "·" + Num.f(i);
        }
    }

    /**
     * Design bearing resistance, EN 1997-1 6.5.2.1(1)P, 2.4.7.3.4.2 Exp. (2.7b): Rd = A'·(R/A')/γR;v.
     *
     * @param perAreaKpa R/A', kPa, ≥ 0
     * @param aEffM2     A', m², &gt; 0
     * @param gammaRv    γR;v (Table A.5: R1 1.0), ≥ 1
     * @return Rd, kN
     */
    public static Step designResistance(double perAreaKpa, double aEffM2, double gammaRv) {
        String clause = "EN 1997-1:2004 6.5.2.1(1)P; 2.4.7.3.4.2, Exp. (2.7b); Table A.5";
        Bounds.nonNegative("R/A'", perAreaKpa, "kPa", clause);
        Bounds.positive("A'", aEffM2, "m2", clause);
        Bounds.atLeast("γR;v", gammaRv, "-", 1, clause);
        return Step.of("Rd", "A'·(R/A')/γR;v", Num.f(aEffM2) + "·" + Num.f(perAreaKpa) + "/" + Num.f(gammaRv),
                aEffM2 * perAreaKpa / gammaRv, "kN", clause);
    }

    /**
     * The undrained resistance with its whole trace (D.3): sc, ic, R/A' and Rd.
     *
     * @param area    the effective area
     * @param cuDKpa  cu,d, kPa, &gt; 0
     * @param qKpa    total overburden pressure at the base, kPa
     * @param hKn     the horizontal load H, kN, ≥ 0
     * @param gammaRv γR;v
     */
    public static Resistance undrained(EffectiveArea area, double cuDKpa, double qKpa, double hKn, double gammaRv) {
        List<Step> trace = new ArrayList<>(List.of(area.bEff(), area.lEff(), area.area()));
        Step sc = add(trace, scUndrained(area.ratio()));
        Step ic = add(trace, icUndrained(hKn, area.area().value(), cuDKpa));
        Step perArea = add(trace, undrainedPerArea(cuDKpa, sc.value(), ic.value(), qKpa));
        Step rd = add(trace, designResistance(perArea.value(), area.area().value(), gammaRv));
        return new Resistance(trace, perArea, rd);
    }

    /**
     * The drained resistance with its whole trace (D.4): Nq, Nc, Nγ, the shape factors, m, the inclination
     * factors, R/A' and Rd.
     *
     * @param area         the effective area
     * @param phiDDeg      φ'd, degrees, 0 &lt; φ'd ≤ 50
     * @param cDKpa        c'd, kPa, ≥ 0
     * @param qEffKpa      effective overburden pressure at the base q', kPa, ≥ 0
     * @param gammaEffKnM3 effective unit weight of the soil below the base γ', kN/m³, ≥ 0
     * @param vKn          the vertical load V, kN, &gt; 0
     * @param hxKn         horizontal load along the plan's x, kN
     * @param hyKn         horizontal load along y, kN
     * @param gammaRv      γR;v
     */
    public static Resistance drained(EffectiveArea area, double phiDDeg, double cDKpa, double qEffKpa,
                                     double gammaEffKnM3, double vKn, double hxKn, double hyKn, double gammaRv) {
        List<Step> trace = new ArrayList<>(List.of(area.bEff(), area.lEff(), area.area()));
        double ratio = area.ratio();
        double a = area.area().value();
        double h = Math.hypot(hxKn, hyKn);
        double hb = area.widthAlongX() ? hxKn : hyKn;
        double hl = area.widthAlongX() ? hyKn : hxKn;
        Step nq = add(trace, nq(phiDDeg));
        Step nc = add(trace, nc(nq.value(), phiDDeg));
        Step ng = add(trace, nGamma(nq.value(), phiDDeg));
        Step sq = add(trace, sq(ratio, phiDDeg));
        Step sg = add(trace, sGamma(ratio));
        Step sc = add(trace, scDrained(sq.value(), nq.value()));
        Step m = add(trace, m(ratio, hb, hl));
        Step iq = add(trace, iq(h, vKn, a, cDKpa, phiDDeg, m.value()));
        Step ig = add(trace, iGamma(h, vKn, a, cDKpa, phiDDeg, m.value()));
        Step ic = add(trace, icDrained(iq.value(), nc.value(), phiDDeg));
        Step perArea = add(trace, drainedPerArea(new Term(cDKpa, nc.value(), sc.value(), ic.value()),
                new Term(qEffKpa, nq.value(), sq.value(), iq.value()),
                new Term(gammaEffKnM3 * area.bEff().value() / 1000, ng.value(), sg.value(), ig.value())));
        Step rd = add(trace, designResistance(perArea.value(), a, gammaRv));
        return new Resistance(trace, perArea, rd);
    }

    /**
     * A bearing resistance and how it was found.
     *
     * @param trace   every step, in order
     * @param perArea R/A', kPa
     * @param rd      Rd, kN
     */
    public record Resistance(List<Step> trace, Step perArea, Step rd) {

        public Resistance {
            trace = List.copyOf(trace);
        }
    }

    private static Step add(List<Step> trace, Step s) {
        trace.add(s);
        return s;
    }

    private static double phi(double phiDeg) {
        if (!(phiDeg > 0 && phiDeg <= PHI_MAX)) {
            throw new OutOfRangeException("φ'", phiDeg, "°", "0 < φ' ≤ " + Num.f(PHI_MAX) + " °", D4);
        }
        return Math.toRadians(phiDeg);
    }

    private static void ratio(double bOverL) {
        Bounds.positiveAtMost("B'/L'", bOverL, "-", 1, D4);
    }

    private static double inclinationBase(double hKn, double vKn, double aEffM2, double cKpa, double phiDeg) {
        Bounds.nonNegative("H", hKn, "kN", D4);
        Bounds.positive("V", vKn, "kN", D4);
        Bounds.positive("A'", aEffM2, "m2", D4);
        Bounds.nonNegative("c'", cKpa, "kPa", D4);
        double base = 1 - hKn / (vKn + aEffM2 * cKpa / Math.tan(phi(phiDeg)));
        Bounds.nonNegative("1 − H/(V + A'·c'·cot φ')", base, "-", D4);
        return base;
    }

    private static String substitution(double hKn, double vKn, double aEffM2, double cKpa, double phiDeg,
                                       String exponent) {
        return "[1 − " + Num.f(hKn) + "/(" + Num.f(vKn) + " + " + Num.f(aEffM2) + "·" + Num.f(cKpa) + "·cot "
                + Num.f(phiDeg) + "°)]^(" + exponent + ")";
    }
}
