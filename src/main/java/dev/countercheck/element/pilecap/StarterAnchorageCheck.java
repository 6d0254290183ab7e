package dev.countercheck.element.pilecap;

import dev.countercheck.eurocode.Anchorage;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.review.CheckBuilder;
import dev.countercheck.review.CheckOutcome;
import dev.countercheck.review.Severity;
import dev.countercheck.submission.Column.StarterBars;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;

/**
 * {@code anchorage-starters}: the column starter bars, in compression, must anchor within the cap
 * depth. Vertical bars in good bond (η1 = 1), straight, all α = 1, σsd = fyd (pile-cap-method.md);
 * the length available runs from the top of the cap to the top of the bottom mat they stand on:
 * h − c_bottom − φ1 − φ2.
 */
final class StarterAnchorageCheck {

    private StarterAnchorageCheck() {
    }

    static CheckOutcome run(PileCapContext ctx) {
        CheckBuilder b = Checks.builder("anchorage-starters");
        if (ctx.cap.column().starterBars().isEmpty()) {
            return b.notChecked("the column starter bars are not given").build();
        }
        if (ctx.cap.reinforcement().isEmpty()) {
            return b.notChecked("no reinforcement given: the bottom cover and mat are unknown").build();
        }
        StarterBars bars = ctx.cap.column().starterBars().get();
        Reinforcement r = ctx.cap.reinforcement().get();
        double phi = bars.diameterMm();
        b.trace(ctx.fctk005);
        Step fctd = b.trace(ctx.fctd);
        Step eta2 = b.trace(Anchorage.eta2(phi));
        Step fbd = b.trace(Anchorage.fbd(1.0, eta2.value(), fctd.value())
                .remarked("η1 = 1.0: vertical bars are in good bond (EN 1992-1-1 8.4.2(2))"));
        b.trace(ctx.fyd);
        Step lbRqd = b.value("lb_rqd", Anchorage.lbRqd(phi, ctx.fyd.value(), fbd.value()));
        Step lbMin = b.trace(Anchorage.lbMinCompression(lbRqd.value(), phi));
        Step lbd = b.value("lbd", Anchorage.lbd(1, 1, 1, 1, 1, lbRqd.value(), lbMin.value()));
        double phi1 = layerDiameter(r, 1);
        double phi2 = layerDiameter(r, 2);
        double h = ctx.cap.depthMm();
        double cover = r.cover().bottomMm();
        Step available = b.value("available", Step.of("l,avail", "h − c_bottom − φ1 − φ2",
                Num.f(h) + " − " + Num.f(cover) + " − " + Num.f(phi1) + " − " + Num.f(phi2), h - cover - phi1 - phi2,
                "mm", "starter bars stand on the bottom mat (common practice)"));
        b.require(lbd.value(), available.value(), Severity.MAJOR, "Starter bars φ" + Num.f(phi) + " need lbd = "
                + Num.f(lbd.value()) + " mm in compression but the cap gives " + Num.f(available.value()) + " mm.");
        return b.build();
    }

    private static double layerDiameter(Reinforcement r, int layer) {
        return r.bottom().stream().filter(s -> s.layer() == layer).mapToDouble(BarSet::diameterMm).max().orElse(0);
    }
}
