package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.Step;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The bottom-cover finding and the trace of its required cover speak of what the element has: a pad footing's of
 * cnom and the ground alone, a pile cap's of the pile heads cast into it as well (the bundled rulesets' cover rule
 * and its {@code for: pile-cap} variant). The numbers are the fixtures' hand calculations (their comments).
 */
class CoverFindingWordsTest {

    @ParameterizedTest
    @ValueSource(strings = {"en1992-recommended", "en1992-uk-na", "house-example"})
    void aPadsBottomCoverFindingAndTraceNameNoPiles(String ruleset) {
        ElementReview pad = CapReviews.review("/rule-fixtures/cover-pad-against-soil.yaml", ruleset).elements().get(0);
        // cmin,dur 25 (Table 4.4N S4, or BS 8500 C30 XC2 under the UK annex) + Δcdev 10 = 35; against soil k2 = 75
        assertThat(finding(pad, "FP/cover/cover-bottom").message())
                .startsWith("Bottom cover 60 mm is less than the 75 mm required (cnom 35 mm, against the ground 75 mm)")
                .doesNotContainIgnoringCase("pile").doesNotContainIgnoringCase("embedment");
        Step required = requiredCover(pad);
        assertThat(required.formula()).isEqualTo("MAX(c_nom, c_ground)");
        assertThat(required.substituted()).isEqualTo("MAX(35, 75)");
        assertThat(CapReviews.check(pad, "cover").trace()).allSatisfy(s -> assertThat(s.symbol() + " " + s.formula()
                + " " + s.clause()).doesNotContainIgnoringCase("pile").doesNotContainIgnoringCase("embedment"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"en1992-recommended", "en1992-uk-na", "house-example"})
    void aPileCapsBottomCoverFindingNamesThePileEmbedment(String ruleset) {
        ElementReview cap = CapReviews.review("/rule-fixtures/cover-cap-pile-heads.yaml", ruleset).elements().get(0);
        // on blinding k1 = 40 (house rules: 50); the pile heads 100 mm into the cap govern
        String ground = ruleset.equals("house-example") ? "50" : "40";
        assertThat(finding(cap, "FC/cover/cover-bottom").message()).startsWith("Bottom cover 75 mm is less than the"
                + " 100 mm required (cnom 35 mm, against the ground " + ground + " mm, pile embedment 100 mm)");
        Step required = requiredCover(cap);
        assertThat(required.formula()).isEqualTo("MAX(c_nom, c_ground, embedment)");
        assertThat(required.clause()).contains("on piles, the bottom bars also clear the pile heads (common practice)");
    }

    private static Finding finding(ElementReview e, String id) {
        return e.findings().stream().filter(f -> f.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no finding " + id + " among " + e.findings()));
    }

    private static Step requiredCover(ElementReview e) {
        return CapReviews.check(e, "cover").trace().stream().filter(s -> s.symbol().equals("cnom,req")).findFirst()
                .orElseThrow(() -> new AssertionError("no cnom,req in the cover trace"));
    }
}
