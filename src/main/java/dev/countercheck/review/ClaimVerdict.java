package dev.countercheck.review;

/** How a claimed value compares with the recomputed one. */
public enum ClaimVerdict {
    AGREES("agrees"), DIFFERS_CONSERVATIVE("differs-conservative"), DIFFERS_UNCONSERVATIVE("differs-unconservative");

    private final String label;

    ClaimVerdict(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
