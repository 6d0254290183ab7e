package dev.countercheck.submission;

import dev.countercheck.input.Node;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Shown;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.input.Suggestions;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * Binds the tree of a whole file: the format version, project, basis and default materials, then
 * each element by its type. Element ids are unique, at most 64 characters, made of letters, digits,
 * '.', '_' and '-' (they become part of finding ids such as {@code PC-C4/anchorage-x/1}).
 */
final class SubmissionBinder {

    /** The format version this reader understands. */
    static final int FORMAT_VERSION = 1;

    private static final List<String> KEYS = List.of("countercheck", "project", "basis", "materials", "elements");
    private static final List<String> PROJECT_KEYS = List.of("title", "reference", "revision", "prepared_by", "date");
    private static final List<String> BASIS_KEYS = List.of("ruleset");
    private static final int ID_MAX_CHARS = 64;
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0," + (ID_MAX_CHARS - 1) + "}");

    private final Values values;
    private final MaterialsBinder materialsBinder;
    private final Map<String, ElementBinder> binders = new LinkedHashMap<>();

    /** @param binders the binder of each element type, in the order the types are listed to the user */
    SubmissionBinder(Values values, List<ElementBinder> binders) {
        this.values = values;
        this.materialsBinder = new MaterialsBinder(values);
        binders.forEach(b -> this.binders.put(b.type(), b));
    }

    Optional<Submission> bind(Node root, String sha256) {
        return Fields.of(root, "", values, KEYS).flatMap(f -> {
            if (!f.has("countercheck")) {
                values.problems().add(f.location(), "countercheck", "missing required key 'countercheck', the format"
                        + " version: a submission starts with 'countercheck: " + FORMAT_VERSION + "'");
            }
            f.get("countercheck").flatMap(n -> values.wholeNumber(n, "countercheck")).ifPresent(v -> {
                if (v != FORMAT_VERSION) {
                    values.error(f.get("countercheck").orElseThrow(), "countercheck", "unsupported format version "
                            + v + ": this version of countercheck reads format version " + FORMAT_VERSION);
                }
            });
            Project project = f.fields("project", PROJECT_KEYS).map(this::project).orElse(Project.empty());
            Optional<Fields> basis = f.fields("basis", BASIS_KEYS);
            Optional<String> ruleset = basis.flatMap(b -> b.text("ruleset"));
            Optional<SourceLocation> rulesetAt = basis.flatMap(b -> b.get("ruleset")).map(Node::location);
            MaterialsBinder.Draft materials = f.fields("materials", MaterialsBinder.KEYS)
                    .map(materialsBinder::read).orElse(MaterialsBinder.Draft.NONE);
            Optional<List<ElementInput>> elements = f.require("elements", "a list of the elements to review")
                    .flatMap(n -> values.nonEmptyList(n, "elements", Limits.ELEMENTS, "elements", "element"))
                    .flatMap(items -> elements(items, materials));
            return values.problems().any() ? Optional.empty() : elements.map(e ->
                    new Submission(values.problems().file(), sha256, project, ruleset, rulesetAt, e));
        });
    }

    private Project project(Fields f) {
        return new Project(f.text("title"), f.text("reference"), f.text("revision"), f.text("prepared_by"),
                f.text("date"));
    }

    private Optional<List<ElementInput>> elements(List<Node> items, MaterialsBinder.Draft materials) {
        Map<String, SourceLocation> ids = new HashMap<>();
        return values.each(items, "elements", (item, path) -> element(item, path, materials, ids));
    }

    private Optional<ElementInput> element(Node node, String path, MaterialsBinder.Draft materials,
                                           Map<String, SourceLocation> ids) {
        Optional<MapNode> map = values.map(node, path);
        if (map.isEmpty()) {
            return Optional.empty();
        }
        Optional<String> id = entry(map.get(), "id", path).flatMap(n -> id(n, Values.join(path, "id"), ids));
        Optional<String> type = entry(map.get(), "type", path).flatMap(n -> type(n, Values.join(path, "type")));
        if (type.isEmpty()) {
            return Optional.empty();
        }
        ElementBinder binder = binders.get(type.get());
        return Fields.of(node, path, values, binder.keys()).flatMap(f -> id.flatMap(i ->
                binder.read(values, materialsBinder, f, i, f.text("description").orElse(""), materials)));
    }

    /** A required entry of an element, read before the element's type (and so its keys) is known. */
    private Optional<Node> entry(MapNode map, String key, String path) {
        Optional<Node> node = map.entry(key).map(Node.Entry::value);
        if (node.isEmpty()) {
            values.problems().add(map.location(), Values.join(path, key), "missing required key '" + key + "'");
        }
        return node;
    }

    private Optional<String> id(Node node, String path, Map<String, SourceLocation> ids) {
        return values.text(node, path).filter(id -> {
            if (!ID.matcher(id).matches()) {
                values.error(node, path, "element id '" + Shown.text(id) + "' may hold only letters, digits, '.', '_' and '-',"
                        + " must start with a letter or digit and be at most " + ID_MAX_CHARS + " characters long");
                return false;
            }
            SourceLocation first = ids.putIfAbsent(id, node.location());
            if (first != null) {
                values.error(node, path, "duplicate element id '" + Shown.text(id) + "': already used at line " + first.line());
            }
            return first == null;
        });
    }

    private Optional<String> type(Node node, String path) {
        return values.text(node, path).filter(type -> {
            List<String> supported = List.copyOf(binders.keySet());
            if (!supported.contains(type)) {
                values.error(node, path, "unknown element type '" + Shown.text(type) + "'"
                        + Suggestions.nearest(type, supported).map(t -> "; did you mean '" + t + "'?").orElse("")
                        + "; supported types: " + String.join(", ", supported));
            }
            return supported.contains(type);
        });
    }
}
