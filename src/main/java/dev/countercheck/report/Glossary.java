package dev.countercheck.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * The meaning of every symbol the calculations write, declared once in {@code report/symbols.yaml} and read
 * by the derivation renderer ({@link Derivation}), which defines each symbol at its first use in a check's
 * derivation. A symbol means one thing, or one thing per group of checks (a glob on the check id, {@code *}
 * for the rest: the a of the pile-reaction plane is not the a of a control perimeter; a glob that names the
 * element type, {@code pad-footing/*}, holds for that type's checks alone: a pad's φ is a bar's, never a pile's);
 * a {@code #} in a symbol
 * stands for a number ({@code P#} is P1, P2, ...). The file also lists the words a formula's text may hold
 * that are not symbols ("over", "max"). Read once, at the first report; the review itself never reads it.
 */
final class Glossary {

    static final String RESOURCE = "/report/symbols.yaml";

    /** How many answers of each kind are kept: the checks and symbols of a review need a few hundred. */
    private static final int MEMO_LIMIT = 8192;

    private static final class Bundled {
        static final Glossary INSTANCE = read(RESOURCE);
    }

    private final Map<String, List<Meaning>> exact;
    private final Map<Pattern, List<Meaning>> numbered;
    private final Set<String> words;
    /** {@link #meaning} by symbol and element type/check id, joined by a line break (neither holds one). */
    private final Memo<Optional<String>> meanings = new Memo<>(this::lookUp, MEMO_LIMIT);
    private final Memo<List<String>> formulaSymbols =
            new Memo<>(formula -> List.copyOf(FormulaSymbols.in(formula, this)), MEMO_LIMIT);

    private record Meaning(Pattern checks, String text) {
    }

    private Glossary(Map<String, List<Meaning>> exact, Map<Pattern, List<Meaning>> numbered, Set<String> words) {
        this.exact = exact;
        this.numbered = numbered;
        this.words = words;
    }

    /** The glossary shipped in the jar. */
    static Glossary bundled() {
        return Bundled.INSTANCE;
    }

    /** What {@code symbol} means in check {@code checkId} of an element of {@code elementType}, when the glossary defines it. */
    Optional<String> meaning(String symbol, String elementType, String checkId) {
        return meanings.get(symbol + "\n" + elementType + "/" + checkId);
    }

    /** The symbols of {@code formula} ({@link FormulaSymbols#in}, with this glossary's words left out). */
    List<String> symbolsIn(String formula) {
        return formulaSymbols.get(formula);
    }

    private Optional<String> lookUp(String symbolAndCheck) {
        int split = symbolAndCheck.lastIndexOf('\n');
        String symbol = symbolAndCheck.substring(0, split);
        String checkId = symbolAndCheck.substring(split + 1);
        List<Meaning> meanings = exact.get(symbol);
        if (meanings == null) {
            meanings = numbered.entrySet().stream().filter(e -> e.getKey().matcher(symbol).matches())
                    .map(Map.Entry::getValue).findFirst().orElse(List.of());
        }
        return meanings.stream().filter(m -> m.checks.matcher(checkId).matches()).map(Meaning::text).findFirst();
    }

    /** Whether {@code token} is a word of a formula's text, never a symbol. */
    boolean isWord(String token) {
        return words.contains(token);
    }

    /** Every symbol the glossary declares, as written in the file. */
    Set<String> symbols() {
        Set<String> all = new HashSet<>(exact.keySet());
        numbered.keySet().forEach(p -> all.add(p.pattern()));
        return all;
    }

    static Glossary read(String resource) {
        try (InputStream in = Glossary.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("the glossary " + resource + " is missing from the jar");
            }
            JsonNode root = new ObjectMapper(new YAMLFactory()).readTree(in);
            Map<String, List<Meaning>> exact = new LinkedHashMap<>();
            Map<Pattern, List<Meaning>> numbered = new LinkedHashMap<>();
            for (Iterator<Map.Entry<String, JsonNode>> it = root.path("symbols").fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                List<Meaning> meanings = meanings(e.getValue());
                if (e.getKey().contains("#")) {
                    numbered.put(Pattern.compile(Pattern.quote(e.getKey()).replace("#", "\\E\\d+\\Q")), meanings);
                } else {
                    exact.put(e.getKey(), meanings);
                }
            }
            Set<String> words = new HashSet<>();
            root.path("words").forEach(w -> words.add(w.asText()));
            return new Glossary(exact, numbered, words);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** One meaning for every check, or one per glob of check ids in the order written. */
    private static List<Meaning> meanings(JsonNode node) {
        List<Meaning> list = new ArrayList<>();
        if (node.isTextual()) {
            list.add(new Meaning(Pattern.compile(".*"), node.asText()));
        } else {
            node.fields().forEachRemaining(e -> list.add(new Meaning(glob(e.getKey()), e.getValue().asText())));
        }
        return List.copyOf(list);
    }

    /**
     * A glob over {@code <element type>/<check id>} (several separated by spaces): {@code *} any run of characters;
     * a glob without {@code /} is one over check ids, of any element type.
     */
    private static Pattern glob(String globs) {
        List<String> parts = new ArrayList<>();
        for (String g : globs.trim().split("\\s+")) {
            parts.add((g.contains("/") ? "" : "[^/]*/") + Pattern.quote(g).replace("*", "\\E.*\\Q"));
        }
        return Pattern.compile(String.join("|", parts));
    }
}
