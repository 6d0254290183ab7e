package dev.countercheck.element.padfooting;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ClaimComparer;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.SeverityPolicy;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Materials;
import dev.countercheck.submission.PadFooting;
import dev.countercheck.submission.PileCap.CastAgainst;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Direction;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Properties of the pad review on invented footings: a quarter turn (x and y swapped) swaps the results of
 * the two directions, and a mirror (the moments reversed) changes no utilisation; a larger load (every column
 * action scaled together) never lowers a utilisation of bending, shear or punching; a deeper footing never
 * raises the one-way shear or punching utilisation, and its governing punching perimeter lies no further out
 * in multiples of d (it moves inward as the footing gets thicker).
 */
class PadFootingProperties {

    private static final Ruleset RULES = rules();
    private static final PadFootingReviewer REVIEWER = new PadFootingReviewer(new ElementAssembler(
            new ClaimComparer(RULES.number("claim_tolerance"), java.util.Map.of()), new SeverityPolicy(RULES::severity)));

    /** An invented pad: plan, depth, column, one ULS case. */
    record Layout(double lx, double ly, double h, double cx, double cy, double n, double mx, double my) {
        Layout scaled(double k) {
            return new Layout(lx, ly, h, cx, cy, n * k, mx * k, my * k);
        }

        Layout deeper(double dh) {
            return new Layout(lx, ly, h + dh, cx, cy, n, mx, my);
        }

        Layout mirrored() {
            return new Layout(lx, ly, h, cx, cy, n, -mx, -my);
        }

        Layout turned() {
            return new Layout(ly, lx, h, cy, cx, n, my, mx);
        }
    }

    @Provide
    Arbitrary<Layout> layouts() {
        return Combinators.combine(Arbitraries.integers().between(16, 36), Arbitraries.integers().between(16, 36),
                Arbitraries.integers().between(5, 9), Arbitraries.integers().between(3, 6),
                Arbitraries.integers().between(3, 6), Arbitraries.integers().between(6, 30),
                Arbitraries.integers().between(0, 20), Arbitraries.integers().between(0, 20))
                .as((lx, ly, h, cx, cy, n, mx, my) -> new Layout(lx * 100, ly * 100, h * 100, cx * 100, cy * 100,
                        n * 100, mx * 10, my * 10));
    }

    @Property(tries = 25)
    void aQuarterTurnSwapsTheResultsOfXAndY(@ForAll("layouts") Layout layout) {
        ElementReview original = REVIEWER.review(pad(layout, false), RULES);
        ElementReview turned = REVIEWER.review(pad(layout.turned(), true), RULES);
        for (String[] pair : new String[][] {{"bending-x", "bending-y"}, {"shear-x", "shear-y"},
                {"anchorage-x", "anchorage-y"}}) {
            for (int i = 0; i < 2; i++) {
                String id = pair[i];
                CheckResult a = check(original, id);
                CheckResult b = check(turned, pair[1 - i]);
                assertThat(b.status()).as(id).isEqualTo(a.status());
                a.values().forEach((q, v) -> assertThat(b.values().get(q).value()).as(id + "." + q)
                        .isCloseTo(v.value(), within(1e-6 * Math.max(1, Math.abs(v.value())))));
            }
        }
        assertThat(value(turned, "punching-perimeter", "ved")).isCloseTo(value(original, "punching-perimeter", "ved"),
                within(1e-6 * Math.max(1, value(original, "punching-perimeter", "ved"))));
    }

    @Property(tries = 20)
    void aLargerLoadNeverLowersAUtilisation(@ForAll("layouts") Layout layout) {
        ElementReview base = REVIEWER.review(pad(layout, false), RULES);
        ElementReview more = REVIEWER.review(pad(layout.scaled(1.3), false), RULES);
        for (String id : List.of("bending-x", "bending-y", "shear-x", "shear-y", "punching-face",
                "punching-perimeter")) {
            double before = check(base, id).utilisation().orElse(0);
            assertThat(check(more, id).utilisation().orElse(0)).as(id).isGreaterThanOrEqualTo(before - 1e-9);
        }
    }

    @Property(tries = 15)
    void aMirrorChangesNoUtilisation(@ForAll("layouts") Layout layout) {
        ElementReview original = REVIEWER.review(pad(layout, false), RULES);
        ElementReview mirrored = REVIEWER.review(pad(layout.mirrored(), false), RULES);
        for (CheckResult a : original.checks()) {
            CheckResult b = check(mirrored, a.id());
            assertThat(b.status()).as(a.id()).isEqualTo(a.status());
            assertThat(b.utilisation().orElse(0)).as(a.id()).isCloseTo(a.utilisation().orElse(0), within(1e-6));
        }
    }

    /**
     * With column moments too: before u of Exp. (6.51) was read as the part of the perimeter on the footing
     * (β = 1 + (β(u) − 1)·u'/u), a perimeter mostly off the footing kept the whole perimeter's u/W in β while its
     * resistance shrank with u', so a deeper footing could show a higher punching utilisation (this property, then
     * restricted to concentric pads, found it).
     */
    @Property(tries = 25)
    void aDeeperFootingNeverRaisesTheShearOrPunchingUtilisation(@ForAll("layouts") Layout layout) {
        ElementReview base = REVIEWER.review(pad(layout, false), RULES);
        ElementReview deeper = REVIEWER.review(pad(layout.deeper(100), false), RULES);
        for (String id : List.of("shear-x", "shear-y", "punching-perimeter")) {
            double before = check(base, id).utilisation().orElse(0);
            assertThat(check(deeper, id).utilisation().orElse(0)).as(id).isLessThanOrEqualTo(before + 1e-9);
        }
    }

    /**
     * The governing punching perimeter moves inward as the footing gets thicker: a/d of the deeper footing is no
     * larger than the shallower one's, within one step of the search (Δa = d/50).
     */
    @Property(tries = 25)
    void theGoverningPunchingPerimeterMovesInwardAsTheFootingGetsThicker(@ForAll("layouts") Layout layout) {
        ElementReview base = REVIEWER.review(pad(layout, false), RULES);
        ElementReview deeper = REVIEWER.review(pad(layout.deeper(100), false), RULES);
        CheckResult before = check(base, "punching-perimeter");
        CheckResult after = check(deeper, "punching-perimeter");
        if (before.values().get("a") == null || after.values().get("a") == null) {
            return;
        }
        double dBefore = layout.h() - 50 - 16;
        double dAfter = dBefore + 100;
        assertThat(after.values().get("a").value() / dAfter)
                .isLessThanOrEqualTo(before.values().get("a").value() / dBefore + 0.02 + 1e-9);
    }

    /** @param turned whether the layout is the quarter turn of another (the y-bars then lie in layer 1) */
    private static PadFooting pad(Layout l, boolean turned) {
        Materials materials = new Materials(Optional.of("C30/37"), 30, 500, 20, List.of("XC2"), "S4", Optional.empty());
        Column column = new Column(Column.ColumnShape.RECTANGULAR, l.cx, l.cy, new Point(0, 0),
                Optional.of(new Column.StarterBars(4, 12)));
        int barsAcrossY = (int) (l.ly / 150);
        int barsAcrossX = (int) (l.lx / 150);
        BarSet xBars = new BarSet(Direction.X, barsAcrossY, 16, turned ? 2 : 1, BarEnds.STRAIGHT, Optional.empty(),
                Optional.empty());
        BarSet yBars = new BarSet(Direction.Y, barsAcrossX, 16, turned ? 1 : 2, BarEnds.STRAIGHT, Optional.empty(),
                Optional.empty());
        Reinforcement r = new Reinforcement(new Reinforcement.Covers(50, 50, 50), List.of(xBars, yBars), List.of(),
                Optional.empty());
        ActionCase uls = new ActionCase("ULS-1", ActionCase.Kind.ULS, l.n, l.mx, l.my, 0, 0, null);
        return new PadFooting("P", "", null, materials, l.lx, l.ly, l.h, CastAgainst.BLINDING, Optional.empty(),
                column, List.of(uls), Optional.of(r), List.of());
    }

    private static CheckResult check(ElementReview e, String id) {
        return e.checks().stream().filter(c -> c.id().equals(id)).findFirst().orElseThrow();
    }

    private static double value(ElementReview e, String check, String quantity) {
        var v = check(e, check).values().get(quantity);
        return v == null ? 0 : v.value();
    }

    private static Ruleset rules() {
        try {
            return new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load("en1992-recommended");
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }
}
