package dev.countercheck.element;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Finding ids are stable across a revision: the designer fixes one claim (writes the recomputed value)
 * and resubmits; that claim's finding closes and every other finding keeps its id.
 */
class FindingIdsAcrossRevisionsTest {

    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory());
    private static final ObjectMapper JSON = new ObjectMapper();

    static Stream<Path> samples() throws IOException {
        return Files.list(Path.of("sample-submissions")).filter(p -> p.toString().endsWith(".yaml")).sorted();
    }

    @ParameterizedTest
    @MethodSource("samples")
    void fixingOneClaimClosesItsFindingAndRenamesNoOther(Path sample, @TempDir Path dir) throws Exception {
        JsonNode original = YAML.readTree(sample.toFile());
        Review before = review(original, dir.resolve("p01.json"));
        Set<String> idsBefore = ids(before);
        List<Disagreement> disagreements = disagreements(before);
        assertThat(disagreements).as("the sample should have a claim to fix").isNotEmpty();
        for (Disagreement d : disagreements) {
            ObjectNode revised = original.deepCopy();
            for (JsonNode e : revised.get("elements")) {
                if (e.get("id").asText().equals(d.element())) {
                    ((ObjectNode) e.get("claims").get(d.check())).put(d.quantity(), d.computed());
                }
            }
            Review after = review(revised, dir.resolve("p02.json"));
            Set<String> expected = new TreeSet<>(idsBefore);
            expected.remove(d.findingId());
            assertThat(ids(after)).as("after fixing " + d.findingId()).isEqualTo(expected);
        }
    }

    /** A claim that raised a finding: fixing it must close exactly that finding. */
    record Disagreement(String element, String check, String quantity, double computed, String findingId) {
    }

    private static List<Disagreement> disagreements(Review review) {
        List<Disagreement> out = new ArrayList<>();
        for (ElementReview e : review.elements()) {
            e.checks().forEach(c -> {
                for (ClaimComparison claim : c.claims()) {
                    String id = e.id() + "/" + c.id() + "/claim-" + claim.quantity().replace('_', '-');
                    if (e.findings().stream().anyMatch(f -> f.id().equals(id))) {
                        out.add(new Disagreement(e.id(), c.id(), claim.quantity(), claim.computed(), id));
                    }
                }
            });
        }
        return out;
    }

    private static Set<String> ids(Review review) {
        return review.elements().stream().flatMap(e -> e.findings().stream()).map(Finding::id)
                .collect(Collectors.toCollection(TreeSet::new));
    }

    private static Review review(JsonNode submission, Path file) throws Exception {
        Files.writeString(file, JSON.writeValueAsString(submission));
        Submission s = new SubmissionReader(ElementKinds.binders()).read(file);
        var rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY)
                .load(s.ruleset().orElse("en1992-recommended"));
        return new ProjectReviewer(new Review.ToolInfo("countercheck", "test")).review(s, rules, "2026-12-01");
    }
}
