package dev.countercheck.element;

import dev.countercheck.review.Review;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The assumption on generated combinations says what the review did for the kinds the project has: a project of pad
 * footings hears nothing of piles, a project of pile caps nothing of the ground checks of footings (the samples with
 * characteristic loads: Tannery Row's pads, Mill Road's caps).
 */
class CombinationsAssumptionTest {

    @Test
    void aProjectOfPadsIsToldNothingOfPileCaps() throws Exception {
        String assumption = combinationsAssumption("sample-submissions/tannery-row-pads.yaml");
        assertThat(assumption).contains("design approach 1", "overturning").doesNotContainIgnoringCase("pile");
    }

    @Test
    void aProjectOfPileCapsIsToldNothingOfFootings() throws Exception {
        String assumption = combinationsAssumption("sample-submissions/mill-road-depot.yaml");
        assertThat(assumption).contains("For pile caps the GEO and EQU combinations are listed only")
                .doesNotContainIgnoringCase("footing").doesNotContainIgnoringCase("overburden")
                .doesNotContainIgnoringCase("sliding").doesNotContainIgnoringCase("overturning");
    }

    private static String combinationsAssumption(String file) throws Exception {
        Submission s = new SubmissionReader(ElementKinds.binders()).read(Path.of(file));
        Review review = new ProjectReviewer(new Review.ToolInfo("countercheck", "test")).review(s,
                new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load("en1992-recommended"),
                "2026-01-01");
        return review.assumptions().stream().filter(a -> a.startsWith(Combinations.ASSUMPTION)).findFirst()
                .orElseThrow(() -> new AssertionError("no combinations assumption in " + review.assumptions()));
    }
}
