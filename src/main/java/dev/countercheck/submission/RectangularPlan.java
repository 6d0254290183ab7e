package dev.countercheck.submission;

/** An element whose plan is a rectangle centred on the origin, its sides along x and y. */
public interface RectangularPlan {

    /** The side along x, mm. */
    double planXMm();

    /** The side along y, mm. */
    double planYMm();
}
