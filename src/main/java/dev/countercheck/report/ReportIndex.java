package dev.countercheck.report;

import dev.countercheck.report.HtmlModel.Count;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.review.Verdict;

import java.net.URI;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The {@code index.html} of a review of several submissions: one row per submission in the order
 * reviewed, with its verdict, its findings by severity and links to its reports, or why it was not
 * reviewed; and the totals. The reports sit beside the index, so the links are bare file names.
 */
public final class ReportIndex {

    /** The index's file name without extension: {@code index.html}. */
    public static final String NAME = "index";

    private final Review.ToolInfo tool;
    private final String reviewDate;
    private final List<Entry> entries = new ArrayList<>();

    /** A row with the verdict and counts it was made from, for the totals. */
    private record Entry(Row row, Optional<Verdict> verdict, Map<Severity, Integer> findings) {
    }

    /**
     * What the index template shows of one submission. Public only for the template engine.
     *
     * @param problem why the submission was not reviewed; empty when it was
     */
    public record Row(int number, String file, String title, String reference, String revision, String verdict,
                      int elements, List<Count> findings, String html, String pdf, String json, String problem) {
    }

    /** What {@code templates/index.ftlh} shows. Public only for the template engine. */
    public record View(String toolName, String toolVersion, String reviewDate, List<Row> rows, int reviewed,
                       int notReviewed, List<Count> verdicts, List<Count> findings) {
    }

    public ReportIndex(Review.ToolInfo tool, String reviewDate) {
        this.tool = tool;
        this.reviewDate = reviewDate;
    }

    /** Adds a reviewed submission and the reports written for it. */
    public void reviewed(Review review, Path json, Path html, Optional<Path> pdf) {
        Review.SubmissionInfo s = review.submission();
        List<Count> findings = List.of(Severity.values()).stream()
                .map(sev -> new Count(sev.label(), review.summary().findings().getOrDefault(sev, 0))).toList();
        Row row = new Row(entries.size() + 1, s.file(), s.title().orElse(""), s.reference().orElse(""),
                s.revision().orElse(""), review.verdict().label(), review.summary().elements(), findings,
                href(html), pdf.map(ReportIndex::href).orElse(""), href(json), "");
        entries.add(new Entry(row, Optional.of(review.verdict()), review.summary().findings()));
    }

    /** Adds a submission that was not reviewed, with the reason in a few words. */
    public void notReviewed(String file, String problem) {
        Row row = new Row(entries.size() + 1, file, "", "", "", "", 0, List.of(), "", "", "", problem);
        entries.add(new Entry(row, Optional.empty(), Map.of()));
    }

    /** Whether any submission was reviewed; an index of none is not written. */
    public boolean anyReviewed() {
        return entries.stream().anyMatch(e -> e.verdict().isPresent());
    }

    /** The index page. */
    public String html() {
        return new HtmlReportWriter().render(HtmlReportWriter.INDEX_TEMPLATE, view());
    }

    View view() {
        Map<Verdict, Integer> verdicts = new EnumMap<>(Verdict.class);
        Map<Severity, Integer> findings = new EnumMap<>(Severity.class);
        for (Entry entry : entries) {
            entry.verdict().ifPresent(v -> verdicts.merge(v, 1, Integer::sum));
            entry.findings().forEach((severity, n) -> findings.merge(severity, n, Integer::sum));
        }
        int reviewed = (int) entries.stream().filter(e -> e.verdict().isPresent()).count();
        return new View(tool.name(), tool.version(), reviewDate, entries.stream().map(Entry::row).toList(), reviewed,
                entries.size() - reviewed,
                List.of(Verdict.values()).stream().map(v -> new Count(v.label(), verdicts.getOrDefault(v, 0))).toList(),
                List.of(Severity.values()).stream().map(v -> new Count(v.label(), findings.getOrDefault(v, 0))).toList());
    }

    /** A link to a file beside the index: its name, percent-encoded, after "./" so no name reads as a scheme. */
    static String href(Path file) {
        try {
            return new URI(null, null, "./" + file.getFileName().toString(), null).toASCIIString();
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException("cannot link to " + file, e);
        }
    }
}
