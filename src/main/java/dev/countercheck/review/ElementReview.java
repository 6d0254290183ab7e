package dev.countercheck.review;

import java.util.List;
import java.util.Optional;

/**
 * The review of one element.
 *
 * @param drawing what the report draws of it; empty for an element that could not be reviewed
 * @param combinations the combinations generated from the element's characteristic loads (none without loads)
 * @param cases        the designer's action cases of the element, as numbers (the generated ones are the combinations)
 */
public record ElementReview(String id, String type, String description, Verdict verdict,
                            List<CheckResult> checks, List<Finding> findings, List<String> cautions,
                            Optional<Drawing> drawing, List<GeneratedCase> combinations, List<CaseActions> cases) {

    /** The review of an element with no generated combinations. */
    public ElementReview(String id, String type, String description, Verdict verdict, List<CheckResult> checks,
                         List<Finding> findings, List<String> cautions, Optional<Drawing> drawing) {
        this(id, type, description, verdict, checks, findings, cautions, drawing, List.of(), List.of());
    }

    /** The review of an element with generated combinations and no action cases listed. */
    public ElementReview(String id, String type, String description, Verdict verdict, List<CheckResult> checks,
                         List<Finding> findings, List<String> cautions, Optional<Drawing> drawing,
                         List<GeneratedCase> combinations) {
        this(id, type, description, verdict, checks, findings, cautions, drawing, combinations, List.of());
    }

    /** The same review listing {@code generated}. */
    public ElementReview withCombinations(List<GeneratedCase> generated) {
        return new ElementReview(id, type, description, verdict, checks, findings, cautions, drawing,
                List.copyOf(generated), cases);
    }

    /** The same review listing the designer's action {@code cases}. */
    public ElementReview withCases(List<CaseActions> designerCases) {
        return new ElementReview(id, type, description, verdict, checks, findings, cautions, drawing, combinations,
                List.copyOf(designerCases));
    }

    /** The case named {@code name}, the designer's or a generated one, when the element has it. */
    public Optional<CaseActions> caseNamed(String name) {
        return cases.stream().filter(c -> c.name().equals(name)).findFirst()
                .or(() -> combinations.stream().filter(g -> g.name().equals(name)).findFirst()
                        .map(g -> new CaseActions(g.name(), g.kind(), g.nKn(), g.mxKnm(), g.myKnm(), g.hxKn(),
                                g.hyKn())));
    }
}
