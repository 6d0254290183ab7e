package dev.countercheck.submission;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.Error;
import com.networknt.schema.InputFormat;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import dev.countercheck.input.Node;
import dev.countercheck.input.Node.ListNode;
import dev.countercheck.input.Node.MapNode;
import dev.countercheck.input.Node.ScalarNode;
import dev.countercheck.input.Problems;
import dev.countercheck.input.TreeParser;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The published schema, checked by a JSON Schema validator as an editor would: it accepts every
 * sample and good test file, and of the bad-input corpus it rejects exactly the files that
 * announce {@code # schema: rejects} (those that are structurally wrong: unknown keys, wrong
 * types, values outside the reader's limits, ...). The other corpus files are wrong in ways a
 * schema cannot see (overlapping piles, a column off the cap, fck against the class) or cannot be
 * parsed at all; the schema must accept those it can parse, so that the marker stays true.
 */
class SchemaValidationTest {

    private static final String REJECTS = "# schema: rejects";
    private static final Schema SCHEMA = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12)
            .getSchema(read(SubmissionSchemaTest.SCHEMA), InputFormat.JSON);

    static Stream<Path> samples() throws IOException {
        return Stream.of(Path.of("sample-submissions"), Path.of("src/test/resources/submissions/good"),
                        Path.of("src/test/resources/hand-calcs"), Path.of("src/main/resources"))
                .flatMap(SchemaValidationTest::submissionsIn);
    }

    static Stream<Path> corpus() {
        return submissionsIn(Path.of("src/test/resources/submissions/bad"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void acceptsEverySample(Path file) {
        Optional<JsonNode> tree = tree(file);
        assertThat(tree).as("%s parses", file).isPresent();

        assertThat(SCHEMA.validate(tree.get())).as("schema errors of %s", file).isEmpty();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void rejectsTheCorpusFilesThatAreStructurallyWrong(Path file) {
        boolean announced = announcesRejection(file);
        Optional<JsonNode> tree = tree(file);
        if (tree.isEmpty()) {
            assertThat(announced).as("%s cannot be parsed, so no schema can judge it", file).isFalse();
            return;
        }
        List<Error> errors = SCHEMA.validate(tree.get());
        if (announced) {
            assertThat(errors).as("%s is structurally wrong", file).isNotEmpty();
        } else {
            assertThat(errors).as("%s: its error is not one a schema can see", file).isEmpty();
        }
    }

    private static boolean announcesRejection(Path file) {
        String name = file.getFileName().toString();
        Path sidecar = file.resolveSibling(name.substring(0, name.lastIndexOf('.')) + ".expect");
        Path header = Files.exists(sidecar) ? sidecar : file;
        try {
            return new String(Files.readAllBytes(header), StandardCharsets.UTF_8).lines()
                    .takeWhile(line -> line.startsWith("#")).anyMatch(REJECTS::equals);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The file as the reader parses it, as a JSON tree; empty when it does not parse. */
    static Optional<JsonNode> tree(Path file) {
        try {
            Problems problems = new Problems(file.toString());
            Optional<Node> root = new TreeParser(problems).parse(Files.readAllBytes(file), file.toString());
            return problems.any() ? Optional.empty() : root.map(SchemaValidationTest::json);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static JsonNode json(Node node) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        if (node instanceof MapNode map) {
            ObjectNode object = f.objectNode();
            map.entries().forEach(e -> object.set(e.key(), json(e.value())));
            return object;
        }
        if (node instanceof ListNode list) {
            ArrayNode array = f.arrayNode();
            list.items().forEach(item -> array.add(json(item)));
            return array;
        }
        ScalarNode scalar = (ScalarNode) node;
        return switch (scalar.kind()) {
            case TEXT -> f.textNode(scalar.text());
            case BOOLEAN -> f.booleanNode(Boolean.parseBoolean(scalar.text()));
            case NULL -> f.nullNode();
            case NUMBER -> number(scalar.text());
        };
    }

    /**
     * A number as a YAML editor reads it: a decimal number as its double (1e400 is infinite, and
     * beyond every maximum); other forms ({@code .nan}, {@code 0x384}) stay text.
     */
    private static JsonNode number(String text) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        if (text.matches("[+-]?[0-9]+")) {
            try {
                return f.numberNode(Long.parseLong(text));
            } catch (NumberFormatException tooLong) {
                return f.numberNode(Double.parseDouble(text));
            }
        }
        return text.matches("[+-]?([0-9]+(\\.[0-9]*)?|\\.[0-9]+)([eE][+-]?[0-9]+)?")
                ? f.numberNode(Double.parseDouble(text)) : f.textNode(text);
    }

    private static Stream<Path> submissionsIn(Path folder) {
        try (Stream<Path> files = Files.list(folder)) {
            return files.filter(p -> p.toString().matches(".*\\.(yaml|yml|json)$")).sorted().toList().stream();
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    private static String read(Path file) {
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
