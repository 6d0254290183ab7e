package dev.countercheck.statics;

/**
 * A column's outline in plan, in the element's axes: a rectangle cx × cy or a circle of diameter cx (then
 * cy = cx), centred on {@code centre}. Lengths in mm.
 *
 * @param circular whether the column is circular
 * @param cxMm     side parallel to x, or the diameter, mm, &gt; 0
 * @param cyMm     side parallel to y (the diameter again for a circle), mm, &gt; 0
 * @param centre   the column's centre
 */
public record ColumnOutline(boolean circular, double cxMm, double cyMm, PlanPoint centre) {

    /** A rectangular column cx × cy centred on {@code centre}. */
    public static ColumnOutline rectangular(double cxMm, double cyMm, PlanPoint centre) {
        return new ColumnOutline(false, cxMm, cyMm, centre);
    }

    /** A circular column of diameter D centred on {@code centre}. */
    public static ColumnOutline circular(double diameterMm, PlanPoint centre) {
        return new ColumnOutline(true, diameterMm, diameterMm, centre);
    }

    /** The same column turned a quarter: x and y swapped (its centre too). */
    ColumnOutline turned() {
        return new ColumnOutline(circular, cyMm, cxMm, new PlanPoint(centre.yMm(), centre.xMm()));
    }
}
