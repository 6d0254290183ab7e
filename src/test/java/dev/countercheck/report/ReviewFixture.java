package dev.countercheck.report;

import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.ClaimVerdict;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Value;
import dev.countercheck.review.Verdict;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * A small finished review built by hand for the writer tests.
 *
 * <p>Every value here is invented demo data: the numbers are not the result of any calculation
 * and are not taken from any published example. The writers compute nothing, so the tests only
 * need values whose rounding and placement can be observed.
 *
 * <p>What it holds: element {@code PC-D1} (a pile cap, does not conform) with a passing check
 * carrying an agreeing and a conservative claim, a failing check with an unconservative claim,
 * and three findings (critical, major on a check that is not in the list, minor); element
 * {@code PF-A2} (a pad footing, conforms with remarks) with a passing check and a not-applicable
 * check with its reason and no trace, and two findings (minor, note). Trace steps with and without
 * remark. PC-D1 carries the drawing of {@link DrawingFixture}; PF-A2 has none. The submission has no
 * revision and no "prepared by"; the summary map leaves out the
 * verdicts no element has, so the writers must print them as 0.
 */
public final class ReviewFixture {

    static final String TITLE = "Harbour Lane cold store (invented demo project)";

    private ReviewFixture() {
    }

    public static Review review() {
        return review(TITLE);
    }

    static Review review(String title) {
        return new Review(
                new Review.ToolInfo("countercheck", "0.1.0"),
                new Review.SubmissionInfo("sample-submissions/harbour-lane.yaml",
                        "9f2c4e1a7b3d5f60812a4c6e8b0d2f4a6c8e0b2d4f6a8c0e2b4d6f8a0c2e4b6d",
                        Optional.of(title), Optional.of("HL-STR-014"), Optional.empty(), Optional.empty(),
                        Optional.of("2026-02-27")),
                new Review.RulesetInfo("en1992-recommended", "EN 1992-1-1 recommended values",
                        "0a1b2c3d4e5f60718293a4b5c6d7e8f90a1b2c3d4e5f60718293a4b5c6d7e8f9",
                        List.of("rulesets/en1992-recommended.yaml")),
                "2026-03-14",
                Verdict.DOES_NOT_CONFORM,
                List.of(pileCap(), padFooting()),
                new Review.Summary(2,
                        new EnumMap<>(Map.of(Verdict.DOES_NOT_CONFORM, 1, Verdict.CONFORMS_WITH_REMARKS, 1)),
                        new EnumMap<>(Map.of(Severity.CRITICAL, 1, Severity.MAJOR, 1, Severity.MINOR, 2,
                                Severity.NOTE, 1))),
                List.of("Pile reactions assume a rigid cap.",
                        "Self weight of the cap is added to the column load."));
    }

    private static ElementReview pileCap() {
        CheckResult tie = new CheckResult("tie-x", "Tension tie, bars parallel to x", "EN 1992-1-1 6.5, 9.8.1(2)",
                CheckStatus.PASS, OptionalDouble.of(0.8123456), Optional.empty(),
                values("force", new Value(812.3456, "kN", OptionalInt.of(0)),
                        "as_required", new Value(1867.459, "mm2", OptionalInt.of(1)),
                        "as_provided", new Value(123456.7, "mm2", OptionalInt.empty())),
                List.of(new ClaimComparison("force", 812.0, 812.3456, -0.000425, ClaimVerdict.AGREES),
                        new ClaimComparison("as_required", 2000.0, 1867.459, 0.070974,
                                ClaimVerdict.DIFFERS_CONSERVATIVE)),
                List.of(Step.of("T", "Σ P_i·x_i / z", "(1500·0.5)/0.9233", 812.3456, "kN", "EN 1992-1-1 6.5.4"),
                        Step.withRemark("As,req", "T / fyd", "812.3·1000/435", 1867.459, "mm2",
                                "EN 1992-1-1 6.5.4", "fyd = fyk/γs with γs from the ruleset")));
        CheckResult shear = new CheckResult("shear-x", "One-way shear, sections parallel to y", "EN 1992-1-1 6.2.2",
                CheckStatus.FAIL, OptionalDouble.of(1.18341), Optional.of("VEd exceeds VRd,c"),
                values("ved", new Value(1183.4, "kN", OptionalInt.empty()), "vrdc", new Value(1000.1, "kN", OptionalInt.empty())),
                List.of(new ClaimComparison("vrdc", 1200.0, 1000.1, 0.19988, ClaimVerdict.DIFFERS_UNCONSERVATIVE)),
                List.of(Step.withRemark("k", "1 + √(200/d)", "1 + √(200/45)", 2.0, "-", "EN 1992-1-1 6.2.2(1)",
                        "k capped at 2.0")));
        return new ElementReview("PC-D1", "pile-cap", "Four-pile cap under column D1", Verdict.DOES_NOT_CONFORM,
                List.of(tie, shear),
                List.of(new Finding("PC-D1/shear-x/capacity", Severity.CRITICAL, "shear-x",
                                "VEd exceeds VRd,c; the claimed VRd,c is unconservative", "EN 1992-1-1 6.2.2"),
                        new Finding("PC-D1/anchorage-x/length", Severity.MAJOR, "anchorage-x",
                                "Anchorage length beyond the pile not shown", "EN 1992-1-1 8.4.4"),
                        new Finding("PC-D1/tie-x/claim-as-required", Severity.MINOR, "tie-x",
                                "Claimed As,req is conservative", "EN 1992-1-1 6.5.4")),
                List.of("Pile spacing exceeds three diameters: concentrate tie bars over the piles."),
                Optional.of(DrawingFixture.drawing("PC-D1")));
    }

    private static ElementReview padFooting() {
        CheckResult bearing = new CheckResult("bearing", "Ground bearing pressure", "common practice",
                CheckStatus.PASS, OptionalDouble.of(0.7), Optional.empty(),
                values("pressure", new Value(154.0, "kPa", OptionalInt.of(0))),
                List.of(),
                List.of(Step.of("q", "N / (B·L)", "1386/(3·3)", 154.0, "kPa", "common practice")));
        CheckResult shearY = new CheckResult("shear-y", "One-way shear, sections parallel to x", "EN 1992-1-1 6.2.2",
                CheckStatus.NOT_APPLICABLE, OptionalDouble.empty(),
                Optional.of("no part of the footing projects beyond d from the column face in y"),
                values(), List.of(), List.of());
        return new ElementReview("PF-A2", "pad-footing", "Pad footing under column A2",
                Verdict.CONFORMS_WITH_REMARKS, List.of(bearing, shearY),
                List.of(new Finding("PF-A2/bearing/capacity", Severity.MINOR, "bearing",
                                "Allowable bearing pressure not referenced to a ground report", "common practice"),
                        new Finding("PF-A2/shear-y/claim-ved", Severity.NOTE, "shear-y",
                                "Shear in y not checked: not applicable to this geometry", "EN 1992-1-1 6.2.2")),
                List.of(), Optional.empty());
    }

    /** Values in the order given (name, value, name, value, ...), as the reviewer keeps them. */
    private static Map<String, Value> values(Object... namesAndValues) {
        Map<String, Value> values = new LinkedHashMap<>();
        for (int i = 0; i < namesAndValues.length; i += 2) {
            values.put((String) namesAndValues[i], (Value) namesAndValues[i + 1]);
        }
        return values;
    }
}
