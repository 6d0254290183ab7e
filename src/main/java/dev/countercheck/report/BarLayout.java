package dev.countercheck.report;

import dev.countercheck.eurocode.Num;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Reinforcement;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Direction;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * Where the drawings place the submitted bars: the same placement the submission format states
 * (bars evenly spread over the width less the side covers; layer 1 nearest its face), applied to
 * drawing only. Nothing here enters a check.
 */
final class BarLayout {

    private BarLayout() {
    }

    /**
     * Centre lines of {@code count} bars spread evenly across {@code widthMm} (centred on 0),
     * between the side covers: the outer bars' faces touch the covers. One bar sits in the middle.
     */
    static List<Double> positions(int count, double widthMm, double sideCoverMm, double diameterMm) {
        List<Double> at = new ArrayList<>();
        double half = widthMm / 2 - sideCoverMm - diameterMm / 2;
        if (count == 1) {
            at.add(0.0);
            return at;
        }
        for (int i = 0; i < count; i++) {
            at.add(-half + 2 * half * i / (count - 1));
        }
        return at;
    }

    /** Height of a bar set's centre above the soffit, mm: bottom layer 1 at c + φ/2, layer 2 at c + φ1 + φ/2; top sets likewise down from the top. */
    static double levelMm(PileCap cap, Reinforcement r, BarSet set, boolean bottom) {
        List<BarSet> face = bottom ? r.bottom() : r.top();
        double cover = bottom ? r.cover().bottomMm() : r.cover().topMm();
        double first = face.stream().filter(b -> b.layer() == 1).mapToDouble(BarSet::diameterMm).max()
                .orElse(face.stream().mapToDouble(BarSet::diameterMm).max().orElse(0));
        double fromFace = cover + (set.layer() <= 1 ? set.diameterMm() / 2 : first + set.diameterMm() / 2);
        return bottom ? fromFace : cap.depthMm() - fromFace;
    }

    /**
     * How far the 45° spread from a pile head's edge widens by the level of the lowest bottom bars
     * (the centre of layer 1 less the embedment), mm; empty without bottom bars or when the bars
     * lie no higher than the pile head.
     */
    static OptionalDouble spreadMm(PileCap cap) {
        if (cap.reinforcement().isEmpty() || cap.reinforcement().get().bottom().isEmpty()) {
            return OptionalDouble.empty();
        }
        Reinforcement r = cap.reinforcement().get();
        double lowest = r.bottom().stream().mapToDouble(b -> levelMm(cap, r, b, true)).min().orElse(0);
        double rise = lowest - cap.piles().embedmentMm();
        return rise > 0 ? OptionalDouble.of(rise) : OptionalDouble.empty();
    }

    /** "6 φ25 B1, 4 φ16 T1" for the sets running in {@code direction}; "none" when there are none. */
    static String describe(Reinforcement r, Direction direction) {
        List<String> parts = new ArrayList<>();
        r.bottom().stream().filter(b -> b.direction() == direction).forEach(b -> parts.add(name(b, "B")));
        r.top().stream().filter(b -> b.direction() == direction).forEach(b -> parts.add(name(b, "T")));
        return parts.isEmpty() ? "none" : String.join(", ", parts);
    }

    /** "6 φ25 B1": count, diameter, face (B bottom, T top) and layer. */
    static String name(BarSet set, String face) {
        return set.count() + " φ" + Num.f(set.diameterMm()) + " " + face + set.layer();
    }
}
