package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;
import java.util.List;

/**
 * An element that was readable but lacks items every check needs (its piles, its column, a
 * ULS action case...). It is reported {@code incomplete} with {@code missing} named; the other
 * elements of the file are still reviewed.
 */
public record IncompleteElement(String id, String type, String description, SourceLocation location,
                                List<String> missing) implements ElementInput {
}
