package dev.countercheck.element;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Direction;

import java.util.List;
import java.util.Optional;

/**
 * An element's bottom steel in each direction and the effective depths it gives
 * (docs/pile-cap.md, "Effective depths"): d of layer 1 = h − c − φ1/2, of layer 2 = h − c − φ1 − φ2/2.
 *
 * @param xBars       the bottom sets running in x
 * @param yBars       the bottom sets running in y
 * @param dx          effective depth of the x-bars, mm
 * @param dy          effective depth of the y-bars, mm
 * @param dMean       (dx + dy)/2, for punching and nodes
 * @param asX         area of the bottom x-bars, mm2
 * @param asY         area of the bottom y-bars, mm2
 */
public record Section(List<BarSet> xBars, List<BarSet> yBars, Step dx, Step dy, Step dMean, Step asX, Step asY) {

    private static final String BASIS = "common practice: layer 1 nearest the soffit";

    /** The section of an element {@code depthMm} deep, or empty when it has no reinforcement or no bottom bars at all. */
    public static Optional<Section> of(Optional<Reinforcement> r, double depthMm) {
        if (r.isEmpty() || r.get().bottom().isEmpty()) {
            return Optional.empty();
        }
        List<BarSet> bottom = r.get().bottom();
        double cover = r.get().cover().bottomMm();
        double phi1 = bottom.stream().filter(b -> b.layer() == 1).mapToDouble(BarSet::diameterMm).max()
                .orElse(bottom.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        List<BarSet> xs = bottom.stream().filter(b -> b.direction() == Direction.X).toList();
        List<BarSet> ys = bottom.stream().filter(b -> b.direction() == Direction.Y).toList();
        Step dx = depth("dx", xs.isEmpty() ? ys : xs, depthMm, cover, phi1);
        Step dy = depth("dy", ys.isEmpty() ? xs : ys, depthMm, cover, phi1);
        if (xs.isEmpty()) {
            dx = dx.remarked("no bottom x-bars: dx taken as for the y-bars");
        }
        if (ys.isEmpty()) {
            dy = dy.remarked("no bottom y-bars: dy taken as for the x-bars");
        }
        double mean = (dx.value() + dy.value()) / 2;
        Step dMean = Step.of("d", "(dx + dy)/2", "(" + Num.f(dx.value()) + " + " + Num.f(dy.value()) + ")/2",
                mean, "mm", "EN 1992-1-1 6.4.2(1)");
        return Optional.of(new Section(xs, ys, dx, dy, dMean, area("As,x", xs), area("As,y", ys)));
    }

    /**
     * The effective depth of bar sets {@code sets} from the face with cover {@code cover}: layer 1
     * h − c − φ/2, layer 2 h − c − φ1 − φ/2.
     */
    public static Step depth(String symbol, List<BarSet> sets, double h, double cover, double phi1) {
        double phi = sets.stream().mapToDouble(BarSet::diameterMm).max().orElse(phi1);
        int layer = sets.stream().mapToInt(BarSet::layer).max().orElse(1);
        if (layer <= 1) {
            double d = h - cover - phi / 2;
            return Step.of(symbol, "h − c − φ/2", Num.f(h) + " − " + Num.f(cover) + " − " + Num.f(phi) + "/2", d,
                    "mm", BASIS);
        }
        double d = h - cover - phi1 - phi / 2;
        return Step.of(symbol, "h − c − φ1 − φ/2",
                Num.f(h) + " − " + Num.f(cover) + " − " + Num.f(phi1) + " − " + Num.f(phi) + "/2", d, "mm", BASIS);
    }

    private static Step area(String symbol, List<BarSet> sets) {
        double as = sets.stream().mapToDouble(BarSet::areaMm2).sum();
        String subst = sets.isEmpty() ? "no bars"
                : String.join(" + ", sets.stream().map(b -> b.count() + "·π·" + Num.f(b.diameterMm()) + "²/4")
                .toList());
        return Step.of(symbol, "Σ n·π·φ²/4 (bottom bars)", subst, as, "mm2", "bar areas");
    }

    public Step d(Direction direction) {
        return direction == Direction.X ? dx : dy;
    }

    public Step as(Direction direction) {
        return direction == Direction.X ? asX : asY;
    }
}
