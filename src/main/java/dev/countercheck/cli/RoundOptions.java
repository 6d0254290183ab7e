package dev.countercheck.cli;

import dev.countercheck.input.UnusableInputException;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.export.ConsoleJson;
import dev.countercheck.export.JunitXml;
import dev.countercheck.export.Sarif;
import dev.countercheck.responses.Response;
import dev.countercheck.responses.ResponseSheet;
import dev.countercheck.responses.ResponseSheetReader;
import dev.countercheck.responses.Responses;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;
import dev.countercheck.revision.FindingSnapshot;
import dev.countercheck.revision.ResultFile;
import dev.countercheck.revision.RevisionComparison;
import dev.countercheck.round.ReviewRound;
import dev.countercheck.round.SignOff;
import dev.countercheck.round.SignOffFile;
import picocli.CommandLine.Option;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The options of {@code review} that place a review in its round: the designer's responses, the previous
 * revision, who signs, and the files and console summary for pipelines. Thin: reading, comparing and
 * writing happen in the responses, revision, round and export packages.
 */
final class RoundOptions {

    /** The response sheet every review writes, as CSV and as a workbook. */
    static final String RESPONSES_CSV = ".responses.csv";
    static final String RESPONSES_XLSX = ".responses.xlsx";
    static final String JUNIT = ".junit.xml";
    static final String SARIF = ".sarif";

    @Option(names = "--responses", paramLabel = "FILE",
            description = "The designer's filled-in response sheet (.csv or .xlsx): each response is shown beside"
                    + " its finding; responses to findings no longer raised are listed and warned about.")
    Optional<Path> responses;

    @Option(names = "--previous", paramLabel = "OLD.json",
            description = "The JSON result of the previous revision: every finding is classified closed, still-open,"
                    + " changed or new, and page one of the report says so.")
    Optional<Path> previous;

    @Option(names = "--checker", paramLabel = "NAME",
            description = "The checking engineer, for the sign-off page (default: checker in "
                    + SignOffFile.NAME + " beside the submission).")
    Optional<String> checker;

    @Option(names = "--review-ref", paramLabel = "REF",
            description = "The checker's reference for this review (default: review_ref in " + SignOffFile.NAME + ").")
    Optional<String> reviewRef;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "The console summary: text (default) or json (one line of JSON per submission).")
    String format;

    @Option(names = "--junit",
            description = "Also write DIR/<name>" + JUNIT + ": one test case per check, for CI servers.")
    boolean junit;

    @Option(names = "--sarif", description = "Also write DIR/<name>" + SARIF + ": the findings as SARIF 2.1.0.")
    boolean sarif;

    /** @throws UsageException for an unknown format, or a sheet or previous result given for several submissions */
    void validate(List<Path> inputs) {
        if (!format.equals("text") && !format.equals("json")) {
            throw new UsageException("--format " + format + " is not one of text, json");
        }
        if (inputs.size() > 1 && (responses.isPresent() || previous.isPresent())) {
            throw new UsageException("--responses and --previous belong to one submission; review it on its own");
        }
    }

    /** The extensions of the files every review writes besides the JSON, HTML and PDF. */
    List<String> extensions() {
        List<String> out = new ArrayList<>(List.of(RESPONSES_CSV, RESPONSES_XLSX));
        if (junit) {
            out.add(JUNIT);
        }
        if (sarif) {
            out.add(SARIF);
        }
        return out;
    }

    /** The round of the review of {@code submission}; warnings (responses whose finding is gone) go to {@code err}. */
    ReviewRound round(Path submission, Review review, PrintWriter err) throws UnusableInputException {
        SignOff signOff = SignOffFile.read(submission.toAbsolutePath().getParent())
                .overriddenBy(new SignOff(checker, reviewRef));
        Responses matched = Responses.none();
        if (responses.isPresent()) {
            matched = Responses.match(review, ResponseSheetReader.read(responses.get()));
            for (Response r : matched.orphans()) {
                err.println(r.where() + ": warning: a response to " + r.findingId()
                        + ", which this review does not raise (closed, or of another submission)");
            }
        }
        Optional<RevisionComparison> revision = Optional.empty();
        if (previous.isPresent()) {
            ResultFile old = ResultFile.read(previous.get());
            revision = Optional.of(RevisionComparison.compare(old.label(), old.findings(), FindingSnapshot.of(review)));
        }
        return new ReviewRound(signOff, matched, revision, ProjectReviewer.OUT_OF_SCOPE);
    }

    /** The round's own files by extension, in order. */
    Map<String, byte[]> files(Review review, Severity failOn) {
        Map<String, byte[]> out = new LinkedHashMap<>();
        out.put(RESPONSES_CSV, ResponseSheet.csv(review));
        out.put(RESPONSES_XLSX, ResponseSheet.xlsx(review));
        if (junit) {
            out.put(JUNIT, JunitXml.write(review, failOn).getBytes(StandardCharsets.UTF_8));
        }
        if (sarif) {
            out.put(SARIF, Sarif.write(review).getBytes(StandardCharsets.UTF_8));
        }
        return out;
    }

    /** What the console shows for one reviewed submission, in the chosen format. */
    String summary(Path file, Review review, ReviewRound round, List<Path> written) {
        if (format.equals("json")) {
            return ConsoleJson.line(file, review, round.revision(), written);
        }
        return SummaryLine.of(file, review, written) + round.revision()
                .map(r -> System.lineSeparator() + file + ": against " + r.previous() + ": " + r.countsLine())
                .orElse("");
    }
}
