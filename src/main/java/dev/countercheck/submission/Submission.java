package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;

import java.util.List;

/**
 * A design submission as the designer gave it, read and validated.
 *
 * @param file        the path as given on the command line
 * @param sha256      hex SHA-256 of the file's bytes
 * @param project     the project block
 * @param ruleset     the {@code basis.ruleset} value (id or path); empty when not given
 * @param rulesetAt   where {@code basis.ruleset} stands in the file, for errors about it
 * @param elements    every element in file order: reviewable ones and incomplete ones
 */
public record Submission(String file, String sha256, Project project, java.util.Optional<String> ruleset,
                         java.util.Optional<SourceLocation> rulesetAt, List<ElementInput> elements) {
}
