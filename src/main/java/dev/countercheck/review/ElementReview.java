package dev.countercheck.review;

import java.util.List;
import java.util.Optional;

/**
 * The review of one element.
 *
 * @param drawing what the report draws of it; empty for an element that could not be reviewed
 * @param combinations the combinations generated from the element's characteristic loads (none without loads)
 */
public record ElementReview(String id, String type, String description, Verdict verdict,
                            List<CheckResult> checks, List<Finding> findings, List<String> cautions,
                            Optional<Drawing> drawing, List<GeneratedCase> combinations) {

    /** The review of an element with no generated combinations. */
    public ElementReview(String id, String type, String description, Verdict verdict, List<CheckResult> checks,
                         List<Finding> findings, List<String> cautions, Optional<Drawing> drawing) {
        this(id, type, description, verdict, checks, findings, cautions, drawing, List.of());
    }

    /** The same review listing {@code generated}. */
    public ElementReview withCombinations(List<GeneratedCase> generated) {
        return new ElementReview(id, type, description, verdict, checks, findings, cautions, drawing,
                List.copyOf(generated));
    }
}
