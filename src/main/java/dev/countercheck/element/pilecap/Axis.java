package dev.countercheck.element.pilecap;

import dev.countercheck.submission.Column;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement.Direction;

/** A plan axis, and what a check in that direction measures along and across it. */
enum Axis {
    X, Y;

    String label() {
        return this == X ? "x" : "y";
    }

    Direction bars() {
        return this == X ? Direction.X : Direction.Y;
    }

    /** The coordinate of {@code p} along this axis, mm. */
    double along(Point p) {
        return this == X ? p.xMm() : p.yMm();
    }

    /** Half the column's size along this axis, mm (the radius for a circular column). */
    double columnHalf(Column c) {
        return (this == X ? c.cxMm() : c.cyMm()) / 2.0;
    }

    /** The cap's length along this axis, mm (the cap is centred on the origin). */
    double capLength(PileCap cap) {
        return this == X ? cap.planXMm() : cap.planYMm();
    }

    /** The cap's width across bars of this direction, mm: the full width of a section across this axis. */
    double capWidth(PileCap cap) {
        return this == X ? cap.planYMm() : cap.planXMm();
    }
}
