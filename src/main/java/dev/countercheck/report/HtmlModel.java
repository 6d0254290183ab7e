package dev.countercheck.report;

import dev.countercheck.responses.Response;
import dev.countercheck.responses.ResponseStatus;
import dev.countercheck.review.CaseActions;
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
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Supplier;
import java.util.function.ToIntFunction;
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
 * @param parts       the parts of a report on several pages, for the project page's table (none on one page)
 */
public record HtmlModel(Header header, String pageHeading, List<Count> verdictCounts, List<Count> severityCounts,
                        List<String> assumptions, List<FindingRow> register, List<ElementView> elements,
                        List<ElementCautions> cautions, RoundView round, List<PartRow> parts, Paging paging) {

    /** The severities page one lists: critical and major. */
    private static final Set<String> PROBLEMS = Set.of(Severity.CRITICAL.label(), Severity.MAJOR.label());

    /** The link to {@code anchor} from the page being written (see {@link Paging#href}). */
    public String href(String anchor) {
        return paging.href(anchor);
    }

    /**
     * The same report of {@code review} on each part of its pages, in order: the elements of that
     * part, their findings, cautions and checks not performed; the lists of the project page are cut,
     * not built again.
     */
    List<HtmlModel> parts(Review review) {
        List<ElementReview> reviewed = review.elements();
        List<HtmlModel> pages = new ArrayList<>();
        Rows before = new Rows(0, 0, 0);
        for (int k = 1; k <= paging.parts(); k++) {
            int from = Paging.firstOf(k);
            int to = Math.min(reviewed.size(), from + Paging.PER_PART);
            Rows within = Rows.of(reviewed.subList(from, to));
            RoundView partRound = new RoundView(round.checker(), round.reviewRef(), round.previous(),
                    round.changeCounts(), round.closed(), round.orphans(),
                    within.cut(round.notChecked(), before.notChecked(), Rows::notChecked), round.outOfScope());
            pages.add(new HtmlModel(header, pageHeading, verdictCounts, severityCounts, assumptions,
                    within.cut(register, before.findings(), Rows::findings), elements.subList(from, to),
                    within.cut(cautions, before.cautioned(), Rows::cautioned), partRound, parts, paging.atPart(k)));
            before = before.and(within);
        }
        return pages;
    }

    /** How many rows of the register, the cautions and the checks not performed some elements take. */
    private record Rows(int findings, int cautioned, int notChecked) {

        static Rows of(List<ElementReview> elements) {
            int findings = 0;
            int cautioned = 0;
            int notChecked = 0;
            for (ElementReview e : elements) {
                findings += e.findings().size();
                cautioned += e.cautions().isEmpty() ? 0 : 1;
                notChecked += (int) e.checks().stream().filter(HtmlModel::notPerformed).count();
            }
            return new Rows(findings, cautioned, notChecked);
        }

        Rows and(Rows more) {
            return new Rows(findings + more.findings, cautioned + more.cautioned, notChecked + more.notChecked);
        }

        /** The rows of {@code list} these elements take, starting at {@code from}. */
        <T> List<T> cut(List<T> list, int from, ToIntFunction<Rows> count) {
            return list.subList(from, from + count.applyAsInt(this));
        }
    }

    public record Header(String title, String reference, String revision, String preparedBy, String submissionDate,
                         String file, String sha256, String rulesetId, String rulesetTitle, String rulesetSha256,
                         List<String> rulesetFiles, String toolName, String toolVersion, String reviewDate,
                         String verdict, int elementCount, int findingCount) {
    }

    public record Count(String label, int count) {
    }

    /**
     * Every critical and major finding, in the register's order: page one lists them (on a report of
     * several pages, the first {@link Paging#PROBLEMS_SHOWN}).
     */
    public List<FindingRow> problems() {
        List<FindingRow> all = register.stream().filter(FindingRow::isProblem).toList();
        return paging.onePage() ? all : all.subList(0, Math.min(all.size(), Paging.PROBLEMS_SHOWN));
    }

    /** How many critical and major findings page one leaves out (only a report of several pages leaves any out). */
    public long problemsNotShown() {
        return register.stream().filter(FindingRow::isProblem).count() - problems().size();
    }

    /**
     * A part of a report on several pages, a row of the project page's table of parts.
     *
     * @param governing the largest utilisation of the part's checks, as a list of one (none when no check has one)
     * @param notConforming how many of its elements do not conform
     * @param problems how many of its findings are critical or major
     */
    public record PartRow(int number, String file, String firstId, String lastId, List<Governing> governing,
                          int notConforming, int problems, int findings) {
    }

    /** The check with the largest utilisation among some elements, and its element. */
    public record Governing(String elementId, String elementAnchor, String checkId, String checkAnchor,
                            String utilisation, String bar, boolean over) {
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
            return PROBLEMS.contains(severity);
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

        /** The checks with a utilisation, largest first, then the others in their order (each utilisation read once). */
        public List<CheckView> checksByUtilisation() {
            record Keyed(CheckView check, Optional<Double> utilisation) {
            }
            return checks.stream().map(c -> new Keyed(c, c.utilisationValue()))
                    .sorted(Comparator.comparing((Keyed k) -> k.utilisation().isEmpty())
                            .thenComparing(k -> -k.utilisation().orElse(0.0)))
                    .map(Keyed::check)
                    .toList();
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
     * @param governingActions the governing case's actions as numbers ("N = 3000 kN, Mx = 0 kNm, ..."), or empty
     */
    public record CheckView(String anchor, String id, String title, String basis, String status, boolean failing,
                            String utilisation, String bar, boolean over, String reason, List<QuantityView> quantities,
                            List<StepView> trace, String governingCase, String governingActions) {

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

    /**
     * A step of a check's derivation.
     *
     * @param symbol        the step's symbol as the trace writes it, e.g. {@code "V (ULS-1)"}
     * @param base          the symbol without the case or place in brackets, e.g. {@code "V"}
     * @param qualifier     what follows it in brackets, e.g. {@code "(ULS-1)"}, or empty
     * @param quantity      the quantity in words (the glossary's meaning of the symbol), or empty
     * @param definesSymbol whether this is the symbol's first appearance in the derivation (its definition)
     * @param substituted   the formula with the values put in, or empty when it is the formula itself
     * @param where         the symbols the formula writes that appear here first, with their meanings
     * @param uses          every symbol the step writes (its own first), separated by {@code |}
     */
    public record StepView(String anchor, int number, String symbol, String base, String qualifier, String quantity,
                           boolean definesSymbol, String formula, String substituted, String value, String unit,
                           String clause, String remark, List<Definition> where, String uses) {
    }

    /** A symbol and what it means. */
    public record Definition(String symbol, String meaning) {
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
        Review.RulesetInfo ruleset = review.ruleset();
        Derivation derivation = new Derivation(Glossary.bundled(), ruleset.names(), ruleset.symbols());
        List<ElementView> elements = new ElementViews(reviewed.size(), i -> element(reviewed.get(i), i + 1, round,
                derivation));
        List<FindingRow> register = IntStream.range(0, reviewed.size())
                .mapToObj(i -> findingRows(reviewed.get(i), "e" + (i + 1), round))
                .flatMap(List::stream)
                .toList();
        List<ElementCautions> cautions = IntStream.range(0, reviewed.size())
                .filter(i -> !reviewed.get(i).cautions().isEmpty())
                .mapToObj(i -> new ElementCautions(reviewed.get(i).id(), "e" + (i + 1), reviewed.get(i).cautions()))
                .toList();
        List<PartRow> parts = IntStream.rangeClosed(1, paging.parts()).mapToObj(k -> partRow(reviewed, k, paging))
                .toList();
        return new HtmlModel(header(review), PageHeading.css(review), verdictCounts(review.summary()),
                severityCounts(review.summary()), review.assumptions(), register, elements, cautions,
                roundView(round, reviewed), parts, paging);
    }

    private static PartRow partRow(List<ElementReview> reviewed, int k, Paging paging) {
        int from = Paging.firstOf(k);
        int to = Math.min(reviewed.size(), from + Paging.PER_PART);
        Optional<Governing> governing = Optional.empty();
        double largest = Double.NEGATIVE_INFINITY;
        int notConforming = 0;
        int problems = 0;
        int findings = 0;
        for (int i = from; i < to; i++) {
            ElementReview e = reviewed.get(i);
            for (int j = 0; j < e.checks().size(); j++) {
                OptionalDouble u = e.checks().get(j).utilisation();
                if (u.isPresent() && u.getAsDouble() > largest) {
                    largest = u.getAsDouble();
                    governing = Optional.of(new Governing(e.id(), "e" + (i + 1), e.checks().get(j).id(),
                            checkAnchor("e" + (i + 1), j), ReportNumbers.utilisation(largest),
                            ReportNumbers.barPercent(largest), largest > 1));
                }
            }
            notConforming += e.verdict() == Verdict.DOES_NOT_CONFORM ? 1 : 0;
            problems += (int) e.findings().stream().filter(f -> PROBLEMS.contains(f.severity().label())).count();
            findings += e.findings().size();
        }
        return new PartRow(k, paging.partFile(k), reviewed.get(from).id(), reviewed.get(to - 1).id(),
                governing.stream().toList(), notConforming, problems, findings);
    }

    /** Whether a check was not performed or did not apply: the review lists it in section 3.3. */
    private static boolean notPerformed(CheckResult check) {
        return check.status() == CheckStatus.NOT_CHECKED || check.status() == CheckStatus.NOT_APPLICABLE;
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
                if (notPerformed(c)) {
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

    private static ElementView element(ElementReview element, int position, ReviewRound round,
                                       Derivation derivation) {
        String anchor = "e" + position;
        List<CheckView> checks = IntStream.range(0, element.checks().size())
                .mapToObj(i -> check(element, element.checks().get(i), checkAnchor(anchor, i), derivation))
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

    private static CheckView check(ElementReview element, CheckResult check, String anchor, Derivation derivation) {
        String utilisation = check.utilisation().isPresent()
                ? ReportNumbers.utilisation(check.utilisation().getAsDouble())
                : "";
        List<StepView> trace = derivation.of(element.type(), check.id(), check.trace(), anchor);
        String bar = check.utilisation().isPresent() ? ReportNumbers.barPercent(check.utilisation().getAsDouble()) : "";
        boolean over = check.utilisation().isPresent() && check.utilisation().getAsDouble() > 1;
        return new CheckView(anchor, check.id(), check.title(), check.basis(), check.status().label(),
                check.status() == CheckStatus.FAIL, utilisation, bar, over, text(check.reason()),
                quantities(check, trace), trace, check.governingCase().orElse(""),
                check.governingCase().flatMap(element::caseNamed).map(HtmlModel::actions).orElse(""));
    }

    /** A case's actions as numbers, in the order the submission writes them. */
    private static String actions(CaseActions c) {
        return "N = " + ReportNumbers.display(c.nKn(), "kN") + " kN, Mx = " + ReportNumbers.display(c.mxKnm(), "kNm")
                + " kNm, My = " + ReportNumbers.display(c.myKnm(), "kNm") + " kNm, Hx = "
                + ReportNumbers.display(c.hxKn(), "kN") + " kN, Hy = " + ReportNumbers.display(c.hyKn(), "kN") + " kN";
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

    private static String text(Optional<String> optional) {
        return optional.orElse("");
    }
}
