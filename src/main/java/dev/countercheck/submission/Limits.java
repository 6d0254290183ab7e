package dev.countercheck.submission;

/**
 * The most items of each kind a submission may give. They keep a hostile or broken file from
 * costing more than a moment to read and review (the placement check compares every pile with
 * every other), and lie far beyond any design (common practice):
 * <ul>
 *   <li>20 000 elements in one file: a large project has a few hundred foundations, a site-wide
 *       export of many buildings some thousands;
 *   <li>100 piles under one cap: a group larger than that is a piled raft, not a cap;
 *   <li>100 action cases per element;
 *   <li>20 bar sets on one face: a face has two directions, each in one or a few sets;
 *   <li>1000 bars in one set, 500 column starter bars.
 * </ul>
 */
final class Limits {

    static final int ELEMENTS = 20_000;
    static final int PILES = 100;
    static final int ACTION_CASES = 100;
    static final int BAR_SETS = 20;
    static final int BARS_IN_A_SET = 1000;
    static final int STARTER_BARS = 500;

    private Limits() {
    }
}
