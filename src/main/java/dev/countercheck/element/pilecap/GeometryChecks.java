package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;

import java.util.List;

/** {@code pile-spacing} and {@code edge-distance}: rules of common practice on the pile layout. */
final class GeometryChecks {

    private GeometryChecks() {
    }

    static double minSpacing(PileCap cap) {
        List<Point> p = cap.piles().positions();
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < p.size(); i++) {
            for (int j = i + 1; j < p.size(); j++) {
                min = Math.min(min, p.get(i).distanceTo(p.get(j)));
            }
        }
        return min;
    }

    static CheckOutcome spacing(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("pile-spacing");
        PileCap cap = ctx.cap;
        if (cap.piles().count() < 2) {
            return b.notApplicable("a single pile has no spacing").build();
        }
        double phi = cap.piles().diameterMm();
        double s = minSpacing(cap);
        b.value("min_spacing", Step.of("s,min", "least distance between pile centres", Num.f(s), s, "mm",
                "common practice"));
        Step friction = b.trace(ctx.rules.parameter("pile_spacing_factor").asStep());
        Step endBearing = b.trace(ctx.rules.parameter("pile_spacing_factor_end_bearing").asStep());
        b.pass();
        if (s < endBearing.value() * phi) {
            b.fail(FindingKind.RULE, "spacing", "Piles are " + Num.f(s) + " mm apart, less than " + Num.f(endBearing.value())
                    + "φ = " + Num.f(endBearing.value() * phi) + " mm, the least spacing even for end-bearing piles"
                    + " (common practice).");
        } else if (s < friction.value() * phi) {
            b.finding(FindingKind.REMARK, "spacing-friction", "Piles are " + Num.f(s) + " mm apart, less than " + Num.f(friction.value())
                    + "φ = " + Num.f(friction.value() * phi) + " mm: acceptable for end-bearing piles; friction"
                    + " piles this close interact (common practice).");
        } else if (s > friction.value() * phi + 1e-6) {
            b.caution("Pile spacing " + Num.f(s) + " mm exceeds " + Num.f(friction.value()) + "φ = "
                    + Num.f(friction.value() * phi) + " mm: tie steel should be concentrated in bands over the piles,"
                    + " and the full cap width may not act in one-way shear (common practice).");
        }
        return b.build();
    }

    static CheckOutcome edgeDistance(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("edge-distance");
        PileCap cap = ctx.cap;
        double radius = cap.piles().diameterMm() / 2;
        double min = Double.POSITIVE_INFINITY;
        int governing = 0;
        List<Point> p = cap.piles().positions();
        for (int i = 0; i < p.size(); i++) {
            double e = Math.min(cap.planXMm() / 2 - Math.abs(p.get(i).xMm()),
                    cap.planYMm() / 2 - Math.abs(p.get(i).yMm())) - radius;
            if (e < min) {
                min = e;
                governing = i + 1;
            }
        }
        b.value("min_edge", Step.of("e,min", "min(Lx/2 − |x_i|, Ly/2 − |y_i|) − φ/2", "pile " + governing, min,
                "mm", "EN 1992-1-1 9.8.1(1)"));
        Step delta = b.trace(ctx.planTolerance());
        double deviated = min - delta.value();
        b.value("min_edge_deviated", Step.of("e,min,δ", "e,min − δ", Num.f(min) + " − " + Num.f(delta.value()),
                deviated, "mm", "EN 1992-1-1 9.8.1(1)"));
        Step limit = b.trace(ctx.rules.parameter("min_edge_distance").asStep());
        b.require(limit.value(), min, FindingKind.RULE, "edge", "Pile " + governing + " face is " + Num.f(min)
                + " mm from the cap edge, less than " + Num.f(limit.value()) + " mm (" + limit.clause()
                + "): the ties may not anchor over the pile.");
        if (min >= limit.value() && deviated < limit.value()) {
            b.finding(FindingKind.REMARK, "edge-deviated", "With pile " + governing + " " + Num.f(delta.value()) + " mm off position"
                    + " towards the edge its face would be " + Num.f(deviated) + " mm from the cap edge, less than "
                    + Num.f(limit.value()) + " mm: check the as-built position.");
        }
        return b.build();
    }
}
