package dev.countercheck.input;

/** A place in an input file: 1-based line and column. */
public record SourceLocation(String file, int line, int column) {

    @Override
    public String toString() {
        return file + ":" + line + ":" + column;
    }
}
