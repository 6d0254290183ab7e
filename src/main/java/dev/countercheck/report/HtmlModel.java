package dev.countercheck.report;

import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.Drawing;
import dev.countercheck.review.PileCapDrawing;
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
 * already formatted ({@link ReportNumbers}) and every drawing already drawn (SVG text whose every
 * piece of submitted text is escaped), so the template neither formats nor decides. An absent
 * value is the empty string; the template tests it with {@code ?has_content}. Enum values travel
 * as their JSON labels. Anchors are positional ({@code e2}, {@code e2-c3}, {@code e2-c3-s4})
 * because element and check ids may hold any character.
 *
 * <p>Public only because the template engine reads public members of public classes; it is the
 * template's view, not an API: build reports with {@link HtmlReportWriter}.
 *
 * @param pageHeading the running head of printed pages, already a quoted CSS string
 * @param cautions    the elements' cautions, for the closing section, elements without any left out
 */
public record HtmlModel(Header header, String pageHeading, List<Count> verdictCounts, List<Count> severityCounts,
                        List<String> assumptions, List<FindingRow> register, List<ElementView> elements,
                        List<ElementCautions> cautions) {

    public record Header(String title, String reference, String revision, String preparedBy, String submissionDate,
                         String file, String sha256, String rulesetId, String rulesetTitle, String rulesetSha256,
                         List<String> rulesetFiles, String toolName, String toolVersion, String reviewDate,
                         String verdict, int elementCount, int findingCount) {
    }

    public record Count(String label, int count) {
    }

    /** A finding; {@code checkAnchor} is its check's place in the report, or empty when the check is not listed. */
    public record FindingRow(String id, String elementId, String elementAnchor, String severity, String checkAnchor,
                             String basis, String message) {
    }

    /**
     * One element.
     *
     * @param number   its section number in the report, e.g. "2.3"
     * @param drawings its drawings: one set for a pile cap, none for an element that was not reviewed
     */
    public record ElementView(String anchor, String number, String id, String type, String description,
                              String verdict, List<CheckView> checks, List<FindingRow> findings, int cautionCount,
                              List<DrawingView> drawings) {
    }

    /**
     * @param failing     whether the check failed (to mark its row)
     * @param utilisation two decimals rounded up, or empty
     */
    public record CheckView(String anchor, String id, String title, String basis, String status, boolean failing,
                            String utilisation, String reason, List<QuantityView> quantities, List<StepView> trace) {
    }

    /**
     * A computed quantity, with the designer's claim beside it when there is one.
     *
     * @param stepAnchor the trace step that computed it, or empty when no step matches
     * @param stepNumber that step's number in the check's trace, or empty
     */
    public record QuantityView(String name, String value, String unit, String claimed, String difference,
                               String claimVerdict, String stepAnchor, String stepNumber) {
    }

    public record StepView(String anchor, int number, String symbol, String formula, String substituted, String value,
                           String unit, String clause, String remark) {
    }

    /** An element's drawings (SVG text), legend and fail tags. */
    public record DrawingView(String plan, String section, List<LegendRow> legend, List<MarkRow> marks) {
    }

    /** A sample of a line or symbol (SVG text) and what it stands for. */
    public record LegendRow(String sample, String text) {
    }

    /** A fail tag on the drawings: the failing check, what is marked, and its findings. */
    public record MarkRow(String tag, String checkId, String checkTitle, String where, List<String> findingIds) {
    }

    public record ElementCautions(String elementId, String anchor, List<String> cautions) {
    }

    static HtmlModel of(Review review) {
        List<ElementView> elements = IntStream.range(0, review.elements().size())
                .mapToObj(i -> element(review.elements().get(i), i + 1))
                .toList();
        List<FindingRow> register = elements.stream().flatMap(e -> e.findings().stream()).toList();
        List<ElementCautions> cautions = IntStream.range(0, review.elements().size())
                .filter(i -> !review.elements().get(i).cautions().isEmpty())
                .mapToObj(i -> new ElementCautions(review.elements().get(i).id(), "e" + (i + 1),
                        review.elements().get(i).cautions()))
                .toList();
        return new HtmlModel(header(review), PageHeading.css(review), verdictCounts(review.summary()),
                severityCounts(review.summary()), review.assumptions(), register, elements, cautions);
    }

    private static Header header(Review review) {
        Review.SubmissionInfo s = review.submission();
        Review.RulesetInfo r = review.ruleset();
        int findings = review.summary().findings().values().stream().mapToInt(Integer::intValue).sum();
        return new Header(text(s.title()), text(s.reference()), text(s.revision()), text(s.preparedBy()),
                text(s.date()), s.file(), s.sha256(), r.id(), r.title(), r.sha256(), r.files(),
                review.tool().name(), review.tool().version(), review.reviewDate(), review.verdict().label(),
                review.summary().elements(), findings);
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

    private static ElementView element(ElementReview element, int position) {
        String anchor = "e" + position;
        List<CheckView> checks = IntStream.range(0, element.checks().size())
                .mapToObj(i -> check(element.checks().get(i), anchor + "-c" + (i + 1)))
                .toList();
        List<FindingRow> findings = element.findings().stream()
                .map(f -> findingRow(f, element.id(), anchor, checks))
                .toList();
        List<DrawingView> drawings = element.drawing().map(d -> List.of(drawing(anchor, element, d)))
                .orElse(List.of());
        return new ElementView(anchor, "2." + position, element.id(), element.type(), element.description(),
                element.verdict().label(), checks, findings, element.cautions().size(), drawings);
    }

    /** The element's drawing as its kind renders it; the report never asks which kind it is. */
    private static DrawingView drawing(String anchor, ElementReview element, Drawing drawing) {
        return drawing.accept(new Drawing.Visitor<>() {
            @Override
            public DrawingView pileCap(PileCapDrawing cap) {
                DrawingMarks marks = DrawingMarks.of(element, cap);
                return new DrawingView(PlanDrawing.svg(anchor, cap, marks), SectionDrawing.svg(anchor, cap, marks),
                        DrawingLegend.rows(anchor, cap, !marks.all().isEmpty()), DrawingLegend.marks(marks));
            }
        });
    }

    private static FindingRow findingRow(Finding finding, String elementId, String elementAnchor,
                                         List<CheckView> checks) {
        String checkAnchor = checks.stream()
                .filter(c -> c.id().equals(finding.check()))
                .map(CheckView::anchor)
                .findFirst()
                .orElse("");
        return new FindingRow(finding.id(), elementId, elementAnchor, finding.severity().label(), checkAnchor,
                finding.basis(), finding.message());
    }

    private static CheckView check(CheckResult check, String anchor) {
        String utilisation = check.utilisation().isPresent()
                ? ReportNumbers.utilisation(check.utilisation().getAsDouble())
                : "";
        List<StepView> trace = IntStream.range(0, check.trace().size())
                .mapToObj(i -> step(check.trace().get(i), anchor + "-s" + (i + 1), i + 1))
                .toList();
        return new CheckView(anchor, check.id(), check.title(), check.basis(), check.status().label(),
                check.status() == CheckStatus.FAIL, utilisation, text(check.reason()), quantities(check, trace),
                trace);
    }

    /**
     * The computed values in their order, each with its claim and the trace step that computed it;
     * then any claim whose quantity is not among the values (shown with the computed value the claim
     * carries, unit unknown).
     */
    private static List<QuantityView> quantities(CheckResult check, List<StepView> trace) {
        List<QuantityView> rows = new ArrayList<>();
        for (Map.Entry<String, Value> entry : check.values().entrySet()) {
            Value value = entry.getValue();
            Optional<ClaimComparison> claim = claimFor(check, entry.getKey());
            Optional<StepView> step = value.step().isPresent() ? Optional.of(trace.get(value.step().getAsInt()))
                    : Optional.empty();
            rows.add(quantity(entry.getKey(), ReportNumbers.display(value.value(), value.unit()),
                    ReportNumbers.unit(value.unit()), claim, step));
        }
        check.claims().stream()
                .filter(c -> !check.values().containsKey(c.quantity()))
                .forEach(c -> rows.add(quantity(c.quantity(), ReportNumbers.quantityText(c.computed()), "",
                        Optional.of(c), Optional.empty())));
        return rows;
    }

    private static Optional<ClaimComparison> claimFor(CheckResult check, String quantity) {
        return check.claims().stream().filter(c -> c.quantity().equals(quantity)).findFirst();
    }

    private static QuantityView quantity(String name, String value, String unit, Optional<ClaimComparison> claim,
                                         Optional<StepView> step) {
        return new QuantityView(name, value, unit,
                claim.map(c -> ReportNumbers.claimedText(c.claimed())).orElse(""),
                claim.map(c -> ReportNumbers.percentText(c.difference())).orElse(""),
                claim.map(c -> c.verdict().label()).orElse(""),
                step.map(StepView::anchor).orElse(""),
                step.map(s -> String.valueOf(s.number())).orElse(""));
    }

    private static StepView step(Step step, String anchor, int number) {
        return new StepView(anchor, number, step.symbol(), step.formula(), step.substituted(),
                ReportNumbers.display(step.value(), step.unit()), ReportNumbers.unit(step.unit()), step.clause(),
                text(step.remark()));
    }

    private static String text(Optional<String> optional) {
        return optional.orElse("");
    }
}
