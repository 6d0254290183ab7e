package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;

import java.util.List;

/** One element of a submission: a reviewable element of a known type, or one too incomplete to review. */
public interface ElementInput {

    String id();

    /** The submission's {@code type} value, e.g. {@code "pile-cap"}. */
    String type();

    String description();

    SourceLocation location();

    /** The characteristic loads by source ({@code loads:}), from which the review generates combinations. */
    default List<CharacteristicLoad> loads() {
        return List.of();
    }

    /** The designer's action cases at the top of the element (none for an element that has none or was not read). */
    default List<ActionCase> actions() {
        return List.of();
    }
}
