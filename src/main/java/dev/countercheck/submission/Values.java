package dev.countercheck.submission;

import dev.countercheck.input.KeyPath;
import dev.countercheck.input.Node;
import dev.countercheck.input.Node.ListNode;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Node.ScalarNode.Kind;
import dev.countercheck.input.Problems;
import dev.countercheck.eurocode.Num;
import dev.countercheck.input.Shown;
import dev.countercheck.input.Suggestions;
import dev.countercheck.input.TreeParser;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.BiFunction;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Converts tree nodes into values: quantities with units, whole numbers, text, choices, lists and
 * mappings. Each method either returns the value or reports a located problem and returns empty.
 */
final class Values {

    /** Which values a quantity may take. */
    enum Bound {
        ANY(""), POSITIVE("must be greater than zero"), NON_NEGATIVE("must not be negative");

        private final String rule;

        Bound(String rule) {
            this.rule = rule;
        }

        boolean admits(double value) {
            return switch (this) {
                case ANY -> true;
                case POSITIVE -> value > 0;
                case NON_NEGATIVE -> value >= 0;
            };
        }
    }

    private static final String DECIMAL = "[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?";
    private static final Pattern NUMBER = Pattern.compile(DECIMAL);
    private static final Pattern NUMBER_AND_UNIT = Pattern.compile("\\s*(" + DECIMAL + ")\\s*(\\S.*?)?\\s*");
    /** NaN or infinity as YAML or Java writes them, with or without a unit after. */
    private static final Pattern NOT_FINITE = Pattern.compile("\\s*[+-]?\\.?(?:nan|inf|infinity)\\b.*",
            Pattern.CASE_INSENSITIVE);

    private final Problems problems;

    Values(Problems problems) {
        this.problems = problems;
    }

    Problems problems() {
        return problems;
    }

    void error(Node at, String path, String message) {
        problems.add(at.location(), path, message);
    }

    /**
     * A quantity in the dimension's default unit: a number, or text with a unit ({@code "1.1 m"}),
     * which is converted.
     */
    Optional<Double> quantity(Node node, String path, Dimension dimension, Bound bound) {
        Optional<Double> value = node instanceof ScalarNode scalar
                ? switch (scalar.kind()) {
                    case NUMBER -> bareNumber(scalar, path);
                    case TEXT -> numberWithUnit(scalar, path, dimension);
                    default -> expectedQuantity(node, path, dimension);
                }
                : expectedQuantity(node, path, dimension);
        return value.filter(v -> finite(node, path, v)).filter(v -> plausible(node, path, v, dimension))
                .filter(v -> within(node, path, v, bound));
    }

    private Optional<Double> expectedQuantity(Node node, String path, Dimension dimension) {
        String example = dimension == Dimension.NUMBER ? ""
                : " (a number in " + dimension.defaultUnit() + ", or a number and a unit: " + dimension.unitList() + ")";
        error(node, path, "expected " + dimension.noun() + example + ", found " + node.describe());
        return Optional.empty();
    }

    private Optional<Double> bareNumber(ScalarNode scalar, String path) {
        if (NUMBER.matcher(scalar.text()).matches()) {
            return Optional.of(Double.parseDouble(scalar.text()));
        }
        error(scalar, path, NOT_FINITE.matcher(scalar.text()).matches()
                ? "'" + Shown.text(scalar.text()) + "' is not a finite number"
                : "'" + Shown.text(scalar.text()) + "' is not a decimal number");
        return Optional.empty();
    }

    private Optional<Double> numberWithUnit(ScalarNode scalar, String path, Dimension dimension) {
        String text = Shown.text(scalar.text());
        Matcher m = NUMBER_AND_UNIT.matcher(scalar.text());
        if (!m.matches()) {
            error(scalar, path, NOT_FINITE.matcher(text).matches()
                    ? "'" + text + "' is not a finite number"
                    : "'" + text + "' is not " + dimension.noun() + ": write a number"
                    + (dimension == Dimension.NUMBER ? "" : " in " + dimension.defaultUnit()
                    + ", or a number and a unit (" + dimension.unitList() + ")"));
            return Optional.empty();
        }
        if (m.group(1).length() > TreeParser.MAX_NUMBER_CHARS) {
            error(scalar, path, "reading limit exceeded: a number of " + m.group(1).length() + " characters, longer"
                    + " than the " + TreeParser.MAX_NUMBER_CHARS + " allowed");
            return Optional.empty();
        }
        double number = Double.parseDouble(m.group(1));
        String symbol = m.group(2);
        if (symbol == null) {
            return Optional.of(number);
        }
        Optional<Dimension.Unit> unit = dimension.unit(symbol);
        if (unit.isPresent()) {
            return Optional.of(number * unit.get().toDefault());
        }
        if (symbol.startsWith(",") || symbol.startsWith(".")) {
            error(scalar, path, "'" + text + "' is not a number: write it without separators, with '.' as the"
                    + " decimal mark (3400, 3.4)");
            return Optional.empty();
        }
        String expected = dimension == Dimension.NUMBER ? dimension.noun() + " without a unit is expected here"
                : dimension.noun() + " is expected here (" + dimension.unitList() + ")";
        String hint = Suggestions.nearest(symbol, dimension.units().stream().map(Dimension.Unit::symbol).toList())
                .map(u -> " (did you mean '" + u + "'?)").orElse("");
        error(scalar, path, Dimension.ofUnit(symbol)
                .map(other -> "'" + text + "' is " + other.noun() + ", but " + expected)
                .orElse("unknown unit '" + Shown.text(symbol) + "' in '" + text + "'" + hint + ": " + expected));
        return Optional.empty();
    }

    private boolean finite(Node node, String path, double value) {
        if (Double.isFinite(value)) {
            return true;
        }
        error(node, path, "the value is too large to be a finite number");
        return false;
    }

    /**
     * Within the magnitudes of a foundation review, both ways: a larger value, or one other than
     * zero that is smaller, is a slip of unit or of keyboard.
     */
    private boolean plausible(Node node, String path, double value, Dimension dimension) {
        boolean tooLarge = Math.abs(value) > dimension.limit();
        if (!tooLarge && (value == 0 || Math.abs(value) >= dimension.least())) {
            return true;
        }
        boolean bare = node instanceof ScalarNode scalar && scalar.kind() == Kind.NUMBER;
        String check = dimension == Dimension.NUMBER ? "check the number"
                : "check the number and its unit" + (bare ? " (a bare number is in " + dimension.defaultUnit() + ")" : "");
        error(node, path, tooLarge
                ? source(node) + " is too large for " + dimension.noun() + ": no value of a foundation review exceeds "
                        + dimension.limitText() + "; " + check
                : source(node) + " is too small for " + dimension.noun() + ": no value of a foundation review other"
                        + " than 0 is below " + Num.f(dimension.least()) + " " + dimension.defaultUnit() + "; " + check);
        return false;
    }

    private boolean within(Node node, String path, double value, Bound bound) {
        if (bound.admits(value)) {
            return true;
        }
        error(node, path, bound.rule + " (found " + source(node) + ")");
        return false;
    }

    /** A whole number (a count, a layer, the format version). */
    Optional<Integer> wholeNumber(Node node, String path) {
        if (node instanceof ScalarNode scalar && scalar.kind() == Kind.NUMBER
                && NUMBER.matcher(scalar.text()).matches()) {
            double value = Double.parseDouble(scalar.text());
            if (value == Math.rint(value) && Math.abs(value) <= Integer.MAX_VALUE) {
                return Optional.of((int) value);
            }
        }
        error(node, path, "expected a whole number, found " + node.describe());
        return Optional.empty();
    }

    /** A whole number from 1 to {@code max} (a count of bars). */
    Optional<Integer> count(Node node, String path, int max, String what) {
        return wholeNumber(node, path).filter(n -> within(node, path, n, Bound.POSITIVE)).filter(n -> {
            if (n > max) {
                error(node, path, n + " " + what + " is more than the " + max + " a submission may give");
            }
            return n <= max;
        });
    }

    /** Non-blank text; numbers and booleans are taken as written ({@code revision: 2}). */
    Optional<String> text(Node node, String path) {
        if (!(node instanceof ScalarNode scalar) || scalar.kind() == Kind.NULL) {
            error(node, path, "expected text, found " + node.describe());
            return Optional.empty();
        }
        if (scalar.text().isBlank()) {
            error(node, path, "must not be empty");
            return Optional.empty();
        }
        return Optional.of(scalar.text().strip());
    }

    /** One of the {@code options} keys, exactly as written there (the map keeps the order for messages). */
    <E> Optional<E> choice(Node node, String path, String what, Map<String, E> options) {
        return text(node, path).flatMap(text -> {
            E value = options.get(text);
            if (value == null) {
                error(node, path, "unknown " + what + " '" + Shown.text(text) + "'" + Suggestions.hint(text, options.keySet()));
            }
            return Optional.ofNullable(value);
        });
    }

    Optional<List<Node>> list(Node node, String path) {
        if (node instanceof ListNode list) {
            return Optional.of(list.items());
        }
        error(node, path, "expected a list, found " + node.describe());
        return Optional.empty();
    }

    /** A list of at most {@code maxItems} items; {@code what} names them in the plural ("pile positions"). */
    Optional<List<Node>> list(Node node, String path, int maxItems, String what) {
        return list(node, path).filter(items -> {
            if (items.size() > maxItems) {
                error(node, path, "the list holds " + items.size() + " " + what + ", more than the " + maxItems
                        + " a submission may give");
            }
            return items.size() <= maxItems;
        });
    }

    /** A list of 1 to {@code maxItems} items. */
    Optional<List<Node>> nonEmptyList(Node node, String path, int maxItems, String what, String one) {
        return list(node, path, maxItems, what).filter(items -> {
            if (items.isEmpty()) {
                error(node, path, "the list is empty: give at least one " + one);
            }
            return !items.isEmpty();
        });
    }

    /** A point {@code [x, y]} in mm. */
    Optional<Point> point(Node node, String path) {
        return lengths(node, path, 2, 2, Bound.ANY, "a position is [x, y]")
                .map(xy -> new Point(xy.get(0), xy.get(1)));
    }

    /** A list of {@code min..max} lengths, e.g. a column size {@code [cx, cy]} or {@code [D]}. */
    Optional<List<Double>> lengths(Node node, String path, int min, int max, Bound bound, String form) {
        return list(node, path).filter(items -> {
            int n = items.size();
            if (n < min || n > max) {
                error(node, path, form + ", found " + n + (n == 1 ? " value" : " values"));
            }
            return n >= min && n <= max;
        }).flatMap(items -> each(items, path, (item, itemPath) -> quantity(item, itemPath, Dimension.LENGTH, bound)));
    }

    /**
     * Reads every item of a list (so that every bad item is reported); the values when all were
     * read, else empty.
     */
    <T> Optional<List<T>> each(List<Node> items, String path, BiFunction<Node, String, Optional<T>> reader) {
        List<Optional<T>> read = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            read.add(reader.apply(items.get(i), KeyPath.item(path, i)));
        }
        return read.stream().allMatch(Optional::isPresent)
                ? Optional.of(read.stream().map(Optional::get).toList())
                : Optional.empty();
    }

    /** A finite number for a message: whole numbers without decimals, others to 0.1. */
    static String format(double value) {
        return BigDecimal.valueOf(value).setScale(1, RoundingMode.HALF_UP).stripTrailingZeros().toPlainString();
    }

    Optional<MapNode> map(Node node, String path) {
        if (node instanceof MapNode map) {
            return Optional.of(map);
        }
        error(node, path, "expected a mapping (key: value pairs), found " + node.describe());
        return Optional.empty();
    }

    /** The node as the user wrote it, for messages. */
    static String source(Node node) {
        return node instanceof ScalarNode scalar ? Shown.text(scalar.text()) : node.describe();
    }

    /** {@code path.key}, or {@code key} at the top of the file. */
    static String join(String path, String key) {
        return KeyPath.join(path, key);
    }

    /**
     * The spellings of an enum's constants in a submission, in declaration order: lower case with
     * dashes, {@code SLS_QUASI_PERMANENT → "sls-quasi-permanent"}.
     */
    static <E extends Enum<E>> Map<String, E> options(E[] constants) {
        Map<String, E> options = new LinkedHashMap<>();
        for (E constant : constants) {
            options.put(constant.name().toLowerCase(Locale.ROOT).replace('_', '-'), constant);
        }
        return options;
    }
}
