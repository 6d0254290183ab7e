package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;

/** Statics of the cap's strut-and-tie model (EN 1992-1-1 6.5, 9.8.1(2)). */
final class Truss {

    private Truss() {
    }

    /**
     * Lever arm of the truss: z = (z/d)·d between the tie and the compression node (common practice).
     */
    static Step leverArm(double factor, double dMm) {
        return Step.of("z", "(z/d)·d", Num.f(factor) + "·" + Num.f(dMm), factor * dMm, "mm", "common practice");
    }

    /**
     * Tie force from moments about the column node: T = Σ P_i·l_i / z, l_i the distance of pile i from
     * the column centre along the tie, for the piles on one side. Valid for z &gt; 0. kN, mm.
     */
    static Step tieForce(double sumMomentKnMm, String substituted, double zMm) {
        return Step.of("T", "Σ P_i·l_i / z", substituted + " / " + Num.f(zMm), Math.max(0, sumMomentKnMm / zMm),
                "kN", "EN 1992-1-1 6.5.3, 9.8.1(2)");
    }

    /** Tie steel: As,req = T/fyd (6.5.3(1)). T in kN, fyd in MPa, result mm². */
    static Step tieArea(double forceKn, double fydMpa) {
        return Step.of("As,req", "T/fyd", Num.f(forceKn) + "·1000/" + Num.f(fydMpa), forceKn * 1000 / fydMpa, "mm2",
                "EN 1992-1-1 6.5.3(1)");
    }

    /** Force in the bars from a bending moment: Fs = M/z. M in kNm, z in mm, result kN. */
    static Step forceFromMoment(double momentKnm, double zMm) {
        return Step.of("T", "M/z", Num.f(momentKnm) + "·1000/" + Num.f(zMm), momentKnm * 1000 / zMm, "kN",
                "EN 1992-1-1 6.1");
    }
}
