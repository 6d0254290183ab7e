package dev.countercheck.submission;

import dev.countercheck.submission.CheckCatalogue.CheckSpec;
import dev.countercheck.submission.CheckCatalogue.Kind;

import java.util.List;

import static dev.countercheck.submission.CheckCatalogue.capacity;
import static dev.countercheck.submission.CheckCatalogue.demand;

/**
 * The detailing checks that one ruleset rule reviews for every element type that has such parts
 * (`applies_to` names the types): declared once here, listed by each type's catalogue in its own order.
 */
final class SharedDetailingChecks {

    static final CheckSpec MAX_STEEL = new CheckSpec("max-steel", "Maximum steel", "EN 1992-1-1 9.2.1.1(3)",
            Kind.DETAILING, List.of(capacity("as_max", "mm2"), demand("as_provided", "mm2")));
    static final CheckSpec BAR_SPACING_X = barSpacing("x");
    static final CheckSpec BAR_SPACING_Y = barSpacing("y");
    static final CheckSpec COVER = new CheckSpec("cover", "Concrete cover", "EN 1992-1-1 4.4.1",
            Kind.DETAILING, List.of(demand("required", "mm"), capacity("provided", "mm"),
                    demand("required_side", "mm"), capacity("provided_side", "mm")));
    static final CheckSpec ANCHORAGE_STARTERS = new CheckSpec("anchorage-starters",
            "Anchorage of the column starter bars in compression", "EN 1992-1-1 8.4",
            Kind.DETAILING, List.of(demand("lb_rqd", "mm"), demand("lbd", "mm"), capacity("available", "mm")));
    static final CheckSpec CRACK_CONTROL = new CheckSpec("crack-control", "Crack control without direct calculation",
            "EN 1992-1-1 7.3.3", Kind.DETAILING, List.of(demand("sigma_s", "MPa"), capacity("phi_max", "mm"),
                    capacity("s_max", "mm")));

    private static CheckSpec barSpacing(String axis) {
        return new CheckSpec("bar-spacing-" + axis, "Bar spacing, bars parallel to " + axis, "EN 1992-1-1 8.2",
                Kind.DETAILING, List.of(demand("spacing", "mm"), capacity("clear", "mm"), demand("min_clear", "mm"),
                        capacity("max_spacing", "mm")));
    }

    private SharedDetailingChecks() {
    }
}
