package dev.countercheck.review;

import dev.countercheck.eurocode.Step;

import java.util.List;

/**
 * A combination the review generated from an element's characteristic loads, as the report lists it.
 *
 * @param kind             {@code uls}, {@code uls-geo}, {@code equ}, {@code accidental}, {@code sls-characteristic}
 *                         or {@code sls-quasi-permanent}
 * @param selfWeightFactor the factor on the permanent actions, which the element's own weight takes too
 * @param trace            its factors and clauses
 * @param governs          the ids of the checks this case governs
 */
public record GeneratedCase(String name, String kind, double nKn, double mxKnm, double myKnm, double hxKn,
                            double hyKn, double selfWeightFactor, Step trace, List<String> governs) {
}
