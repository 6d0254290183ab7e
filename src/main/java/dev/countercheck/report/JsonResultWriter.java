package dev.countercheck.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.StreamWriteFeature;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.core.util.Separators;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.GeneratedCase;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Value;
import dev.countercheck.review.Verdict;
import dev.countercheck.round.ReviewRound;

import java.io.IOException;
import java.io.StringWriter;
import java.io.Writer;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Writes a finished {@link Review} as the JSON result of {@code docs/results.md}.
 *
 * <p>Keys appear in the order of {@code docs/results.md}; fields the spec adds beside it
 * ({@code review_date}, {@code assumptions}, the submission's {@code prepared_by} and
 * {@code date}, the ruleset's {@code files}) sit where they read naturally. Absent optional
 * fields are left out, never written as {@code null}. Numbers are rounded as
 * {@link ReportNumbers} says. Two-space indent, {@code "\n"} line ends, a trailing newline:
 * the same review always gives the same bytes.
 */
public final class JsonResultWriter {

    /** The {@code format} this writer produces. */
    public static final String FORMAT = "countercheck-result/1";

    private static final JsonMapper MAPPER = JsonMapper.builder()
            .enable(StreamWriteFeature.WRITE_BIGDECIMAL_AS_PLAIN)
            .disable(StreamWriteFeature.AUTO_CLOSE_TARGET)
            .disable(SerializationFeature.FLUSH_AFTER_WRITE_VALUE)
            .build();

    private static final ObjectWriter WRITER = MAPPER.writer(prettyPrinter());

    /** The JSON text of {@code review}, ending in a newline. */
    public String write(Review review) {
        return write(review, ReviewRound.none(""));
    }

    /**
     * The JSON text of {@code review} in its round: with the designer's responses and the comparison
     * with the previous revision where the round has them ({@link RoundJson}).
     */
    public String write(Review review, ReviewRound round) {
        StringWriter out = new StringWriter();
        try {
            write(review, round, out);
        } catch (IOException e) {
            // A StringWriter does not fail; a tree of strings and numbers always serialises.
            throw new IllegalStateException("could not serialise the review result", e);
        }
        return out.toString();
    }

    /**
     * Writes the JSON text of {@code review} in its round, ending in a newline, into {@code out}
     * element by element: only one element's part of the result is held in memory at a time.
     * {@code out} is flushed, not closed.
     */
    public void write(Review review, ReviewRound round, Writer out) throws IOException {
        try (JsonGenerator g = WRITER.createGenerator(out)) {
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            field(g, "tool", tool(review.tool()));
            field(g, "submission", submission(review.submission()));
            field(g, "ruleset", ruleset(review.ruleset()));
            g.writeStringField("review_date", review.reviewDate());
            g.writeStringField("verdict", review.verdict().label());
            g.writeArrayFieldStart("elements");
            for (ElementReview element : review.elements()) {
                MAPPER.writeTree(g, element(element));
            }
            g.writeEndArray();
            field(g, "summary", summary(review.summary()));
            ObjectNode roundFields = MAPPER.createObjectNode();
            RoundJson.add(roundFields, review, round);
            for (Map.Entry<String, JsonNode> field : roundFields.properties()) {
                field(g, field.getKey(), field.getValue());
            }
            g.writeArrayFieldStart("assumptions");
            for (String assumption : review.assumptions()) {
                g.writeString(assumption);
            }
            g.writeEndArray();
            g.writeEndObject();
            g.flush();
        }
        out.write('\n');
        out.flush();
    }

    private static void field(JsonGenerator g, String name, JsonNode value) throws IOException {
        g.writeFieldName(name);
        MAPPER.writeTree(g, value);
    }

    private static ObjectNode tool(Review.ToolInfo tool) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("name", tool.name());
        node.put("version", tool.version());
        return node;
    }

    private static ObjectNode submission(Review.SubmissionInfo submission) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("file", submission.file());
        node.put("sha256", submission.sha256());
        putIfPresent(node, "title", submission.title());
        putIfPresent(node, "reference", submission.reference());
        putIfPresent(node, "revision", submission.revision());
        putIfPresent(node, "prepared_by", submission.preparedBy());
        putIfPresent(node, "date", submission.date());
        return node;
    }

    private static ObjectNode ruleset(Review.RulesetInfo ruleset) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("id", ruleset.id());
        node.put("title", ruleset.title());
        node.put("sha256", ruleset.sha256());
        strings(node.putArray("files"), ruleset.files());
        return node;
    }

    private static ObjectNode element(ElementReview element) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("id", element.id());
        node.put("type", element.type());
        node.put("description", element.description());
        node.put("verdict", element.verdict().label());
        ArrayNode checks = node.putArray("checks");
        element.checks().forEach(c -> checks.add(check(c)));
        ArrayNode findings = node.putArray("findings");
        element.findings().forEach(f -> findings.add(finding(f)));
        strings(node.putArray("cautions"), element.cautions());
        if (!element.combinations().isEmpty()) {
            ArrayNode generated = node.putArray("combinations");
            element.combinations().forEach(c -> generated.add(combination(c)));
        }
        return node;
    }

    private static ObjectNode combination(GeneratedCase c) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("name", c.name());
        node.put("kind", c.kind());
        node.put("N", ReportNumbers.quantity(c.nKn()));
        node.put("Mx", ReportNumbers.quantity(c.mxKnm()));
        node.put("My", ReportNumbers.quantity(c.myKnm()));
        node.put("Hx", ReportNumbers.quantity(c.hxKn()));
        node.put("Hy", ReportNumbers.quantity(c.hyKn()));
        node.put("gamma_self_weight", ReportNumbers.ratio(c.selfWeightFactor()));
        node.set("trace", step(c.trace()));
        strings(node.putArray("governs"), c.governs());
        return node;
    }

    private static ObjectNode check(CheckResult check) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("id", check.id());
        node.put("title", check.title());
        node.put("basis", check.basis());
        node.put("status", check.status().label());
        check.utilisation().ifPresent(u -> node.put("utilisation", ReportNumbers.ratio(u)));
        putIfPresent(node, "governing_case", check.governingCase());
        putIfPresent(node, "reason", check.reason());
        ObjectNode values = node.putObject("values");
        check.values().forEach((name, value) -> values.set(name, value(value)));
        ArrayNode claims = node.putArray("claims");
        check.claims().forEach(c -> claims.add(claim(c)));
        ArrayNode trace = node.putArray("trace");
        check.trace().forEach(s -> trace.add(step(s)));
        return node;
    }

    private static ObjectNode value(Value value) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("value", ReportNumbers.quantity(value.value()));
        node.put("unit", value.unit());
        return node;
    }

    private static ObjectNode claim(ClaimComparison claim) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("quantity", claim.quantity());
        node.put("claimed", ReportNumbers.claimed(claim.claimed()));
        node.put("computed", ReportNumbers.quantity(claim.computed()));
        node.put("difference", ReportNumbers.ratio(claim.difference()));
        node.put("verdict", claim.verdict().label());
        return node;
    }

    private static ObjectNode step(Step step) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("symbol", step.symbol());
        node.put("formula", step.formula());
        node.put("substituted", step.substituted());
        node.put("value", ReportNumbers.quantity(step.value()));
        node.put("unit", step.unit());
        node.put("clause", step.clause());
        putIfPresent(node, "remark", step.remark());
        return node;
    }

    private static ObjectNode finding(Finding finding) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("id", finding.id());
        node.put("severity", finding.severity().label());
        node.put("check", finding.check());
        node.put("message", finding.message());
        node.put("basis", finding.basis());
        return node;
    }

    /** Every verdict and severity appears, in the order of the enums, with 0 where the map has none. */
    private static ObjectNode summary(Review.Summary summary) {
        ObjectNode node = MAPPER.createObjectNode();
        node.put("elements", summary.elements());
        for (Verdict verdict : Verdict.values()) {
            node.put(verdict.label(), countOf(summary.verdicts(), verdict));
        }
        ObjectNode findings = node.putObject("findings");
        for (Severity severity : Severity.values()) {
            findings.put(severity.label(), countOf(summary.findings(), severity));
        }
        return node;
    }

    private static <K> int countOf(Map<K, Integer> counts, K key) {
        return counts.getOrDefault(key, 0);
    }

    private static void putIfPresent(ObjectNode node, String key, Optional<String> text) {
        text.ifPresent(t -> node.put(key, t));
    }

    private static void strings(ArrayNode array, List<String> texts) {
        texts.forEach(array::add);
    }

    /** Two-space indent, {@code "key": value}, {@code []} and {@code {}} when empty, {@code "\n"} on every platform. */
    private static DefaultPrettyPrinter prettyPrinter() {
        Separators separators = Separators.createDefaultInstance()
                .withObjectFieldValueSpacing(Separators.Spacing.AFTER)
                .withObjectEmptySeparator("")
                .withArrayEmptySeparator("");
        DefaultIndenter indenter = new DefaultIndenter("  ", "\n");
        return new DefaultPrettyPrinter(separators).withObjectIndenter(indenter).withArrayIndenter(indenter);
    }
}
