package dev.countercheck.ruleset;

import dev.countercheck.input.InputError;
import dev.countercheck.input.Node;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Problems;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.input.Suggestions;
import dev.countercheck.input.TreeParser;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Reads a ruleset and everything it {@code extends}, validating it completely before any review:
 * unknown keys, missing fields, non-numeric values, an {@code extends} that does not resolve or
 * loops, an override of a parameter the parent does not have, and any parameter the engine needs
 * but the chain does not define. Every error carries file, line and column.
 *
 * <p>A reference that ends in {@code .yaml}/{@code .yml} or contains a path separator is a path;
 * otherwise it is an id, looked up as {@code <id>.yaml} in the local rulesets folder first, then
 * among the rulesets bundled with the tool.
 */
public final class RulesetLoader {

    private static final List<String> TOP_KEYS = List.of("ruleset", "id", "extends", "title", "standard", "version",
            "parameters", "tables", "checks");
    private static final List<String> PARAMETER_KEYS = List.of("symbol", "value", "unit", "clause", "note");

    /** A ruleset is a short text file; anything larger is refused before it is read. */
    private static final long MAX_FILE_BYTES = 1024 * 1024;

    private final Path localFolder;
    private final RuleVocabulary vocabulary;

    /**
     * @param localFolder where ids are looked up first (normally {@code ./rulesets})
     * @param vocabulary  what the engine offers the rules and the parameters it reads itself
     */
    public RulesetLoader(Path localFolder, RuleVocabulary vocabulary) {
        this.localFolder = localFolder;
        this.vocabulary = vocabulary;
    }

    /** One file of a chain, parsed. */
    private record RulesetFile(String name, byte[] bytes, MapNode root, Problems problems) {
    }

    public Ruleset load(String reference) throws RulesetException {
        return load(reference, Optional.empty());
    }

    /**
     * @param referencedAt where the reference was written (a submission's {@code basis.ruleset}), so that an
     *                     error about it points there; empty for a reference given on the command line
     */
    public Ruleset load(String reference, Optional<SourceLocation> referencedAt) throws RulesetException {
        List<RulesetFile> chain = new ArrayList<>();
        List<InputError> errors = new ArrayList<>();
        Optional<RulesetFile> current = open(reference, referencedAt, errors);
        while (current.isPresent()) {
            RulesetFile file = current.get();
            if (chain.stream().anyMatch(f -> f.name().equals(file.name()))) {
                errors.add(new InputError(file.root().location(), "extends",
                        "the extends chain loops back to " + file.name()));
                break;
            }
            chain.add(0, file);
            Optional<Entry> parent = file.root().entry("extends");
            if (parent.isEmpty()) {
                break;
            }
            current = open(text(parent.get().value(), file.problems(), "extends"),
                    Optional.of(parent.get().value().location()), errors);
        }
        if (!errors.isEmpty()) {
            throw new RulesetException(errors);
        }
        return resolve(chain);
    }

    private Ruleset resolve(List<RulesetFile> chain) throws RulesetException {
        Map<String, Parameter> parameters = new LinkedHashMap<>();
        Map<String, TableDef> tables = new LinkedHashMap<>();
        Map<String, CheckDef> checks = new LinkedHashMap<>();
        List<InputError> errors = new ArrayList<>();
        for (int i = 0; i < chain.size(); i++) {
            RulesetFile file = chain.get(i);
            Problems problems = file.problems();
            checkTop(file);
            boolean base = i == 0;
            Optional<Entry> params = file.root().entry("parameters");
            if (params.isPresent() && params.get().value() instanceof MapNode map) {
                for (Entry e : map.entries()) {
                    readParameter(e, file.name(), base, parameters, problems);
                }
            } else if (params.isPresent()) {
                problems.add(params.get().value().location(), "parameters",
                        "expected a mapping of parameter names to their values");
            }
            RuleDefinitions definitions = new RuleDefinitions(problems, file.name());
            file.root().entry("tables").ifPresent(t -> definitions.readTables(t.value(), tables));
            file.root().entry("checks").ifPresent(c -> definitions.readChecks(c.value(), checks));
            errors.addAll(problems.sorted());
        }
        RulesetFile top = chain.get(chain.size() - 1);
        List<String> missing = vocabulary.requiredParameters().stream().filter(n -> !parameters.containsKey(n)).sorted().toList();
        if (!missing.isEmpty()) {
            errors.add(new InputError(top.root().location(), "parameters", "the ruleset chain does not define "
                    + String.join(", ", missing) + ", which the review needs"));
        }
        if (!errors.isEmpty()) {
            throw new RulesetException(errors);
        }
        RuleExpressions expressions = new RuleExpressions(tables);
        RuleValidator validator = new RuleValidator(vocabulary, parameters, expressions);
        Map<String, CheckDef> validated = validator.validate(checks);
        if (!validator.errors().isEmpty()) {
            throw new RulesetException(validator.errors());
        }
        MapNode root = top.root();
        return new Ruleset(optionalText(root, "id").orElse(top.name()), optionalText(root, "title").orElse(""),
                optionalText(root, "standard").orElse(""), optionalText(root, "version").orElse(""), hash(chain),
                chain.stream().map(RulesetFile::name).toList(), Collections.unmodifiableMap(parameters),
                Collections.unmodifiableMap(tables), Collections.unmodifiableMap(validated), validator.rules(),
                expressions);
    }

    private void checkTop(RulesetFile file) {
        Problems problems = file.problems();
        for (Entry e : file.root().entries()) {
            if (!TOP_KEYS.contains(e.key())) {
                problems.add(e.keyLocation(), e.key(), "unknown key '" + e.key() + "'"
                        + Suggestions.hint(e.key(), TOP_KEYS));
            }
        }
        Optional<Entry> format = file.root().entry("ruleset");
        if (format.isEmpty() || !(format.get().value() instanceof ScalarNode s) || !"1".equals(s.text())) {
            problems.add(format.map(f -> f.value().location()).orElse(file.root().location()), "ruleset",
                    "a ruleset starts with 'ruleset: 1' (the format version)");
        }
        for (String key : List.of("id", "title")) {
            if (file.root().entry(key).isEmpty()) {
                problems.add(file.root().location(), key, "the ruleset has no '" + key + "'");
            }
        }
    }

    private static void readParameter(Entry e, String origin, boolean base, Map<String, Parameter> parameters,
                                      Problems problems) {
        String path = "parameters." + e.key();
        Parameter inherited = parameters.get(e.key());
        if (!base && inherited == null) {
            problems.add(e.keyLocation(), path, "'" + e.key() + "' is not a parameter of the ruleset this one extends"
                    + Suggestions.hint(e.key(), parameters.keySet()));
            return;
        }
        if (!(e.value() instanceof MapNode map)) {
            problems.add(e.value().location(), path, "expected a mapping with " + String.join(", ", PARAMETER_KEYS));
            return;
        }
        for (Entry f : map.entries()) {
            if (!PARAMETER_KEYS.contains(f.key())) {
                problems.add(f.keyLocation(), path + "." + f.key(), "unknown key '" + f.key() + "'"
                        + Suggestions.hint(f.key(), PARAMETER_KEYS));
            }
        }
        List<String> needed = base ? PARAMETER_KEYS : List.of("value", "clause");
        for (String key : needed) {
            if (map.entry(key).isEmpty()) {
                problems.add(map.location(), path, "'" + e.key() + "' has no '" + key + "'"
                        + (base ? "" : " (an override states its value and the clause that sets it)"));
            }
        }
        Optional<Double> value = map.entry("value").flatMap(v -> number(v.value(), problems, path + ".value"));
        if (value.isEmpty()) {
            return;
        }
        if (!base && map.entry("unit").isPresent()
                && !optionalText(map, "unit").orElse("").equals(inherited.unit())) {
            problems.add(map.entry("unit").get().value().location(), path + ".unit", "an override cannot change the"
                    + " unit of '" + e.key() + "' (" + inherited.unit() + ")");
        }
        parameters.put(e.key(), new Parameter(e.key(),
                optionalText(map, "symbol").orElse(base ? e.key() : inherited.symbol()), value.get(),
                optionalText(map, "unit").orElse(base ? "-" : inherited.unit()),
                optionalText(map, "clause").orElse(""),
                optionalText(map, "note").orElse(base ? "" : inherited.note()), origin));
    }

    private static Optional<Double> number(Node node, Problems problems, String path) {
        if (node instanceof ScalarNode s && s.kind() == ScalarNode.Kind.NUMBER) {
            try {
                double v = Double.parseDouble(s.text());
                if (Double.isFinite(v)) {
                    return Optional.of(v);
                }
            } catch (NumberFormatException ignored) {
                // reported below
            }
        }
        problems.add(node.location(), path, "expected a number, found " + node.describe());
        return Optional.empty();
    }

    private static String text(Node node, Problems problems, String path) {
        if (node instanceof ScalarNode s && s.kind() != ScalarNode.Kind.NULL) {
            return s.text();
        }
        problems.add(node.location(), path, "expected a ruleset id or path, found " + node.describe());
        return "";
    }

    private static Optional<String> optionalText(MapNode map, String key) {
        return map.entry(key).map(Entry::value).filter(v -> v instanceof ScalarNode s
                && s.kind() != ScalarNode.Kind.NULL).map(v -> ((ScalarNode) v).text());
    }

    /** Opens a ruleset by id or path; problems go into {@code errors} located at {@code referencedAt}. */
    private Optional<RulesetFile> open(String reference, Optional<SourceLocation> referencedAt,
                                       List<InputError> errors) {
        boolean isPath = reference.endsWith(".yaml") || reference.endsWith(".yml") || reference.contains("/")
                || reference.contains("\\");
        try {
            byte[] bytes;
            String name;
            if (isPath) {
                Path p = Path.of(reference);
                if (!Files.isRegularFile(p)) {
                    return notFound("no ruleset file " + reference, referencedAt, errors);
                }
                if (Files.size(p) > MAX_FILE_BYTES) {
                    return notFound(reference + " is larger than " + MAX_FILE_BYTES / 1024
                            + " KiB: not a ruleset", referencedAt, errors);
                }
                bytes = Files.readAllBytes(p);
                name = reference;
            } else {
                Path local = localFolder.resolve(reference + ".yaml");
                if (Files.isRegularFile(local)) {
                    bytes = Files.readAllBytes(local);
                    name = local.toString();
                } else {
                    try (InputStream in = RulesetLoader.class.getResourceAsStream("/rulesets/" + reference + ".yaml")) {
                        if (in == null || !reference.matches("[A-Za-z0-9._-]+")) {
                            return notFound("no ruleset with id '" + reference + "' in " + localFolder
                                    + " or among the bundled rulesets", referencedAt, errors);
                        }
                        bytes = in.readAllBytes();
                        name = "rulesets/" + reference + ".yaml (bundled)";
                    }
                }
            }
            Problems problems = new Problems(name);
            Optional<Node> root = new TreeParser(problems).parse(bytes, name.replace(" (bundled)", ""));
            if (root.isPresent() && !(root.get() instanceof MapNode)) {
                problems.add(root.get().location(), "", "a ruleset is a mapping that starts with 'ruleset: 1'");
            }
            if (problems.any()) {
                errors.addAll(problems.sorted());
                return Optional.empty();
            }
            return Optional.of(new RulesetFile(name, bytes, (MapNode) root.get(), problems));
        } catch (IOException e) {
            return notFound("cannot read ruleset " + reference + ": " + e.getMessage(), referencedAt, errors);
        }
    }

    private static Optional<RulesetFile> notFound(String message, Optional<SourceLocation> at, List<InputError> errors) {
        errors.add(new InputError(at.orElse(SourceLocation.unpositioned("--ruleset")), at.isPresent() ? "extends" : "",
                message));
        return Optional.empty();
    }

    private static String hash(List<RulesetFile> chain) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            chain.forEach(f -> sha.update(f.bytes()));
            return HexFormat.of().formatHex(sha.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

}
