package dev.countercheck.round;

import java.util.List;

/** A project folder's review settings that cannot be used; each problem says where. */
public final class SignOffException extends Exception {

    private final List<String> problems;

    public SignOffException(List<String> problems) {
        super(String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    public List<String> problems() {
        return problems;
    }
}
