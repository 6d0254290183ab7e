package dev.countercheck.element.pilecap;

import dev.countercheck.element.pilecap.PileCapProperties.Layout;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Value;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.PileGroup;
import dev.countercheck.submission.Point;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Moving a pile outward (the cap unchanged) never lengthens the anchorage available beyond the piles. */
class AnchorageProperties {

    private static final Ruleset RULES = PileCapProperties.RULES;
    private static final PileCapReviewer REVIEWER = PileCapProperties.REVIEWER;

    @Property(tries = 30)
    void movingAPileOutwardNeverLengthensTheAvailableAnchorage(@ForAll("layouts") Layout layout,
                                                               @ForAll @IntRange(min = 1, max = 200) int outward,
                                                               @ForAll @IntRange(min = 0, max = 8) int which) {
        PileCap cap = PileCapProperties.cap(layout);
        List<Point> piles = new ArrayList<>(cap.piles().positions());
        int i = which % piles.size();
        Point p = piles.get(i);
        piles.set(i, new Point(p.xMm() + Math.signum(p.xMm() == 0 ? 1 : p.xMm()) * outward, p.yMm()));
        PileGroup g = cap.piles();
        PileCap moved = new PileCap(cap.id(), cap.description(), cap.location(), cap.materials(), cap.planXMm(),
                cap.planYMm(), cap.depthMm(), cap.castAgainst(), cap.selfWeight(),
                new PileGroup(g.diameterMm(), piles, g.compressionKn(), g.tensionKn(), g.embedmentMm(),
                        g.toleranceMm()), cap.column(), cap.actions(), cap.reinforcement(),
                cap.tieMethod(), cap.claims());
        Value before = available(REVIEWER.review(cap, RULES));
        Value after = available(REVIEWER.review(moved, RULES));
        if (before != null && after != null) {
            assertThat(after.value()).isLessThanOrEqualTo(before.value() + 1e-9);
        }
    }

    @net.jqwik.api.Provide
    net.jqwik.api.Arbitrary<Layout> layouts() {
        return new PileCapProperties().layouts();
    }

    private static Value available(ElementReview review) {
        return review.checks().stream().filter(c -> c.id().equals("anchorage-x")).findFirst().orElseThrow()
                .values().get("available");
    }
}
