package dev.countercheck.cli;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.input.UnusableInputException;
import dev.countercheck.report.OutputSet;
import dev.countercheck.report.ReportIndex;
import dev.countercheck.report.ReviewReports;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.round.ReviewRound;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetException;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;

/** {@code review FILE...}: reviews each submission and writes its JSON result and HTML report. */
@Command(name = ReviewCommand.NAME, mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Recompute every check of each submission and write DIR/<name>.json and DIR/<name>.html;"
                + " for several submissions or a folder, also DIR/index.html.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:nothing at or above the --fail-on severity was found and every element was reviewed",
                "1:something at or above the --fail-on severity was found, or an element is incomplete",
                "2:unusable input or wrong usage, or the reports could not be written",
                "3:internal error (a fault of the tool, never of the input)"})
public final class ReviewCommand implements Callable<Integer> {

    /** The sub-command's name on the command line. */
    static final String NAME = "review";

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Submission files (YAML or JSON) or folders of them.")
    List<Path> files;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: ${DEFAULT-VALUE}).",
            defaultValue = "reports")
    Path outDir;

    @picocli.CommandLine.Mixin
    RulesetOptions rulesetOptions;

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

    @picocli.CommandLine.Mixin
    RoundOptions round;

    @picocli.CommandLine.Mixin
    Console console;

    /** Where report files are written; tests put a failing disk here. */
    OutputSet.Sink sink = OutputSet.DISK;

    @Override
    public Integer call() {
        PrintWriter err = console.err();
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
            round.validate(inputs);
            batch = inputs.size() > 1 || files.stream().anyMatch(Files::isDirectory);
            if (batch && inputs.stream().anyMatch(p -> SubmissionFiles.basename(p).equals(ReportIndex.NAME))) {
                throw new UsageException("a submission named " + ReportIndex.NAME + " would write its report where"
                        + " the index of several submissions goes; rename it or review it on its own");
            }
            List<String> extensions = new ArrayList<>(pdf ? List.of(".json", ".html", ".pdf")
                    : List.of(".json", ".html"));
            extensions.addAll(round.extensions());
            targets = ReportTargets.of(outDir, inputs, extensions, batch);
            OutputSet.recover(outDir);
        } catch (IllegalArgumentException | UsageException e) {
            err.println("countercheck review: " + e.getMessage());
            return ExitCodes.UNUSABLE;
        } catch (IOException e) {
            err.println("countercheck review: cannot use --out " + outDir + ": " + IoReasons.of(e));
            return ExitCodes.UNUSABLE;
        }
        Rulesets rulesets = rulesetOptions.rulesets(err);
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
        if (batch && index.anyReviewed()) {
            status = worse(status, writeIndex(index, inputs.size()));
        } else if (batch) {
            err.println("no submission could be reviewed: nothing written");
        }
        return status;
    }

    /** Reviews one submission and writes its reports; the exit status it calls for. */
    private int reviewOne(Path file, Rulesets rulesets, ProjectReviewer reviewer, String reviewDate,
                          ReportTargets targets, Severity threshold, ReportIndex index) {
        PrintWriter err = console.err();
        try {
            Submission submission = new dev.countercheck.submission.SubmissionReader(ElementKinds.binders()).read(file);
            Ruleset rules = rulesets.of(submission, rulesetOptions.ruleset);
            Review review = reviewer.review(submission, rules, reviewDate);
            ReviewRound context = round.round(file, review, err);
            Path json = targets.report(file, ".json");
            Path html = targets.report(file, ".html");
            Optional<Path> pdfFile = pdf ? Optional.of(targets.report(file, ".pdf")) : Optional.empty();
            List<Path> written = new ArrayList<>(List.of(json, html));
            try (OutputSet reports = OutputSet.in(outDir, sink)) {
                ReviewReports.addTo(reports, review, context, json.getFileName().toString(),
                        html.getFileName().toString(), pdfFile.map(p -> p.getFileName().toString()))
                        .forEach(part -> written.add(html.resolveSibling(part)));
                pdfFile.ifPresent(written::add);
                for (Map.Entry<String, byte[]> extra : round.files(review, threshold).entrySet()) {
                    Path target = targets.report(file, extra.getKey());
                    reports.add(target.getFileName().toString(), extra.getValue());
                    written.add(target);
                }
                reports.commit();
            }
            index.reviewed(review, json, html, pdfFile);
            console.out().println(round.summary(file, review, context, written));
            return review.passesGate(threshold) ? ExitCodes.OK : ExitCodes.FINDINGS;
        } catch (SubmissionException e) {
            e.errors().forEach(err::println);
            err.println(file + ": not reviewed (" + e.errors().size() + " input error"
                    + (e.errors().size() == 1 ? "" : "s") + ")");
            index.notReviewed(file.toString(), "input errors");
        } catch (UnusableInputException e) {
            e.problems().forEach(err::println);
            err.println(file + ": not reviewed (the responses, previous result or review settings cannot be used)");
            index.notReviewed(file.toString(), "its responses, previous result or review settings cannot be used");
        } catch (RulesetException e) {
            e.errors().forEach(err::println);
            err.println(file + ": not reviewed (the ruleset cannot be used)");
            index.notReviewed(file.toString(), "the ruleset cannot be used");
        } catch (IOException e) {
            notWritten(file, "cannot write the reports to " + outDir + ": " + IoReasons.of(e), index);
        } catch (UncheckedIOException e) {
            notWritten(file, "cannot write the reports: " + e.getMessage() + ": " + IoReasons.of(e.getCause()), index);
        } catch (RuntimeException | StackOverflowError | OutOfMemoryError e) {
            err.println(file + ": not reviewed: " + InternalFailure.line(e, debug));
            if (debug) {
                e.printStackTrace(err);
            }
            index.notReviewed(file.toString(), "internal error");
            return ExitCodes.INTERNAL;
        }
        return ExitCodes.UNUSABLE;
    }

    private void notWritten(Path file, String why, ReportIndex index) {
        console.err().println(file + ": " + why + "; the previous reports, if any, are left as they were");
        index.notReviewed(file.toString(), "its reports could not be written");
    }

    private int writeIndex(ReportIndex index, int submissions) {
        Path indexFile = outDir.resolve(ReportIndex.NAME + ".html");
        try (OutputSet set = OutputSet.in(outDir, sink)) {
            set.add(indexFile.getFileName().toString(), index.html()).commit();
            console.out().println("index of " + submissions + " submissions -> " + indexFile);
            return ExitCodes.OK;
        } catch (IOException e) {
            console.err().println("cannot write " + indexFile + ": " + IoReasons.of(e));
            return ExitCodes.UNUSABLE;
        }
    }

    /** The more serious of two exit statuses (internal error over unusable input over findings over none). */
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
