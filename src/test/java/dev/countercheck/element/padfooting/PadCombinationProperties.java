package dev.countercheck.element.padfooting;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.review.ClaimComparer;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.SeverityPolicy;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.CharacteristicLoad;
import dev.countercheck.submission.CharacteristicLoad.Source;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Materials;
import dev.countercheck.submission.PadFooting;
import dev.countercheck.submission.PileCap.CastAgainst;
import dev.countercheck.submission.Point;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Properties of the generated GEO and EQU sets on an invented pad footing (2400 × 2000 × 550, column 400 × 400
 * centred, 450 mm of soil at 18 kN/m³ over it, φ'k 30°, φ'cv,k 28°) given by characteristic loads only (G: N, My;
 * Q category B: N; W: N, My, Hx, reversible): the review's overturning and sliding utilisations are the least
 * favourable over every admissible EN 1990 combination, found here by an independent enumeration; and adding a
 * permanent load that only holds the footing down never raises either.
 * <p>
 * The enumeration: each variable action's factor runs over {0, γQ·ψ0, γQ} (the wind with either sign), at
 * most one of them at γQ (the leading one), the permanent actions with γG,sup and with γG,inf. Overturning is
 * Ed,dst/Ed,stb about the edges x = ±Lx/2, and sliding Hd/Rd (drained, δd = φ'cv,d) are quasi-convex in the
 * factors (a convex function over a positive linear one), so their greatest value over the admissible region
 * lies at one of these points (the region is the union of the box "Q leads" and the box "W leads").
 * Factors: EN 1990:2002 Table A1.2(A) (EQU: γG,sup 1.10, γG,inf 0.90, γQ 1.5; the footing's and the
 * overburden's weight, only ever stabilising, × γG,inf in every case: EN 1990 6.4.3.1(4)), Table A1.2(B) (STR
 * = DA1-1: γG,sup 1.35, γG,inf 1.0, γQ 1.5, weights with the case's γG), Table A1.2(C) (DA1-2: γG 1.0, γQ
 * 1.3); ψ0 = 0.7 (category B) and 0.6 (wind), Table A1.1; M2 γφ' = 1.25, R1 γR;h = 1.0, EN 1997-1 Tables A.4,
 * A.5 (from memory).
 */
class PadCombinationProperties {

    static final Ruleset RULES = rules();
    private static final PadFootingReviewer REVIEWER = new PadFootingReviewer(new ElementAssembler(
            new ClaimComparer(RULES.number("claim_tolerance"), Map.of()), new SeverityPolicy(RULES::severity)));
    private static final SourceLocation HERE = new SourceLocation("property", 1, 1);
    private static final double LX = 2.4;
    private static final double LY = 2.0;
    private static final double H = 0.55;
    private static final double OVERBURDEN = 0.45;
    private static final double PSI_B = 0.7;
    private static final double PSI_W = 0.6;

    /** The loads of one try. */
    record Loads(double g, double gMy, double q, double w, double wMy, double wHx) {

        List<CharacteristicLoad> list() {
            return List.of(new CharacteristicLoad(Source.G, Optional.empty(), g, 0, gMy, 0, 0, false, HERE),
                    new CharacteristicLoad(Source.Q, Optional.of("B"), q, 0, 0, 0, 0, false, HERE),
                    new CharacteristicLoad(Source.W, Optional.empty(), w, 0, wMy, wHx, 0, true, HERE));
        }
    }

    @Property(tries = 25)
    void overturningAndSlidingAreTheLeastFavourableOverEveryCombination(
            @ForAll @DoubleRange(min = 150, max = 600) double g, @ForAll @DoubleRange(min = -40, max = 40) double gMy,
            @ForAll @DoubleRange(min = 10, max = 200) double q, @ForAll @DoubleRange(min = -80, max = 80) double w,
            @ForAll @DoubleRange(min = 20, max = 250) double wMy, @ForAll @DoubleRange(min = 5, max = 80) double wHx) {
        Loads loads = new Loads(g, gMy, q, w, wMy, wHx);
        ElementReview pad = review(pad(loads.list(), OVERBURDEN * 1000));
        double overturning = PadCombinationsTest.check(pad, "overturning").utilisation().orElseThrow();
        double sliding = PadCombinationsTest.check(pad, "sliding").utilisation().orElseThrow();
        assertThat(overturning).isCloseTo(worstOverturning(loads), within(1e-9 * overturning + 1e-12));
        assertThat(sliding).isCloseTo(worstSliding(loads), within(1e-9 * sliding + 1e-12));
    }

    @Property(tries = 15)
    void aPermanentLoadThatHoldsTheFootingDownNeverRaisesOverturningOrSliding(
            @ForAll @DoubleRange(min = 150, max = 600) double g, @ForAll @DoubleRange(min = 10, max = 200) double q,
            @ForAll @DoubleRange(min = -80, max = 80) double w, @ForAll @DoubleRange(min = 20, max = 250) double wMy,
            @ForAll @DoubleRange(min = 5, max = 80) double wHx, @ForAll @DoubleRange(min = 1, max = 400) double extra) {
        List<CharacteristicLoad> before = new Loads(g, 0, q, w, wMy, wHx).list();
        List<CharacteristicLoad> after = new ArrayList<>(before);
        after.add(new CharacteristicLoad(Source.G, Optional.empty(), extra, 0, 0, 0, 0, false, HERE));
        ElementReview b = review(pad(before, OVERBURDEN * 1000));
        ElementReview a = review(pad(after, OVERBURDEN * 1000));
        for (String id : List.of("overturning", "sliding")) {
            assertThat(PadCombinationsTest.check(a, id).utilisation().orElseThrow()).as(id)
                    .isLessThanOrEqualTo(PadCombinationsTest.check(b, id).utilisation().orElseThrow() + 1e-12);
        }
    }

    /** Greatest Ed,dst/Ed,stb over the EQU combinations, enumerated independently. */
    private static double worstOverturning(Loads l) {
        double weights = 0.9 * weights();
        double worst = 0;
        for (double gamma : new double[] {1.10, 0.90}) {
            for (double[] f : variableFactors(1.5)) {
                double n = gamma * l.g + f[0] * l.q + f[1] * l.w;
                double my = gamma * l.gMy + f[1] * (l.wMy + l.wHx * H);
                for (double m : new double[] {my, -my}) {
                    double dst = Math.max(0, m) + Math.max(0, -n) * LX / 2;
                    double stb = (Math.max(0, n) + weights) * LX / 2;
                    worst = Math.max(worst, dst / stb);
                }
            }
        }
        return worst;
    }

    /** Greatest Hd/Rd over DA1-1 (STR factors, M1) and DA1-2 (GEO factors, M2), enumerated independently. */
    private static double worstSliding(Loads l) {
        double tanCv = Math.tan(Math.toRadians(28));
        double worst = 0;
        for (double gamma : new double[] {1.35, 1.0}) {
            for (double[] f : variableFactors(1.5)) {
                worst = Math.max(worst, sliding(l, gamma, f, tanCv));
            }
        }
        for (double[] f : variableFactors(1.3)) {
            worst = Math.max(worst, sliding(l, 1.0, f, tanCv / 1.25));
        }
        return worst;
    }

    private static double sliding(Loads l, double gamma, double[] f, double tanDelta) {
        double v = gamma * (l.g + weights()) + f[0] * l.q + f[1] * l.w;
        return Math.abs(f[1] * l.wHx) / (v * tanDelta);
    }

    /** {Q factor, W factor} over {0, γQ·ψ0, γQ} each (W with both signs), at most one at γQ. */
    private static List<double[]> variableFactors(double gammaQ) {
        List<double[]> out = new ArrayList<>();
        for (double fq : new double[] {0, gammaQ * PSI_B, gammaQ}) {
            for (double fw : new double[] {0, gammaQ * PSI_W, gammaQ, -gammaQ * PSI_W, -gammaQ}) {
                if (!(fq == gammaQ && Math.abs(fw) == gammaQ)) {
                    out.add(new double[] {fq, fw});
                }
            }
        }
        return out;
    }

    /** Wf + Ws, kN: concrete (ruleset unit weight) and 450 mm of soil at 18 kN/m³ outside the column. */
    private static double weights() {
        return RULES.number("concrete_unit_weight") * LX * LY * H + 18 * (LX * LY - 0.16) * OVERBURDEN;
    }

    static ElementReview review(PadFooting pad) {
        return REVIEWER.review(pad, RULES);
    }

    /** The invented pad with {@code loads} and no designer's cases. */
    static PadFooting pad(List<CharacteristicLoad> loads, double overburdenMm) {
        Materials materials = new Materials(Optional.of("C30/37"), 30, 500, 20, List.of("XC2"), "S4", Optional.empty());
        Column column = new Column(Column.ColumnShape.RECTANGULAR, 400, 400, new Point(0, 0),
                Optional.of(new Column.StarterBars(4, 12)));
        PadFooting.Soil soil = new PadFooting.Soil(Optional.of(250.0), overburdenMm, 18, Optional.of(30.0),
                Optional.empty(), Optional.empty(), Optional.of(19.0), Optional.of(28.0), Optional.empty());
        return new PadFooting("P", "", HERE, materials, LX * 1000, LY * 1000, H * 1000, CastAgainst.BLINDING,
                Optional.of(soil), column, List.of(), Optional.empty(), List.of(), loads);
    }

    private static Ruleset rules() {
        try {
            return new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load("en1992-recommended");
        } catch (Exception e) {
            throw new AssertionError(e);
        }
    }
}
