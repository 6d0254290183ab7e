package dev.countercheck.input;

/** A place in an input file: 1-based line and column; line 0 when the input has no position (an option). */
public record SourceLocation(String file, int line, int column) {

    /** An input without lines, such as a command-line option: shown by its name alone. */
    public static SourceLocation unpositioned(String what) {
        return new SourceLocation(what, 0, 0);
    }

    @Override
    public String toString() {
        return line == 0 ? file : file + ":" + line + ":" + column;
    }
}
