package dev.countercheck.review;

/** A finding before it is numbered: the element assembler gives it its stable id. */
public record DraftFinding(Severity severity, String check, String message, String basis) {
}
