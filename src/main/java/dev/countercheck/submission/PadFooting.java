package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;
import dev.countercheck.submission.PileCap.CastAgainst;

import java.util.List;
import java.util.Optional;

/**
 * A rectangular pad footing under one column, centred on the origin, bearing on the ground.
 *
 * @param planXMm       plan length along x, mm
 * @param planYMm       plan length along y, mm
 * @param depthMm       overall depth h, mm
 * @param castAgainst   what the soffit is cast against
 * @param soil          the ground under and over the footing, when given
 * @param actions       action cases at the top of the footing (the footing's own weight and the overburden are
 *                      added by the review where a check needs them)
 * @param reinforcement the reinforcement, when given
 * @param claims        the designer's claimed values
 * @param loads         the characteristic loads by source, from which the review generates combinations
 */
public record PadFooting(String id, String description, SourceLocation location, Materials materials,
                         double planXMm, double planYMm, double depthMm, CastAgainst castAgainst,
                         Optional<Soil> soil, Column column, List<ActionCase> actions,
                         Optional<Reinforcement> reinforcement, List<Claim> claims, List<CharacteristicLoad> loads)
        implements ElementInput, RectangularPlan {

    public static final String TYPE = "pad-footing";

    /** A pad footing given by its combined action cases only (no characteristic loads). */
    public PadFooting(String id, String description, SourceLocation location, Materials materials, double planXMm,
                      double planYMm, double depthMm, CastAgainst castAgainst, Optional<Soil> soil, Column column,
                      List<ActionCase> actions, Optional<Reinforcement> reinforcement, List<Claim> claims) {
        this(id, description, location, materials, planXMm, planYMm, depthMm, castAgainst, soil, column, actions,
                reinforcement, claims, List.of());
    }

    /** The same footing reviewed under {@code cases} instead of its own action cases. */
    public PadFooting withActions(List<ActionCase> cases) {
        return new PadFooting(id, description, location, materials, planXMm, planYMm, depthMm, castAgainst, soil,
                column, cases, reinforcement, claims, loads);
    }

    @Override
    public String type() {
        return TYPE;
    }

    /**
     * The ground: an allowable pressure for characteristic actions, the soil over the footing, and
     * (optionally) its characteristic strength for the resistances of EN 1997-1.
     *
     * @param allowableKpa        allowable bearing pressure under characteristic (SLS) actions, kPa, when given
     * @param overburdenMm        depth of soil over the footing, mm (0 when not given)
     * @param unitWeightKnM3      unit weight of the overburden, kN/m³
     * @param phiKDeg             φ'k, characteristic angle of shearing resistance, degrees
     * @param cKKpa               c'k, characteristic effective cohesion, kPa
     * @param cuKKpa              cu,k, characteristic undrained shear strength, kPa
     * @param gammaKKnM3          γk, characteristic unit weight of the soil under the footing, kN/m³
     * @param phiCvKDeg           φ'cv,k, critical-state angle for the footing–soil interface, degrees
     * @param groundwaterDepthMm  depth of the water table below ground level, mm
     */
    public record Soil(Optional<Double> allowableKpa, double overburdenMm, double unitWeightKnM3,
                       Optional<Double> phiKDeg, Optional<Double> cKKpa, Optional<Double> cuKKpa,
                       Optional<Double> gammaKKnM3, Optional<Double> phiCvKDeg,
                       Optional<Double> groundwaterDepthMm) {

        /** Whether a drained or an undrained strength is given (the EN 1997-1 resistances need one). */
        public boolean hasStrength() {
            return phiKDeg.isPresent() || cuKKpa.isPresent();
        }
    }
}
