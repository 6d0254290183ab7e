package dev.countercheck.ruleset;

import dev.countercheck.input.InputError;
import dev.countercheck.input.Node;
import dev.countercheck.input.Node.Entry;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Problems;
import dev.countercheck.input.Shown;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.input.Suggestions;
import dev.countercheck.input.TreeParser;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;
import java.util.regex.Pattern;

/**
 * Reads a ruleset and everything it {@code extends}, validating it completely before any review:
 * unknown keys, missing fields, non-numeric values, an {@code extends} that does not resolve or
 * loops, an override of a parameter the parent does not have, and any parameter the engine needs
 * but the chain does not define. Every error carries file, line and column.
 *
 * <p>Where a ruleset comes from: a submission names one by id only; the checker may also give a
 * path on the command line. An id is looked up as {@code <id>.yaml} in the checker's rulesets folder
 * (when one is given), then among the rulesets bundled with the tool; a local file that replaces a
 * bundled ruleset with different content says so in its name, which the report shows. An {@code
 * extends} resolves against the file that says it: a path relative to that file's folder, an id in
 * that folder first, then among the bundled rulesets (a bundled ruleset extends bundled ones only).
 * A chain holds at most {@link #MAX_CHAIN} files.
 */
public final class RulesetLoader {

    private static final List<String> TOP_KEYS = List.of("ruleset", "id", "extends", "title", "standard", "version",
            "parameters", "options", "severities", "tables", "checks");
    private static final List<String> OPTION_KEYS = List.of("value", "clause", "note");
    private static final List<String> PARAMETER_KEYS = List.of("symbol", "value", "unit", "clause", "note", "source");
    /** The keys a parameter must state; an override states its value and clause. */
    private static final List<String> PARAMETER_NEEDED = List.of("symbol", "value", "unit", "clause", "note");
    private static final List<String> SEVERITY_KEYS = List.of("severity", "meaning");
    private static final List<String> SEVERITIES = List.of("critical", "major", "minor", "note");

    /** A ruleset is a short text file; anything larger is refused before it is read. */
    private static final long MAX_FILE_BYTES = 1024 * 1024;
    /**
     * The most files in an {@code extends} chain. The shipped chains have three (standard, annex,
     * house rules); a chain longer than this is a mistake or an attack (common practice).
     */
    public static final int MAX_CHAIN = 8;
    /** What a ruleset id may hold: no separator, so that an id never leads out of its folder. */
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,99}");
    private static final Pattern FORMAT_LINE = Pattern.compile("ruleset:\\s*1\\s*(#.*)?");
    /** The folder of a bundled file, which is not on disk: its parents are bundled rulesets too. */
    private static final Path BUNDLED = Path.of("(bundled)");
    /** Added to the name of a local ruleset file that replaces a bundled ruleset of the same id. */
    public static final String SHADOWS = " (in place of the bundled ruleset ";

    private final Optional<Path> localFolder;
    private final RuleVocabulary vocabulary;

    /**
     * @param localFolder the checker's rulesets folder, where ids are looked up before the bundled
     *                    rulesets; empty for the bundled rulesets only
     * @param vocabulary  what the engine offers the rules and the parameters it reads itself
     */
    public RulesetLoader(Optional<Path> localFolder, RuleVocabulary vocabulary) {
        this.localFolder = localFolder;
        this.vocabulary = vocabulary;
    }

    /** A loader that looks ids up in {@code localFolder} first, then among the bundled rulesets. */
    public RulesetLoader(Path localFolder, RuleVocabulary vocabulary) {
        this(Optional.of(localFolder), vocabulary);
    }

    /** One file of a chain, parsed; {@code folder} is where the files it extends are looked up. */
    private record RulesetFile(String name, byte[] bytes, MapNode root, Problems problems, Path folder) {
        RulesetFile named(String newName) {
            return new RulesetFile(newName, bytes, root, problems, folder);
        }
    }

    /** A ruleset named by the checker (the command line): an id, or the path of a ruleset file. */
    public Ruleset load(String reference) throws RulesetException {
        return load(reference, Optional.empty(), true);
    }

    /**
     * A ruleset named in a submission: by id only, so that a file sent by another firm cannot
     * make the review read a file of the checker's machine.
     *
     * @param referencedAt where the id was written, so that an error about it points there
     */
    public Ruleset loadId(String id, SourceLocation referencedAt) throws RulesetException {
        return load(id, Optional.of(referencedAt), false);
    }

    private Ruleset load(String reference, Optional<SourceLocation> referencedAt, boolean pathAllowed)
            throws RulesetException {
        List<RulesetFile> chain = new ArrayList<>();
        List<InputError> errors = new ArrayList<>();
        if (localFolder.isPresent() && !Files.isDirectory(localFolder.get())) {
            throw new RulesetException(List.of(new InputError(new SourceLocation("--rulesets-dir", 1, 1), "",
                    "the rulesets folder " + localFolder.get() + " is not a folder")));
        }
        Optional<RulesetFile> current = open(reference, referencedAt, Optional.empty(), pathAllowed, errors);
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
            if (chain.size() == MAX_CHAIN) {
                errors.add(new InputError(parent.get().value().location(), "extends", "the extends chain is longer"
                        + " than " + MAX_CHAIN + " rulesets: a ruleset extends a standard's, an annex's and a firm's"
                        + " rules, not more"));
                break;
            }
            current = open(text(parent.get().value(), file.problems(), "extends"),
                    Optional.of(parent.get().value().location()), Optional.of(file.folder()), true, errors);
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
        Map<String, SeverityDef> severities = new LinkedHashMap<>();
        Map<String, RuleOption> options = new LinkedHashMap<>();
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
            readSeverities(file, severities);
            readOptions(file, options);
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
        List<String> unchosen = vocabulary.options().keySet().stream().filter(o -> !options.containsKey(o)).sorted()
                .toList();
        if (!unchosen.isEmpty()) {
            errors.add(new InputError(top.root().location(), "options", "the ruleset chain does not choose "
                    + String.join(", ", unchosen) + ", which the review needs"));
        }
        List<String> unset = vocabulary.findingKinds().stream().filter(k -> !severities.containsKey(k)).sorted().toList();
        if (!unset.isEmpty()) {
            errors.add(new InputError(top.root().location(), "severities", "the ruleset chain gives no severity to "
                    + String.join(", ", unset) + ", which the review raises"));
        }
        if (!errors.isEmpty()) {
            throw new RulesetException(errors);
        }
        RuleExpressions expressions = new RuleExpressions(tables, parameters);
        RuleValidator validator = new RuleValidator(vocabulary, parameters, expressions);
        Map<String, CheckDef> validated = validator.validate(checks);
        if (!validator.errors().isEmpty()) {
            throw new RulesetException(validator.errors());
        }
        MapNode root = top.root();
        return new Ruleset(optionalText(root, "id").orElse(top.name()), optionalText(root, "title").orElse(""),
                optionalText(root, "standard").orElse(""), optionalText(root, "version").orElse(""), hashOnDemand(chain),
                chain.stream().map(RulesetFile::name).toList(), Collections.unmodifiableMap(parameters),
                Collections.unmodifiableMap(tables), Collections.unmodifiableMap(validated), validator.rules(),
                Collections.unmodifiableMap(severities), expressions, Collections.unmodifiableMap(options));
    }

    /**
     * The {@code options} section: each method the engine lets a ruleset choose, with its choice, clause
     * and note. A ruleset that extends another may change a choice (stating its clause).
     */
    private void readOptions(RulesetFile file, Map<String, RuleOption> options) {
        Problems problems = file.problems();
        for (Entry e : section(file, "options", "expected a mapping of options to their choice")) {
            String path = "options." + e.key();
            List<String> choices = vocabulary.options().get(e.key());
            if (choices == null) {
                problems.add(e.keyLocation(), path, "'" + Shown.text(e.key()) + "' is not an option the review offers"
                        + Suggestions.hint(e.key(), vocabulary.options().keySet()));
                continue;
            }
            Optional<MapNode> mapping = fields(e, path, OPTION_KEYS, problems);
            if (mapping.isEmpty()) {
                continue;
            }
            MapNode m = mapping.get();
            Optional<String> value = optionalText(m, "value");
            Optional<String> clause = optionalText(m, "clause");
            RuleOption inherited = options.get(e.key());
            if (value.isEmpty() || clause.isEmpty()) {
                problems.add(m.location(), path, "'" + e.key() + "' needs a value and the clause that offers it");
            } else if (!choices.contains(value.get())) {
                problems.add(m.entry("value").get().value().location(), path + ".value", "'"
                        + Shown.text(value.get()) + "' is not a choice of " + e.key() + "; the choices are "
                        + String.join(", ", choices) + Suggestions.hint(value.get(), choices));
            } else {
                options.put(e.key(), new RuleOption(e.key(), value.get(), clause.get(), optionalText(m, "note")
                        .orElse(inherited == null ? "" : inherited.note()), file.name()));
            }
        }
    }

    private void checkTop(RulesetFile file) {
        Problems problems = file.problems();
        for (Entry e : file.root().entries()) {
            if (!TOP_KEYS.contains(e.key())) {
                problems.add(e.keyLocation(), e.key(), "unknown key '" + Shown.text(e.key()) + "'"
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
            problems.add(e.keyLocation(), path, "'" + Shown.text(e.key()) + "' is not a parameter of the ruleset this one extends"
                    + Suggestions.hint(e.key(), parameters.keySet()));
            return;
        }
        Optional<MapNode> mapping = fields(e, path, PARAMETER_KEYS, problems);
        if (mapping.isEmpty()) {
            return;
        }
        MapNode map = mapping.get();
        List<String> needed = base ? PARAMETER_NEEDED : List.of("value", "clause");
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
        String unit = optionalText(map, "unit").orElse(base ? "-" : inherited.unit());
        Node written = map.entry("value").get().value();
        Optional<String> implausible = ParameterRanges.problem(e.key(), unit, value.get(),
                Shown.text(((ScalarNode) written).text()));
        if (implausible.isPresent()) {
            problems.add(written.location(), path + ".value", implausible.get());
            return;
        }
        parameters.put(e.key(), new Parameter(e.key(),
                optionalText(map, "symbol").orElse(base ? e.key() : inherited.symbol()), value.get(),
                unit, optionalText(map, "clause").orElse(""),
                optionalText(map, "note").orElse(base ? "" : inherited.note()), origin,
                source(map, path, problems)));
    }

    /** The {@code source} of a parameter or table: how sure the file is of the value (not inherited). */
    static ValueSource source(MapNode map, String path, Problems problems) {
        Optional<String> written = optionalText(map, "source");
        if (written.isEmpty()) {
            return ValueSource.STATED;
        }
        Optional<ValueSource> source = ValueSource.of(written.get());
        if (source.isEmpty()) {
            problems.add(map.entry("source").get().value().location(), path + ".source", "unknown source '"
                    + Shown.text(written.get()) + "'; expected one of " + String.join(", ", ValueSource.written()));
        }
        return source.orElse(ValueSource.STATED);
    }

    /**
     * The {@code severities} section: each kind of finding with its severity and meaning. A ruleset that
     * extends another may move a kind's severity; the meaning stays the one first declared unless restated.
     */
    private void readSeverities(RulesetFile file, Map<String, SeverityDef> severities) {
        Problems problems = file.problems();
        for (Entry e : section(file, "severities", "expected a mapping of finding kinds to their severity and meaning")) {
            String path = "severities." + e.key();
            SeverityDef inherited = severities.get(e.key());
            if (!vocabulary.findingKinds().contains(e.key())) {
                problems.add(e.keyLocation(), path, "'" + e.key() + "' is not a kind of finding the review raises"
                        + Suggestions.hint(e.key(), vocabulary.findingKinds()));
                continue;
            }
            Optional<MapNode> mapping = fields(e, path, SEVERITY_KEYS, problems);
            if (mapping.isEmpty()) {
                continue;
            }
            MapNode m = mapping.get();
            Optional<String> severity = optionalText(m, "severity");
            Optional<String> meaning = optionalText(m, "meaning").or(() -> Optional.ofNullable(inherited)
                    .map(SeverityDef::meaning));
            if (severity.isEmpty() || meaning.isEmpty()) {
                problems.add(m.location(), path, "'" + e.key() + "' needs a severity"
                        + (inherited == null ? " and its meaning" : ""));
            } else if (!SEVERITIES.contains(severity.get())) {
                problems.add(m.entry("severity").get().value().location(), path + ".severity", "severity '"
                        + severity.get() + "' is not one of " + String.join(", ", SEVERITIES));
            } else {
                severities.put(e.key(), new SeverityDef(e.key(), severity.get(), meaning.get(), file.name()));
            }
        }
    }

    /** The entries of a top-level section of the file; none when it is absent or not a mapping (reported). */
    private static List<Entry> section(RulesetFile file, String key, String expected) {
        Optional<Entry> section = file.root().entry(key);
        if (section.isPresent() && !(section.get().value() instanceof MapNode)) {
            file.problems().add(section.get().value().location(), key, expected);
        }
        return section.map(Entry::value).filter(MapNode.class::isInstance).map(v -> ((MapNode) v).entries())
                .orElse(List.of());
    }

    /** The mapping of an entry (a parameter, a severity, an option), its unknown keys reported; empty if none. */
    private static Optional<MapNode> fields(Entry e, String path, List<String> keys, Problems problems) {
        if (!(e.value() instanceof MapNode map)) {
            problems.add(e.value().location(), path, "expected a mapping with " + String.join(", ", keys));
            return Optional.empty();
        }
        for (Entry f : map.entries()) {
            if (!keys.contains(f.key())) {
                problems.add(f.keyLocation(), path + "." + f.key(), "unknown key '" + Shown.text(f.key()) + "'"
                        + Suggestions.hint(f.key(), keys));
            }
        }
        return Optional.of(map);
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

    /**
     * Opens a ruleset by id or path; problems go into {@code errors} located at {@code referencedAt}.
     *
     * @param from the folder of the file that names it (empty for the command line or a
     *             submission; {@link #BUNDLED} for a bundled file, whose parents are bundled too)
     */
    private Optional<RulesetFile> open(String reference, Optional<SourceLocation> referencedAt, Optional<Path> from,
                                       boolean pathAllowed, List<InputError> errors) {
        try {
            if (!isId(reference)) {
                if (!pathAllowed) {
                    return notFound("'" + Shown.text(reference) + "' is not a ruleset id: a submission names its"
                            + " ruleset by id only (letters, digits, '.', '-', '_'); a ruleset file is given on the"
                            + " command line with --ruleset", referencedAt, errors);
                }
                if (from.isPresent() && from.get().equals(BUNDLED)) {
                    return notFound("a bundled ruleset extends bundled rulesets by id only", referencedAt, errors);
                }
                Path p = from.map(f -> f.resolve(reference)).orElse(Path.of(reference)).toAbsolutePath().normalize();
                return readFile(p, p.toString(), referencedAt, errors);
            }
            Optional<byte[]> bundled = bundled(reference);
            Optional<Path> folder = from.isPresent() ? from.filter(f -> !f.equals(BUNDLED)) : localFolder;
            Path local = folder.map(f -> f.resolve(reference + ".yaml")).orElse(BUNDLED);
            if (folder.isPresent() && Files.isRegularFile(local)) {
                Optional<RulesetFile> file = readFile(local, local.toString(), referencedAt, errors);
                boolean shadows = bundled.isPresent() && file.isPresent()
                        && !Arrays.equals(bundled.get(), file.get().bytes());
                return shadows ? file.map(f -> f.named(f.name() + SHADOWS + reference + ")")) : file;
            }
            if (bundled.isEmpty()) {
                return notFound("no ruleset with id '" + reference + "'"
                        + folder.map(f -> " in " + f + " or").orElse("")
                        + " among the bundled rulesets", referencedAt, errors);
            }
            String name = "rulesets/" + reference + ".yaml";
            return parse(bundled.get(), name, name, BUNDLED, errors);
        } catch (IOException e) {
            return notFound("cannot read ruleset " + Shown.text(reference) + ": " + e.getMessage(), referencedAt,
                    errors);
        }
    }

    /** An id: a name without a path or an extension, e.g. {@code en1992-uk-na}. */
    static boolean isId(String reference) {
        return ID.matcher(reference).matches() && !reference.endsWith(".yaml") && !reference.endsWith(".yml");
    }

    private static Optional<byte[]> bundled(String id) throws IOException {
        try (InputStream in = RulesetLoader.class.getResourceAsStream("/rulesets/" + id + ".yaml")) {
            return in == null ? Optional.empty() : Optional.of(in.readAllBytes());
        }
    }

    /**
     * A ruleset file the checker named: refused unread when it is not a regular file or is too
     * large, and refused without a word of its content when it does not start as a ruleset does,
     * so that naming a file that is not a ruleset never shows what it holds.
     */
    private Optional<RulesetFile> readFile(Path p, String name, Optional<SourceLocation> referencedAt,
                                           List<InputError> errors) throws IOException {
        if (!Files.isRegularFile(p)) {
            return notFound("no ruleset file " + name, referencedAt, errors);
        }
        if (Files.size(p) > MAX_FILE_BYTES) {
            return notFound(name + " is larger than " + MAX_FILE_BYTES / 1024 + " KiB: not a ruleset", referencedAt,
                    errors);
        }
        byte[] bytes = Files.readAllBytes(p);
        if (!startsAsARuleset(bytes)) {
            return notFound(name + " is not a ruleset: a ruleset file starts with the line 'ruleset: 1' (its"
                    + " content is not shown)", referencedAt, errors);
        }
        return parse(bytes, name, name, p.getParent(), errors);
    }

    /** The first line that is not blank, a comment or a document start is {@code ruleset: 1}. */
    private static boolean startsAsARuleset(byte[] bytes) {
        int length = Math.min(bytes.length, 64 * 1024);
        String head = new String(bytes, 0, length, StandardCharsets.UTF_8);
        if (head.startsWith("\uFEFF")) {
            head = head.substring(1);
        }
        return head.lines().map(String::strip).filter(l -> !l.isEmpty() && !l.startsWith("#") && !l.equals("---"))
                .findFirst().filter(FORMAT_LINE.asMatchPredicate()).isPresent();
    }

    private static Optional<RulesetFile> parse(byte[] bytes, String name, String parsedAs, Path folder,
                                               List<InputError> errors) {
        Problems problems = new Problems(name);
        Optional<Node> root = new TreeParser(problems).parse(bytes, parsedAs);
        if (root.isPresent() && !(root.get() instanceof MapNode)) {
            problems.add(root.get().location(), "", "a ruleset is a mapping that starts with 'ruleset: 1'");
        }
        if (problems.any()) {
            errors.addAll(problems.sorted());
            return Optional.empty();
        }
        return Optional.of(new RulesetFile(name, bytes, (MapNode) root.get(), problems, folder));
    }

    private static Optional<RulesetFile> notFound(String message, Optional<SourceLocation> at, List<InputError> errors) {
        errors.add(new InputError(at.orElse(SourceLocation.unpositioned("--ruleset")), "", message));
        return Optional.empty();
    }

    /** {@link #hash} of the chain, worked out the first time it is asked for (a thread may then work it out again). */
    private static Supplier<String> hashOnDemand(List<RulesetFile> chain) {
        List<byte[]> contents = chain.stream().map(RulesetFile::bytes).toList();
        return new Supplier<>() {
            private volatile String hash;

            @Override
            public String get() {
                String h = hash;
                if (h == null) {
                    h = hash(contents);
                    hash = h;
                }
                return h;
            }
        };
    }

    private static String hash(List<byte[]> contents) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            contents.forEach(sha::update);
            return HexFormat.of().formatHex(sha.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is part of every Java runtime", e);
        }
    }

}
