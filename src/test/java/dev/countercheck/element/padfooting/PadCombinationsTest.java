package dev.countercheck.element.padfooting;

import dev.countercheck.element.Combinations;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ElementReview;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.CharacteristicLoad;
import dev.countercheck.submission.CharacteristicLoad.Source;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The combinations generated for an invented pad footing (the gable base F-T2 of the sample tannery-row-pads:
 * 2400 × 2000 × 550, G: N 300, My 10; Q category H: N 60; W: N −60, My 110, Hx 40, reversible) against a hand
 * calculation, and the ground checks run on the right generated sets. Factors: EN 1990:2002 Table A1.2(B)
 * (STR, Exp. (6.10): γG,sup 1.35, γG,inf 1.00, γQ 1.5), Table A1.2(C) (GEO, design approach 1 combination 2:
 * γG 1.0, γQ 1.3), Table A1.2(A) (EQU: γG,sup 1.10, γG,inf 0.90, γQ 1.5); ψ0 = 0 for roofs (category H) and
 * 0.6 for wind, ψ2 = 0 for both, EN 1990 Table A1.1 recommended values (from memory).
 */
class PadCombinationsTest {

    private static final SourceLocation HERE = new SourceLocation("test", 1, 1);
    private static final Ruleset RULES = PadCombinationProperties.RULES;
    private static final List<CharacteristicLoad> LOADS = List.of(
            new CharacteristicLoad(Source.G, Optional.empty(), 300, 0, 10, 0, 0, false, HERE),
            new CharacteristicLoad(Source.Q, Optional.of("H"), 60, 0, 0, 0, 0, false, HERE),
            new CharacteristicLoad(Source.W, Optional.empty(), -60, 0, 110, 40, 0, true, HERE));

    /**
     * Hand count: STR, G sup and G inf each with G alone, Q(H) leading with W absent, W+ ψ0 or W− ψ0, W+ or W−
     * leading (Q(H) with ψ0 = 0 is the case without it): 2·(1 + 3 + 2) = 12; GEO the same once (γG,sup = γG,inf
     * = 1.0, identical cases once): 6; EQU 12; characteristic (6.14b) 6; quasi-permanent (6.16b, ψ2 = 0): G
     * alone, 1. Total 37.
     * <p>
     * Hand calculation of the cases the ground checks need:
     * EQU G inf + W+ lead: N = 0.9·300 + 1.5·(−60) = 180, My = 0.9·10 + 1.5·110 = 174, Hx = 1.5·40 = 60, γ 0.9;
     * EQU G sup + W+ lead: N = 1.1·300 − 90 = 240, My = 11 + 165 = 176, Hx 60, γ 1.1;
     * GEO G + W+ lead: N = 300 − 1.3·60 = 222, My = 10 + 1.3·110 = 153, Hx = 1.3·40 = 52, γ 1.0;
     * 6.10 G inf + W+ lead: N = 300 − 90 = 210, My = 10 + 165 = 175, Hx 60, γ 1.0;
     * 6.10 G sup + Q(H) lead + W− ψ0: N = 1.35·300 + 1.5·60 + 1.5·0.6·60 = 549, My = 13.5 − 0.9·110 = −85.5,
     * Hx = −0.9·40 = −36, γ 1.35;
     * 6.14b G + W− lead: N = 300 + 60 = 360, My = 10 − 110 = −100, Hx = −40, γ 1.0; 6.16b G: N 300, My 10.
     */
    @Test
    void theGeneratedCasesOfAPadAgreeWithTheHandCalculation() {
        List<ActionCase> cases = Combinations.of(LOADS, RULES).cases(HERE);
        assertThat(cases).hasSize(37); // hand count
        expect(cases, "EQU G inf + W+ lead", ActionCase.Kind.EQU, 180, 174, 60, 0.9);
        expect(cases, "EQU G sup + W+ lead", ActionCase.Kind.EQU, 240, 176, 60, 1.1);
        expect(cases, "GEO G + W+ lead", ActionCase.Kind.ULS_GEO, 222, 153, 52, 1.0);
        expect(cases, "6.10 G inf + W+ lead", ActionCase.Kind.ULS, 210, 175, 60, 1.0);
        expect(cases, "6.10 G sup + Q(H) lead + W− ψ0", ActionCase.Kind.ULS, 549, -85.5, -36, 1.35);
        expect(cases, "6.14b G + W− lead", ActionCase.Kind.SLS_CHARACTERISTIC, 360, -100, -40, 1.0);
        expect(cases, "6.16b G", ActionCase.Kind.SLS_QUASI_PERMANENT, 300, 10, 0, 1.0);
    }

    /**
     * The pad reviewed from its loads alone: overturning takes the EQU set (governing EQU G inf + W+ lead, hand
     * calculation in the sample: M,dst = 174 + 60·0.55 = 207 kNm; M,stb = (180 + 0.9·(66 + 37.584))·1.2 = 327.87
     * kNm); sliding takes the worse of DA1-1 on the STR set and DA1-2 on the GEO set (GEO G + W+ lead: Hd = 52 kN,
     * Rd = (222 + 103.584)·tan 28°/1.25 = 138.49 kN; DA1-1's worst, 6.10 G inf + W+ lead: Hd = 60 kN,
     * Rd = (210 + 103.584)·tan 28° = 166.74 kN, 0.360 &lt; 0.375); the bearing pressure the characteristic set.
     */
    @Test
    void theGroundChecksOfAPadUseTheirOwnGeneratedSets() {
        ElementReview pad = PadCombinationProperties.review(PadCombinationProperties.pad(LOADS, 450));
        assertThat(check(pad, "overturning").governingCase()).contains("EQU G inf + W+ lead");
        assertThat(value(pad, "overturning", "m_dst")).isCloseTo(207, within(0.01)); // hand calculation
        assertThat(value(pad, "overturning", "m_stb")).isCloseTo(327.87, within(0.01)); // hand calculation
        assertThat(check(pad, "sliding").governingCase()).contains("GEO G + W+ lead");
        assertThat(value(pad, "sliding", "hd")).isCloseTo(52, within(0.001)); // hand calculation
        assertThat(value(pad, "sliding", "rd")).isCloseTo(138.49, within(0.01)); // hand calculation
        assertThat(check(pad, "bearing-pressure").governingCase()).contains("6.14b G + W− lead");
        assertThat(check(pad, "combinations").values()).containsKey("cases_generated");
    }

    private static void expect(List<ActionCase> cases, String name, ActionCase.Kind kind, double n, double my,
                               double hx, double gamma) {
        ActionCase c = cases.stream().filter(a -> a.name().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no generated case " + name));
        assertThat(c.kind()).as(name).isEqualTo(kind);
        assertThat(c.nKn()).as(name + " N").isCloseTo(n, within(1e-9));
        assertThat(c.myKnm()).as(name + " My").isCloseTo(my, within(1e-9));
        assertThat(c.hxKn()).as(name + " Hx").isCloseTo(hx, within(1e-9));
        assertThat(c.selfWeightFactor().orElseThrow()).as(name + " γG").isCloseTo(gamma, within(1e-12));
    }

    static CheckResult check(ElementReview e, String id) {
        return e.checks().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }

    static double value(ElementReview e, String check, String quantity) {
        var v = check(e, check).values().get(quantity);
        if (v == null) {
            throw new AssertionError(check + " has no " + quantity + ": " + check(e, check).reason());
        }
        return v.value();
    }
}
