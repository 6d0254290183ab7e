package dev.countercheck.review;

/**
 * What a finding says is wrong, so that its severity can come from the ruleset (docs/results.md: a firm
 * may move severities). Each kind has the name the ruleset's {@code severities} section uses.
 */
public enum FindingKind {
    /** A recomputed capacity or resistance is exceeded: the check fails. */
    CAPACITY("capacity"),
    /** A claimed value beyond the tolerance on the unsafe side. */
    CLAIM_UNCONSERVATIVE("claim-unconservative"),
    /** A claimed value beyond the tolerance on the safe side. */
    CLAIM_CONSERVATIVE("claim-conservative"),
    /** A claim that could not be compared (its check was not done or does not compute it). */
    CLAIM_NOT_COMPARED("claim-not-compared"),
    /** A detailing or code rule checked by the engine itself (spacing, edge distance, restraint) not met. */
    RULE("rule"),
    /** A combination generated from the characteristic loads governs a check beyond the tolerance. */
    COMBINATION_MISSED("combination-missed"),
    /** Information for the designer that needs no change. */
    REMARK("remark"),
    /** An element that could not be reviewed at all. */
    NOT_REVIEWED("not-reviewed");

    private final String key;

    FindingKind(String key) {
        this.key = key;
    }

    /** The name of this kind in a ruleset's {@code severities} section. */
    public String key() {
        return key;
    }
}
