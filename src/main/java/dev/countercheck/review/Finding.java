package dev.countercheck.review;

/**
 * Something the designer must answer.
 *
 * @param id    stable across runs and revisions: {@code <element>/<check>/<slug>}, the slug naming what is
 *              wrong, never a running number
 * @param check the check id it belongs to
 * @param basis the clause (or "common practice") it rests on
 */
public record Finding(String id, Severity severity, String check, String message, String basis) {

    /**
     * The message with the basis after it in brackets, as a line of text outside the report shows it; a message
     * that already ends with its basis (a rule's requirement citing the check's own clause) keeps it once.
     */
    public String withBasis() {
        String cited = "(" + basis + ")";
        return message.endsWith(cited) || message.endsWith(cited + ".") ? message : message + " " + cited;
    }
}
