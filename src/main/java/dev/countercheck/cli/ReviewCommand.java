package dev.countercheck.cli;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.report.HtmlReportWriter;
import dev.countercheck.report.JsonResultWriter;
import dev.countercheck.report.PdfReportWriter;
import dev.countercheck.report.ReportFiles;
import dev.countercheck.report.ReportIndex;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;

/** {@code review FILE...}: reviews each submission and writes its JSON result and HTML report. */
@Command(name = "review", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Recompute every check of each submission and write DIR/<name>.json and DIR/<name>.html;"
                + " for several submissions or a folder, also DIR/index.html.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:nothing at or above the --fail-on severity was found",
                "1:something at or above the --fail-on severity was found",
                "2:unusable input or wrong usage"})
public final class ReviewCommand implements Callable<Integer> {

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Submission files (YAML or JSON) or folders of them.")
    List<Path> files;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: ${DEFAULT-VALUE}).",
            defaultValue = "reports")
    Path outDir;

    @Option(names = "--ruleset", paramLabel = "ID|PATH",
            description = "Ruleset to apply, overriding the submission's basis.ruleset (default en1992-recommended).")
    Optional<String> ruleset;

    @Option(names = "--fail-on", paramLabel = "SEVERITY", defaultValue = "critical",
            description = "Exit 1 when a finding at or above this severity exists: critical, major, minor, note"
                    + " (default: ${DEFAULT-VALUE}).")
    String failOn;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD",
            description = "Review date to state (default: SOURCE_DATE_EPOCH if set, else today).")
    Optional<String> date;

    @Option(names = "--pdf", description = "Also write DIR/<name>.pdf, the report laid out on A4.")
    boolean pdf;

    @Option(names = "--debug", description = "On an internal error, print where it happened (a stack trace).")
    boolean debug;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Severity threshold;
        String reviewDate;
        List<Path> inputs;
        ReportTargets targets;
        boolean batch;
        try {
            threshold = Severity.fromLabel(failOn);
            reviewDate = ReviewDate.resolve(date, Optional.ofNullable(System.getenv("SOURCE_DATE_EPOCH")),
                    Clock.systemUTC());
            inputs = SubmissionFiles.expand(files);
            requireDistinctBasenames(inputs);
            batch = inputs.size() > 1 || files.stream().anyMatch(Files::isDirectory);
            if (batch && inputs.stream().anyMatch(p -> SubmissionFiles.basename(p).equals(ReportIndex.NAME))) {
                throw new UsageException("a submission named " + ReportIndex.NAME + " would write its report where"
                        + " the index of several submissions goes; rename it or review it on its own");
            }
            targets = ReportTargets.of(outDir, inputs, pdf ? List.of(".json", ".html", ".pdf")
                    : List.of(".json", ".html"));
        } catch (IllegalArgumentException | UsageException e) {
            err.println("countercheck review: " + e.getMessage());
            return ExitCodes.UNUSABLE;
        }
        Rulesets rulesets = new Rulesets();
        ProjectReviewer reviewer = new ProjectReviewer(Version.tool());
        ReportIndex index = new ReportIndex(Version.tool(), reviewDate);
        int status = ExitCodes.OK;
        for (int i = 0; i < inputs.size(); i++) {
            Path file = inputs.get(i);
            if (inputs.size() > 1) {
                err.println("[" + (i + 1) + "/" + inputs.size() + "] " + file);
            }
            status = worse(status, reviewOne(file, rulesets, reviewer, reviewDate, targets, threshold, index));
        }
        if (batch) {
            status = worse(status, writeIndex(index, inputs.size()));
        }
        return status;
    }

    /** Reviews one submission and writes its reports; the exit status it calls for. */
    private int reviewOne(Path file, Rulesets rulesets, ProjectReviewer reviewer, String reviewDate,
                          ReportTargets targets, Severity threshold, ReportIndex index) {
        PrintWriter err = spec.commandLine().getErr();
        try {
            Submission submission = new dev.countercheck.submission.SubmissionReader(ElementKinds.binders()).read(file);
            Ruleset rules = ruleset.isPresent() ? rulesets.load(ruleset.get())
                    : rulesets.load(submission.ruleset().orElse(Rulesets.DEFAULT), submission.rulesetAt());
            Review review = reviewer.review(submission, rules, reviewDate);
            Path json = targets.report(file, ".json");
            Path html = targets.report(file, ".html");
            Files.createDirectories(outDir);
            ReportFiles.writeAtomically(json, new JsonResultWriter().write(review));
            ReportFiles.writeAtomically(html, new HtmlReportWriter().write(review));
            Optional<Path> pdfFile = pdf ? Optional.of(targets.report(file, ".pdf")) : Optional.empty();
            if (pdfFile.isPresent()) {
                ReportFiles.writeAtomically(pdfFile.get(), new PdfReportWriter().write(review));
            }
            index.reviewed(review, json, html, pdfFile);
            spec.commandLine().getOut().println(SummaryLine.of(file, review, json, html));
            boolean found = review.elements().stream().flatMap(e -> e.findings().stream())
                    .anyMatch(f -> f.severity().atLeast(threshold));
            return found ? ExitCodes.FINDINGS : ExitCodes.OK;
        } catch (SubmissionException e) {
            e.errors().forEach(err::println);
            err.println(file + ": not reviewed (" + e.errors().size() + " input error"
                    + (e.errors().size() == 1 ? "" : "s") + ")");
            index.notReviewed(file.toString(), "input errors");
        } catch (RulesetException e) {
            e.errors().forEach(err::println);
            err.println(file + ": not reviewed (the ruleset cannot be used)");
            index.notReviewed(file.toString(), "the ruleset cannot be used");
        } catch (IOException e) {
            err.println(file + ": cannot write the reports to " + outDir + ": " + e.getMessage());
            index.notReviewed(file.toString(), "its reports could not be written");
        } catch (RuntimeException e) {
            err.println(file + ": not reviewed: internal error (" + e.getClass().getSimpleName() + ")."
                    + " Please report it with the submission" + (debug ? ":" : "; --debug shows where it happened."));
            if (debug) {
                e.printStackTrace(err);
            }
            index.notReviewed(file.toString(), "internal error");
        }
        return ExitCodes.UNUSABLE;
    }

    private int writeIndex(ReportIndex index, int submissions) {
        Path indexFile = outDir.resolve(ReportIndex.NAME + ".html");
        try {
            ReportFiles.writeAtomically(indexFile, index.html());
            spec.commandLine().getOut().println("index of " + submissions + " submissions -> " + indexFile);
            return ExitCodes.OK;
        } catch (IOException e) {
            spec.commandLine().getErr().println("cannot write " + indexFile + ": " + e.getMessage());
            return ExitCodes.UNUSABLE;
        }
    }

    /** The more serious of two exit statuses (unusable input over findings over none). */
    private static int worse(int a, int b) {
        return Math.max(a, b);
    }

    private static void requireDistinctBasenames(List<Path> inputs) {
        Set<String> seen = new HashSet<>();
        for (Path p : inputs) {
            if (!seen.add(SubmissionFiles.basename(p))) {
                throw new UsageException("two submissions named " + SubmissionFiles.basename(p)
                        + " would write the same reports; review them into different --out folders");
            }
        }
    }
}
