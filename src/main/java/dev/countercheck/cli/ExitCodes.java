package dev.countercheck.cli;

/** Every exit status of the tool, defined once (docs/results.md). */
public final class ExitCodes {

    /** Nothing at or above the {@code --fail-on} severity was found. */
    public static final int OK = 0;
    /** Something at or above the {@code --fail-on} severity was found. */
    public static final int FINDINGS = 1;
    /** Unusable input (a submission or ruleset that cannot be read) or wrong usage. */
    public static final int UNUSABLE = 2;

    private ExitCodes() {
    }
}
