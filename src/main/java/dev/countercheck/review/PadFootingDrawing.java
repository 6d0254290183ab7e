package dev.countercheck.review;

import dev.countercheck.submission.PadFooting;
import dev.countercheck.submission.Point;

import java.util.List;
import java.util.OptionalDouble;

/**
 * What the report draws for a pad footing: the footing as submitted and the places the review computed.
 * Everything is in the footing's axes, mm and kPa; the report only scales and draws it.
 *
 * @param pad                the element as submitted
 * @param pressureCase       the ULS case whose ground pressure (column actions alone) is drawn, the one of largest q
 * @param q0Kpa              the pressure plane q = q0 + qx·x + qy·y of that case (no tension: q ≥ 0 drawn)
 * @param qxKpaPerMm         its slope along x, kPa/mm
 * @param qyKpaPerMm         its slope along y, kPa/mm
 * @param contactOutline     the zone in contact under that case, counter-clockwise (the whole plan under full contact)
 * @param sections           the critical sections as the bending and shear checks recorded them
 * @param controlPerimeterMm distance a of the governing control perimeter from the column face, when found
 */
public record PadFootingDrawing(PadFooting pad, String pressureCase, double q0Kpa, double qxKpaPerMm,
                                double qyKpaPerMm, List<Point> contactOutline, List<SectionLine> sections,
                                OptionalDouble controlPerimeterMm) implements Drawing {

    /** The no-tension pressure at (x, y) under the drawn case, kPa. */
    public double pressureKpa(double xMm, double yMm) {
        return Math.max(0, q0Kpa + qxKpaPerMm * xMm + qyKpaPerMm * yMm);
    }

    @Override
    public <R> R accept(Visitor<R> visitor) {
        return visitor.padFooting(this);
    }
}
