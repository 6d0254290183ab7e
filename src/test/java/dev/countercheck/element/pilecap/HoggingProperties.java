package dev.countercheck.element.pilecap;

import dev.countercheck.element.pilecap.PileCapProperties.Layout;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Value;
import dev.countercheck.ruleset.Ruleset;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The hogging check over generated pile groups under large moments: more uplift on the piles in
 * tension (the same moments, larger) never lowers the hogging moment of either direction.
 */
class HoggingProperties {

    private static final Ruleset RULES = PileCapProperties.RULES;
    private static final PileCapReviewer REVIEWER = PileCapProperties.REVIEWER;

    @Provide
    Arbitrary<Layout> upliftLayouts() {
        Arbitrary<int[]> grid = Combinators.combine(Arbitraries.integers().between(1, 3),
                Arbitraries.integers().between(1, 3)).as((a, b) -> new int[] {a, b}).filter(g -> g[0] * g[1] >= 2);
        Arbitrary<Double> spacing = Arbitraries.integers().between(24, 60).map(i -> i * 50.0);
        Arbitrary<Double> load = Arbitraries.integers().between(2, 30).map(i -> i * 100.0);
        Arbitrary<Double> moment = Arbitraries.integers().between(-40, 40).map(i -> i * 50.0);
        return Combinators.combine(grid, spacing, spacing, Arbitraries.of(400.0, 600.0), load, moment, moment)
                .as((g, sx, sy, phi, n, mx, my) -> new Layout(g[0], g[1], sx, sy, phi, 500, 500, 1000, n, mx, my,
                        12, 12, 20, 0, 0));
    }

    @Property(tries = 30)
    void moreUpliftOnATensionPileNeverLowersTheHoggingMoment(@ForAll("upliftLayouts") Layout layout) {
        Layout more = new Layout(layout.nx(), layout.ny(), layout.spacingX(), layout.spacingY(), layout.phi(),
                layout.cx(), layout.cy(), layout.depth(), layout.n(), 1.3 * layout.mx(), 1.3 * layout.my(),
                layout.barsX(), layout.barsY(), layout.barPhi(), layout.offsetX(), layout.offsetY());
        ElementReview base = REVIEWER.review(PileCapProperties.cap(layout), RULES);
        ElementReview lifted = REVIEWER.review(PileCapProperties.cap(more), RULES);
        for (String id : new String[] {"hogging-x", "hogging-y"}) {
            Value before = find(base, id).values().get("moment");
            if (before != null) {
                Value after = find(lifted, id).values().get("moment");
                assertThat(after).as(id + " after more uplift").isNotNull();
                assertThat(after.value()).as(id).isGreaterThanOrEqualTo(before.value() - 1e-9);
            }
        }
    }

    private static CheckResult find(ElementReview review, String id) {
        return review.checks().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }
}
