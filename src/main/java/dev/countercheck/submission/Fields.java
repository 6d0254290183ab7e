package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Shown;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.input.Suggestions;
import dev.countercheck.submission.Values.Bound;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The keys of one mapping of the submission, checked against the keys that mapping may hold:
 * an unknown key is reported where it stands, with the nearest known key. Lookups of a required
 * key that is missing report it at the mapping; a key written without a value is reported too.
 */
final class Fields {

    private final MapNode map;
    private final String path;
    private final Values values;

    private Fields(MapNode map, String path, Values values) {
        this.map = map;
        this.path = path;
        this.values = values;
    }

    /** The fields of {@code node}, or empty (reported) when it is not a mapping. */
    static Optional<Fields> of(Node node, String path, Values values, List<String> known) {
        return values.map(node, path).map(map -> {
            for (Entry entry : map.entries()) {
                if (!known.contains(entry.key())) {
                    values.problems().add(entry.keyLocation(), Values.join(path, entry.key()),
                            "unknown key '" + Shown.text(entry.key()) + "'" + Suggestions.hint(entry.key(), known));
                }
            }
            return new Fields(map, path, values);
        });
    }

    SourceLocation location() {
        return map.location();
    }

    String path() {
        return path;
    }

    /** {@code path.key} */
    String path(String key) {
        return Values.join(path, key);
    }

    Values values() {
        return values;
    }

    boolean has(String key) {
        return map.entry(key).isPresent();
    }

    /** The value of an optional key; empty when the key is absent. A key without a value is reported. */
    Optional<Node> get(String key) {
        Optional<Node> node = map.entry(key).map(Entry::value);
        if (node.isPresent() && node.get() instanceof ScalarNode scalar && scalar.kind() == ScalarNode.Kind.NULL) {
            values.error(scalar, path(key), "no value given: give one or remove the key");
            return Optional.empty();
        }
        return node;
    }

    /** The value of a required key; a missing key is reported at this mapping. */
    Optional<Node> require(String key) {
        return require(key, "");
    }

    /** As {@link #require(String)}; the report of a missing key says what it takes ("a length in mm"). */
    Optional<Node> require(String key, String expected) {
        if (!has(key)) {
            values.problems().add(map.location(), path(key), "missing required key '" + key + "'"
                    + (expected.isEmpty() ? "" : ": give " + expected));
            return Optional.empty();
        }
        return get(key);
    }

    Optional<Double> quantity(String key, Dimension dimension, Bound bound) {
        return get(key).flatMap(n -> values.quantity(n, path(key), dimension, bound));
    }

    /** The quantity under an optional key; {@code fallback} when the key is absent. */
    Optional<Double> quantity(String key, Dimension dimension, Bound bound, double fallback) {
        return has(key) ? quantity(key, dimension, bound) : Optional.of(fallback);
    }

    Optional<Double> requiredQuantity(String key, Dimension dimension, Bound bound) {
        String unit = dimension == Dimension.NUMBER ? "" : " in " + dimension.defaultUnit();
        return require(key, dimension.noun() + unit).flatMap(n -> values.quantity(n, path(key), dimension, bound));
    }

    Optional<Integer> requiredCount(String key, int max, String what) {
        return require(key, "a whole number from 1 to " + max).flatMap(n -> values.count(n, path(key), max, what));
    }

    Optional<String> text(String key) {
        return get(key).flatMap(n -> values.text(n, path(key)));
    }

    Optional<String> requiredText(String key) {
        return require(key, "a text").flatMap(n -> values.text(n, path(key)));
    }

    /** The value of an optional choice; {@code fallback} when the key is absent. */
    <E> Optional<E> choice(String key, Map<String, E> options, E fallback) {
        return has(key) ? get(key).flatMap(n -> values.choice(n, path(key), key, options)) : Optional.of(fallback);
    }

    <E> Optional<E> requiredChoice(String key, Map<String, E> options) {
        return require(key, "one of " + String.join(", ", options.keySet()))
                .flatMap(n -> values.choice(n, path(key), key, options));
    }

    /** The fields of the mapping under {@code key}, when the key is present. */
    Optional<Fields> fields(String key, List<String> known) {
        return get(key).flatMap(n -> of(n, path(key), values, known));
    }

    Optional<Fields> requiredFields(String key, List<String> known) {
        return require(key, "a mapping of " + String.join(", ", known)).flatMap(n -> of(n, path(key), values, known));
    }
}
