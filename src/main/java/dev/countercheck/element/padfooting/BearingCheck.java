package dev.countercheck.element.padfooting;

import dev.countercheck.element.padfooting.PadContext.Resultant;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.FindingKind;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.PadFooting;

import java.util.List;
import java.util.Optional;

/**
 * {@code bearing-pressure}: the ground pressure under the characteristic (SLS) cases, V = N + Wf + Ws
 * unfactored, linear without tension under a rigid footing; q_max the largest, q_min and the contact
 * fraction the least over the cases, against the stated allowable pressure.
 */
final class BearingCheck {

    private BearingCheck() {
    }

    static CheckOutcome run(PadContext ctx) {
        CheckBuilder b = Checks.builder("bearing-pressure");
        List<ActionCase> cases = ctx.cases(ActionCase.Kind.SLS_CHARACTERISTIC);
        if (cases.isEmpty()) {
            return b.notChecked("no sls-characteristic action case is given").build();
        }
        b.trace(ctx.footingWeight);
        b.trace(ctx.overburdenWeight);
        Ground.Contact worst = null;
        Ground.Contact least = null;
        for (ActionCase a : cases) {
            Resultant r = ctx.resultant(a, 1.0);
            Optional<Ground.Contact> contact = ctx.contact(r);
            if (contact.isEmpty()) {
                b.trace(Step.of("e", "√(e,x² + e,y²), resultant on the base", "√(" + PadContext.squared(r.exMm()) + " + "
                        + PadContext.squared(r.eyMm()) + ")", Math.hypot(r.exMm(), r.eyMm()), "mm",
                        "EN 1997-1 6.5.4"));
                return b.fail(FindingKind.CAPACITY, "no-equilibrium", "Under " + a.name() + " the resultant (e_x = "
                        + Num.f(r.exMm()) + " mm, e_y = " + Num.f(r.eyMm()) + " mm) lies at or beyond the footing edge:"
                        + " there is no equilibrium.").build();
            }
            Ground.Contact c = contact.get();
            if (worst == null || c.qMaxKpa() > worst.qMaxKpa()) {
                worst = c;
            }
            if (least == null || c.contactFraction() < least.contactFraction()) {
                least = c;
            }
        }
        b.governing(worst.load().action().name());
        b.trace(Step.of("V", "N + W (characteristic)", worst.load().vTerms(), worst.load().vKn(), "kN",
                "EN 1990 6.5.3, Exp. (6.14b)"));
        Step qMax = b.value("q_max", worst.solved().qMax());
        double qMinValue = cases.stream().map(a -> ctx.contact(ctx.resultant(a, 1.0)).orElseThrow())
                .mapToDouble(Ground.Contact::qMinKpa).min().orElseThrow();
        b.value("q_min", Step.of("q,min", "least pressure over the sls-characteristic cases", cases.size()
                + " cases", qMinValue, "kPa", "rigid footing, linear contact pressure without tension (common practice)"));
        b.value("contact_fraction", least.solved().contactFraction());
        if (least.contactFraction() < 1) {
            b.caution("Under the characteristic actions of " + least.load().action().name() + " only "
                    + Num.f(100 * least.contactFraction()) + " % of the base of " + ctx.pad.id() + " is in contact"
                    + " with the ground: the footing lifts off under service loads (common practice: avoid).");
        }
        Optional<Double> allowable = ctx.pad.soil().flatMap(PadFooting.Soil::allowableKpa);
        if (allowable.isEmpty()) {
            return b.notChecked("no allowable bearing pressure (soil.allowable_bearing) is given").build();
        }
        Step limit = b.value("allowable", Step.of("q,allow", "allowable bearing pressure", "as stated",
                allowable.get(), "kPa", "submission"));
        return b.require(qMax.value(), limit.value(), FindingKind.CAPACITY, "capacity", "q,max = "
                + Num.f(qMax.value()) + " kPa under " + worst.load().action().name() + " exceeds the allowable "
                + Num.f(limit.value()) + " kPa.").build();
    }
}
