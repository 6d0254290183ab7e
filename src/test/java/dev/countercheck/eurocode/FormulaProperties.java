package dev.countercheck.eurocode;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Properties that must hold over the whole valid range of the formulas, where a table of examples could miss a
 * wrong branch or a cap applied on the wrong side. Recommended NDPs throughout (CRd,c = 0.12, αcc = 0.85,
 * γc = 1.5).
 */
class FormulaProperties {

    /** vRd,c can only rise with more steel or stronger concrete, including across the ρl cap (6.2.2(1)). */
    @Property(tries = 300)
    void vRdcStressIsNonDecreasingInSteelAndStrength(@ForAll @DoubleRange(min = 0, max = 20000) double as1,
                                                     @ForAll @DoubleRange(min = 0, max = 20000) double as2,
                                                     @ForAll @DoubleRange(min = 12, max = 90) double fck1,
                                                     @ForAll @DoubleRange(min = 12, max = 90) double fck2,
                                                     @ForAll @DoubleRange(min = 100, max = 2000) double d) {
        double k = Shear.kSize(d).value();
        double lowRho = Shear.rhoL(Math.min(as1, as2), 400, d).value();
        double highRho = Shear.rhoL(Math.max(as1, as2), 400, d).value();
        double low = Shear.vRdcStress(0.12, k, lowRho, Math.min(fck1, fck2)).value();
        double high = Shear.vRdcStress(0.12, k, highRho, Math.max(fck1, fck2)).value();
        assertThat(high).isGreaterThanOrEqualTo(low);
    }

    /** z stays within [0.5d, 0.95d] for every K the block can carry, up to ηαcc/(2γc) = 0.28333 (3.1.7(3)). */
    @Property(tries = 300)
    void leverArmStaysBetweenHalfAndNinetyFivePercentOfD(@ForAll @DoubleRange(min = 0, max = 0.2833) @Scale(5) double k,
                                                         @ForAll @DoubleRange(min = 100, max = 3000) double d) {
        double z = Bending.leverArm(k, d, 0.85, 1.5).value();
        assertThat(z).isLessThanOrEqualTo(0.95 * d).isGreaterThanOrEqualTo(0.5 * d);
    }

    /** A perimeter closer to the column gets a resistance at least the basic one (6.4.4(2), Exp. (6.50)). */
    @Property(tries = 300)
    void punchingResistanceRisesAsThePerimeterApproachesTheColumn(
            @ForAll @DoubleRange(min = 0.01, max = 1.0) double fraction,
            @ForAll @DoubleRange(min = 200, max = 2000) double d) {
        double atA = Punching.vRdEnhanced(0.5, 0.4, d, fraction * 2 * d).value();
        double at2d = Punching.vRdEnhanced(0.5, 0.4, d, 2 * d).value();
        assertThat(atA).isGreaterThanOrEqualTo(at2d);
    }
}
