package dev.countercheck.element.padfooting;

import dev.countercheck.review.CheckOutcome;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.PadFooting;

import java.util.ArrayList;
import java.util.List;

/**
 * {@code bearing-resistance} (EN 1997-1 6.5.2, Annex D), {@code sliding} (6.5.3) and {@code overturning}
 * (EQU): each is not-checked, naming what is missing, when the soil's strength or the cases it needs are
 * not given. This version does not yet compute them when they are: they stay not-checked, saying so.
 */
final class GeotechnicalChecks {

    private static final String NOT_YET = "this version of the review does not compute it yet";

    private GeotechnicalChecks() {
    }

    static CheckOutcome bearingResistance(PadContext ctx) {
        return notChecked(ctx, "bearing-resistance", true, ActionCase.Kind.ULS_GEO);
    }

    static CheckOutcome sliding(PadContext ctx) {
        return notChecked(ctx, "sliding", true, ActionCase.Kind.ULS_GEO);
    }

    static CheckOutcome overturning(PadContext ctx) {
        return notChecked(ctx, "overturning", false, ActionCase.Kind.EQU);
    }

    private static CheckOutcome notChecked(PadContext ctx, String id, boolean needsStrength, ActionCase.Kind kind) {
        List<String> missing = new ArrayList<>();
        if (needsStrength && !ctx.pad.soil().map(PadFooting.Soil::hasStrength).orElse(false)) {
            missing.add("the soil's strength (soil.phi_k or soil.cu_k)");
        }
        if (ctx.cases(kind).isEmpty()) {
            missing.add("an action case of kind " + kind.label());
        }
        return Checks.builder(id).notChecked(missing.isEmpty() ? NOT_YET : "not given: " + String.join(" and ", missing))
                .build();
    }
}
