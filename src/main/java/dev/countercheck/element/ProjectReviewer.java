package dev.countercheck.element;

import dev.countercheck.review.ClaimComparer;
import dev.countercheck.review.CaseActions;
import dev.countercheck.review.ElementAssembler;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.FindingKind;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.SeverityPolicy;
import dev.countercheck.review.Verdict;
import dev.countercheck.ruleset.RuleVocabulary;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.ElementInput;
import dev.countercheck.submission.IncompleteElement;
import dev.countercheck.submission.Submission;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * Reviews a whole submission: each element by the kind of its type, then the summary. The elements
 * are independent, so several are reviewed at once on the common fork-join pool (one per core); the
 * results keep the submission's order and are the same as one at a time. The system property
 * {@value #PARALLEL_PROPERTY}{@code =false} reviews them one at a time.
 */
public final class ProjectReviewer {

    /** Set to {@code false} to review the elements of a submission one at a time. */
    public static final String PARALLEL_PROPERTY = "countercheck.parallel";

    /** Stated on every report and in the README (rule of the product). */
    public static final String GENERAL_CAUTION = "This review assists a competent engineer and does not replace one."
            + " Local codes, the applicable National Annex and licensed engineering practice govern.";

    /** What the tool does not review at all, stated in every report beside the checks it did not do. */
    public static final String OUT_OF_SCOPE = "This tool reviews pile caps and pad footings only. It does not review"
            + " other foundation elements (strip footings, ground beams, rafts), the piles themselves (their design"
            + " resistances are taken as submitted), the ground beyond the pad checks it names (settlement, pile group"
            + " effects, the ground under pile caps), or the columns and walls above; nothing about them is checked here.";

    /** The ruleset parameter that holds the absolute claim tolerance of each catalogue unit. */
    private static final Map<String, String> CLAIM_FLOORS = Map.of("kN", "claim_floor_force",
            "kNm", "claim_floor_moment", "mm", "claim_floor_length", "mm2", "claim_floor_area",
            "MPa", "claim_floor_stress", "kPa", "claim_floor_pressure", "deg", "claim_floor_angle", "-",
            "claim_floor_ratio");

    /** Every ruleset parameter a review reads in Java; the ruleset loader refuses a chain that lacks one. */
    public static final Set<String> REQUIRED_PARAMETERS = requiredParameters();

    /** What a ruleset's rules may use and define, and the parameters the engine reads. */
    public static final RuleVocabulary RULE_VOCABULARY = ElementKinds.vocabulary(REQUIRED_PARAMETERS,
            Arrays.stream(FindingKind.values()).map(FindingKind::key).collect(Collectors.toUnmodifiableSet()));

    private final Review.ToolInfo tool;
    private final boolean parallel;

    /** Reviews elements in parallel unless the system property {@value #PARALLEL_PROPERTY} is {@code false}. */
    public ProjectReviewer(Review.ToolInfo tool) {
        this(tool, !"false".equals(System.getProperty(PARALLEL_PROPERTY)));
    }

    /** @param parallel whether several elements are reviewed at once */
    public ProjectReviewer(Review.ToolInfo tool, boolean parallel) {
        this.tool = tool;
        this.parallel = parallel;
    }

    public Review review(Submission submission, Ruleset rules, String reviewDate) {
        SeverityPolicy severities = new SeverityPolicy(rules::severity);
        ElementAssembler assembler = new ElementAssembler(new ClaimComparer(rules.number("claim_tolerance"),
                claimFloors(rules)), severities);
        Function<ElementInput, ElementReview> one = e -> {
            ElementKind<?> kind = ElementKinds.of(e.type()).orElseThrow(
                    () -> new IllegalStateException("no element kind of type " + e.type()));
            return e instanceof IncompleteElement inc ? incomplete(inc, severities) : review(kind, e, rules, assembler);
        };
        Stream<ElementInput> inputs = submission.elements().stream();
        List<ElementReview> elements = (parallel ? inputs.parallel() : inputs).map(one).toList();
        List<String> assumptions = new ArrayList<>();
        assumptions.add(GENERAL_CAUTION);
        assumptions.add("Nationally determined parameters come from ruleset " + rules.id() + " (" + rules.title()
                + "); every value used is shown in the calculation trace with the file that set it.");
        List<String> recalled = rules.recalled();
        if (!recalled.isEmpty()) {
            assumptions.add("Values of ruleset " + rules.id() + " recalled from memory, not yet verified against the"
                    + " printed standard or annex (verify them before relying on a check that uses them; the trace"
                    + " marks each step that does): " + String.join("; ", recalled) + ".");
        }
        ElementKinds.ALL.stream().filter(k -> submission.elements().stream().anyMatch(e -> e.type().equals(k.type())))
                .forEach(k -> assumptions.addAll(k.assumptions()));
        List<String> combined = ElementKinds.ALL.stream().filter(k -> elements.stream()
                .anyMatch(e -> e.type().equals(k.type()) && !e.combinations().isEmpty()))
                .map(ElementKind::combinationsAssumption).toList();
        if (!combined.isEmpty()) {
            // what every kind assumes of its generated combinations, for the kinds that have some
            assumptions.add(Combinations.ASSUMPTION + " " + String.join(" ", combined));
        }
        assumptions.add("Checks marked not-checked were not performed; the review says nothing about them.");
        var p = submission.project();
        return new Review(tool,
                new Review.SubmissionInfo(submission.file(), submission.sha256(), p.title(), p.reference(),
                        p.revision(), p.preparedBy(), p.date()),
                new Review.RulesetInfo(rules.id(), rules.title(), rules.sha256(), rules.files(), RulesetNames.of(rules),
                        RulesetNames.symbols(rules)),
                reviewDate, ElementAssembler.overall(elements), elements, summary(elements),
                List.copyOf(assumptions));
    }

    private static <E extends ElementInput> ElementReview review(ElementKind<E> kind, ElementInput element,
                                                                 Ruleset rules, ElementAssembler assembler) {
        return kind.review(kind.elementClass().cast(element), rules, assembler).withCases(element.actions().stream()
                .map(a -> new CaseActions(a.name(), a.kind().label(), a.nKn(), a.mxKnm(), a.myKnm(), a.hxKn(),
                        a.hyKn())).toList());
    }

    /** An element that could not be reviewed: a finding of its own kind (major as recommended), never a pass. */
    private static ElementReview incomplete(IncompleteElement e, SeverityPolicy severities) {
        Finding f = new Finding(e.id() + "/input/" + FindingKind.NOT_REVIEWED.key(),
                severities.of(FindingKind.NOT_REVIEWED), "input",
                "The element could not be reviewed; missing: " + String.join(", ", e.missing()) + ".",
                "submission format");
        return new ElementReview(e.id(), e.type(), e.description(), Verdict.INCOMPLETE, List.of(), List.of(f),
                List.of("No check of " + e.id() + " was performed."), Optional.empty());
    }

    /** The absolute claim tolerance by unit, from the ruleset (pile-cap-method.md, Revision 2 item 13). */
    static Map<String, Double> claimFloors(Ruleset rules) {
        Map<String, Double> floors = new java.util.HashMap<>();
        CLAIM_FLOORS.forEach((unit, name) -> floors.put(unit, rules.number(name)));
        return floors;
    }

    private static Set<String> requiredParameters() {
        Set<String> all = new TreeSet<>(Set.of("claim_tolerance", "cover_deviation"));
        all.addAll(Combinations.PARAMETERS);
        all.addAll(CLAIM_FLOORS.values());
        ElementKinds.ALL.forEach(k -> all.addAll(k.parameters()));
        return Set.copyOf(all);
    }

    private static Review.Summary summary(List<ElementReview> elements) {
        Map<Verdict, Integer> verdicts = new EnumMap<>(Verdict.class);
        Map<Severity, Integer> findings = new EnumMap<>(Severity.class);
        for (Verdict v : Verdict.values()) {
            verdicts.put(v, 0);
        }
        for (Severity s : Severity.values()) {
            findings.put(s, 0);
        }
        for (ElementReview e : elements) {
            verdicts.merge(e.verdict(), 1, Integer::sum);
            e.findings().forEach(f -> findings.merge(f.severity(), 1, Integer::sum));
        }
        return new Review.Summary(elements.size(), verdicts, findings);
    }

}
