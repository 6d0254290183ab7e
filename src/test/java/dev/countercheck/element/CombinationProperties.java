package dev.countercheck.element;

import dev.countercheck.input.SourceLocation;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.statics.PileGroupReactions;
import dev.countercheck.statics.PileGroupReactions.Load;
import dev.countercheck.statics.PlanPoint;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.CharacteristicLoad;
import dev.countercheck.submission.CharacteristicLoad.Source;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Properties of the generated combinations on a pile group (a rigid cap on four piles at ±1100 mm, its own
 * weight 300 kN at the centre, taken with each combination's factor on the permanent actions): adding a
 * variable load never lowers the largest reaction; a reversible action gives mirror-image reactions; the
 * cases with γG,inf always hold the least reaction (permanent actions without moments).
 */
class CombinationProperties {

    private static final Ruleset RULES = CombinationsTest.ruleset("en1992-recommended");
    private static final SourceLocation HERE = new SourceLocation("generated", 1, 1);
    private static final List<PlanPoint> PILES = List.of(new PlanPoint(-1100, -1100), new PlanPoint(1100, -1100),
            new PlanPoint(-1100, 1100), new PlanPoint(1100, 1100));
    private static final double OWN_WEIGHT = 300;

    private static CharacteristicLoad load(Source s, Optional<String> category, double n, double mx, double my,
                                           boolean reversible) {
        return new CharacteristicLoad(s, category, n, mx, my, 0, 0, reversible, HERE);
    }

    private static double[] reactions(ActionCase c) {
        double gamma = c.selfWeightFactor().orElseThrow();
        return PileGroupReactions.solve(PILES, List.of(new Load("N", c.nKn(), new PlanPoint(0, 0)),
                new Load("γG·W", gamma * OWN_WEIGHT, new PlanPoint(0, 0))), c.mxKnm(), c.myKnm()).reactionsKn();
    }

    private static List<ActionCase> uls(List<CharacteristicLoad> loads) {
        return Combinations.of(loads, RULES).cases(HERE).stream().filter(c -> c.kind() == ActionCase.Kind.ULS).toList();
    }

    private static double largest(List<CharacteristicLoad> loads) {
        return uls(loads).stream().flatMapToDouble(c -> java.util.Arrays.stream(reactions(c))).max().orElseThrow();
    }

    @Property(tries = 60)
    void addingAVariableLoadNeverLowersTheLargestReaction(
            @ForAll @DoubleRange(min = 100, max = 3000) double g, @ForAll @DoubleRange(min = -300, max = 300) double gMx,
            @ForAll @DoubleRange(min = -500, max = 1500) double q, @ForAll @DoubleRange(min = -400, max = 400) double qMy,
            @ForAll @DoubleRange(min = -300, max = 300) double w, @ForAll @DoubleRange(min = -600, max = 600) double wMx) {
        List<CharacteristicLoad> before = new ArrayList<>(List.of(load(Source.G, Optional.empty(), g, gMx, 0, false),
                load(Source.W, Optional.empty(), w, wMx, 0, true)));
        List<CharacteristicLoad> after = new ArrayList<>(before);
        after.add(load(Source.Q, Optional.of("C"), q, 0, qMy, false));
        assertThat(largest(after)).isGreaterThanOrEqualTo(largest(before) - 1e-9);
    }

    @Property(tries = 60)
    void aReversibleActionGivesMirrorImageReactions(
            @ForAll @DoubleRange(min = 100, max = 3000) double g, @ForAll @DoubleRange(min = 0, max = 1500) double q,
            @ForAll @DoubleRange(min = -800, max = 800) double wMy) {
        // a lateral action: reversing it (the whole action, N too) mirrors it when it has no N of its own
        List<CharacteristicLoad> loads = List.of(load(Source.G, Optional.empty(), g, 0, 0, false),
                load(Source.Q, Optional.of("B"), q, 0, 0, false), load(Source.W, Optional.empty(), 0, 0, wMy, true));
        List<double[]> all = uls(loads).stream().map(CombinationProperties::reactions).toList();
        for (double[] p : all) {
            // the mirror about x = 0 swaps piles 1 ↔ 2 and 3 ↔ 4; a mirrored moment My changes sign
            double[] mirrored = {p[1], p[0], p[3], p[2]};
            assertThat(all).anySatisfy(o -> {
                for (int i = 0; i < 4; i++) {
                    assertThat(o[i]).isCloseTo(mirrored[i], org.assertj.core.api.Assertions.within(1e-6));
                }
            });
        }
    }

    @Property(tries = 60)
    void theCasesWithGammaGInfHoldTheLeastReaction(
            @ForAll @DoubleRange(min = 0, max = 3000) double g, @ForAll @DoubleRange(min = -500, max = 1500) double q,
            @ForAll @DoubleRange(min = -400, max = 400) double qMx,
            @ForAll @DoubleRange(min = -400, max = 300) double w, @ForAll @DoubleRange(min = -900, max = 900) double wMy) {
        List<CharacteristicLoad> loads = List.of(load(Source.G, Optional.empty(), g, 0, 0, false),
                load(Source.Q, Optional.of("A"), q, qMx, 0, false), load(Source.W, Optional.empty(), w, 0, wMy, true));
        List<ActionCase> cases = uls(loads);
        double least = cases.stream().flatMapToDouble(c -> java.util.Arrays.stream(reactions(c))).min().orElseThrow();
        double leastInf = cases.stream().filter(c -> c.name().contains("G inf"))
                .flatMapToDouble(c -> java.util.Arrays.stream(reactions(c))).min().orElseThrow();
        assertThat(leastInf).isCloseTo(least, org.assertj.core.api.Assertions.within(1e-6));
    }
}
