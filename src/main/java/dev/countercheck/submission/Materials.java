package dev.countercheck.submission;

import java.util.List;
import java.util.Optional;

/**
 * The effective materials of one element: the submission's defaults with the element's own
 * {@code materials:} overrides applied.
 *
 * @param concreteClass     the class as written ("C32/40"), empty when only {@code fck} was given
 * @param fckMpa            characteristic cylinder strength, MPa
 * @param fykMpa            characteristic yield strength of the reinforcement, MPa
 * @param aggregateMm       largest nominal aggregate size dg, mm
 * @param exposure          exposure classes (Table 4.1), e.g. ["XC2"]
 * @param structuralClass   structural class for Table 4.4N, e.g. "S4"
 * @param coverDeviationMm  Δc_dev, mm, when the submission states it
 */
public record Materials(Optional<String> concreteClass, double fckMpa, double fykMpa, double aggregateMm,
                        List<String> exposure, String structuralClass, Optional<Double> coverDeviationMm) {
}
