package dev.countercheck.submission;

import dev.countercheck.input.KeyPath;
import dev.countercheck.input.Node;
import dev.countercheck.input.Shown;
import dev.countercheck.submission.ActionCase.Kind;
import dev.countercheck.submission.Values.Bound;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Reads the {@code actions:} list of an element: named action cases at the top of the element. */
final class ActionsBinder {

    private static final List<String> KEYS = List.of("name", "kind", "N", "Mx", "My", "Hx", "Hy");
    private static final Map<String, Kind> KINDS = Values.options(Kind.values());

    private final Values values;

    ActionsBinder(Values values) {
        this.values = values;
    }

    /** The action cases, possibly none; names must be unique within the element. */
    Optional<List<ActionCase>> read(Node node, String path) {
        Optional<List<ActionCase>> cases = values.list(node, path, Limits.ACTION_CASES, "action cases").flatMap(items -> values.each(items, path,
                (item, itemPath) -> Fields.of(item, itemPath, values, KEYS).flatMap(this::actionCase)));
        cases.ifPresent(c -> checkNamesUnique(c, path));
        return cases;
    }

    /**
     * The items every check needs that an element with {@code required} keys does not give: each missing key, and
     * actions with a ULS case unless characteristic loads stand for them.
     */
    static List<String> missing(Fields f, List<String> required, Optional<List<ActionCase>> actions,
                                Optional<List<CharacteristicLoad>> loads) {
        List<String> missing = new ArrayList<>();
        for (String key : required) {
            if (!f.has(key)) {
                missing.add(key);
            }
        }
        if (loads.map(l -> !l.isEmpty()).orElse(false)) {
            return missing;
        }
        if (!f.has("actions") || actions.map(List::isEmpty).orElse(false)) {
            missing.add("actions");
        } else if (actions.isPresent() && actions.get().stream().noneMatch(a -> a.kind() == Kind.ULS)) {
            missing.add("a ULS action case (kind: uls)");
        }
        return missing;
    }

    private Optional<ActionCase> actionCase(Fields f) {
        Optional<String> name = f.requiredText("name");
        Optional<Kind> kind = f.requiredChoice("kind", KINDS);
        Optional<Double> n = f.requiredQuantity("N", Dimension.FORCE, Bound.ANY);
        Optional<Double> mx = f.quantity("Mx", Dimension.MOMENT, Bound.ANY, 0);
        Optional<Double> my = f.quantity("My", Dimension.MOMENT, Bound.ANY, 0);
        Optional<Double> hx = f.quantity("Hx", Dimension.FORCE, Bound.ANY, 0);
        Optional<Double> hy = f.quantity("Hy", Dimension.FORCE, Bound.ANY, 0);
        if (name.isEmpty() || kind.isEmpty() || n.isEmpty() || mx.isEmpty() || my.isEmpty() || hx.isEmpty()
                || hy.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new ActionCase(name.get(), kind.get(), n.get(), mx.get(), my.get(), hx.get(), hy.get(),
                f.location()));
    }

    private void checkNamesUnique(List<ActionCase> cases, String path) {
        Map<String, ActionCase> seen = new HashMap<>();
        for (int i = 0; i < cases.size(); i++) {
            ActionCase c = cases.get(i);
            ActionCase first = seen.putIfAbsent(c.name(), c);
            if (first != null) {
                values.problems().add(c.location(), Values.join(KeyPath.item(path, i), "name"), "duplicate action case name '"
                        + Shown.text(c.name())
                        + "': already used at line " + first.location().line());
            }
        }
    }
}
