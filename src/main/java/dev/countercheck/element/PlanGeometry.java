package dev.countercheck.element;

import dev.countercheck.statics.ColumnOutline;
import dev.countercheck.statics.PlanPoint;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.Point;

import java.util.List;

/** The submission's points and columns as the pure statics package takes them (shared by every kind). */
public final class PlanGeometry {

    private PlanGeometry() {
    }

    public static PlanPoint point(Point p) {
        return new PlanPoint(p.xMm(), p.yMm());
    }

    public static List<PlanPoint> points(List<Point> points) {
        return points.stream().map(PlanGeometry::point).toList();
    }

    /** The column's outline: a circle of diameter cx, or the rectangle cx × cy, at its position. */
    public static ColumnOutline outline(Column c) {
        return c.shape() == Column.ColumnShape.CIRCULAR
                ? ColumnOutline.circular(c.cxMm(), point(c.position()))
                : ColumnOutline.rectangular(c.cxMm(), c.cyMm(), point(c.position()));
    }
}
