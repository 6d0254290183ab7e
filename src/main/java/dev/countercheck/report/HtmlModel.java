package dev.countercheck.report;

import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Value;
import dev.countercheck.review.Verdict;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.IntStream;

/**
 * What {@code templates/review.ftlh} shows: the review flattened to text, with every number
 * already formatted ({@link ReportNumbers}), so the template neither formats nor decides.
 * An absent value is the empty string; the template tests it with {@code ?has_content}.
 * Enum values travel as their JSON labels. Anchors are positional ({@code e2}, {@code e2-c3})
 * because element and check ids may hold any character.
 *
 * <p>Public only because the template engine reads public members of public classes; it is the
 * template's view, not an API: build reports with {@link HtmlReportWriter}.
 */
public record HtmlModel(Header header, List<Count> verdictCounts, List<Count> severityCounts, List<String> assumptions,
                 List<FindingRow> register, List<ElementView> elements) {

    public record Header(String title, String reference, String revision, String preparedBy, String submissionDate,
                  String file, String sha256, String rulesetId, String rulesetTitle, String rulesetSha256,
                  List<String> rulesetFiles, String toolName, String toolVersion, String reviewDate,
                  String verdict, int elementCount) {
    }

    public record Count(String label, int count) {
    }

    public record FindingRow(String id, String elementId, String elementAnchor, String severity, String check,
                      String checkAnchor, String basis, String message) {
    }

    public record ElementView(String anchor, String id, String type, String description, String verdict,
                       List<CheckView> checks, List<FindingRow> findings, List<String> cautions) {
    }

    public record CheckView(String anchor, String id, String title, String basis, String status, String utilisation,
                     String reason, List<QuantityView> quantities, List<StepView> trace) {
    }

    /** A computed quantity, with the designer's claim beside it when there is one. */
    public record QuantityView(String name, String value, String unit, String claimed, String difference,
                        String claimVerdict) {
    }

    public record StepView(String symbol, String formula, String substituted, String value, String unit, String clause,
                    String remark) {
    }

    static HtmlModel of(Review review) {
        List<ElementView> elements = IntStream.range(0, review.elements().size())
                .mapToObj(i -> element(review.elements().get(i), "e" + (i + 1)))
                .toList();
        List<FindingRow> register = elements.stream().flatMap(e -> e.findings().stream()).toList();
        return new HtmlModel(header(review), verdictCounts(review.summary()), severityCounts(review.summary()),
                review.assumptions(), register, elements);
    }

    private static Header header(Review review) {
        Review.SubmissionInfo s = review.submission();
        Review.RulesetInfo r = review.ruleset();
        return new Header(text(s.title()), text(s.reference()), text(s.revision()), text(s.preparedBy()),
                text(s.date()), s.file(), s.sha256(), r.id(), r.title(), r.sha256(), r.files(),
                review.tool().name(), review.tool().version(), review.reviewDate(), review.verdict().label(),
                review.summary().elements());
    }

    private static List<Count> verdictCounts(Review.Summary summary) {
        return List.of(Verdict.values()).stream()
                .map(v -> new Count(v.label(), summary.verdicts().getOrDefault(v, 0)))
                .toList();
    }

    private static List<Count> severityCounts(Review.Summary summary) {
        return List.of(Severity.values()).stream()
                .map(s -> new Count(s.label(), summary.findings().getOrDefault(s, 0)))
                .toList();
    }

    private static ElementView element(ElementReview element, String anchor) {
        List<CheckView> checks = IntStream.range(0, element.checks().size())
                .mapToObj(i -> check(element.checks().get(i), anchor + "-c" + (i + 1)))
                .toList();
        List<FindingRow> findings = element.findings().stream()
                .map(f -> findingRow(f, element.id(), anchor, checks))
                .toList();
        return new ElementView(anchor, element.id(), element.type(), element.description(),
                element.verdict().label(), checks, findings, element.cautions());
    }

    private static FindingRow findingRow(Finding finding, String elementId, String elementAnchor,
                                         List<CheckView> checks) {
        String checkAnchor = checks.stream()
                .filter(c -> c.id().equals(finding.check()))
                .map(CheckView::anchor)
                .findFirst()
                .orElse("");
        return new FindingRow(finding.id(), elementId, elementAnchor, finding.severity().label(), finding.check(),
                checkAnchor, finding.basis(), finding.message());
    }

    private static CheckView check(CheckResult check, String anchor) {
        String utilisation = check.utilisation().isPresent()
                ? ReportNumbers.ratioText(check.utilisation().getAsDouble())
                : "";
        return new CheckView(anchor, check.id(), check.title(), check.basis(), check.status().label(),
                utilisation, text(check.reason()), quantities(check),
                check.trace().stream().map(HtmlModel::step).toList());
    }

    /**
     * The computed values in their order, each with its claim; then any claim whose quantity is not
     * among the values (shown with the computed value the claim carries, unit unknown).
     */
    private static List<QuantityView> quantities(CheckResult check) {
        List<QuantityView> rows = new ArrayList<>();
        for (Map.Entry<String, Value> entry : check.values().entrySet()) {
            Value value = entry.getValue();
            Optional<ClaimComparison> claim = claimFor(check, entry.getKey());
            rows.add(quantity(entry.getKey(), ReportNumbers.quantityText(value.value()), value.unit(), claim));
        }
        check.claims().stream()
                .filter(c -> !check.values().containsKey(c.quantity()))
                .forEach(c -> rows.add(quantity(c.quantity(), ReportNumbers.quantityText(c.computed()), "",
                        Optional.of(c))));
        return rows;
    }

    private static Optional<ClaimComparison> claimFor(CheckResult check, String quantity) {
        return check.claims().stream().filter(c -> c.quantity().equals(quantity)).findFirst();
    }

    private static QuantityView quantity(String name, String value, String unit, Optional<ClaimComparison> claim) {
        return new QuantityView(name, value, unit,
                claim.map(c -> ReportNumbers.claimedText(c.claimed())).orElse(""),
                claim.map(c -> ReportNumbers.percentText(c.difference())).orElse(""),
                claim.map(c -> c.verdict().label()).orElse(""));
    }

    private static StepView step(Step step) {
        return new StepView(step.symbol(), step.formula(), step.substituted(), ReportNumbers.quantityText(step.value()),
                step.unit(), step.clause(), text(step.remark()));
    }

    private static String text(Optional<String> optional) {
        return optional.orElse("");
    }
}
