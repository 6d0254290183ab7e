package dev.countercheck.submission;

import java.util.List;
import java.util.Optional;

/**
 * The piles under a cap.
 *
 * @param diameterMm          pile diameter (or side of a square pile), mm
 * @param positions           pile centres, mm, in the cap's axes; pile i is {@code positions.get(i)}, numbered from 1 in reports
 * @param compressionKn       ULS design resistance of one pile in compression, kN
 * @param tensionKn           ULS design resistance of one pile in tension, kN (0 when none)
 * @param embedmentMm         pile head cast into the cap, mm
 * @param toleranceMm         plan positional tolerance δ, mm, when stated
 */
public record PileGroup(double diameterMm, List<Point> positions, double compressionKn, double tensionKn,
                        double embedmentMm, Optional<Double> toleranceMm) {

    public int count() {
        return positions.size();
    }
}
