package dev.countercheck.submission;

import dev.countercheck.input.InputError;
import java.util.List;
import java.util.stream.Collectors;

/** A submission file that cannot be used; {@link #errors()} lists every problem found, in file order. */
public final class SubmissionException extends Exception {

    private final List<InputError> errors;

    public SubmissionException(List<InputError> errors) {
        super(errors.stream().map(InputError::toString).collect(Collectors.joining(System.lineSeparator())));
        if (errors.isEmpty()) {
            throw new IllegalArgumentException("a submission error needs at least one input error");
        }
        this.errors = List.copyOf(errors);
    }

    public List<InputError> errors() {
        return errors;
    }
}
