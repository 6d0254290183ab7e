package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;

import java.util.OptionalDouble;

/**
 * One action case at the top of the element. Compression positive; {@code mx} increases the
 * reactions at positive y, {@code my} those at positive x.
 *
 * @param selfWeightFactor the factor on the element's own weight that a generated combination carries (its
 *                         γG); empty for a designer's case, whose own weight takes γG,sup or γG,inf as each
 *                         check needs
 */
public record ActionCase(String name, Kind kind, double nKn, double mxKnm, double myKnm, double hxKn, double hyKn,
                         SourceLocation location, OptionalDouble selfWeightFactor) {

    /** A designer's action case. */
    public ActionCase(String name, Kind kind, double nKn, double mxKnm, double myKnm, double hxKn, double hyKn,
                      SourceLocation location) {
        this(name, kind, nKn, mxKnm, myKnm, hxKn, hyKn, location, OptionalDouble.empty());
    }

    /** True for a case the review generated from characteristic loads. */
    public boolean generated() {
        return selfWeightFactor.isPresent();
    }

    public enum Kind {
        ULS("uls"), SLS_CHARACTERISTIC("sls-characteristic"), SLS_QUASI_PERMANENT("sls-quasi-permanent"),
        /** EN 1997-1 GEO, Design Approach 1 combination 2 (EN 1990 Table A1.2(C)): ground resistances. */
        ULS_GEO("uls-geo"),
        /** EN 1990 Table A1.2(A): static equilibrium (overturning). */
        EQU("equ");

        private final String label;

        Kind(String label) {
            this.label = label;
        }

        public String label() {
            return label;
        }
    }
}
