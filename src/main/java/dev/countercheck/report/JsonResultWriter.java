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
 * {@link ReportNumbers} says. Streamed into the generator as it goes, element by element, with no tree
 * built on the way (the header and the round's parts excepted, which are small). Two-space indent, {@code "\n"} line ends, a trailing newline:
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
        TextWriter out = new TextWriter();
        try {
            write(review, round, out);
        } catch (IOException e) {
            // Text in memory does not fail; strings and numbers always serialise.
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
                element(g, element);
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
        ruleset.files().forEach(node.putArray("files")::add);
        return node;
    }

    private static void element(JsonGenerator g, ElementReview element) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", element.id());
        g.writeStringField("type", element.type());
        g.writeStringField("description", element.description());
        g.writeStringField("verdict", element.verdict().label());
        array(g, "checks", element.checks(), JsonResultWriter::check);
        array(g, "findings", element.findings(), JsonResultWriter::finding);
        strings(g, "cautions", element.cautions());
        if (!element.combinations().isEmpty()) {
            array(g, "combinations", element.combinations(), JsonResultWriter::combination);
        }
        g.writeEndObject();
    }

    private static void combination(JsonGenerator g, GeneratedCase c) throws IOException {
        g.writeStartObject();
        g.writeStringField("name", c.name());
        g.writeStringField("kind", c.kind());
        number(g, "N", ReportNumbers.quantityText(c.nKn()));
        number(g, "Mx", ReportNumbers.quantityText(c.mxKnm()));
        number(g, "My", ReportNumbers.quantityText(c.myKnm()));
        number(g, "Hx", ReportNumbers.quantityText(c.hxKn()));
        number(g, "Hy", ReportNumbers.quantityText(c.hyKn()));
        number(g, "gamma_self_weight", ReportNumbers.ratioText(c.selfWeightFactor()));
        g.writeFieldName("trace");
        step(g, c.trace());
        strings(g, "governs", c.governs());
        g.writeEndObject();
    }

    private static void check(JsonGenerator g, CheckResult check) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", check.id());
        g.writeStringField("title", check.title());
        g.writeStringField("basis", check.basis());
        g.writeStringField("status", check.status().label());
        if (check.utilisation().isPresent()) {
            number(g, "utilisation", ReportNumbers.ratioText(check.utilisation().getAsDouble()));
        }
        stringIfPresent(g, "governing_case", check.governingCase());
        stringIfPresent(g, "reason", check.reason());
        g.writeObjectFieldStart("values");
        for (Map.Entry<String, Value> value : check.values().entrySet()) {
            g.writeObjectFieldStart(value.getKey());
            number(g, "value", ReportNumbers.quantityText(value.getValue().value()));
            g.writeStringField("unit", value.getValue().unit());
            g.writeEndObject();
        }
        g.writeEndObject();
        array(g, "claims", check.claims(), JsonResultWriter::claim);
        array(g, "trace", check.trace(), JsonResultWriter::step);
        g.writeEndObject();
    }

    private static void claim(JsonGenerator g, ClaimComparison claim) throws IOException {
        g.writeStartObject();
        g.writeStringField("quantity", claim.quantity());
        number(g, "claimed", ReportNumbers.claimedText(claim.claimed()));
        number(g, "computed", ReportNumbers.quantityText(claim.computed()));
        number(g, "difference", ReportNumbers.ratioText(claim.difference()));
        g.writeStringField("verdict", claim.verdict().label());
        g.writeEndObject();
    }

    private static void step(JsonGenerator g, Step step) throws IOException {
        g.writeStartObject();
        g.writeStringField("symbol", step.symbol());
        g.writeStringField("formula", step.formula());
        g.writeStringField("substituted", step.substituted());
        number(g, "value", ReportNumbers.quantityText(step.value()));
        g.writeStringField("unit", step.unit());
        g.writeStringField("clause", step.clause());
        stringIfPresent(g, "remark", step.remark());
        g.writeEndObject();
    }

    private static void finding(JsonGenerator g, Finding finding) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", finding.id());
        g.writeStringField("severity", finding.severity().label());
        g.writeStringField("check", finding.check());
        g.writeStringField("message", finding.message());
        g.writeStringField("basis", finding.basis());
        g.writeEndObject();
    }

    /** A number already written as its plain decimal text ({@link ReportNumbers}), unquoted. */
    private static void number(JsonGenerator g, String name, String plain) throws IOException {
        g.writeFieldName(name);
        g.writeNumber(plain);
    }

    private static void stringIfPresent(JsonGenerator g, String name, Optional<String> text) throws IOException {
        if (text.isPresent()) {
            g.writeStringField(name, text.get());
        }
    }

    private static void strings(JsonGenerator g, String name, List<String> texts) throws IOException {
        array(g, name, texts, JsonGenerator::writeString);
    }

    /** The array {@code name} of {@code items}, each written by {@code item}. */
    private static <T> void array(JsonGenerator g, String name, List<T> items, Item<T> item) throws IOException {
        g.writeArrayFieldStart(name);
        for (T t : items) {
            item.write(g, t);
        }
        g.writeEndArray();
    }

    /** Writes one item of an array. */
    @FunctionalInterface
    private interface Item<T> {
        void write(JsonGenerator g, T item) throws IOException;
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
