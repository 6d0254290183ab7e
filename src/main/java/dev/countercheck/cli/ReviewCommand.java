package dev.countercheck.cli;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.report.HtmlReportWriter;
import dev.countercheck.report.JsonResultWriter;
import dev.countercheck.report.ReportFiles;
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
        description = "Recompute every check of each submission and write DIR/<name>.json and DIR/<name>.html.",
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

    @Option(names = "--debug", description = "On an internal error, print where it happened (a stack trace).")
    boolean debug;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Severity threshold;
        String reviewDate;
        List<Path> inputs;
        ReportTargets targets;
        try {
            threshold = Severity.fromLabel(failOn);
            reviewDate = ReviewDate.resolve(date, Optional.ofNullable(System.getenv("SOURCE_DATE_EPOCH")),
                    Clock.systemUTC());
            inputs = SubmissionFiles.expand(files);
            requireDistinctBasenames(inputs);
            targets = ReportTargets.of(outDir, inputs, List.of(".json", ".html"));
        } catch (IllegalArgumentException | UsageException e) {
            err.println("countercheck review: " + e.getMessage());
            return ExitCodes.UNUSABLE;
        }
        Rulesets rulesets = new Rulesets();
        ProjectReviewer reviewer = new ProjectReviewer(Version.tool());
        int status = ExitCodes.OK;
        for (int i = 0; i < inputs.size(); i++) {
            Path file = inputs.get(i);
            if (inputs.size() > 1) {
                err.println("[" + (i + 1) + "/" + inputs.size() + "] " + file);
            }
            try {
                Submission submission = new dev.countercheck.submission.SubmissionReader().read(file);
                Ruleset rules = rulesets.load(ruleset.or(submission::ruleset).orElse(Rulesets.DEFAULT));
                Review review = reviewer.review(submission, rules, reviewDate);
                Path json = targets.report(file, ".json");
                Path html = targets.report(file, ".html");
                Files.createDirectories(outDir);
                ReportFiles.writeAtomically(json, new JsonResultWriter().write(review));
                ReportFiles.writeAtomically(html, new HtmlReportWriter().write(review));
                out.println(SummaryLine.of(file, review, json, html));
                boolean found = review.elements().stream().flatMap(e -> e.findings().stream())
                        .anyMatch(f -> f.severity().atLeast(threshold));
                if (found && status == ExitCodes.OK) {
                    status = ExitCodes.FINDINGS;
                }
            } catch (SubmissionException e) {
                e.errors().forEach(err::println);
                err.println(file + ": not reviewed (" + e.errors().size() + " input error"
                        + (e.errors().size() == 1 ? "" : "s") + ")");
                status = ExitCodes.UNUSABLE;
            } catch (RulesetException e) {
                e.errors().forEach(err::println);
                err.println(file + ": not reviewed (the ruleset cannot be used)");
                status = ExitCodes.UNUSABLE;
            } catch (IOException e) {
                err.println(file + ": cannot write the reports to " + outDir + ": " + e.getMessage());
                status = ExitCodes.UNUSABLE;
            } catch (RuntimeException e) {
                err.println(file + ": not reviewed: internal error (" + e.getClass().getSimpleName() + ")."
                        + " Please report it with the submission" + (debug ? ":" : "; --debug shows where it happened."));
                if (debug) {
                    e.printStackTrace(err);
                }
                status = ExitCodes.UNUSABLE;
            }
        }
        return status;
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
