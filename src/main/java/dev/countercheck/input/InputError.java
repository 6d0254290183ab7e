package dev.countercheck.input;

/**
 * One problem found in a submission file.
 *
 * @param location where in the file (1-based line and column)
 * @param path     the key path of the offending item, e.g. {@code elements[3].piles.positions[2]}
 *                 (list indices from 0); empty when the problem concerns the whole file
 * @param message  what is wrong, in the user's terms
 */
public record InputError(SourceLocation location, String path, String message) {

    /** {@code file:line:column: path: message}, or {@code file:line:column: message} without a path. */
    @Override
    public String toString() {
        return location + ": " + (path.isEmpty() ? "" : path + ": ") + message;
    }
}
