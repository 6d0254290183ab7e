package dev.countercheck.report;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.review.Review;
import dev.countercheck.ruleset.RulesetLoader;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

/** The sample submissions of the repository, reviewed as the review command does, on a fixed date. */
final class SampleReviews {

    static final String DATE = "2026-12-01";
    private static final Path FOLDER = Path.of("sample-submissions");

    private SampleReviews() {
    }

    /** Every sample submission, in name order. */
    static List<Path> samples() {
        try (Stream<Path> files = Files.list(FOLDER)) {
            List<Path> samples = files.filter(p -> p.toString().matches(".*\\.(ya?ml|json)")).sorted().toList();
            if (samples.isEmpty()) {
                throw new AssertionError("no sample submissions in " + FOLDER.toAbsolutePath());
            }
            return samples;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static Review review(Path sample) {
        try {
            Submission submission = new SubmissionReader(ElementKinds.binders()).read(sample);
            var rules = new RulesetLoader(Path.of("rulesets"), ProjectReviewer.RULE_VOCABULARY)
                    .load(submission.ruleset().orElse("en1992-recommended"));
            return new ProjectReviewer(new Review.ToolInfo("countercheck", "test")).review(submission, rules, DATE);
        } catch (Exception e) {
            throw new AssertionError("sample " + sample + " cannot be reviewed: " + e.getMessage(), e);
        }
    }

    /** The basename of a sample, for output files. */
    static String name(Path sample) {
        String file = sample.getFileName().toString();
        return file.substring(0, file.lastIndexOf('.'));
    }
}
