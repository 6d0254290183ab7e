/**
 * Combinations of actions to EN 1990: characteristic actions by source in, design and
 * serviceability combinations out, each with the name that says how it was made and the factors
 * it applied. Pure: knows no element type, no submission, no ruleset; the caller hands it the
 * factors (from the ruleset) and the actions (from the submission).
 */
package dev.countercheck.actions;
