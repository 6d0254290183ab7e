package dev.countercheck.cli;

/** Every exit status of the tool, defined once (docs/results.md). */
public final class ExitCodes {

    /** Nothing at or above the {@code --fail-on} severity was found. */
    public static final int OK = 0;
    /** Something at or above the {@code --fail-on} severity was found, or an element is incomplete. */
    public static final int FINDINGS = 1;
    /**
     * Unusable input (a submission or ruleset that cannot be read), wrong usage, or output that
     * could not be written (a read-only or full folder, a closed standard output).
     */
    public static final int UNUSABLE = 2;
    /** An internal error: a fault of the tool (an exception, a stack overflow, out of memory), never of the input. */
    public static final int INTERNAL = 3;

    private ExitCodes() {
    }
}
