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
 * @param shearSections        the critical one-way shear sections, as the shear checks recorded them
 * @param controlPerimeterMm   distance a of the governing control perimeter from the column face, when punching-perimeter found one
 */
public record PileCapDrawing(PileCap cap, List<Double> pileReactionsKn, List<SectionLine> shearSections,
                             OptionalDouble controlPerimeterMm) implements Drawing {

    @Override
    public <R> R accept(Visitor<R> visitor) {
        return visitor.pileCap(this);
    }
}
