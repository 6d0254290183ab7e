package dev.countercheck.review;

/**
 * What the report draws of an element: one record per element kind, holding the element as
 * submitted and the places its review computed. The report renders a drawing through a
 * {@link Visitor}, so that it never asks for an element's type and a new kind's drawing cannot be
 * left unrendered.
 */
public sealed interface Drawing permits PileCapDrawing, PadFootingDrawing {

    /** Renders each kind's drawing; one method per member of the family. */
    interface Visitor<R> {
        R pileCap(PileCapDrawing drawing);

        R padFooting(PadFootingDrawing drawing);
    }

    <R> R accept(Visitor<R> visitor);

    /**
     * A straight critical section across the whole element.
     *
     * @param axis       "x" when the line is perpendicular to x (at x = position), "y" likewise
     * @param positionMm its coordinate along that axis
     * @param checkId    the check it belongs to ({@code shear-x}, {@code shear-y})
     */
    public record SectionLine(String axis, double positionMm, String checkId) {
    }
}
