package dev.countercheck.submission;

import java.util.List;
import java.util.Optional;

/**
 * Reads the elements of one type: its {@code type} value, the keys it accepts and its check
 * catalogue (the checks its claims may name). Binders live in this package; the list of element
 * kinds hands them to {@link SubmissionReader}, which names no type itself.
 */
public abstract class ElementBinder {

    private final String type;
    private final List<String> keys;
    private final CheckCatalogue checks;

    ElementBinder(List<String> keys, CheckCatalogue checks) {
        this.type = checks.elementType();
        this.keys = List.copyOf(keys);
        this.checks = checks;
    }

    /** The {@code type} value of these elements, e.g. {@code pile-cap}. */
    public final String type() {
        return type;
    }

    /** The checks of this type, in report order. */
    public final CheckCatalogue checks() {
        return checks;
    }

    final List<String> keys() {
        return keys;
    }

    /**
     * The element, or empty when it has errors (they are in the problems).
     *
     * @param fileMaterials the materials given at file level, which the element's own override
     */
    abstract Optional<ElementInput> read(Values values, MaterialsBinder materialsBinder, Fields f, String id,
                                         String description, MaterialsBinder.Draft fileMaterials);
}
