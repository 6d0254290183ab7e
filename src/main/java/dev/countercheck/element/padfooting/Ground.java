package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.element.padfooting.PadContext.Resultant;
import dev.countercheck.statics.ContactPressure;
import dev.countercheck.statics.PlanPoint;
import dev.countercheck.statics.PressureField;
import dev.countercheck.submission.PadFooting;

import java.util.Optional;

/** The ground pressure under a pad for one case, as the pure statics solve it, and parts of it beyond a line. */
final class Ground {

    private Ground() {
    }

    /** The pressure of one case in equilibrium with it. */
    record Contact(Resultant load, ContactPressure.Contact solved) {

        double qMaxKpa() {
            return solved.qMaxKpa();
        }

        double qMinKpa() {
            return solved.qMinKpa();
        }

        double contactFraction() {
            return solved.fraction();
        }

        PressureField field() {
            return solved.field();
        }
    }

    /** The pressure under case {@code r}, or empty when its resultant leaves the footing (no equilibrium). */
    static Optional<Contact> solve(PadFooting pad, Resultant r) {
        if (r.vKn() <= 0) {
            return Optional.empty();
        }
        return ContactPressure.rectangular(pad.planXMm(), pad.planYMm(), r.base()).contact()
                .map(c -> new Contact(r, c));
    }

    /** The pressure on the part beyond the line at {@code position} along {@code axis}, on side {@code sign}. */
    static PressureField.Resultant beyond(Contact c, Axis axis, double position, int sign) {
        PressureField.Side side = sign > 0 ? PressureField.Side.POSITIVE : PressureField.Side.NEGATIVE;
        return axis == Axis.X ? c.field().beyondX(position, side) : c.field().beyondY(position, side);
    }

    /** The coordinate of {@code p} along {@code axis}, mm. */
    static double along(Axis axis, PlanPoint p) {
        return axis == Axis.X ? p.xMm() : p.yMm();
    }
}
