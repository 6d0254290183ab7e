package dev.countercheck.responses;

import java.util.List;

/** A response sheet that cannot be used; each problem names its cell. */
public final class ResponseSheetException extends Exception {

    private final List<String> problems;

    public ResponseSheetException(List<String> problems) {
        super(String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    /** Each problem as {@code <where>: <what>}. */
    public List<String> problems() {
        return problems;
    }
}
