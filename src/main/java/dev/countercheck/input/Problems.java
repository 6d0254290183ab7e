package dev.countercheck.input;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/** Collects the input errors of one file while it is read, so that all of them are reported at once. */
public final class Problems {

    private final String file;
    private final List<InputError> errors = new ArrayList<>();

    public Problems(String file) {
        this.file = file;
    }

    public String file() {
        return file;
    }

    public SourceLocation at(int line, int column) {
        return new SourceLocation(file, line, column);
    }

    /** The 1-based line and column of character {@code offset} of {@code text}. */
    public SourceLocation at(String text, int offset) {
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

    public void add(SourceLocation location, String path, String message) {
        errors.add(new InputError(location, path, message));
    }

    public boolean any() {
        return !errors.isEmpty();
    }

    /** The errors in file order (stable for errors at the same place). */
    public List<InputError> sorted() {
        return errors.stream()
                .sorted(Comparator.comparingInt((InputError e) -> e.location().line())
                        .thenComparingInt(e -> e.location().column()))
                .toList();
    }
}
