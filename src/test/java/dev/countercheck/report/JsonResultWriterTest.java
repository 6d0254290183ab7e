package dev.countercheck.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Verdict;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The JSON result against the shape of results.md; the review is the invented {@link ReviewFixture}. */
class JsonResultWriterTest {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private final Review review = ReviewFixture.review();
    private final String json = new JsonResultWriter().write(review);
    private final JsonNode root = parse(json);

    @Test
    void topLevelKeysFollowResultsMdInOrder() {
        assertThat(keys(root)).containsExactly("format", "tool", "submission", "ruleset", "review_date", "verdict",
                "elements", "summary", "assumptions");
        assertThat(root.get("format").asText()).isEqualTo("countercheck-result/1");
        assertThat(keys(root.get("tool"))).containsExactly("name", "version");
        assertThat(keys(root.get("ruleset"))).containsExactly("id", "title", "sha256", "files");
        assertThat(root.get("review_date").asText()).isEqualTo("2026-03-14");
        assertThat(root.get("assumptions")).hasSize(review.assumptions().size());
    }

    @Test
    void submissionOmitsAbsentOptionalFields() {
        // The fixture gives title, reference and date, but no revision and no prepared-by.
        JsonNode submission = root.get("submission");
        assertThat(keys(submission)).containsExactly("file", "sha256", "title", "reference", "date");
        assertThat(submission.get("title").asText()).isEqualTo(ReviewFixture.TITLE);
    }

    @Test
    void elementsCarryExactlyTheKeysOfResultsMd() {
        JsonNode element = root.get("elements").get(0);
        assertThat(keys(element)).containsExactly("id", "type", "description", "verdict", "checks", "findings",
                "cautions");
        assertThat(element.get("id").asText()).isEqualTo("PC-D1");
        assertThat(element.get("verdict").asText()).isEqualTo("does-not-conform");
        assertThat(element.get("cautions")).hasSize(1);

        JsonNode finding = element.get("findings").get(0);
        assertThat(keys(finding)).containsExactly("id", "severity", "check", "message", "basis");
        assertThat(finding.get("id").asText()).isEqualTo("PC-D1/shear-x/capacity");
        assertThat(finding.get("severity").asText()).isEqualTo("critical");
    }

    @Test
    void checksCarryValuesClaimsAndTraceInResultsMdShape() {
        JsonNode tie = check(0, 0);
        assertThat(keys(tie)).as("a passing check has utilisation but no reason")
                .containsExactly("id", "title", "basis", "status", "utilisation", "values", "claims", "trace");
        assertThat(tie.get("status").asText()).isEqualTo("pass");
        assertThat(keys(tie.get("values"))).as("values keep the reviewer's order")
                .containsExactly("force", "as_required", "as_provided");
        assertThat(keys(tie.get("values").get("force"))).containsExactly("value", "unit");
        assertThat(tie.get("values").get("force").get("unit").asText()).isEqualTo("kN");

        JsonNode claim = tie.get("claims").get(1);
        assertThat(keys(claim)).containsExactly("quantity", "claimed", "computed", "difference", "verdict");
        assertThat(claim.get("verdict").asText()).isEqualTo("differs-conservative");

        assertThat(keys(tie.get("trace").get(0))).as("a step without remark has no remark key")
                .containsExactly("symbol", "formula", "substituted", "value", "unit", "clause");
        assertThat(keys(tie.get("trace").get(1)))
                .containsExactly("symbol", "formula", "substituted", "value", "unit", "clause", "remark");
        assertThat(tie.get("trace").get(0).get("formula").asText()).isEqualTo("Σ P_i·x_i / z");
    }

    @Test
    void failingCheckHasUtilisationAndReason() {
        JsonNode shear = check(0, 1);
        assertThat(keys(shear)).containsExactly("id", "title", "basis", "status", "utilisation", "reason", "values",
                "claims", "trace");
        assertThat(shear.get("status").asText()).isEqualTo("fail");
        assertThat(shear.get("claims").get(0).get("verdict").asText()).isEqualTo("differs-unconservative");
    }

    @Test
    void notApplicableCheckHasReasonButNoUtilisation() {
        JsonNode shearY = check(1, 1);
        assertThat(keys(shearY)).containsExactly("id", "title", "basis", "status", "reason", "values", "claims",
                "trace");
        assertThat(shearY.get("status").asText()).isEqualTo("not-applicable");
        assertThat(shearY.get("values").isObject()).isTrue();
        assertThat(shearY.get("values")).isEmpty();
        assertThat(shearY.get("trace")).isEmpty();
    }

    @Test
    void aRuleStepIsWrittenLikeAnyOtherStepWithoutItsMark() {
        Review sample = SampleReviews.review(Path.of("sample-submissions/mill-road-depot.yaml"));
        assertThat(sample.elements().stream().flatMap(e -> e.checks().stream()).flatMap(c -> c.trace().stream())
                .anyMatch(Step::fromRule)).as("the sample's detailing rules give marked steps").isTrue();
        List<String> stepKeys = List.of("symbol", "formula", "substituted", "value", "unit", "clause", "remark");
        parse(new JsonResultWriter().write(sample)).findValues("trace").forEach(trace ->
                trace.forEach(step -> assertThat(stepKeys).containsAll(keys(step))));
    }

    @Test
    void noNullIsEverWritten() {
        assertThat(json).doesNotContain("null");
    }

    @Test
    void numbersAreRoundedForOutputInPlainNotation() {
        JsonNode tie = check(0, 0);
        // Source: hand calculation of the rounding rules (fixture values are invented demo data):
        // utilisation 0.8123456 to 4 decimals = 0.8123;
        assertThat(tie.get("utilisation").decimalValue()).isEqualByComparingTo("0.8123");
        // force 812.3456 to 4 significant figures = 812.3;
        assertThat(tie.get("values").get("force").get("value").decimalValue()).isEqualByComparingTo("812.3");
        // as_provided 123456.7 to 4 significant figures = 123500, written without exponent;
        assertThat(json).contains("\"value\": 123500,");
        // claimed 812 is quoted as submitted; difference -0.000425 to 4 decimals = -0.0004.
        JsonNode claim = tie.get("claims").get(0);
        assertThat(claim.get("claimed").decimalValue()).isEqualByComparingTo("812");
        assertThat(claim.get("difference").decimalValue()).isEqualByComparingTo("-0.0004");
        assertThat(json).as("no number in exponent notation").doesNotContainPattern(": -?[0-9.]+[eE]");
    }

    @Test
    void summaryMatchesTheReviewAndListsEveryVerdictAndSeverity() {
        JsonNode summary = root.get("summary");
        assertThat(keys(summary)).containsExactly("elements", "conforms", "conforms-with-remarks",
                "does-not-conform", "incomplete", "findings");
        assertThat(keys(summary.get("findings"))).containsExactly("critical", "major", "minor", "note");

        // The counts are taken from the fixture's elements here, so fixture and summary must agree.
        assertThat(summary.get("elements").asInt()).isEqualTo(review.elements().size());
        for (Verdict verdict : Verdict.values()) {
            long expected = review.elements().stream().filter(e -> e.verdict() == verdict).count();
            assertThat(summary.get(verdict.label()).asLong()).as(verdict.label()).isEqualTo(expected);
        }
        List<Finding> findings = review.elements().stream().map(ElementReview::findings).flatMap(List::stream).toList();
        for (Severity severity : Severity.values()) {
            long expected = findings.stream().filter(f -> f.severity() == severity).count();
            assertThat(summary.get("findings").get(severity.label()).asLong()).as(severity.label())
                    .isEqualTo(expected);
        }
    }

    @Test
    void sameReviewGivesIdenticalBytes() {
        String again = new JsonResultWriter().write(ReviewFixture.review());
        assertThat(again).isEqualTo(json);
        assertThat(new JsonResultWriter().write(review)).isEqualTo(json);
    }

    @Test
    void usesNewlineLineEndsTwoSpaceIndentAndATrailingNewline() {
        assertThat(json).doesNotContain("\r").endsWith("}\n").doesNotEndWith("\n\n");
        assertThat(json).startsWith("{\n  \"format\": \"countercheck-result/1\",\n");
        assertThat(json).as("empty arrays are written compactly").contains("\"trace\": []");
    }

    private JsonNode check(int element, int check) {
        return root.get("elements").get(element).get("checks").get(check);
    }

    private static List<String> keys(JsonNode node) {
        List<String> keys = new ArrayList<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    private static JsonNode parse(String text) {
        try {
            return MAPPER.readTree(text);
        } catch (Exception e) {
            throw new AssertionError("the writer produced invalid JSON", e);
        }
    }
}
