package dev.countercheck.input;

import java.util.List;

/** A file the run needs that cannot be used (a response sheet, an earlier result, review settings): each problem says where. */
public final class UnusableInputException extends Exception {

    private final List<String> problems;

    public UnusableInputException(List<String> problems) {
        super(String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    public UnusableInputException(String problem) {
        this(List.of(problem));
    }

    /** Each problem as {@code <where>: <what>}. */
    public List<String> problems() {
        return problems;
    }
}
