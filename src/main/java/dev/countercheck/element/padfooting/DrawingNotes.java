package dev.countercheck.element.padfooting;

import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.PadFootingDrawing;
import dev.countercheck.review.Value;
import dev.countercheck.statics.PlanPoint;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Point;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The places of a pad's review that its drawing shows: the ground pressure of the ULS case with the largest
 * q (column actions alone) and its contact zone, the critical sections as the checks placed them, the
 * governing control perimeter. Empty when no ULS case has a pressure in equilibrium.
 */
final class DrawingNotes {

    private DrawingNotes() {
    }

    static Optional<PadFootingDrawing> of(PadContext ctx, List<CheckOutcome> outcomes) {
        Ground.Contact worst = null;
        for (ActionCase a : ctx.cases(ActionCase.Kind.ULS)) {
            if (ctx.resultant(a, 0).vKn() <= 0) {
                continue;
            }
            Optional<Ground.Contact> c = ctx.contact(ctx.resultant(a, 0));
            if (c.isPresent() && (worst == null || c.get().qMaxKpa() > worst.qMaxKpa())) {
                worst = c.get();
            }
        }
        if (worst == null) {
            return Optional.empty();
        }
        OptionalDouble perimeter = outcomes.stream().filter(o -> o.result().id().equals("punching-perimeter"))
                .map(o -> o.result().values().get("a")).filter(Objects::nonNull).mapToDouble(Value::value)
                .findFirst();
        List<Point> outline = worst.field().contactOutline().stream().map(DrawingNotes::point).toList();
        return Optional.of(new PadFootingDrawing(ctx.pad, worst.load().action().name(), worst.field().q0Kpa(),
                worst.field().qxKpaPerMm(), worst.field().qyKpaPerMm(), outline,
                outcomes.stream().flatMap(o -> o.sections().stream()).toList(), perimeter));
    }

    private static Point point(PlanPoint p) {
        return new Point(p.xMm(), p.yMm());
    }
}
