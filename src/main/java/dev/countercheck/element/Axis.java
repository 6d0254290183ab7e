package dev.countercheck.element;

import dev.countercheck.submission.Column;
import dev.countercheck.submission.Point;
import dev.countercheck.submission.RectangularPlan;
import dev.countercheck.submission.Reinforcement.Direction;

/** A plan axis, and what a check in that direction measures along and across it. */
public enum Axis {
    X, Y;

    public String label() {
        return this == X ? "x" : "y";
    }

    public Direction bars() {
        return this == X ? Direction.X : Direction.Y;
    }

    /** The coordinate of {@code p} along this axis, mm. */
    public double along(Point p) {
        return this == X ? p.xMm() : p.yMm();
    }

    /** Half the column's size along this axis, mm (the radius for a circular column). */
    public double columnHalf(Column c) {
        return (this == X ? c.cxMm() : c.cyMm()) / 2.0;
    }

    /** The element's length along this axis, mm (the plan is centred on the origin). */
    public double length(RectangularPlan plan) {
        return this == X ? plan.planXMm() : plan.planYMm();
    }

    /** The element's width across bars of this direction, mm: the full width of a section across this axis. */
    public double width(RectangularPlan plan) {
        return this == X ? plan.planYMm() : plan.planXMm();
    }
}
