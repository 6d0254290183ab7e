package dev.countercheck.review;

/** Outcome of one check (docs/results.md). */
public enum CheckStatus {
    PASS("pass"), FAIL("fail"), NOT_APPLICABLE("not-applicable"), NOT_CHECKED("not-checked");

    private final String label;

    CheckStatus(String label) {
        this.label = label;
    }

    /** The JSON spelling. */
    public String label() {
        return label;
    }
}
