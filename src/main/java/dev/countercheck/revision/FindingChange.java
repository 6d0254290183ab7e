package dev.countercheck.revision;

/** What became of a finding from one revision to the next, matched by its stable id. */
public enum FindingChange {
    /** Raised before, not raised now. */
    CLOSED("closed"),
    /** Raised before and now, with the same severity and message. */
    STILL_OPEN("still-open"),
    /** Raised before and now, with another severity or other values. */
    CHANGED("changed"),
    /** Raised now, not before. */
    NEW("new");

    private final String label;

    FindingChange(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }
}
