package dev.countercheck.element.padfooting;

import dev.countercheck.submission.Column;
import dev.countercheck.submission.PadFooting;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.Reinforcement.Direction;

/** A plan axis of a pad, and what a check in that direction measures along and across it. */
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

    /** The footing's length along this axis, mm. */
    double length(PadFooting pad) {
        return this == X ? pad.planXMm() : pad.planYMm();
    }

    /** The footing's width across bars of this direction: the full width of a section across this axis, mm. */
    double width(PadFooting pad) {
        return this == X ? pad.planYMm() : pad.planXMm();
    }
}
