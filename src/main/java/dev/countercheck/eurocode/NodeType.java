package dev.countercheck.eurocode;

/**
 * Node types of EN 1992-1-1 6.5.4(4) with the symbol of their k factor (NDP) and the expression
 * that gives the node's design compressive stress limit σRd,max = k·ν'·fcd.
 */
public enum NodeType {
    /** Compression node with no ties anchored at the node: σRd,max = k1·ν'·fcd (recommended k1 = 1.0). */
    CCC("k1", "Exp. (6.60)", "6.5.4(4)a", "compression node, no ties anchored"),
    /** Compression-tension node with ties anchored in one direction: k2·ν'·fcd (recommended k2 = 0.85). */
    CCT("k2", "Exp. (6.61)", "6.5.4(4)b", "compression-tension node, ties anchored in one direction"),
    /** Compression-tension node with ties anchored in more than one direction: k3·ν'·fcd (recommended 0.75). */
    CTT("k3", "Exp. (6.62)", "6.5.4(4)c", "compression-tension node, ties anchored in more than one direction");

    private final String kSymbol;
    private final String expression;
    private final String subClause;
    private final String description;

    NodeType(String kSymbol, String expression, String subClause, String description) {
        this.kSymbol = kSymbol;
        this.expression = expression;
        this.subClause = subClause;
        this.description = description;
    }

    /** The symbol of the node's k factor: {@code "k1"}, {@code "k2"} or {@code "k3"}. */
    public String kSymbol() {
        return kSymbol;
    }

    /** The expression number, e.g. {@code "Exp. (6.60)"}. */
    public String expression() {
        return expression;
    }

    /** The full clause reference, e.g. {@code "EN 1992-1-1 6.5.4(4)a, Exp. (6.60)"}. */
    public String clause() {
        return "EN 1992-1-1 " + subClause + ", " + expression;
    }

    /** What kind of node this is, in words. */
    public String description() {
        return description;
    }
}
