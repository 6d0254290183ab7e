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
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/** Average time of the steps of a review for one element (4-pile cap, 9-pile cap, pad footing), ruleset load, JSON and HTML rendering. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ElementBenchmark {

    private static final String DATE = "2026-01-01";

    private final ProjectReviewer reviewer = new ProjectReviewer(new Review.ToolInfo("countercheck", "bench"));
    private final RulesetLoader loader = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY);
    private final JsonResultWriter json = new JsonResultWriter();
    private final HtmlReportWriter html = new HtmlReportWriter();
    private Ruleset rules;
    private Submission fourPiles;
    private Submission ninePiles;
    private Submission pad;
    private Review fourPileReview;

    @Setup
    public void setUp() throws Exception {
        Path dir = Files.createTempDirectory("countercheck-bench");
        rules = loader.load("en1992-recommended");
        fourPiles = new SubmissionReader(ElementKinds.binders()).read(BenchProject.writeOne(dir.resolve("four.yaml"), 4));
        ninePiles = new SubmissionReader(ElementKinds.binders()).read(BenchProject.writeOne(dir.resolve("nine.yaml"), 9));
        pad = new SubmissionReader(ElementKinds.binders()).read(BenchProject.writeOnePad(dir.resolve("pad.yaml")));
        fourPileReview = reviewer.review(fourPiles, rules, DATE);
    }

    @Benchmark
    public Review reviewFourPileCap() {
        return reviewer.review(fourPiles, rules, DATE);
    }

    @Benchmark
    public Review reviewNinePileCap() {
        return reviewer.review(ninePiles, rules, DATE);
    }

    @Benchmark
    public Review reviewPadFooting() {
        return reviewer.review(pad, rules, DATE);
    }

    @Benchmark
    public Ruleset loadRuleset() throws Exception {
        return loader.load("en1992-recommended");
    }

    @Benchmark
    public String jsonOfOneElement() {
        return json.write(fourPileReview);
    }

    @Benchmark
    public String htmlOfOneElement() {
        return html.write(fourPileReview);
    }
}
