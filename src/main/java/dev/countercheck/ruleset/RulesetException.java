package dev.countercheck.ruleset;

import dev.countercheck.input.InputError;

import java.util.List;

/** A ruleset that cannot be used: every error found, each with its file, line and column. */
public final class RulesetException extends Exception {

    private final transient List<InputError> errors;

    public RulesetException(List<InputError> errors) {
        super(errors.isEmpty() ? "ruleset error" : errors.get(0).toString());
        this.errors = List.copyOf(errors);
    }

    public List<InputError> errors() {
        return errors;
    }
}
