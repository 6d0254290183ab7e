package dev.countercheck.bench;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.report.HtmlReportWriter;
import dev.countercheck.report.JsonResultWriter;
import dev.countercheck.review.Review;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

/**
 * The CPU time of this thread per operation (review of one 4-pile and one 9-pile cap and one pad footing, JSON and HTML
 * of one element), warm: unlike JMH's wall-clock average it stays meaningful while other processes
 * compete for the cores. Median and spread over {@code -Dbatches=N} batches (default 7). Arguments, when given,
 * pick the operations whose name contains one of them ({@code cpu HTML JSON}).
 */
public final class ElementCpuTime {

    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    private ElementCpuTime() {
    }

    private static List<String> picked = List.of();

    public static void main(String[] args) throws Exception {
        picked = List.of(args);
        int batches = Integer.getInteger("batches", 7);
        Path dir = Files.createTempDirectory("countercheck-bench");
        ProjectReviewer reviewer = new ProjectReviewer(new Review.ToolInfo("countercheck", "bench"));
        Ruleset rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY)
                .load("en1992-recommended");
        Submission four = new SubmissionReader(ElementKinds.binders()).read(BenchProject.writeOne(dir.resolve("four.yaml"), 4));
        Submission nine = new SubmissionReader(ElementKinds.binders()).read(BenchProject.writeOne(dir.resolve("nine.yaml"), 9));
        Submission pad = new SubmissionReader(ElementKinds.binders()).read(BenchProject.writeOnePad(dir.resolve("pad.yaml")));
        Review fourReview = reviewer.review(four, rules, "2026-01-01");
        JsonResultWriter json = new JsonResultWriter();
        HtmlReportWriter html = new HtmlReportWriter();
        report("review of a 4-pile cap", batches, () -> reviewer.review(four, rules, "2026-01-01"));
        report("review of a 9-pile cap", batches, () -> reviewer.review(nine, rules, "2026-01-01"));
        report("review of a pad footing", batches, () -> reviewer.review(pad, rules, "2026-01-01"));
        report("JSON of one element", batches, () -> json.write(fourReview));
        report("HTML of one element", batches, () -> html.write(fourReview));
        Files.delete(dir.resolve("four.yaml"));
        Files.delete(dir.resolve("nine.yaml"));
        Files.delete(dir.resolve("pad.yaml"));
        Files.delete(dir);
    }

    private static void report(String what, int batches, Supplier<Object> op) {
        if (!picked.isEmpty() && picked.stream().noneMatch(what::contains)) {
            return;
        }
        warm(op);
        int perBatch = calibrate(op);
        for (int i = 0; i < 3; i++) {
            batch(op, perBatch);
        }
        List<Double> micros = new ArrayList<>();
        for (int i = 0; i < batches; i++) {
            micros.add(batch(op, perBatch));
        }
        List<Double> sorted = micros.stream().sorted().toList();
        System.out.printf("%-24s median %8.1f µs CPU per op (min %.1f, max %.1f; %d batches of %d)%n", what,
                sorted.get(sorted.size() / 2), sorted.get(0), sorted.get(sorted.size() - 1), batches, perBatch);
    }

    /**
     * Runs the operation for about two seconds of CPU, so that its first, cold runs (class loading, template
     * compilation, the interpreter) neither count in the calibration nor leave it at a batch of one or two.
     */
    private static void warm(Supplier<Object> op) {
        long t0 = THREADS.getCurrentThreadCpuTime();
        int runs = 0;
        while (runs < 20 || THREADS.getCurrentThreadCpuTime() - t0 < 2_000_000_000L) {
            batch(op, 1);
            runs++;
        }
    }

    /** Operations to fill about half a second of CPU once warm. */
    private static int calibrate(Supplier<Object> op) {
        int n = 1;
        double micros;
        do {
            n *= 2;
            micros = batch(op, n) * n;
        } while (micros < 500_000 && n < 1 << 20);
        return n;
    }

    private static double batch(Supplier<Object> op, int n) {
        long sink = 0;
        long t0 = THREADS.getCurrentThreadCpuTime();
        for (int i = 0; i < n; i++) {
            sink += System.identityHashCode(op.get()) & 1;
        }
        long t = THREADS.getCurrentThreadCpuTime() - t0;
        if (sink < 0) {
            System.out.print("");
        }
        return t / 1e3 / n;
    }
}
