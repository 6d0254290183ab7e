package dev.countercheck.report;

import dev.countercheck.review.Review;

import java.util.ArrayList;
import java.util.List;

/**
 * The running head of every printed page (project, reference, revision) as a CSS string for the
 * {@code @page} margin boxes. Submitted text reaches the stylesheet only through {@link #quote}:
 * every character but ASCII letters, digits and spaces becomes a CSS escape, so nothing in a title
 * can end the string, the rule or the style element.
 */
final class PageHeading {

    private PageHeading() {
    }

    static String css(Review review) {
        Review.SubmissionInfo s = review.submission();
        List<String> parts = new ArrayList<>();
        parts.add(s.title().orElse(s.file()));
        s.reference().ifPresent(parts::add);
        s.revision().ifPresent(r -> parts.add("rev. " + r));
        return quote(String.join(" · ", parts));
    }

    /** {@code text} as a double-quoted CSS string: {@code a"b → "a\22 b"}. */
    static String quote(String text) {
        StringBuilder out = new StringBuilder("\"");
        text.codePoints().forEach(c -> {
            boolean plain = (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9') || c == ' ';
            if (plain) {
                out.appendCodePoint(c);
            } else {
                out.append('\\').append(Integer.toHexString(c)).append(' ');
            }
        });
        return out.append('"').toString();
    }
}
