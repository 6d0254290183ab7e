package dev.countercheck.cli;

/** The one line that reports an internal error: what kind it was and what to do, never a stack trace. */
final class InternalFailure {

    private InternalFailure() {
    }

    static String line(Throwable e, boolean debug) {
        String what = e instanceof StackOverflowError ? "it ran out of stack"
                : e instanceof OutOfMemoryError ? "it ran out of memory"
                : "an unexpected condition";
        return "internal error (" + what + ", " + e.getClass().getSimpleName() + "). Please report it with the input"
                + " file" + (debug ? ":" : "; --debug shows where it happened.");
    }
}
