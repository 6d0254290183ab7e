package dev.countercheck.review;

/**
 * An action case an element was reviewed under, as numbers at the top of the element (compression positive),
 * so that the report can write out the case that governs a check, not only its name.
 */
public record CaseActions(String name, String kind, double nKn, double mxKnm, double myKnm, double hxKn,
                          double hyKn) {
}
