package dev.countercheck.actions;

/** Where a characteristic action comes from (EN 1990 4.1.1, EN 1991). */
public enum Source {
    /** Permanent action. */
    G,
    /** Imposed load, with a category of use (EN 1991-1-1 Table 6.1, EN 1990 Table A1.1). */
    Q,
    /** Snow. */
    S,
    /** Wind. */
    W,
    /** Thermal action. */
    T,
    /** Accidental action: only in the accidental combination. */
    A;

    /** True for the variable actions (Q, S, W, T). */
    public boolean variable() {
        return this == Q || this == S || this == W || this == T;
    }
}
