package dev.countercheck.review;

import java.util.List;

/** The review of one element. */
public record ElementReview(String id, String type, String description, Verdict verdict,
                            List<CheckResult> checks, List<Finding> findings, List<String> cautions) {
}
