package dev.countercheck.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The CLI end to end on every bundled sample: exit status, the JSON result's shape (results.md),
 * the HTML report, byte-identical reruns, and what each sample's "# expect:" comment lines say the
 * review must find.
 */
class SampleSubmissionsTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    static Stream<Path> samples() throws IOException {
        return Files.list(Path.of("sample-submissions")).filter(p -> p.toString().endsWith(".yaml")).sorted();
    }

    /** The outcome of one command line run. */
    record Run(int exit, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        var cl = CountercheckCommand.commandLine();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int exit = cl.execute(args);
        return new Run(exit, out.toString(), err.toString());
    }

    @ParameterizedTest
    @MethodSource("samples")
    void reviewFindsWhatTheSampleSays(Path sample, @TempDir Path out) throws IOException {
        Run run = run("review", sample.toString(), "--out", out.toString(), "--date", "2026-12-01");
        String base = sample.getFileName().toString().replace(".yaml", "");
        Path json = out.resolve(base + ".json");
        Path html = out.resolve(base + ".html");
        assertThat(run.err()).doesNotContain("Exception").doesNotContain("internal error");
        assertThat(json).exists();
        assertThat(html).exists();
        JsonNode result = JSON.readTree(json.toFile());
        assertResultShape(result);
        // Finding ids may carry <wbr/> break hints after their slashes in narrow table cells.
        String page = Files.readString(html, StandardCharsets.UTF_8).replace("<wbr/>", "");
        for (JsonNode e : result.get("elements")) {
            assertThat(page).contains(e.get("id").asText());
            e.get("findings").forEach(f -> assertThat(page).contains(f.get("id").asText()));
        }
        for (String line : Files.readAllLines(sample)) {
            if (line.startsWith("# expect: ")) {
                assertExpectation(line.substring("# expect: ".length()).trim(), run, result);
            }
        }
    }

    @ParameterizedTest
    @MethodSource("samples")
    void rerunsWithAStatedDateAreByteIdentical(Path sample, @TempDir Path first, @TempDir Path second)
            throws IOException {
        run("review", sample.toString(), "--out", first.toString(), "--date", "2026-12-01");
        run("review", sample.toString(), "--out", second.toString(), "--date", "2026-12-01");
        String base = sample.getFileName().toString().replace(".yaml", "");
        for (String ext : List.of(".json", ".html")) {
            assertThat(Files.readAllBytes(second.resolve(base + ext)))
                    .as(base + ext).isEqualTo(Files.readAllBytes(first.resolve(base + ext)));
        }
    }

    private static void assertExpectation(String expectation, Run run, JsonNode result) {
        String[] words = expectation.split("\\s+");
        switch (words[0]) {
            case "exit" -> assertThat(run.exit()).as(expectation + "\n" + run.err()).isEqualTo(Integer.parseInt(words[1]));
            case "verdict" -> assertThat(result.get("verdict").asText()).as(expectation).isEqualTo(words[1]);
            case "element" -> assertThat(element(result, words[1]).get("verdict").asText()).as(expectation)
                    .isEqualTo(words[2]);
            case "finding" -> {
                String elementId = words[1].substring(0, words[1].indexOf('/'));
                List<String> matching = new ArrayList<>();
                element(result, elementId).get("findings").forEach(f -> {
                    String id = f.get("id").asText();
                    boolean named = id.equals(words[1]) || id.startsWith(words[1] + "/");
                    if (named && f.get("severity").asText().equals(words[2])) {
                        matching.add(f.get("id").asText());
                    }
                });
                assertThat(matching).as(expectation).isNotEmpty();
            }
            case "check" -> assertCheck(expectation, words, element(result, words[1]));
            case "governing" -> assertThat(check(result, words[1], words[2]).path("governing_case").asText())
                    .as(expectation).isEqualTo(expectation.split("\\s+", 4)[3]);
            default -> throw new AssertionError("unknown expectation: " + expectation);
        }
    }

    /** Check {@code checkId} of element {@code elementId}. */
    private static JsonNode check(JsonNode result, String elementId, String checkId) {
        for (JsonNode c : element(result, elementId).get("checks")) {
            if (c.get("id").asText().equals(checkId)) {
                return c;
            }
        }
        throw new AssertionError("no check " + checkId + " on " + elementId);
    }

    /**
     * {@code check <element> <check> <status> [quantity=value[±tolerance]]...}: the check's status and values
     * (a value without a tolerance to 0.05 %).
     */
    private static void assertCheck(String expectation, String[] words, JsonNode element) {
        JsonNode check = null;
        for (JsonNode c : element.get("checks")) {
            if (c.get("id").asText().equals(words[2])) {
                check = c;
            }
        }
        assertThat(check).as(expectation + ": no such check").isNotNull();
        assertThat(check.get("status").asText()).as(expectation + " " + check.path("reason").asText())
                .isEqualTo(words[3]);
        for (int i = 4; i < words.length; i++) {
            String[] nameValue = words[i].split("=");
            String[] valueTolerance = nameValue[1].split("±");
            double expected = Double.parseDouble(valueTolerance[0]);
            double tolerance = valueTolerance.length > 1 ? Double.parseDouble(valueTolerance[1]) : Math.abs(expected) * 5e-4;
            JsonNode value = check.get("values").get(nameValue[0]);
            assertThat(value).as(expectation + ": " + nameValue[0] + " computed").isNotNull();
            assertThat(value.get("value").asDouble()).as(expectation + ": " + nameValue[0])
                    .isCloseTo(expected, org.assertj.core.api.Assertions.within(tolerance));
        }
    }

    private static JsonNode element(JsonNode result, String id) {
        for (JsonNode e : result.get("elements")) {
            if (e.get("id").asText().equals(id)) {
                return e;
            }
        }
        throw new AssertionError("no element " + id);
    }

    /** The keys and value sets of results.md. */
    static void assertResultShape(JsonNode r) {
        assertThat(fields(r)).contains("format", "tool", "submission", "ruleset", "verdict", "elements", "summary");
        assertThat(r.get("format").asText()).isEqualTo("countercheck-result/1");
        assertThat(fields(r.get("tool"))).contains("name", "version");
        assertThat(fields(r.get("submission"))).contains("file", "sha256");
        assertThat(r.get("submission").get("sha256").asText()).matches("[0-9a-f]{64}");
        assertThat(fields(r.get("ruleset"))).contains("id", "title", "sha256");
        Set<String> verdicts = Set.of("conforms", "conforms-with-remarks", "does-not-conform", "incomplete");
        assertThat(verdicts).contains(r.get("verdict").asText());
        for (JsonNode e : r.get("elements")) {
            assertThat(fields(e)).contains("id", "type", "verdict", "checks", "findings", "cautions");
            assertThat(verdicts).contains(e.get("verdict").asText());
            for (JsonNode c : e.get("checks")) {
                assertThat(fields(c)).contains("id", "title", "basis", "status", "values", "claims", "trace");
                assertThat(Set.of("pass", "fail", "not-applicable", "not-checked")).contains(c.get("status").asText());
                if (!c.get("status").asText().equals("pass")) {
                    assertThat(fields(c)).as(c.get("id") + " says why it is " + c.get("status")).contains("reason");
                }
                c.get("values").forEach(v -> assertThat(fields(v)).containsExactly("value", "unit"));
                for (JsonNode claim : c.get("claims")) {
                    assertThat(fields(claim)).containsExactly("quantity", "claimed", "computed", "difference",
                            "verdict");
                    assertThat(Set.of("agrees", "differs-conservative", "differs-unconservative"))
                            .contains(claim.get("verdict").asText());
                }
                c.get("trace").forEach(t -> assertThat(fields(t)).contains("symbol", "formula", "substituted",
                        "value", "unit", "clause"));
            }
            for (JsonNode f : e.get("findings")) {
                assertThat(fields(f)).containsExactly("id", "severity", "check", "message", "basis");
                assertThat(Set.of("critical", "major", "minor", "note")).contains(f.get("severity").asText());
            }
        }
        assertThat(fields(r.get("summary"))).contains("elements", "conforms", "conforms-with-remarks",
                "does-not-conform", "incomplete", "findings");
        assertThat(fields(r.get("summary").get("findings"))).containsExactly("critical", "major", "minor", "note");
    }

    private static List<String> fields(JsonNode node) {
        List<String> names = new ArrayList<>();
        Iterator<String> it = node.fieldNames();
        it.forEachRemaining(names::add);
        return names;
    }
}
