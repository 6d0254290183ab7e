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

/** Two invented pad footings against hand calculations written out here (no published pad example was used). */
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
