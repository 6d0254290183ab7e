package dev.countercheck.review;

/** Verdict on an element or a whole submission (docs/results.md). */
public enum Verdict {
    CONFORMS("conforms"), CONFORMS_WITH_REMARKS("conforms-with-remarks"), DOES_NOT_CONFORM("does-not-conform"),
    INCOMPLETE("incomplete");

    private final String label;

    Verdict(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
