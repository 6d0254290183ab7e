package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;

import java.util.Optional;

/**
 * One characteristic action at the top of an element (the {@code loads:} list), by source. Compression
 * positive; {@code mx} increases the effect at positive y, {@code my} at positive x.
 *
 * @param category   the category of use of an imposed load (A to H); empty for other sources
 * @param reversible true when the action acts either way (both signs are combined)
 */
public record CharacteristicLoad(Source source, Optional<String> category, double nKn, double mxKnm, double myKnm,
                                 double hxKn, double hyKn, boolean reversible, SourceLocation location) {

    /** The sources of EN 1990: permanent, imposed, snow, wind, thermal, accidental. */
    public enum Source { G, Q, S, W, T, A }
}
