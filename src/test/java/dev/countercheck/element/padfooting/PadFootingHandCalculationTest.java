package dev.countercheck.element.padfooting;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Invented pad footings against hand calculations written out here. No published worked example of a pad footing
 * with inputs and printed results that could be read was found (the searches are listed in docs/pad-footing.md,
 * "How the pad checks were verified"); the EN 1997-1 Annex D factors are compared with a published table in
 * {@code BearingResistanceTest}.
 */
class PadFootingHandCalculationTest {

    private static final List<ElementReview> PADS = review();

    /**
     * Hand calculation, HC-P1: 2000 × 2000 × 500, column 400 × 400 centred, C30/37, 10 H16 each way, cover 50.
     * SLS: Wf = 25·2·2·0.5 = 50 kN; q = (700 + 50)/4 = 187.5 kPa everywhere (full contact).
     * ULS column only: q = 1000/4 = 250 kPa. Face at 200 mm, cantilever 0.8 m:
     * M = 250·2·0.8²/2 = 160 kNm. dx = 500 − 50 − 8 = 442 mm: section at 200 + 442 = 642,
     * VEd = 250·2·(1.0 − 0.642) = 179 kN. Punching face: u0 = 4·400 = 1600 mm, β = 1, VEd = 1000 kN.
     * Anchorage (9.8.2.2, x = h/2 = 250): R = 250·2·0.25 = 125 kN at 875 mm; the column force at
     * 200 − 0.15·400 = 140 mm; ze = 735 mm; zi = 0.9·442 = 397.8 mm; Fs = 125·735/397.8 = 230.96 kN.
     */
    @Test
    void concentricPadInFullContact() {
        ElementReview pad = PADS.get(0);
        assertThat(value(pad, "bearing-pressure", "q_max")).isCloseTo(187.5, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "bearing-pressure", "q_min")).isCloseTo(187.5, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "bearing-pressure", "contact_fraction")).isCloseTo(1.0, withinPercentage(0.01));
        assertThat(check(pad, "bearing-pressure").status()).isEqualTo(CheckStatus.PASS); // 187.5 ≤ 200
        assertThat(value(pad, "bending-x", "moment")).isCloseTo(160, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "shear-x", "ved")).isCloseTo(179, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "punching-face", "u0")).isCloseTo(1600, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "punching-face", "ved")).isCloseTo(1000, withinPercentage(0.01)); // β = 1, no moment
        assertThat(value(pad, "anchorage-x", "force")).isCloseTo(230.96, withinPercentage(0.05)); // hand calculation
        assertThat(check(pad, "hogging-x").status()).isEqualTo(CheckStatus.NOT_APPLICABLE); // full contact
        assertThat(check(pad, "bearing-resistance").status()).isEqualTo(CheckStatus.NOT_CHECKED); // no soil strength
        assertThat(check(pad, "bearing-resistance").reason().orElseThrow()).contains("phi_k").contains("uls-geo");
    }

    /**
     * Hand calculation, HC-P2: as HC-P1 with My = 400 kNm, column actions alone: e = 400/1000 = 0.4 m &gt; L/6:
     * uniaxial partial contact (closed form), q_max = 2V/(3·B·(L/2 − e)) = 2·1000/(3·2·0.6) = 555.6 kPa over a
     * length 3·(L/2 − e) = 1.8 m, i.e. from x = −0.8 m to 1.0 m: q(x) = 555.6·(x + 0.8)/1.8.
     * Bending-x, side +x, t = x − 0.2 from 0 to 0.8: q = 308.64·(t + 1);
     * M = 2·308.64·∫(t + 1)·t dt = 617.28·(0.8³/3 + 0.8²/2) = 617.28·0.49067 = 302.88 kNm.
     */
    @Test
    void momentGivesPartialContactAndTheClosedFormMoment() {
        ElementReview pad = PADS.get(1);
        assertThat(value(pad, "bending-x", "moment")).isCloseTo(302.88, withinPercentage(0.05)); // hand calculation
        assertThat(check(pad, "bearing-pressure").status()).isEqualTo(CheckStatus.NOT_CHECKED); // no SLS case
    }

    /**
     * Hand calculation, HC-P3 (hogging, EN 1992-1-1 6.1; pad-footing method, Revision 2 item 2): 2400 × 1800 × 600,
     * column 400 × 400 centred, no soil over it, C30/37; ULS N = 500 kN, My = 500 kNm; top x-bars 10 H12.
     * Weights with γG,sup = 1.35: Wf = 25·2.4·1.8·0.6 = 64.8 kN, γG·Wf = 87.48 kN; V = 587.48 kN.
     * e = 500/587.48 = 0.85109 m &gt; L/6 = 0.4 m: uniaxial partial contact over 3·(1.2 − 0.85109) = 1.04672 m,
     * from x = +0.15328 m to the +x edge: no ground pressure on the −x cantilever (face at x = −0.2 m).
     * −x cantilever, l = 1.2 − 0.2 = 1.0 m, b = 1.8 m: M,hog = 1.35·25·0.6·1.8·1.0²/2 = 18.225 kNm (less 0).
     * Top bars: d,top = 600 − 50 − 12/2 = 544 mm; K = 18.225e6/(1800·544²·30) = 0.0011404;
     * z = (544/2)·[1 + √(1 − 2·0.0011404/(1/1.5))] = 542.1 &gt; 0.95·544 = 516.8 mm, so z = 516.8 mm;
     * fyd = 500/1.15 = 434.78 MPa; As,req = 18.225e6/(434.78·516.8) = 81.11 mm²; As,prov = 10·π·12²/4 = 1131.0 mm².
     * hogging-y, cantilevers y = ±0.2…±0.9 m under the whole 2.4 m length: weight 1.35·25·0.6·2.4·0.7²/2
     * = 11.907 kNm; the pressure, uniform across y, gives (V/Ly)·0.7²/2 = (587.48/1.8)·0.245 = 79.96 kNm on
     * each: net −68.05 kNm, no hogging (not applicable).
     */
    @Test
    void cantileverOutOfContactHogsUnderItsOwnWeight() {
        ElementReview pad = PADS.get(2);
        assertThat(check(pad, "hogging-y").status()).isEqualTo(CheckStatus.NOT_APPLICABLE); // net −68.05 kNm
        assertThat(check(pad, "hogging-y").reason().orElseThrow()).contains("no hogging");
        assertThat(check(pad, "hogging-x").status()).isEqualTo(CheckStatus.PASS);
        assertThat(value(pad, "hogging-x", "moment")).isCloseTo(18.225, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "hogging-x", "as_required")).isCloseTo(81.11, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "hogging-x", "as_provided")).isCloseTo(1131.0, withinPercentage(0.01)); // bar areas
    }

    /**
     * Hand calculation, HC-P4 (EN 1997-1 6.5.2 and Annex D, 6.5.3, EN 1990 Table A1.2(A)): 2000 × 2600 × 500,
     * 800 mm of soil at 19 kN/m³ over it, φ'k = 30°, c'k = 0, φ'cv,k = 28°, no water; column 400 × 400 centred.
     * Weights: Wf = 25·2·2.6·0.5 = 65 kN; Ws = 19·(5.2 − 0.16)·0.8 = 76.608 kN; W = 141.608 kN.
     * q' = 19·(0.8 + 0.5) = 24.7 kPa; γ' = 19 kN/m³. Hx acts along x = B' (mB of D.4).
     * Bearing (drained, Annex D D.4, no depth factors in Annex D; base factors b = 1):
     * DA1-1, ULS-1 (N 1400, Hx 70), weights × 1.35: V = 1591.17 kN, My* = 70·0.5 = 35 kNm, e = 22.00 mm,
     * B' = 1956.0, L' = 2600 mm; φ' = 30°: Nq = e^(π·tan 30°)·tan² 60° = 18.401, Nγ = 2·(Nq − 1)·tan 30° = 20.093
     * (the values of the published table, see BearingResistanceTest); sq = 1 + 0.75231·0.5 = 1.3762,
     * sγ = 1 − 0.3·0.75231 = 0.7743; m = (2 + 0.75231)/(1 + 0.75231) = 1.5707; iq = (1 − 70/1591.17)^1.5707
     * = 0.93177, iγ = (…)^2.5707 = 0.89078; R/A' = 24.7·18.401·1.3762·0.93177 + 0.5·19·1.956·20.093·0.7743·0.89078
     * = 840.33 kPa; Rd = 840.33·5.0856 = 4273.6 kN; Vd/Rd = 0.372. With the weights × 1.0: V = 1541.61, Rd = 4257.4,
     * 0.362.
     * DA1-2, GEO-1 (N 1050, Hx 60), weights × 1.0: V = 1191.608 kN, e = 30/1191.608 = 25.18 mm, B' = 1949.65 mm;
     * φ'd = atan(tan 30°/1.25) = 24.791°: Nq = 10.431, Nγ = 8.7118; sq = 1.3144, sγ = 0.77504; m = 1.5715;
     * iq = (1 − 60/1191.608)^1.5715 = 0.92202, iγ = 0.87559; R/A' = 24.7·10.431·1.3144·0.92202
     * + 0.5·19·1.94965·8.7118·0.77504·0.87559 = 421.74 kPa; A' = 1.94965·2.6 = 5.0691 m²; Rd = 2137.8 kN;
     * Vd/Rd = 0.557: DA1-2 governs, Vd = 1191.6 kN, B' = 1949.6 mm, L' = 2600 mm.
     * Sliding (6.5.3(8), (10): δd = φ'cv,d): DA1-1 γG,inf: 70/(1541.608·tan 28°) = 70/819.69 = 0.0854; DA1-1 γG,sup:
     * 70/846.04 = 0.0827; DA1-2: δd = atan(tan 28°/1.25) = 23.043°, Rd = 1191.608·tan 23.043° = 506.87 kN,
     * 60/506.87 = 0.118: governs, Hd = 60 kN, Rd = 506.87 kN.
     * Overturning (EQU, γG,inf = 0.9 on the weights): about the x edge, Ed,stb = (250 + 0.9·141.608)·1.0 = 377.45 kNm,
     * Ed,dst = 120 + 30·0.5 = 135 kNm (about the y edges 377.45·1.3 = 490.68 kNm holds, nothing turns).
     */
    @Test
    void groundResistanceSlidingAndOverturningOfAPadOnSand() {
        ElementReview pad = PADS.get(3);
        assertThat(value(pad, "bearing-resistance", "vd")).isCloseTo(1191.608, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "bearing-resistance", "b_eff")).isCloseTo(1949.65, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "bearing-resistance", "l_eff")).isCloseTo(2600, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "bearing-resistance", "rd")).isCloseTo(2137.8, withinPercentage(0.05)); // hand calculation
        assertThat(check(pad, "bearing-resistance").status()).isEqualTo(CheckStatus.PASS);
        assertThat(value(pad, "sliding", "hd")).isCloseTo(60, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "sliding", "rd")).isCloseTo(506.87, withinPercentage(0.05)); // hand calculation
        assertThat(check(pad, "sliding").status()).isEqualTo(CheckStatus.PASS);
        assertThat(value(pad, "overturning", "m_dst")).isCloseTo(135, withinPercentage(0.01)); // hand calculation
        assertThat(value(pad, "overturning", "m_stb")).isCloseTo(377.45, withinPercentage(0.01)); // hand calculation
        assertThat(check(pad, "overturning").status()).isEqualTo(CheckStatus.PASS);
    }

    private static List<ElementReview> review() {
        try {
            Path file = Path.of(PadFootingHandCalculationTest.class.getResource("/hand-calcs/pad-footings.yaml").toURI());
            var submission = new SubmissionReader(ElementKinds.binders()).read(file);
            var rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load("en1992-recommended");
            Review r = new ProjectReviewer(new Review.ToolInfo("countercheck", "test")).review(submission, rules,
                    "2026-01-01");
            return r.elements();
        } catch (Exception e) {
            throw new AssertionError("the hand-calculation pads do not review: " + e.getMessage(), e);
        }
    }

    private static CheckResult check(ElementReview e, String id) {
        return e.checks().stream().filter(c -> c.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no check " + id));
    }

    private static double value(ElementReview e, String check, String quantity) {
        var v = check(e, check).values().get(quantity);
        if (v == null) {
            throw new AssertionError(check + " has no value " + quantity + " (" + check(e, check).status() + ", "
                    + check(e, check).reason() + ")");
        }
        return v.value();
    }
}
