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
 * @param castAgainst      what the soffit is cast against
 * @param selfWeight       whether the cap's own weight is to be added to the actions
 * @param reinforcement    the reinforcement, when given
 * @param tieMethod        how the designer sized the ties ({@code claims.method})
 * @param claims           the designer's claimed values
 * @param loads            the characteristic loads by source, from which the review generates combinations
 */
public record PileCap(String id, String description, SourceLocation location, Materials materials,
                      double planXMm, double planYMm, double depthMm, CastAgainst castAgainst,
                      SelfWeight selfWeight, PileGroup piles, Column column, List<ActionCase> actions,
                      Optional<Reinforcement> reinforcement,
                      TieMethod tieMethod, List<Claim> claims, List<CharacteristicLoad> loads) implements ElementInput {

    public static final String TYPE = "pile-cap";

    /** A pile cap given by its combined action cases only (no characteristic loads). */
    public PileCap(String id, String description, SourceLocation location, Materials materials, double planXMm,
                   double planYMm, double depthMm, CastAgainst castAgainst, SelfWeight selfWeight, PileGroup piles,
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

    public enum SelfWeight { ADD, INCLUDED_IN_ACTIONS }

    public enum TieMethod { TRUSS, BENDING }
}
