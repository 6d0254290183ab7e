package dev.countercheck.review;

/** Severity of a finding, most severe first (docs/results.md). */
public enum Severity {
    /** A capacity exceeded, or an unconservative claim beyond tolerance on a safety-relevant quantity. */
    CRITICAL("critical"),
    /** A detailing or code rule not met. */
    MAJOR("major"),
    /** A conservative discrepancy, a missing but non-critical item. */
    MINOR("minor"),
    /** Information for the designer. */
    NOTE("note");

    private final String label;

    Severity(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** True when this severity is the same as or more severe than {@code threshold}. */
    public boolean atLeast(Severity threshold) {
        return ordinal() <= threshold.ordinal();
    }

    public static Severity fromLabel(String label) {
        for (Severity s : values()) {
            if (s.label.equals(label)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown severity '" + label + "' (critical, major, minor, note)");
    }
}
