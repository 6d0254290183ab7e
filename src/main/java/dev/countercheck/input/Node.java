package dev.countercheck.input;

import java.util.List;
import java.util.Optional;

/**
 * The parsed file before binding: mappings, lists and scalars, each knowing where it starts.
 * YAML and JSON give the same tree, so one binder serves both.
 */
public sealed interface Node permits Node.MapNode, Node.ListNode, Node.ScalarNode {

    public SourceLocation location();

    /** How the node reads in an error message: "a mapping", "a list", "the text 'abc'", ... */
    public String describe();

    /** One {@code key: value} of a mapping, with the key's own location. */
    record Entry(String key, SourceLocation keyLocation, Node value) {
    }

    record MapNode(SourceLocation location, List<Entry> entries) implements Node {

        public Optional<Entry> entry(String key) {
            return entries.stream().filter(e -> e.key().equals(key)).findFirst();
        }

        @Override
        public String describe() {
            return "a mapping";
        }
    }

    record ListNode(SourceLocation location, List<Node> items) implements Node {
        @Override
        public String describe() {
            return "a list";
        }
    }

    /** A scalar as written; {@code text} is the source text (numbers are converted later, by the binder). */
    record ScalarNode(SourceLocation location, Kind kind, String text) implements Node {

        public enum Kind { TEXT, NUMBER, BOOLEAN, NULL }

        @Override
        public String describe() {
            return switch (kind) {
                case TEXT -> "the text '" + Shown.text(text) + "'";
                case NUMBER -> "the number " + Shown.text(text);
                case BOOLEAN -> "the value " + Shown.text(text);
                case NULL -> "no value";
            };
        }
    }
}
