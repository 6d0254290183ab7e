package dev.countercheck.responses;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/** What the designer says of a finding. */
public enum ResponseStatus {
    /** The designer accepts the finding and has changed, or will change, the design as it asks. */
    AGREED("agreed"),
    /** The designer does not accept the finding; the response says why. */
    DISPUTED("disputed"),
    /** The designer will answer the finding in the next revision. */
    WILL_REVISE("will-revise");

    private final String label;

    ResponseStatus(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    public static List<String> labels() {
        return Arrays.stream(values()).map(ResponseStatus::label).toList();
    }

    public static Optional<ResponseStatus> fromLabel(String label) {
        return Arrays.stream(values()).filter(s -> s.label.equals(label)).findFirst();
    }
}
