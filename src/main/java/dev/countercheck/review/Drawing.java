package dev.countercheck.review;

import dev.countercheck.submission.PileCap;

import java.util.List;
import java.util.OptionalDouble;

/**
 * What the report draws for a pile cap: the cap as submitted and the places the review computed.
 * Everything here is in the cap's axes, mm and kN; the report only scales and draws it.
 *
 * @param cap                  the element as submitted
 * @param pileReactionsKn      the largest reaction of each pile over the ULS cases, in pile order
 * @param shearSections        the critical one-way shear sections
 * @param controlPerimeterMm   distance a of the basic control perimeter from the column face (2d), when d is known
 */
public record Drawing(PileCap cap, List<Double> pileReactionsKn, List<SectionLine> shearSections,
                      OptionalDouble controlPerimeterMm) {

    /**
     * A straight critical section across the whole cap.
     *
     * @param axis       "x" when the line is perpendicular to x (at x = position), "y" likewise
     * @param positionMm its coordinate along that axis
     * @param checkId    the check it belongs to ({@code shear-x}, {@code shear-y})
     */
    public record SectionLine(String axis, double positionMm, String checkId) {
    }
}
