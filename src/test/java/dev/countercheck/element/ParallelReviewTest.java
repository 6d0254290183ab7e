package dev.countercheck.element;

import dev.countercheck.report.JsonResultWriter;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.ElementInput;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Elements reviewed in parallel give the same result, in the same order, as one at a time: the JSON
 * result of each sample, and of a project of many elements (the sample's elements repeated in a
 * shuffled order, so that elements of different cost finish out of order), is identical both ways.
 */
class ParallelReviewTest {

    private static final Review.ToolInfo TOOL = new Review.ToolInfo("countercheck", "test");

    @ParameterizedTest
    @ValueSource(strings = {"harbour-lane.yaml", "quayside-annex.yaml"})
    void parallelAndSequentialReviewsWriteTheSameJson(String sample) throws Exception {
        Submission submission = new SubmissionReader(ElementKinds.binders()).read(Path.of("sample-submissions", sample));
        Ruleset rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY)
                .load(submission.ruleset().orElse("en1992-recommended"));
        List<ElementInput> many = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            List<ElementInput> round = new ArrayList<>(submission.elements());
            Collections.shuffle(round, new java.util.Random(i));
            many.addAll(round);
        }
        Submission large = new Submission(submission.file(), submission.sha256(), submission.project(),
                submission.ruleset(), submission.rulesetAt(), List.copyOf(many));
        JsonResultWriter json = new JsonResultWriter();
        for (Submission s : List.of(submission, large)) {
            Review parallel = new ProjectReviewer(TOOL, true).review(s, rules, "2026-12-01");
            Review sequential = new ProjectReviewer(TOOL, false).review(s, rules, "2026-12-01");
            assertThat(parallel.elements().stream().map(ElementReview::id).toList())
                    .isEqualTo(s.elements().stream().map(ElementInput::id).toList());
            assertThat(json.write(parallel)).isEqualTo(json.write(sequential));
        }
    }
}
