package dev.countercheck.ruleset;

import dev.countercheck.input.Node;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Node.ListNode;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Problems;
import dev.countercheck.input.Shown;
import dev.countercheck.input.Suggestions;
import dev.countercheck.ruleset.CheckDef.DerivedDef;
import dev.countercheck.ruleset.CheckDef.RequirementDef;
import dev.countercheck.ruleset.CheckDef.Variant;
import dev.countercheck.ruleset.CheckDef.Words;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Reads the {@code tables:} and {@code checks:} blocks of one ruleset file into definitions. */
final class RuleDefinitions {

    private static final List<String> TABLE_KEYS = List.of("symbol", "unit", "clause", "note", "interpolate",
            "several", "columns", "rows", "beyond", "source");
    private static final List<String> CHECK_KEYS = List.of("applies_to", "scope", "applies_when", "not_applicable", "derived",
            "values", "requirements", "cautions", "for");
    private static final List<String> VARIANT_KEYS = List.of("derived", "requirements");
    private static final List<String> VARIANT_DERIVED_KEYS = List.of("formula", "clause");
    private static final List<String> VARIANT_REQUIREMENT_KEYS = List.of("message", "clause");
    private static final List<String> CAUTION_KEYS = List.of("when", "text");
    private static final List<String> DERIVED_KEYS = List.of("symbol", "formula", "unit", "clause");
    private static final List<String> REQUIREMENT_KEYS = List.of("that", "finding", "severity", "utilisation",
            "message", "clause");
    private static final Pattern FIRST_NAME = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");

    private final Problems problems;
    private final String origin;

    RuleDefinitions(Problems problems, String origin) {
        this.problems = problems;
        this.origin = origin;
    }

    void readTables(Node node, Map<String, TableDef> into) {
        for (Entry e : mapping(node, "tables").map(MapNode::entries).orElse(List.of())) {
            String path = "tables." + e.key();
            Optional<MapNode> map = mapping(e.value(), path);
            if (map.isEmpty()) {
                continue;
            }
            MapNode t = map.get();
            unknownKeys(t, path, TABLE_KEYS);
            List<String> columns = texts(t.entry("columns").map(Entry::value), path + ".columns");
            Map<String, List<Optional<Double>>> rows = new LinkedHashMap<>();
            for (Entry row : t.entry("rows").flatMap(r -> mapping(r.value(), path + ".rows")).map(MapNode::entries)
                    .orElse(List.of())) {
                List<Optional<Double>> cells = cells(row.value(), path + ".rows." + row.key());
                if (cells.size() != columns.size()) {
                    problems.add(row.value().location(), path + ".rows." + row.key(), "row '" + row.key() + "' has "
                            + cells.size() + " values for " + columns.size() + " columns");
                }
                rows.put(row.key(), cells);
            }
            boolean interpolate = t.entry("interpolate").map(i -> i.value() instanceof ScalarNode s
                    && "true".equals(s.text())).orElse(false);
            if (interpolate) {
                rows.keySet().stream().filter(k -> !TableDef.isNumber(k)).forEach(k -> problems.add(t.location(), path,
                        "an interpolated table needs numbers as row keys, not '" + k + "'"));
            }
            String several = text(t, "several").orElse("largest");
            if (!List.of("largest", "least").contains(several)) {
                problems.add(t.entry("several").get().value().location(), path + ".several",
                        "expected 'largest' or 'least'");
            }
            if (columns.isEmpty() || rows.isEmpty()) {
                problems.add(t.location(), path, "a table needs columns and rows");
            }
            into.put(e.key(), new TableDef(e.key(), text(t, "symbol").orElse(e.key()), required(t, "unit", path),
                    required(t, "clause", path), text(t, "note").orElse(""), origin, interpolate,
                    "least".equals(several) ? TableDef.Several.LEAST : TableDef.Several.LARGEST, columns, rows,
                    beyond(t, path), RulesetLoader.source(t, path, problems)));
        }
    }

    /** The optional {@code beyond} value of a table: a number. */
    private Optional<Double> beyond(MapNode t, String path) {
        Optional<String> value = text(t, "beyond");
        if (value.isPresent() && !TableDef.isNumber(value.get())) {
            problems.add(t.entry("beyond").get().value().location(), path + ".beyond", "expected a number");
            return Optional.empty();
        }
        return value.map(Double::parseDouble);
    }

    void readChecks(Node node, Map<String, CheckDef> into) {
        for (Entry e : mapping(node, "checks").map(MapNode::entries).orElse(List.of())) {
            String path = "checks." + e.key();
            Optional<MapNode> map = mapping(e.value(), path);
            if (map.isEmpty()) {
                continue;
            }
            MapNode c = map.get();
            unknownKeys(c, path, CHECK_KEYS);
            List<DerivedDef> derived = new ArrayList<>();
            for (Entry d : entries(c, "derived", path)) {
                String dPath = path + ".derived." + d.key();
                mapping(d.value(), dPath).ifPresent(m -> {
                    unknownKeys(m, dPath, DERIVED_KEYS);
                    derived.add(new DerivedDef(d.key(), text(m, "symbol").orElse(d.key()), expression(m, "formula", dPath),
                            required(m, "unit", dPath), required(m, "clause", dPath), d.keyLocation()));
                });
            }
            List<RequirementDef> requirements = new ArrayList<>();
            Optional<Node> reqs = c.entry("requirements").map(Entry::value);
            if (reqs.isPresent() && reqs.get() instanceof ListNode list) {
                for (int i = 0; i < list.items().size(); i++) {
                    String rPath = path + ".requirements[" + i + "]";
                    mapping(list.items().get(i), rPath).ifPresent(m -> {
                        unknownKeys(m, rPath, REQUIREMENT_KEYS);
                        String that = expression(m, "that", rPath);
                        requirements.add(new RequirementDef(that, text(m, "finding").orElseGet(() -> firstName(that)),
                                required(m, "severity", rPath), optionalExpression(m, "utilisation", rPath),
                                required(m, "message", rPath), required(m, "clause", rPath), m.location()));
                    });
                }
            } else if (reqs.isPresent()) {
                problems.add(reqs.get().location(), path + ".requirements", "expected a list of requirements");
            }
            List<CheckDef.CautionDef> cautions = new ArrayList<>();
            Optional<Node> cautionNodes = c.entry("cautions").map(Entry::value);
            if (cautionNodes.isPresent() && cautionNodes.get() instanceof ListNode list) {
                for (int i = 0; i < list.items().size(); i++) {
                    String cPath = path + ".cautions[" + i + "]";
                    mapping(list.items().get(i), cPath).ifPresent(m -> {
                        unknownKeys(m, cPath, CAUTION_KEYS);
                        cautions.add(new CheckDef.CautionDef(expression(m, "when", cPath), required(m, "text", cPath),
                                m.location()));
                    });
                }
            } else if (cautionNodes.isPresent()) {
                problems.add(cautionNodes.get().location(), path + ".cautions", "expected a list of cautions");
            }
            List<String> types = texts(c.entry("applies_to").map(Entry::value), path + ".applies_to");
            if (c.entry("applies_to").isEmpty()) {
                problems.add(c.location(), path, "'applies_to' is missing: every check names the element types it"
                        + " applies to, e.g. [pile-cap]");
            }
            into.put(e.key(), new CheckDef(e.key(), types, required(c, "scope", path),
                    optionalExpression(c, "applies_when", path),
                    text(c, "not_applicable").orElse("the rule's applies_when condition is false"), derived,
                    texts(c.entry("values").map(Entry::value), path + ".values"), requirements, cautions,
                    variants(c, path, types, derived, requirements), origin, e.keyLocation()));
        }
    }

    /**
     * The {@code for:} block of a check: for an element type it applies to, the derived quantities (formula,
     * clause) and the requirements (message, clause; by finding) that the type states otherwise.
     */
    private Map<String, Variant> variants(MapNode c, String path, List<String> types, List<DerivedDef> derived,
                                          List<RequirementDef> requirements) {
        Map<String, Variant> variants = new LinkedHashMap<>();
        for (Entry t : entries(c, "for", path)) {
            String tPath = path + ".for." + t.key();
            if (!types.contains(t.key())) {
                problems.add(t.keyLocation(), tPath, "'" + Shown.text(t.key()) + "' is not a type the check applies"
                        + " to (" + String.join(", ", types) + ")" + Suggestions.hint(t.key(), types));
                continue;
            }
            Optional<MapNode> variant = mapping(t.value(), tPath);
            if (variant.isEmpty()) {
                continue;
            }
            unknownKeys(variant.get(), tPath, VARIANT_KEYS);
            Map<String, DerivedDef> restated = new LinkedHashMap<>();
            for (Entry d : entries(variant.get(), "derived", tPath)) {
                String dPath = tPath + ".derived." + d.key();
                Optional<DerivedDef> own = derived.stream().filter(x -> x.name().equals(d.key())).findFirst();
                if (own.isEmpty()) {
                    problems.add(d.keyLocation(), dPath, "the check derives no '" + Shown.text(d.key()) + "' to restate"
                            + Suggestions.hint(d.key(), derived.stream().map(DerivedDef::name).toList()));
                    continue;
                }
                mapping(d.value(), dPath).ifPresent(m -> {
                    unknownKeys(m, dPath, VARIANT_DERIVED_KEYS);
                    restateOne(m, dPath, "its formula, its clause or both");
                    restated.put(d.key(), new DerivedDef(d.key(), own.get().symbol(),
                            optionalExpression(m, "formula", dPath).orElse(own.get().formula()), own.get().unit(),
                            text(m, "clause").orElse(own.get().clause()), d.keyLocation()));
                });
            }
            Map<String, Words> words = new LinkedHashMap<>();
            List<String> findings = requirements.stream().map(RequirementDef::finding).toList();
            for (Entry f : entries(variant.get(), "requirements", tPath)) {
                String fPath = tPath + ".requirements." + f.key();
                if (!findings.contains(f.key())) {
                    problems.add(f.keyLocation(), fPath, "no requirement of the check raises finding '"
                            + Shown.text(f.key()) + "'" + Suggestions.hint(f.key(), findings));
                    continue;
                }
                mapping(f.value(), fPath).ifPresent(m -> {
                    unknownKeys(m, fPath, VARIANT_REQUIREMENT_KEYS);
                    restateOne(m, fPath, "its message, its clause or both");
                    words.put(f.key(), new Words(text(m, "message"), text(m, "clause"),
                            m.entry("message").map(x -> x.value().location()).orElse(m.location())));
                });
            }
            variants.put(t.key(), new Variant(restated, words));
        }
        return variants;
    }

    /** Reports a restatement of a variant ({@code for:}) that restates nothing: it gives {@code what}. */
    private void restateOne(MapNode m, String path, String what) {
        if (m.entries().stream().noneMatch(e -> text(m, e.key()).isPresent())) {
            problems.add(m.location(), path, "a restatement gives " + what);
        }
    }

    /** The entries of the mapping {@code key} of {@code map}; none when it is absent or not a mapping (reported). */
    private List<Entry> entries(MapNode map, String key, String path) {
        return map.entry(key).flatMap(x -> mapping(x.value(), path + "." + key)).map(MapNode::entries)
                .orElse(List.of());
    }

    private Optional<MapNode> mapping(Node node, String path) {
        if (node instanceof MapNode m) {
            return Optional.of(m);
        }
        problems.add(node.location(), path, "expected a mapping, found " + node.describe());
        return Optional.empty();
    }

    private void unknownKeys(MapNode map, String path, List<String> known) {
        for (Entry e : map.entries()) {
            if (!known.contains(e.key())) {
                problems.add(e.keyLocation(), path + "." + e.key(), "unknown key '" + Shown.text(e.key()) + "'"
                        + Suggestions.hint(e.key(), known));
            }
        }
    }

    private static Optional<String> text(MapNode map, String key) {
        return map.entry(key).map(Entry::value).filter(v -> v instanceof ScalarNode s
                && s.kind() != ScalarNode.Kind.NULL).map(v -> ((ScalarNode) v).text());
    }

    private String required(MapNode map, String key, String path) {
        Optional<String> value = text(map, key);
        if (value.isEmpty()) {
            problems.add(map.location(), path, "'" + key + "' is missing"
                    + ("clause".equals(key) ? ": every rule names the clause it rests on" : ""));
        }
        return value.orElse("");
    }

    /** A required expression, refused at its place when it exceeds {@link ExpressionBounds}. */
    private String expression(MapNode map, String key, String path) {
        String text = required(map, key, path);
        bounded(map, key, path);
        return text;
    }

    private Optional<String> optionalExpression(MapNode map, String key, String path) {
        bounded(map, key, path);
        return text(map, key);
    }

    private void bounded(MapNode map, String key, String path) {
        map.entry(key).ifPresent(e -> text(map, key).flatMap(ExpressionBounds::problem)
                .ifPresent(why -> problems.add(e.value().location(), path + "." + key, why)));
    }

    private List<String> texts(Optional<Node> node, String path) {
        List<String> out = new ArrayList<>();
        if (node.isEmpty()) {
            return out;
        }
        if (!(node.get() instanceof ListNode list)) {
            problems.add(node.get().location(), path, "expected a list");
            return out;
        }
        for (Node item : list.items()) {
            if (item instanceof ScalarNode s && s.kind() != ScalarNode.Kind.NULL) {
                out.add(s.text());
            } else {
                problems.add(item.location(), path, "expected a name or a number, found " + item.describe());
            }
        }
        return out;
    }

    private List<Optional<Double>> cells(Node node, String path) {
        List<Optional<Double>> out = new ArrayList<>();
        if (!(node instanceof ListNode list)) {
            problems.add(node.location(), path, "expected a list of values");
            return out;
        }
        for (Node item : list.items()) {
            if (item instanceof ScalarNode s && s.kind() == ScalarNode.Kind.NUMBER) {
                out.add(Optional.of(Double.parseDouble(s.text())));
            } else if (item instanceof ScalarNode s && (s.kind() == ScalarNode.Kind.NULL || "-".equals(s.text()))) {
                out.add(Optional.empty());
            } else {
                problems.add(item.location(), path, "expected a number, or null where the table has no value");
                out.add(Optional.empty());
            }
        }
        return out;
    }


    /** The default finding name of a requirement: the first name its condition tests, hyphenated. */
    private static String firstName(String that) {
        Matcher m = FIRST_NAME.matcher(that);
        return m.find() ? m.group().toLowerCase(Locale.ROOT).replace('_', '-') : "requirement";
    }
}
