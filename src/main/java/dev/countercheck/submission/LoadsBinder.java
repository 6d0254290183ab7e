package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.submission.CharacteristicLoad.Source;
import dev.countercheck.submission.Values.Bound;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Reads the {@code loads:} list of an element of any type: characteristic actions by source, from which
 * the review generates the EN 1990 combinations. An element binder calls it with the node under its
 * {@code loads} key.
 */
final class LoadsBinder {

    /** The keys of one load. */
    static final List<String> KEYS = List.of("source", "category", "N", "Mx", "My", "Hx", "Hy", "reversible");
    /** The most loads of one element, of variable actions and of accidental actions among them (common practice). */
    static final int MAX_LOADS = 20;
    static final int MAX_VARIABLE = 5;
    static final int MAX_ACCIDENTAL = 2;
    private static final Map<String, Source> SOURCES = upper(Source.values());
    private static final Map<String, String> CATEGORIES = categories();

    private final Values values;

    LoadsBinder(Values values) {
        this.values = values;
    }

    /** The loads, possibly none; empty when an item has errors (they are in the problems). */
    Optional<List<CharacteristicLoad>> read(Node node, String path) {
        Optional<List<CharacteristicLoad>> loads = values.list(node, path, MAX_LOADS, "loads")
                .flatMap(items -> values.each(items, path,
                        (item, itemPath) -> Fields.of(item, itemPath, values, KEYS).flatMap(this::load)));
        loads.ifPresent(l -> {
            countAtMost(node, path, l, true, MAX_VARIABLE, "variable actions (Q, S, W, T)");
            countAtMost(node, path, l, false, MAX_ACCIDENTAL, "accidental actions (A)");
        });
        return loads;
    }

    private void countAtMost(Node node, String path, List<CharacteristicLoad> loads, boolean variable, int max,
                             String what) {
        long n = loads.stream().filter(l -> variable ? isVariable(l.source()) : l.source() == Source.A).count();
        if (n > max) {
            values.error(node, path, "the list holds " + n + " " + what + ", more than the " + max
                    + " an element may combine (each one doubles or triples the combinations): merge loads that act together");
        }
    }

    private static boolean isVariable(Source s) {
        return s == Source.Q || s == Source.S || s == Source.W || s == Source.T;
    }

    private Optional<CharacteristicLoad> load(Fields f) {
        Optional<Source> source = f.requiredChoice("source", SOURCES);
        Optional<Optional<String>> category = source.flatMap(s -> category(f, s));
        Optional<Double> n = f.quantity("N", Dimension.FORCE, Bound.ANY, 0);
        Optional<Double> mx = f.quantity("Mx", Dimension.MOMENT, Bound.ANY, 0);
        Optional<Double> my = f.quantity("My", Dimension.MOMENT, Bound.ANY, 0);
        Optional<Double> hx = f.quantity("Hx", Dimension.FORCE, Bound.ANY, 0);
        Optional<Double> hy = f.quantity("Hy", Dimension.FORCE, Bound.ANY, 0);
        Optional<Boolean> reversible = flag(f, "reversible");
        if (source.isEmpty() || category.isEmpty() || n.isEmpty() || mx.isEmpty() || my.isEmpty() || hx.isEmpty()
                || hy.isEmpty() || reversible.isEmpty()) {
            return Optional.empty();
        }
        if (n.get() == 0 && mx.get() == 0 && my.get() == 0 && hx.get() == 0 && hy.get() == 0) {
            values.problems().add(f.location(), f.path("N"), "the load gives no action: give at least one of N, Mx, My,"
                    + " Hx, Hy");
            return Optional.empty();
        }
        return Optional.of(new CharacteristicLoad(source.get(), category.get(), n.get(), mx.get(), my.get(), hx.get(),
                hy.get(), reversible.get(), f.location()));
    }

    /** The category of an imposed load (required, A to H); refused on other sources. */
    private Optional<Optional<String>> category(Fields f, Source source) {
        if (source == Source.Q) {
            return f.requiredChoice("category", CATEGORIES).map(Optional::of);
        }
        if (f.has("category")) {
            values.error(f.get("category").orElseThrow(), f.path("category"), "a category of use belongs to an"
                    + " imposed load (source: Q) only; remove it from this " + source + " load");
            return Optional.empty();
        }
        return Optional.of(Optional.empty());
    }

    /** An optional true/false under {@code key}; false when absent. */
    private Optional<Boolean> flag(Fields f, String key) {
        if (!f.has(key)) {
            return Optional.of(false);
        }
        return f.get(key).flatMap(node -> {
            if (node instanceof ScalarNode s && s.kind() == ScalarNode.Kind.BOOLEAN) {
                return Optional.of(Boolean.parseBoolean(s.text()));
            }
            values.error(node, f.path(key), "expected true or false, found " + node.describe());
            return Optional.empty();
        });
    }

    private static Map<String, Source> upper(Source[] sources) {
        Map<String, Source> m = new LinkedHashMap<>();
        for (Source s : sources) {
            m.put(s.name(), s);
        }
        return m;
    }

    private static Map<String, String> categories() {
        Map<String, String> m = new LinkedHashMap<>();
        for (char c = 'A'; c <= 'H'; c++) {
            m.put(String.valueOf(c), String.valueOf(c));
        }
        return m;
    }
}
