package dev.countercheck.element.pilecap;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Review;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;

import java.net.URISyntaxException;
import java.nio.file.Path;

/** Reviews test submissions from the classpath with the shipped rulesets. */
final class CapReviews {

    private CapReviews() {
    }

    static Ruleset ruleset(String id) {
        try {
            return new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY).load(id);
        } catch (Exception e) {
            throw new AssertionError("ruleset " + id + " does not load: " + e.getMessage(), e);
        }
    }

    static Review review(String resource, String rulesetId) {
        return review(resource, java.util.Optional.of(rulesetId));
    }

    /** The first element of a test submission, reviewed with the ruleset its basis names (else recommended). */
    static ElementReview elementAsSubmitted(String resource) {
        return review(resource, java.util.Optional.empty()).elements().get(0);
    }

    private static Review review(String resource, java.util.Optional<String> rulesetId) {
        try {
            Path file = Path.of(CapReviews.class.getResource(resource).toURI());
            Submission s = new SubmissionReader(ElementKinds.binders()).read(file);
            Ruleset rules = ruleset(rulesetId.or(s::ruleset).orElse("en1992-recommended"));
            return new ProjectReviewer(new Review.ToolInfo("countercheck", "test")).review(s, rules, "2026-01-01");
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        } catch (dev.countercheck.submission.SubmissionException e) {
            throw new AssertionError("test submission " + resource + " is invalid: " + e.errors(), e);
        }
    }

    static ElementReview element(String resource) {
        return review(resource, "en1992-recommended").elements().get(0);
    }

    static CheckResult check(ElementReview e, String id) {
        return e.checks().stream().filter(c -> c.id().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no check " + id));
    }

    static double value(ElementReview e, String check, String quantity) {
        var v = check(e, check).values().get(quantity);
        if (v == null) {
            throw new AssertionError(check + " has no value " + quantity + "; it has " + check(e, check).values()
                    + " (status " + check(e, check).status() + ", " + check(e, check).reason() + ")");
        }
        return v.value();
    }
}
