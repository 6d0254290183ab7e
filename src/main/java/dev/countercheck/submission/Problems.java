package dev.countercheck.submission;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Collects the input errors of one file while it is read, so that all of them are reported at once. */
final class Problems {

    private final String file;
    private final List<InputError> errors = new ArrayList<>();

    Problems(String file) {
        this.file = file;
    }

    String file() {
        return file;
    }

    SourceLocation at(int line, int column) {
        return new SourceLocation(file, line, column);
    }

    /** The 1-based line and column of character {@code offset} of {@code text}. */
    SourceLocation at(String text, int offset) {
        int line = 1;
        int lineStart = 0;
        for (int i = 0; i < offset && i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                line++;
                lineStart = i + 1;
            }
        }
        return at(line, offset - lineStart + 1);
    }

    void add(SourceLocation location, String path, String message) {
        errors.add(new InputError(location, path, message));
    }

    boolean any() {
        return !errors.isEmpty();
    }

    /** The errors in file order (stable for errors at the same place). */
    List<InputError> sorted() {
        return errors.stream()
                .sorted(Comparator.comparingInt((InputError e) -> e.location().line())
                        .thenComparingInt(e -> e.location().column()))
                .toList();
    }
}
