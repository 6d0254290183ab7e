package dev.countercheck.submission;

import java.util.List;
import java.util.Optional;

/**
 * The reinforcement of an element.
 *
 * @param cover   nominal covers, mm
 * @param bottom  bottom bar sets (layer 1 nearest the soffit)
 * @param top     top bar sets
 * @param sides   side bars, when given
 */
public record Reinforcement(Covers cover, List<BarSet> bottom, List<BarSet> top, Optional<SideBars> sides) {

    /** Nominal covers to the outermost bars of each face, mm. */
    public record Covers(double bottomMm, double topMm, double sideMm) {
    }

    /** Side-face bars: diameter and spacing, mm. */
    public record SideBars(double diameterMm, double spacingMm) {
    }

    public enum Direction { X, Y }

    public enum BarEnds { STRAIGHT, BENT, HOOKED }

    /**
     * Laps of a bar set, when the submission declares them.
     *
     * @param percentLapped share of the bars lapped within one lap length of a section (ρ1 of 8.7.3(1)), %
     * @param lengthMm      the lap length provided, mm
     */
    public record Lap(double percentLapped, double lengthMm) {
    }

    /**
     * A set of equal bars running in one direction.
     *
     * @param layer  1 = nearest the face, 2 = next
     * @param legMm  the vertical leg of bent or hooked ends, when the submission gives it
     * @param lap    the laps of the set, when the submission declares them
     */
    public record BarSet(Direction direction, int count, double diameterMm, int layer, BarEnds ends,
                         Optional<Double> legMm, Optional<Lap> lap) {
        public double areaMm2() {
            return count * Math.PI * diameterMm * diameterMm / 4.0;
        }
    }
}
