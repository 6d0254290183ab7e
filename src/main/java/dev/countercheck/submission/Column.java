package dev.countercheck.submission;

import java.util.Optional;

/**
 * The column standing on the element.
 *
 * @param shape         rectangular or circular
 * @param cxMm          side parallel to x (rectangular) or diameter (circular), mm
 * @param cyMm          side parallel to y (rectangular); equal to the diameter for circular, mm
 * @param position      centre of the column, mm
 * @param starterBars   the column bars continued into the element, when given
 */
public record Column(ColumnShape shape, double cxMm, double cyMm, Point position,
                     Optional<StarterBars> starterBars) {

    public enum ColumnShape { RECTANGULAR, CIRCULAR }

    /** Column starter bars: how many and their diameter, mm. */
    public record StarterBars(int count, double diameterMm) {
        public double areaMm2() {
            return count * Math.PI * diameterMm * diameterMm / 4.0;
        }
    }

    public double areaMm2() {
        return shape == ColumnShape.CIRCULAR ? Math.PI * cxMm * cxMm / 4.0 : cxMm * cyMm;
    }
}
