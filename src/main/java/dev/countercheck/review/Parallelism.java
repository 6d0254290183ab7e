package dev.countercheck.review;

/**
 * Whether a run does independent work at the same time on the common fork-join pool, one piece per core: the
 * elements of a submission reviewed, a one-page HTML report made while the other reports are written. The
 * output is the same either way; the system property {@value #PROPERTY}{@code =false} does every piece in turn.
 */
public final class Parallelism {

    /** Set to {@code false} to do every piece of work in turn. */
    public static final String PROPERTY = "countercheck.parallel";

    private Parallelism() {
    }

    /** True unless the system property {@value #PROPERTY} is {@code false}. */
    public static boolean enabled() {
        return !"false".equals(System.getProperty(PROPERTY));
    }
}
