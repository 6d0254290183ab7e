package dev.countercheck.cli;

import dev.countercheck.report.Paging;
import dev.countercheck.review.Review;
import dev.countercheck.review.Severity;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/** The one line printed per reviewed submission. */
final class SummaryLine {

    private SummaryLine() {
    }

    /**
     * The verdict, the counts and the files written. The part pages of a large report are named by
     * their number and the first and last of them, not one by one: a 20,000-element project has
     * hundreds (the JSON line of {@code --format json} still lists every file).
     */
    static String of(Path file, Review review, List<Path> written) {
        StringBuilder s = new StringBuilder();
        s.append(file).append(": ").append(review.verdict().label()).append(", ")
                .append(review.summary().elements()).append(" element")
                .append(review.summary().elements() == 1 ? "" : "s").append("; findings:");
        for (Severity sev : Severity.values()) {
            s.append(' ').append(sev.label()).append(' ').append(review.summary().findings().get(sev));
        }
        s.append(" -> ").append(String.join(", ", files(written)));
        return s.toString();
    }

    /** Each file written, with the part pages that follow a report page told as one entry. */
    private static List<String> files(List<Path> written) {
        List<String> out = new ArrayList<>();
        int i = 0;
        while (i < written.size()) {
            Path page = written.get(i++);
            Pattern parts = Paging.partFiles(page.getFileName().toString());
            int first = i;
            while (i < written.size() && parts.matcher(written.get(i).getFileName().toString()).matches()) {
                i++;
            }
            out.add(page + partsOf(written.subList(first, i)));
        }
        return out;
    }

    private static String partsOf(List<Path> parts) {
        return switch (parts.size()) {
            case 0 -> "";
            case 1 -> " (and its part page " + parts.get(0) + ")";
            default -> " (and its " + parts.size() + " part pages " + parts.get(0) + " to "
                    + parts.get(parts.size() - 1) + ")";
        };
    }
}
