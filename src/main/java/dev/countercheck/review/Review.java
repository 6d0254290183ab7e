package dev.countercheck.review;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The finished review of one submission: what the JSON result and the HTML report show.
 *
 * @param reviewDate   ISO date of the review (from {@code --date}, SOURCE_DATE_EPOCH or the clock)
 * @param assumptions  every assumption the review made, in plain words, for the report
 */
public record Review(ToolInfo tool, SubmissionInfo submission, RulesetInfo ruleset, String reviewDate,
                     Verdict verdict, List<ElementReview> elements, Summary summary, List<String> assumptions) {

    /**
     * Whether a gate at {@code threshold} passes: no finding at or above it and every element reviewed
     * (an incomplete element fails the gate whatever the threshold: a gate never passes what it did not check).
     */
    public boolean passesGate(Severity threshold) {
        return elements.stream().noneMatch(e -> e.verdict() == Verdict.INCOMPLETE
                || e.findings().stream().anyMatch(f -> f.severity().atLeast(threshold)));
    }

    public record ToolInfo(String name, String version) {
    }

    public record SubmissionInfo(String file, String sha256, Optional<String> title, Optional<String> reference,
                                 Optional<String> revision, Optional<String> preparedBy, Optional<String> date) {
    }

    /**
     * @param names what each name a rule's formula may write means (parameters, tables, the rule scopes' variables,
     *              the rules' derived quantities), for the report's derivations; the JSON does not carry it
     * @param symbols the standard's symbol of each such name that has one (a parameter's, a table's, a derived
     *                quantity's, a scope variable's {@code symbol}), which the report writes in a rule's formula
     *                for the name; the JSON does not carry it either
     */
    public record RulesetInfo(String id, String title, String sha256, List<String> files, Map<String, String> names,
                              Map<String, String> symbols) {

        /** A ruleset without the meanings and symbols of its names. */
        public RulesetInfo(String id, String title, String sha256, List<String> files) {
            this(id, title, sha256, files, Map.of(), Map.of());
        }
    }

    /**
     * Counts over all elements.
     *
     * @param verdicts element count by verdict
     * @param findings finding count by severity
     */
    public record Summary(int elements, Map<Verdict, Integer> verdicts, Map<Severity, Integer> findings) {
    }
}
