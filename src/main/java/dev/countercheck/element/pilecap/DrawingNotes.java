package dev.countercheck.element.pilecap;

import dev.countercheck.review.Drawing;
import dev.countercheck.review.Drawing.SectionLine;
import dev.countercheck.submission.Point;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/** The places of a pile cap's review that its drawing shows: reactions, shear sections, control perimeter. */
final class DrawingNotes {

    private DrawingNotes() {
    }

    static Drawing of(PileCapContext ctx) {
        int n = ctx.cap.piles().count();
        List<Double> reactions = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            final int pile = i;
            reactions.add(ctx.uls.stream().mapToDouble(u -> u.withSelfWeight().reactionsKn()[pile]).max().orElse(0));
        }
        List<SectionLine> sections = new ArrayList<>();
        for (Axis axis : Axis.values()) {
            for (int sign : new int[] {1, -1}) {
                double face = axis.along(ctx.cap.column().position()) + sign * axis.columnHalf(ctx.cap.column());
                double nearest = Double.POSITIVE_INFINITY;
                for (Point p : ctx.cap.piles().positions()) {
                    double distance = sign * (axis.along(p) - face);
                    if (distance > 0) {
                        nearest = Math.min(nearest, distance);
                    }
                }
                if (Double.isFinite(nearest)) {
                    double av = Math.max(0, ShearCheck.shearSpan(ctx, 0, nearest).value());
                    sections.add(new SectionLine(axis.label(), face + sign * av, "shear-" + axis.label()));
                }
            }
        }
        OptionalDouble perimeter = ctx.section.map(s -> OptionalDouble.of(2 * s.dMean().value()))
                .orElse(OptionalDouble.empty());
        return new Drawing(ctx.cap, List.copyOf(reactions), List.copyOf(sections), perimeter);
    }
}
