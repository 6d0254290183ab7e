package dev.countercheck.statics;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.OutOfRangeException;
import dev.countercheck.eurocode.Step;

/**
 * The actions on a footing reduced to its base centre (the origin of the plan): vertical V (kN, downwards
 * positive) and moments Mx*, My* (kNm). Signs as for pile caps: Mx* raises the pressure at positive y, My*
 * at positive x; so e_x = My* / V and e_y = Mx* / V.
 *
 * @param caseName the action case, named in the trace
 * @param v        V, kN
 * @param mx       Mx* about the base centre, kNm
 * @param my       My* about the base centre, kNm
 */
public record BaseActions(String caseName, Step v, Step mx, Step my) {

    private static final String BASIS = "statics of the footing (common practice)";

    /**
     * The column's actions at the top of a footing of depth h moved to the base centre, with weights acting
     * at the centre added: V = N + W, Mx* = Mx + Hy·h + N·y_col, My* = My + Hx·h + N·x_col.
     *
     * @param nKn       column axial force N, kN, compression positive
     * @param mxKnm     column moment Mx, kNm
     * @param myKnm     column moment My, kNm
     * @param hxKn      horizontal force Hx at the top of the footing, kN
     * @param hyKn      horizontal force Hy, kN
     * @param depthMm   footing depth h, mm
     * @param column    the column's centre in the footing's axes, mm
     * @param centredKn weights acting at the centre (footing, overburden; factored by the caller), kN
     */
    public static BaseActions of(String caseName, double nKn, double mxKnm, double myKnm, double hxKn, double hyKn,
                                 double depthMm, PlanPoint column, double centredKn) {
        double h = depthMm / 1000.0;
        double v = nKn + centredKn;
        double mx = mxKnm + hyKn * h + nKn * column.yMm() / 1000.0;
        double my = myKnm + hxKn * h + nKn * column.xMm() / 1000.0;
        String suffix = suffix(caseName);
        return new BaseActions(caseName,
                Step.of("V" + suffix, "N + W", Num.f(nKn) + " + " + Num.f(centredKn), v, "kN", BASIS),
                Step.of("Mx*" + suffix, "Mx + Hy·h + N·y_col", Num.f(mxKnm) + " + " + Num.f(hyKn) + "·" + Num.f(h)
                        + " + " + Num.f(nKn) + "·" + Num.f(column.yMm()) + "/1000", mx, "kNm", BASIS),
                Step.of("My*" + suffix, "My + Hx·h + N·x_col", Num.f(myKnm) + " + " + Num.f(hxKn) + "·" + Num.f(h)
                        + " + " + Num.f(nKn) + "·" + Num.f(column.xMm()) + "/1000", my, "kNm", BASIS));
    }

    /** Actions already at the base centre. */
    public static BaseActions atCentre(String caseName, double vKn, double mxKnm, double myKnm) {
        String suffix = suffix(caseName);
        return new BaseActions(caseName, Step.of("V" + suffix, "V", Num.f(vKn), vKn, "kN", BASIS),
                Step.of("Mx*" + suffix, "Mx*", Num.f(mxKnm), mxKnm, "kNm", BASIS),
                Step.of("My*" + suffix, "My*", Num.f(myKnm), myKnm, "kNm", BASIS));
    }

    public double vKn() {
        return v.value();
    }

    public double mxKnm() {
        return mx.value();
    }

    public double myKnm() {
        return my.value();
    }

    /** e_x = My* / V, mm; V must be positive. */
    public Step ex() {
        return eccentricity("e_x", "My*/V", myKnm());
    }

    /** e_y = Mx* / V, mm; V must be positive. */
    public Step ey() {
        return eccentricity("e_y", "Mx*/V", mxKnm());
    }

    private Step eccentricity(String symbol, String formula, double momentKnm) {
        double vKn = OutOfRangeException.requirePositive("V", vKn(), "kN", BASIS);
        return Step.of(symbol + suffix(caseName), formula, Num.f(momentKnm) + "·1000/" + Num.f(vKn),
                momentKnm * 1000 / vKn, "mm", BASIS);
    }

    static String suffix(String caseName) {
        return caseName.isEmpty() ? "" : " (" + caseName + ")";
    }
}
