package dev.countercheck.submission;

import dev.countercheck.input.SourceLocation;
import java.util.List;
import java.util.Optional;

/**
 * A rectangular pile cap, centred on the origin.
 *
 * @param planXMm          plan length along x, mm
 * @param planYMm          plan length along y, mm
 * @param depthMm          overall depth h, mm
 * @param castAgainst      what the bottom face and the side faces are cast against
 * @param selfWeight       whether the cap's own weight is to be added to the actions
 * @param reinforcement    the reinforcement, when given
 * @param tieMethod        how the designer sized the ties ({@code claims.method})
 * @param claims           the designer's claimed values
 * @param loads            the characteristic loads by source, from which the review generates combinations
 */
public record PileCap(String id, String description, SourceLocation location, Materials materials,
                      double planXMm, double planYMm, double depthMm, Casting castAgainst,
                      SelfWeight selfWeight, PileGroup piles, Column column, List<ActionCase> actions,
                      Optional<Reinforcement> reinforcement,
                      TieMethod tieMethod, List<Claim> claims, List<CharacteristicLoad> loads) implements ElementInput,
        RectangularPlan {

    public static final String TYPE = "pile-cap";

    /** A pile cap given by its combined action cases only (no characteristic loads). */
    public PileCap(String id, String description, SourceLocation location, Materials materials, double planXMm,
                   double planYMm, double depthMm, Casting castAgainst, SelfWeight selfWeight, PileGroup piles,
                   Column column, List<ActionCase> actions, Optional<Reinforcement> reinforcement, TieMethod tieMethod,
                   List<Claim> claims) {
        this(id, description, location, materials, planXMm, planYMm, depthMm, castAgainst, selfWeight, piles, column,
                actions, reinforcement, tieMethod, claims, List.of());
    }

    /** The same cap reviewed under {@code cases} instead of its own action cases. */
    public PileCap withActions(List<ActionCase> cases) {
        return new PileCap(id, description, location, materials, planXMm, planYMm, depthMm, castAgainst, selfWeight,
                piles, column, cases, reinforcement, tieMethod, claims, loads);
    }

    @Override
    public String type() {
        return TYPE;
    }

    public enum CastAgainst { BLINDING, SOIL, FORMWORK }

    /**
     * What the faces are cast against (EN 1992-1-1 4.4.1.3(4)).
     *
     * @param bottom      the soffit: blinding, soil or formwork
     * @param sides       the side faces: soil or formwork
     * @param sidesStated whether the submission said what the sides are cast against (when it did
     *                    not, they are taken as formed and the review says so)
     */
    public record Casting(CastAgainst bottom, CastAgainst sides, boolean sidesStated) {

        /** A plain {@code cast_against} value: the bottom face; the sides taken as formed. */
        public static Casting bottomOnly(CastAgainst bottom) {
            return new Casting(bottom, CastAgainst.FORMWORK, false);
        }
    }

    public enum SelfWeight { ADD, INCLUDED_IN_ACTIONS }

    public enum TieMethod { TRUSS, BENDING }
}
