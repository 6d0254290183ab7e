package dev.countercheck.report;

import dev.countercheck.input.SourceLocation;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.Drawing;
import dev.countercheck.review.PileCapDrawing;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Verdict;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.Materials;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.PileGroup;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Covers;
import dev.countercheck.submission.Reinforcement.Direction;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A four-pile cap and its drawing data, built by hand for the drawing tests. Invented demo data:
 * the reactions, section positions and perimeter distance are not computed from the cap, they are
 * only numbers whose placement on the drawing the tests can observe.
 *
 * <p>Cap 2400 × 2400 × 1000 mm; piles φ450 at (±750, ±750), embedded 75 mm, compression
 * resistance 1550 kN; column 500 × 500 at the centre; covers 75 bottom, 50 top, 75 side; bottom
 * 10 φ20 along x (layer 1, bent), 10 φ20 along y (layer 2, bent); top 4 φ12 along x. Largest
 * reactions 1500, 1620, 1380, 1450 kN: only pile 2 exceeds the resistance. Shear sections at
 * x = ±600 and y = ±600; a = 1700 mm.
 */
final class DrawingFixture {

    static final double PLAN_MM = 2400;
    static final double PILE_OFFSET_MM = 750;

    private DrawingFixture() {
    }

    static PileCap cap(String id) {
        Materials materials = new Materials(Optional.of("C30/37"), 30, 500, 20, List.of("XC2"), "S4",
                Optional.of(10.0));
        PileGroup piles = new PileGroup(450, List.of(new Point(-750, -750), new Point(750, -750),
                new Point(750, 750), new Point(-750, 750)), 1550, 0, 75, Optional.of(75.0));
        Column column = new Column(ColumnShape.RECTANGULAR, 500, 500, new Point(0, 0), Optional.empty());
        Reinforcement reinforcement = new Reinforcement(new Covers(75, 50, 75),
                List.of(new BarSet(Direction.X, 10, 20, 1, BarEnds.BENT, Optional.empty(), Optional.empty()),
                        new BarSet(Direction.Y, 10, 20, 2, BarEnds.BENT, Optional.empty(), Optional.empty())),
                List.of(new BarSet(Direction.X, 4, 12, 1, BarEnds.STRAIGHT, Optional.empty(), Optional.empty())),
                Optional.empty());
        return new PileCap(id, "Four-pile cap (invented)", new SourceLocation("fixture.yaml", 1, 1), materials,
                PLAN_MM, PLAN_MM, 1000, PileCap.Casting.bottomOnly(PileCap.CastAgainst.BLINDING),
                PileCap.SelfWeight.ADD, piles, column,
                List.of(), Optional.of(reinforcement), PileCap.TieMethod.TRUSS, List.of());
    }

    static PileCapDrawing drawing(String id) {
        return new PileCapDrawing(cap(id), List.of(1500.0, 1620.0, 1380.0, 1450.0),
                List.of(new Drawing.SectionLine("x", 600, "shear-x"), new Drawing.SectionLine("x", -600, "shear-x"),
                        new Drawing.SectionLine("y", 600, "shear-y"), new Drawing.SectionLine("y", -600, "shear-y")),
                OptionalDouble.of(1700));
    }

    /**
     * The element with failing pile-reactions (marks pile 2), shear-x (marks its sections), tie-y
     * (marks the y-bars), cover (marks the covers) and max-steel (not drawn); shear-y passes.
     */
    static ElementReview element(String id) {
        List<CheckResult> checks = List.of(check("pile-reactions", CheckStatus.FAIL),
                check("shear-x", CheckStatus.FAIL), check("shear-y", CheckStatus.PASS),
                check("tie-y", CheckStatus.FAIL), check("cover", CheckStatus.FAIL),
                check("max-steel", CheckStatus.FAIL));
        List<Finding> findings = List.of(
                new Finding(id + "/pile-reactions/compression", Severity.CRITICAL, "pile-reactions", "Pile 2 overloaded.",
                        "common practice"),
                new Finding(id + "/shear-x/capacity", Severity.CRITICAL, "shear-x", "VEd exceeds VRd,c.", "EN 1992-1-1 6.2.2"),
                new Finding(id + "/tie-y/capacity", Severity.CRITICAL, "tie-y", "Too few y-bars.", "EN 1992-1-1 6.5"),
                new Finding(id + "/cover/cover-bottom", Severity.MAJOR, "cover", "Cover too small.", "EN 1992-1-1 4.4.1"),
                new Finding(id + "/max-steel/as-max", Severity.MAJOR, "max-steel", "Too much steel.",
                        "EN 1992-1-1 9.2.1.1(3)"));
        return new ElementReview(id, "pile-cap", "Four-pile cap (invented)", Verdict.DOES_NOT_CONFORM, checks,
                findings, List.of(), Optional.of(drawing(id)));
    }

    private static CheckResult check(String id, CheckStatus status) {
        return new CheckResult(id, "Check " + id, "EN 1992-1-1", status, OptionalDouble.empty(), Optional.empty(),
                Map.of(), List.of(), List.of());
    }
}
