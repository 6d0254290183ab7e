package dev.countercheck.actions;

import java.util.Optional;

/**
 * One characteristic action.
 *
 * @param category   the category of use of an imposed load (A to H), empty for other sources
 * @param reversible true when the action may act with either sign (wind from either side)
 */
public record CharacteristicAction(Source source, Optional<String> category, Effects effects, boolean reversible) {

    /** "G", "Q(B)", "W": the source, with the category of an imposed load. */
    public String label() {
        return source.name() + category.map(c -> "(" + c + ")").orElse("");
    }

    /** The key of this action's ψ factors: the category of an imposed load, else the source. */
    public String psiKey() {
        return category.orElse(source.name());
    }
}
