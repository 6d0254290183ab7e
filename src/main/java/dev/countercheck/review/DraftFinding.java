package dev.countercheck.review;

import java.util.Optional;

/**
 * A finding before the element assembler gives it its id and severity.
 *
 * @param slug     what is wrong, in a few words joined by hyphens ({@code capacity}, {@code claim-ved},
 *                 {@code cover-bottom}); unique within the check, it ends the finding's stable id
 * @param kind     what sort of finding it is; the ruleset gives the kind its severity
 * @param declared a severity a ruleset's requirement states itself, which takes the place of the kind's
 */
public record DraftFinding(String slug, FindingKind kind, Optional<Severity> declared, String check,
                           String message, String basis) {

    public DraftFinding {
        if (!Slugs.isSlug(slug)) {
            throw new IllegalArgumentException("'" + slug + "' is not a finding slug");
        }
    }
}
