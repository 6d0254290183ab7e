package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;

/**
 * One action case at the top of the element. Compression positive; {@code mx} increases the
 * reactions at positive y, {@code my} those at positive x.
 */
public record ActionCase(String name, Kind kind, double nKn, double mxKnm, double myKnm, double hxKn, double hyKn,
                         SourceLocation location) {

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
