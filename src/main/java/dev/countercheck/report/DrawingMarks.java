package dev.countercheck.report;

import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.PileCapDrawing;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;

/**
 * What an element's drawings mark as failing: one tag ({@code F1}, {@code F2}, …) per failing
 * check, in check order, and the item of the drawing it belongs to. Which item a check concerns is
 * a fixed table here; a failing check with no place on the drawing still gets its tag, listed as
 * "not drawn" under the drawing.
 *
 * <p>The overloaded piles are those whose largest reaction (given by the reviewer) exceeds the
 * piles' compression resistance; the most heavily loaded piles are those whose reaction equals the
 * largest. Both are comparisons of given numbers, not engineering.
 */
final class DrawingMarks {

    /** The items a failing check can mark. */
    enum Item {
        OVERLOADED_PILES("piles whose reaction exceeds their compression resistance"),
        MOST_LOADED_PILES("the most heavily loaded piles"),
        BARS_X("bottom bars parallel to x"),
        BARS_Y("bottom bars parallel to y"),
        SHEAR_X("shear sections across x"),
        SHEAR_Y("shear sections across y"),
        COLUMN("the column and its face"),
        PERIMETER("the basic control perimeter"),
        COVER("the covers in the section"),
        NOT_DRAWN("not drawn");

        private final String description;

        Item(String description) {
            this.description = description;
        }

        String description() {
            return description;
        }
    }

    private static final Map<String, Item> ITEM_OF_CHECK = Map.ofEntries(
            Map.entry("pile-reactions", Item.OVERLOADED_PILES),
            Map.entry("node-pile", Item.MOST_LOADED_PILES),
            Map.entry("tie-x", Item.BARS_X), Map.entry("min-steel-x", Item.BARS_X),
            Map.entry("bar-spacing-x", Item.BARS_X), Map.entry("anchorage-x", Item.BARS_X),
            Map.entry("tie-y", Item.BARS_Y), Map.entry("min-steel-y", Item.BARS_Y),
            Map.entry("bar-spacing-y", Item.BARS_Y), Map.entry("anchorage-y", Item.BARS_Y),
            Map.entry("shear-x", Item.SHEAR_X), Map.entry("shear-y", Item.SHEAR_Y),
            Map.entry("punching-face", Item.COLUMN), Map.entry("node-column", Item.COLUMN),
            Map.entry("anchorage-starters", Item.COLUMN),
            Map.entry("punching-perimeter", Item.PERIMETER),
            Map.entry("cover", Item.COVER));

    /**
     * One failing check and what it marks.
     *
     * @param piles the 0-based piles it marks (empty unless the item is a set of piles)
     */
    record Mark(String tag, String checkId, String checkTitle, Item item, List<Integer> piles,
                List<String> findingIds) {
    }

    private final List<Mark> marks;

    private DrawingMarks(List<Mark> marks) {
        this.marks = List.copyOf(marks);
    }

    static DrawingMarks of(ElementReview element, PileCapDrawing drawing) {
        List<Mark> marks = new ArrayList<>();
        for (CheckResult check : element.checks()) {
            if (check.status() != CheckStatus.FAIL) {
                continue;
            }
            Item item = ITEM_OF_CHECK.getOrDefault(check.id(), Item.NOT_DRAWN);
            List<Integer> piles = switch (item) {
                case OVERLOADED_PILES -> piles(drawing, drawing.cap().piles().compressionKn(), false);
                case MOST_LOADED_PILES -> piles(drawing, largest(drawing), true);
                default -> List.of();
            };
            if ((item == Item.OVERLOADED_PILES || item == Item.MOST_LOADED_PILES) && piles.isEmpty()) {
                item = Item.NOT_DRAWN;
            }
            List<String> findings = element.findings().stream().filter(f -> f.check().equals(check.id()))
                    .map(Finding::id).toList();
            marks.add(new Mark("F" + (marks.size() + 1), check.id(), check.title(), item, piles, findings));
        }
        return new DrawingMarks(marks);
    }

    private static double largest(PileCapDrawing drawing) {
        return drawing.pileReactionsKn().stream().mapToDouble(Double::doubleValue).max().orElse(0);
    }

    /** Piles whose reaction exceeds {@code limitKn} (or equals it, when {@code orEqual}). */
    private static List<Integer> piles(PileCapDrawing drawing, double limitKn, boolean orEqual) {
        List<Double> reactions = drawing.pileReactionsKn();
        return IntStream.range(0, reactions.size())
                .filter(i -> reactions.get(i) > limitKn || (orEqual && reactions.get(i) == limitKn))
                .boxed().toList();
    }

    List<Mark> all() {
        return marks;
    }

    /** The tags of the failing checks that mark {@code item}, e.g. "F1 F3"; empty when none. */
    String tags(Item item) {
        return String.join(" ", marks.stream().filter(m -> m.item() == item).map(Mark::tag).toList());
    }

    /** The tags that mark pile {@code index} (0-based). */
    String pileTags(int index) {
        return String.join(" ", marks.stream().filter(m -> m.piles().contains(index)).map(Mark::tag).toList());
    }
}
