package dev.countercheck.statics;

/**
 * The region a control perimeter at distance a from a column encloses, formed once for the pressure fields of
 * many action cases ({@link PressureField#insidePerimeter(ControlRegion)}): the cases of one footing that keep
 * the same contact zone (every case in full contact has the whole plan) share its part on that zone, so that the
 * clipping of the many-sided region is done once per zone, not once per case.
 */
public final class ControlRegion {

    private final ConvexPolygon region;
    private final double aMm;
    private ConvexPolygon lastZone;
    private ConvexPolygon lastPart;

    private ControlRegion(ConvexPolygon region, double aMm) {
        this.region = region;
        this.aMm = aMm;
    }

    /** The region within {@code aMm} of the column's face (arcs by chords of 1°). */
    public static ControlRegion of(ColumnOutline column, double aMm) {
        return new ControlRegion(ControlPerimeter.region(column, aMm), aMm);
    }

    public double aMm() {
        return aMm;
    }

    /** The part of the region on the contact zone {@code zone}; the last zone's part is kept for the next case. */
    ConvexPolygon on(ConvexPolygon zone) {
        if (lastZone == null || !lastZone.sameAs(zone)) {
            lastZone = zone;
            lastPart = region.intersect(zone);
        }
        return lastPart;
    }
}
