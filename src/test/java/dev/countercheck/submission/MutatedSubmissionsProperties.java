package dev.countercheck.submission;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonPointer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLMapper;
import dev.countercheck.cli.CountercheckCommand;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.RandomDistribution;
import net.jqwik.api.Tuple;
import net.jqwik.api.lifecycle.AfterContainer;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Mutations of the valid samples, each run through the whole review as the command line runs it
 * (read, review, JSON and HTML written to a folder): one field dropped, duplicated, given another
 * type or a perturbed number. Whatever the mutation, the run ends in a review (exit 0 or 1, both
 * reports complete) or in a refusal (exit 2, every message located at file:line:column, no report
 * written), never in an internal error. The figures of the run are printed at the end.
 */
class MutatedSubmissionsProperties {

    private static final List<Path> SAMPLES = List.of(
            Path.of("sample-submissions/harbour-lane.yaml"),
            Path.of("sample-submissions/quayside-annex.yaml"),
            Path.of("src/test/resources/submissions/good/harbour-lane.yaml"),
            Path.of("src/test/resources/submissions/good/one-incomplete.yaml"),
            Path.of("src/test/resources/hand-calcs/two-pile.yaml"),
            Path.of("src/test/resources/hand-calcs/three-pile.yaml"),
            Path.of("src/test/resources/hand-calcs/four-pile.yaml"));
    private static final ObjectMapper YAML_READER = new YAMLMapper();
    private static final List<JsonNode> TREES = SAMPLES.stream().map(MutatedSubmissionsProperties::tree).toList();
    private static final Pattern INTERNAL = Pattern.compile("internal error|Exception|\\bat dev\\.|\\bat java\\.");

    private static int tried;
    private static int reviews;
    private static int refusals;
    private static long slowestNanos;
    private static String slowest = "";

    enum Kind { DROP, DUPLICATE, RETYPE, PERTURB }

    /** Values a retyped field takes. */
    private static final List<JsonNode> OTHER_TYPES = List.of(
            JsonNodeFactory.instance.textNode("abc"), JsonNodeFactory.instance.numberNode(7),
            JsonNodeFactory.instance.booleanNode(true), JsonNodeFactory.instance.nullNode(),
            JsonNodeFactory.instance.arrayNode(), JsonNodeFactory.instance.objectNode(),
            JsonNodeFactory.instance.arrayNode().add(1).add(2).add(3),
            JsonNodeFactory.instance.objectNode().put("a", 1),
            JsonNodeFactory.instance.textNode("12 kN"), JsonNodeFactory.instance.textNode("1e3 m"));

    /**
     * How a perturbed number changes: a factor, or a replacement when the factor is NaN. Most are
     * mild, so that the reader accepts the result and the review itself meets odd values (a
     * reversed load, a column at the edge, a tiny bar); the others are slips the reader must catch.
     */
    private static final double[][] PERTURBATIONS = {{1.05, 0}, {0.95, 0}, {1.5, 0}, {0.5, 0}, {2, 0}, {-1, 0},
            {Double.NaN, 0}, {Double.NaN, 1}, {10, 0}, {0.1, 0}, {1000, 0}, {Double.NaN, 1e-9}};

    /** One mutation of one sample; {@code toString} says what it did, for a failure report. */
    record Mutant(int sample, String pointer, Kind kind, int variant, String text) {
        @Override
        public String toString() {
            return kind + " " + pointer + " (variant " + variant + ") of " + SAMPLES.get(sample) + ":\n" + text;
        }
    }

    /**
     * Edge cases off: they would pick the first and last field of a file over and over. Tries: the
     * default of src/test/resources/junit-platform.properties; more with {@code -Djqwik.tries.default=1000}.
     */
    @Property(edgeCases = EdgeCasesMode.NONE)
    void aMutatedSampleEndsInAReviewOrALocatedRefusalNeverACrash(@ForAll("mutants") Mutant mutant) throws IOException {
        Path folder = Files.createTempDirectory("mutant");
        try {
            Path file = Files.writeString(folder.resolve("mutant.yaml"), mutant.text(), StandardCharsets.UTF_8);
            Path out = folder.resolve("out");
            StringWriter stdout = new StringWriter();
            StringWriter stderr = new StringWriter();
            long start = System.nanoTime();
            int code = CountercheckCommand.commandLine().setOut(new PrintWriter(stdout)).setErr(new PrintWriter(stderr))
                    .execute("review", file.toString(), "--out", out.toString(), "--date", "2026-01-01");
            record(System.nanoTime() - start, mutant);
            String all = stdout + "\n" + stderr;

            assertThat(all).as("no internal error for %s", mutant).doesNotContainPattern(INTERNAL);
            if (code == 2) {
                refusals++;
                assertThat(stderr.toString().lines().filter(l -> !l.startsWith(file + ": not reviewed")))
                        .as("every message of the refusal is located").isNotEmpty()
                        .allMatch(l -> l.matches(".*\\.(yaml|json)( \\(bundled\\))?:\\d+:\\d+: .*"), "file:line:column: message");
                assertThat(Files.exists(out) ? list(out) : List.<String>of()).as("no report for a refusal").isEmpty();
            } else {
                reviews++;
                assertThat(code).as("a review's exit status for %s%n%s", mutant, all).isIn(0, 1);
                assertThat(list(out)).containsExactly("mutant.html", "mutant.json", "mutant.responses.csv",
                        "mutant.responses.xlsx");
                assertThat(YAML_READER.readTree(out.resolve("mutant.json").toFile()).path("verdict").asText())
                        .as("a complete JSON result").isNotEmpty();
                assertThat(Files.readString(out.resolve("mutant.html")).strip()).as("a complete HTML report")
                        .endsWith("</html>");
            }
        } finally {
            delete(folder);
        }
    }

    @AfterContainer
    static void figures() {
        System.out.printf("Mutations through the CLI: %d tried, %d reviews, %d clean refusals, %d crashes;"
                        + " slowest %d ms (%s)%n", tried, reviews, refusals, tried - reviews - refusals,
                slowestNanos / 1_000_000, slowest);
    }

    private static synchronized void record(long nanos, Mutant mutant) {
        tried++;
        if (nanos > slowestNanos) {
            slowestNanos = nanos;
            slowest = mutant.kind() + " " + mutant.pointer() + " of " + SAMPLES.get(mutant.sample()).getFileName();
        }
    }

    @Provide
    Arbitrary<Mutant> mutants() {
        Arbitrary<Kind> kinds = Arbitraries.frequency(Tuple.of(5, Kind.PERTURB), Tuple.of(2, Kind.DROP),
                Tuple.of(1, Kind.DUPLICATE), Tuple.of(2, Kind.RETYPE));
        return Combinators.combine(Arbitraries.integers().between(0, SAMPLES.size() - 1),
                        Arbitraries.doubles().between(0, 1).ofScale(6).withDistribution(RandomDistribution.uniform()), kinds,
                        Arbitraries.integers().between(0, PERTURBATIONS.length - 1))
                .as(MutatedSubmissionsProperties::mutate);
    }

    private static Mutant mutate(int sample, double where, Kind kind, int variant) {
        JsonNode tree = TREES.get(sample).deepCopy();
        List<String> candidates = new ArrayList<>();
        pointers(tree, "", kind == Kind.PERTURB, candidates);
        String pointer = candidates.get((int) Math.min(candidates.size() - 1, Math.floor(where * candidates.size())));
        JsonPointer at = JsonPointer.compile(pointer);
        JsonNode parent = tree.at(at.head());
        String last = at.last().getMatchingProperty();
        String duplicateKey = null;
        switch (kind) {
            case DROP -> {
                if (parent instanceof ObjectNode object) {
                    object.remove(last);
                } else {
                    ((ArrayNode) parent).remove(at.last().getMatchingIndex());
                }
            }
            case DUPLICATE -> {
                if (parent instanceof ArrayNode array) {
                    array.insert(at.last().getMatchingIndex(), array.get(at.last().getMatchingIndex()).deepCopy());
                } else {
                    duplicateKey = pointer;
                }
            }
            case RETYPE -> replace(parent, at, OTHER_TYPES.get(variant % OTHER_TYPES.size()).deepCopy());
            case PERTURB -> {
                double[] change = PERTURBATIONS[variant % PERTURBATIONS.length];
                double value = tree.at(at).asDouble();
                double perturbed = Double.isNaN(change[0]) ? change[1] : value * change[0];
                replace(parent, at, perturbed == Math.rint(perturbed) && Math.abs(perturbed) < 1e15
                        ? JsonNodeFactory.instance.numberNode((long) perturbed)
                        : JsonNodeFactory.instance.numberNode(perturbed));
            }
        }
        return new Mutant(sample, pointer, kind, variant, yaml(tree, duplicateKey));
    }

    private static void replace(JsonNode parent, JsonPointer at, JsonNode value) {
        if (parent instanceof ObjectNode object) {
            object.set(at.last().getMatchingProperty(), value);
        } else {
            ((ArrayNode) parent).set(at.last().getMatchingIndex(), value);
        }
    }

    /** Every node below the root, or only the numbers. */
    private static void pointers(JsonNode node, String pointer, boolean numbersOnly, List<String> found) {
        if (!pointer.isEmpty() && (!numbersOnly || node.isNumber())) {
            found.add(pointer);
        }
        if (node.isObject()) {
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                pointers(e.getValue(), pointer + "/" + e.getKey().replace("~", "~0").replace("/", "~1"), numbersOnly,
                        found);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                pointers(node.get(i), pointer + "/" + i, numbersOnly, found);
            }
        }
    }

    /** The tree as YAML; the entry at {@code duplicateKey} (a pointer), if any, is written twice. */
    private static String yaml(JsonNode tree, String duplicateKey) {
        StringWriter text = new StringWriter();
        try (JsonGenerator g = YAML_READER.createGenerator(text)) {
            write(g, tree, "", duplicateKey);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return text.toString();
    }

    private static void write(JsonGenerator g, JsonNode node, String pointer, String duplicateKey) throws IOException {
        if (node.isObject()) {
            g.writeStartObject();
            for (Map.Entry<String, JsonNode> e : node.properties()) {
                String child = pointer + "/" + e.getKey().replace("~", "~0").replace("/", "~1");
                int times = child.equals(duplicateKey) ? 2 : 1;
                for (int i = 0; i < times; i++) {
                    g.writeFieldName(e.getKey());
                    write(g, e.getValue(), child, duplicateKey);
                }
            }
            g.writeEndObject();
        } else if (node.isArray()) {
            g.writeStartArray();
            for (int i = 0; i < node.size(); i++) {
                write(g, node.get(i), pointer + "/" + i, duplicateKey);
            }
            g.writeEndArray();
        } else {
            g.writeTree(node);
        }
    }

    private static JsonNode tree(Path file) {
        try {
            return YAML_READER.readTree(file.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static List<String> list(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private static void delete(Path folder) throws IOException {
        try (Stream<Path> files = Files.walk(folder)) {
            for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }
}
