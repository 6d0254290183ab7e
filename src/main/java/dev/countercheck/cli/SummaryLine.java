package dev.countercheck.cli;

import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;

import java.nio.file.Path;

/** The one line printed per reviewed submission. */
final class SummaryLine {

    private SummaryLine() {
    }

    static String of(Path file, Review review, Path json, Path html) {
        StringBuilder s = new StringBuilder();
        s.append(file).append(": ").append(review.verdict().label()).append(", ")
                .append(review.summary().elements()).append(" element")
                .append(review.summary().elements() == 1 ? "" : "s").append("; findings:");
        for (Severity sev : Severity.values()) {
            s.append(' ').append(sev.label()).append(' ').append(review.summary().findings().get(sev));
        }
        s.append(" -> ").append(json).append(", ").append(html);
        return s.toString();
    }
}
