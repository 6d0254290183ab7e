package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.PileCapDrawing;
import dev.countercheck.review.Value;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The places of a pile cap's review that its drawing shows: reactions, the critical sections as the
 * checks placed them, the governing control perimeter.
 */
final class DrawingNotes {

    private DrawingNotes() {
    }

    static PileCapDrawing of(PileCapContext ctx, List<CheckOutcome> outcomes) {
        int n = ctx.cap.piles().count();
        List<Double> reactions = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            final int pile = i;
            reactions.add(ctx.uls.stream().mapToDouble(u -> u.withSelfWeight().reactionsKn()[pile]).max().orElse(0));
        }
        OptionalDouble perimeter = outcomes.stream().filter(o -> o.result().id().equals("punching-perimeter"))
                .map(o -> o.result().values().get("a")).filter(java.util.Objects::nonNull)
                .mapToDouble(Value::value).findFirst();
        return new PileCapDrawing(ctx.cap, List.copyOf(reactions),
                outcomes.stream().flatMap(o -> o.sections().stream()).toList(), perimeter);
    }
}
