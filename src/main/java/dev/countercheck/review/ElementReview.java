package dev.countercheck.review;

import java.util.List;
import java.util.Optional;

/**
 * The review of one element.
 *
 * @param drawing what the report draws of it; empty for an element that could not be reviewed
 */
public record ElementReview(String id, String type, String description, Verdict verdict,
                            List<CheckResult> checks, List<Finding> findings, List<String> cautions,
                            Optional<Drawing> drawing) {
}
