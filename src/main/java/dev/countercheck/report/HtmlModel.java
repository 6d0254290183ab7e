package dev.countercheck.report;

import dev.countercheck.eurocode.Step;
import dev.countercheck.responses.Response;
import dev.countercheck.responses.ResponseStatus;
import dev.countercheck.review.CheckResult;
import dev.countercheck.review.CheckStatus;
import dev.countercheck.review.ClaimComparison;
import dev.countercheck.review.Drawing;
import dev.countercheck.review.PadFootingDrawing;
import dev.countercheck.review.PileCapDrawing;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.GeneratedCase;
import dev.countercheck.review.Finding;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Value;
import dev.countercheck.review.Verdict;
import dev.countercheck.revision.FindingChange;
import dev.countercheck.revision.RevisionComparison;
import dev.countercheck.round.ReviewRound;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;
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
 * @param round       the sign-off, the comparison with the previous revision, and what was not checked
 */
public record HtmlModel(Header header, String pageHeading, List<Count> verdictCounts, List<Count> severityCounts,
                        List<String> assumptions, List<FindingRow> register, List<ElementView> elements,
                        List<ElementCautions> cautions, RoundView round, Paging paging) {

    /** The link to {@code anchor} from the page being written (see {@link Paging#href}). */
    public String href(String anchor) {
        return paging.href(anchor);
    }

    /**
     * The same report on part {@code k} (from 1) of its pages: the elements of that part only; the
     * lists of the project page are shared, not built again.
     */
    HtmlModel part(int k) {
        int from = (k - 1) * Paging.PER_PART;
        List<ElementView> shown = elements.subList(from, Math.min(elements.size(), from + Paging.PER_PART));
        return new HtmlModel(header, pageHeading, verdictCounts, severityCounts, assumptions, register, shown,
                cautions, round, paging.atPart(k));
    }

    public record Header(String title, String reference, String revision, String preparedBy, String submissionDate,
                         String file, String sha256, String rulesetId, String rulesetTitle, String rulesetSha256,
                         List<String> rulesetFiles, String toolName, String toolVersion, String reviewDate,
                         String verdict, int elementCount, int findingCount) {
    }

    public record Count(String label, int count) {
    }

    /** Every critical and major finding, in the register's order: page one lists them. */
    public List<FindingRow> problems() {
        return register.stream().filter(FindingRow::isProblem).toList();
    }

    /**
     * A finding; {@code checkAnchor} is its check's place in the report, or empty when the check is not listed.
     *
     * @param response       the designer's response read from the sheet, or empty
     * @param responseStatus agreed, disputed or will-revise, or empty
     * @param change         new, still-open or changed against the previous revision, or empty without one
     */
    public record FindingRow(String id, String elementId, String elementAnchor, String severity, String checkAnchor,
                             String basis, String message, String response, String responseStatus, String change) {

        /** Whether it is critical or major, for page one. */
        boolean isProblem() {
            return severity.equals(Severity.CRITICAL.label()) || severity.equals(Severity.MAJOR.label());
        }
    }

    /**
     * What the round adds to page one and to the closing sections.
     *
     * @param previous     the previous revision's label, or empty when there was no comparison
     * @param changeCounts closed, still-open, changed, new
     * @param closed       the findings of the previous revision that are closed now
     * @param orphans      responses whose finding this review no longer raises
     * @param notChecked   every check not performed or not applicable, with its reason
     * @param outOfScope   what the tool does not review at all, in words (empty: not stated)
     */
    public record RoundView(String checker, String reviewRef, String previous, List<Count> changeCounts,
                            List<ClosedRow> closed, List<OrphanRow> orphans, List<NotCheckedRow> notChecked,
                            String outOfScope) {
    }

    public record ClosedRow(String id, String elementId, String severity, String message) {
    }

    public record OrphanRow(String id, String where, String response, String status) {
    }

    public record NotCheckedRow(String elementId, String elementAnchor, String checkId, String checkAnchor,
                                String status, String reason) {
    }

    /**
     * One element.
     *
     * @param number   its section number in the report, e.g. "2.3"
     * @param drawingsOf its drawings: one set for a pile cap, none for an element that was not reviewed
     */
    public record ElementView(String anchor, String number, String id, String type, String description,
                              String verdict, List<CheckView> checks, List<FindingRow> findings, int cautionCount,
                              Supplier<List<DrawingView>> drawingsOf, List<CombinationRow> combinations) {

        /** The checks with a utilisation, largest first, then the others in their order. */
        public List<CheckView> checksByUtilisation() {
            List<CheckView> sorted = new ArrayList<>(checks);
            sorted.sort(Comparator.comparing((CheckView c) -> c.utilisationValue().isEmpty())
                    .thenComparing(c -> -c.utilisationValue().orElse(0.0)));
            return sorted;
        }

        /** The check with the largest utilisation, as a list of one, or none when no check has one. */
        public List<CheckView> governing() {
            return checksByUtilisation().stream().filter(c -> c.utilisationValue().isPresent()).limit(1).toList();
        }

        /** Its drawings, drawn when the template reads them. */
        public List<DrawingView> drawings() {
            return drawingsOf.get();
        }
    }

    /**
     * @param failing     whether the check failed (to mark its row)
     * @param utilisation two decimals rounded up, or empty
     * @param bar         the utilisation bar's width in percent of its track, or empty
     * @param over        whether the utilisation exceeds 1 (the bar is then full and marked)
     */
    public record CheckView(String anchor, String id, String title, String basis, String status, boolean failing,
                            String utilisation, String bar, boolean over, String reason, List<QuantityView> quantities,
                            List<StepView> trace, String governingCase) {

        Optional<Double> utilisationValue() {
            return utilisation.isEmpty() ? Optional.empty() : Optional.of(Double.parseDouble(utilisation));
        }
    }

    /**
     * A combination generated from the element's characteristic loads, a row of its collapsed table.
     *
     * @param factors the factors of its actions and the clauses
     * @param governs the ids of the checks it governs (empty when it governs none)
     */
    public record CombinationRow(String name, String kind, String n, String mx, String my, String hx, String hy,
                                 String factors, String clause, String governs) {
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

    /**
     * The model of {@code review}'s report. The element views are built when the template reads them
     * and dropped after (see {@link ElementViews}), so that the model of a large project holds its
     * short lists (register, not-checked, cautions) but never every element's formatted calculations
     * at once.
     */
    static HtmlModel of(Review review, ReviewRound round, Paging paging) {
        List<ElementReview> reviewed = review.elements();
        List<ElementView> elements = new ElementViews(reviewed.size(), i -> element(reviewed.get(i), i + 1, round));
        List<FindingRow> register = IntStream.range(0, reviewed.size())
                .mapToObj(i -> findingRows(reviewed.get(i), "e" + (i + 1), round))
                .flatMap(List::stream)
                .toList();
        List<ElementCautions> cautions = IntStream.range(0, reviewed.size())
                .filter(i -> !reviewed.get(i).cautions().isEmpty())
                .mapToObj(i -> new ElementCautions(reviewed.get(i).id(), "e" + (i + 1), reviewed.get(i).cautions()))
                .toList();
        return new HtmlModel(header(review), PageHeading.css(review), verdictCounts(review.summary()),
                severityCounts(review.summary()), review.assumptions(), register, elements, cautions,
                roundView(round, reviewed), paging);
    }

    private static RoundView roundView(ReviewRound round, List<ElementReview> elements) {
        List<Count> counts = round.revision().map(r -> r.counts().entrySet().stream()
                .map(c -> new Count(c.getKey().label(), c.getValue())).toList()).orElse(List.of());
        List<ClosedRow> closed = round.revision().map(r -> r.entries().stream()
                .filter(e -> e.change() == FindingChange.CLOSED)
                .map(e -> new ClosedRow(e.id(), e.latest().element(), e.latest().severity(), e.latest().message()))
                .toList()).orElse(List.of());
        List<OrphanRow> orphans = round.responses().orphans().stream()
                .map(r -> new OrphanRow(r.findingId(), r.where(), r.text(),
                        r.status().map(ResponseStatus::label).orElse("")))
                .toList();
        List<NotCheckedRow> notChecked = new ArrayList<>();
        for (int i = 0; i < elements.size(); i++) {
            ElementReview e = elements.get(i);
            for (int j = 0; j < e.checks().size(); j++) {
                CheckResult c = e.checks().get(j);
                if (c.status() == CheckStatus.NOT_CHECKED || c.status() == CheckStatus.NOT_APPLICABLE) {
                    notChecked.add(new NotCheckedRow(e.id(), "e" + (i + 1), c.id(), checkAnchor("e" + (i + 1), j),
                            c.status().label(), text(c.reason())));
                }
            }
        }
        return new RoundView(round.signOff().checker().orElse(""), round.signOff().reviewRef().orElse(""),
                round.revision().map(RevisionComparison::previous).orElse(""), counts, closed, orphans,
                List.copyOf(notChecked), round.outOfScope());
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

    private static ElementView element(ElementReview element, int position, ReviewRound round) {
        String anchor = "e" + position;
        List<CheckView> checks = IntStream.range(0, element.checks().size())
                .mapToObj(i -> check(element.checks().get(i), checkAnchor(anchor, i)))
                .toList();
        Supplier<List<DrawingView>> drawings = () -> element.drawing()
                .map(d -> List.of(drawing(anchor, element, d))).orElse(List.of());
        return new ElementView(anchor, "2." + position, element.id(), element.type(), element.description(),
                element.verdict().label(), checks, findingRows(element, anchor, round), element.cautions().size(),
                drawings, element.combinations().stream().map(HtmlModel::combinationRow).toList());
    }

    private static CombinationRow combinationRow(GeneratedCase c) {
        return new CombinationRow(c.name(), c.kind(), ReportNumbers.display(c.nKn(), "kN"),
                ReportNumbers.display(c.mxKnm(), "kNm"), ReportNumbers.display(c.myKnm(), "kNm"),
                ReportNumbers.display(c.hxKn(), "kN"), ReportNumbers.display(c.hyKn(), "kN"), c.trace().substituted(),
                c.trace().clause(), String.join(", ", c.governs()));
    }

    /** The anchor of the check at {@code index} (from 0) of the element at {@code elementAnchor}. */
    private static String checkAnchor(String elementAnchor, int index) {
        return elementAnchor + "-c" + (index + 1);
    }

    private static List<FindingRow> findingRows(ElementReview element, String anchor, ReviewRound round) {
        return element.findings().stream().map(f -> findingRow(f, element, anchor, round)).toList();
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

            @Override
            public DrawingView padFooting(PadFootingDrawing pad) {
                return PadDrawing.view(anchor, pad);
            }
        });
    }

    private static FindingRow findingRow(Finding finding, ElementReview element, String elementAnchor,
                                         ReviewRound round) {
        String checkAnchor = IntStream.range(0, element.checks().size())
                .filter(i -> element.checks().get(i).id().equals(finding.check()))
                .mapToObj(i -> checkAnchor(elementAnchor, i))
                .findFirst()
                .orElse("");
        Optional<Response> response = round.responses().to(finding.id());
        return new FindingRow(finding.id(), element.id(), elementAnchor, finding.severity().label(), checkAnchor,
                finding.basis(), finding.message(), response.map(Response::text).orElse(""),
                response.flatMap(Response::status).map(ResponseStatus::label).orElse(""),
                round.revision().flatMap(r -> r.entry(finding.id())).map(e -> e.change().label()).orElse(""));
    }

    private static CheckView check(CheckResult check, String anchor) {
        String utilisation = check.utilisation().isPresent()
                ? ReportNumbers.utilisation(check.utilisation().getAsDouble())
                : "";
        List<StepView> trace = IntStream.range(0, check.trace().size())
                .mapToObj(i -> step(check.trace().get(i), anchor + "-s" + (i + 1), i + 1))
                .toList();
        String bar = check.utilisation().isPresent() ? ReportNumbers.barPercent(check.utilisation().getAsDouble()) : "";
        boolean over = check.utilisation().isPresent() && check.utilisation().getAsDouble() > 1;
        return new CheckView(anchor, check.id(), check.title(), check.basis(), check.status().label(),
                check.status() == CheckStatus.FAIL, utilisation, bar, over, text(check.reason()),
                quantities(check, trace), trace, check.governingCase().orElse(""));
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
