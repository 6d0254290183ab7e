package dev.countercheck.statics;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Intersection of convex polygons: skipping the edges whose half-plane clears the clipped polygon must give
 * the same vertices, to the bit, as clipping by every edge; a plane integrated without a call per point gives the
 * same double as the general integral. Invented shapes.
 */
class ConvexPolygonTest {

    @Test
    void skippingTheEdgesThatClearTheRegionChangesNoVertex() {
        ConvexPolygon region = ControlPerimeter.region(ColumnOutline.rectangular(450, 300, new PlanPoint(40, -25)), 610);
        ConvexPolygon[] others = {
            ConvexPolygon.rectangle(-2000, -2000, 2000, 2000),   // holds the region: every edge skipped
            ConvexPolygon.rectangle(-700, -2000, 2000, 2000),    // cuts it on one side
            ConvexPolygon.rectangle(-615.2, -631, 655.2, 585.0), // grazes it within a fraction of a millimetre
            ConvexPolygon.of(new double[] {-1500, 900, 1400, -1200}, new double[] {-1300, -700, 1500, 900}),
            ConvexPolygon.regular(300, 100, 800, 7),
        };
        for (ConvexPolygon other : others) {
            ConvexPolygon fast = region.intersect(other);
            ConvexPolygon every = clipByEveryEdge(region, other);
            assertThat(fast.size()).isEqualTo(every.size());
            for (int i = 0; i < fast.size(); i++) {
                assertThat(fast.x(i)).isEqualTo(every.x(i));
                assertThat(fast.y(i)).isEqualTo(every.y(i));
            }
        }
    }

    private static ConvexPolygon clipByEveryEdge(ConvexPolygon p, ConvexPolygon other) {
        ConvexPolygon result = p;
        int n = other.size();
        for (int i = 0; i < n && result.size() >= 3; i++) {
            int j = (i + 1) % n;
            double ex = other.x(j) - other.x(i);
            double ey = other.y(j) - other.y(i);
            result = result.clip(ey * other.x(i) - ex * other.y(i), -ey, ex);
        }
        return result;
    }

    /** Control regions cut by random contact zones, random planes: the same double, to the bit. Invented sizes. */
    @Test
    void aPlaneIntegratesToTheSameDoubleAsTheGeneralIntegral() {
        Random random = new Random(1402);
        List<String> mismatches = new ArrayList<>();
        for (int trial = 0; trial < 2000; trial++) {
            PlanPoint centre = new PlanPoint(random.nextDouble() * 600 - 300, random.nextDouble() * 600 - 300);
            ColumnOutline c = random.nextBoolean()
                    ? ColumnOutline.rectangular(200 + random.nextInt(600), 200 + random.nextInt(600), centre)
                    : ColumnOutline.circular(200 + random.nextInt(600), centre);
            ConvexPolygon region = ControlPerimeter.region(c, 1 + random.nextDouble() * 2000);
            ConvexPolygon zone = ConvexPolygon.rectangle(-1500, -1200, 1500, 1200)
                    .clip(random.nextDouble() * 400 - 100, random.nextDouble() * 2 - 1, random.nextDouble() * 2 - 1);
            ConvexPolygon part = random.nextInt(4) == 0 ? region : region.intersect(zone);
            double q0 = random.nextDouble() * 600 - 100;
            double qx = random.nextDouble() * 0.4 - 0.2;
            double qy = random.nextDouble() * 0.4 - 0.2;
            double general = part.integrate((x, y) -> q0 + qx * x + qy * y);
            double plane = part.integratePlane(q0, qx, qy);
            if (Double.doubleToRawLongBits(general) != Double.doubleToRawLongBits(plane)) {
                mismatches.add("trial " + trial + ": " + general + " vs " + plane);
            }
        }
        assertThat(mismatches).isEmpty();
    }
}
