package dev.countercheck.cli;

import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;

import java.nio.file.Path;
import java.util.List;

/** The one line printed per reviewed submission. */
final class SummaryLine {

    private SummaryLine() {
    }

    /** The verdict, the counts and every file written. */
    static String of(Path file, Review review, List<Path> written) {
        StringBuilder s = new StringBuilder();
        s.append(file).append(": ").append(review.verdict().label()).append(", ")
                .append(review.summary().elements()).append(" element")
                .append(review.summary().elements() == 1 ? "" : "s").append("; findings:");
        for (Severity sev : Severity.values()) {
            s.append(' ').append(sev.label()).append(' ').append(review.summary().findings().get(sev));
        }
        s.append(" -> ").append(String.join(", ", written.stream().map(Path::toString).toList()));
        return s.toString();
    }
}
