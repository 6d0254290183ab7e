package dev.countercheck.element;

import java.util.ArrayList;
import java.util.List;

/**
 * The governing control perimeter among those at j = 1 … count (a = 2d·j/count from the column face,
 * EN 1992-1-1 6.4.4(2)): the first of greatest utilisation, the same one an evaluation of every perimeter
 * in order finds, with the costly part of most perimeters skipped.
 *
 * <p>What is costly is the relief at a perimeter (the shares of the pile heads inside it, the ground
 * pressure inside it); it never falls as a grows. Knowing the relief at two perimeters jl &lt; jh, the
 * utilisation of every perimeter between them has a cheap upper bound (the least relief where it lowers
 * the load, the greatest where it raises it: a tension pile). The search evaluates the last perimeter,
 * then halves each interval whose bound could still reach the greatest utilisation found so far; a
 * perimeter whose bound lies below it by more than {@value #MARGIN} of it cannot govern and is skipped.
 * The margin covers the rounding of the bound's arithmetic (about 10⁻¹⁵ of it); the kinds' bounds are
 * exact upper bounds otherwise.
 */
public final class PerimeterSearch {

    /** The relative margin by which a bound must fall short of the greatest utilisation to skip a perimeter. */
    static final double MARGIN = 1e-9;

    /**
     * The perimeters of one element and case set.
     *
     * @param <R> the relief at a perimeter
     * @param <P> a perimeter evaluated in full
     */
    public interface Perimeters<R, P> {

        /** The relief at no perimeter (a = 0): at most the relief at any perimeter. */
        R none();

        /** The relief at perimeter j (1 … count), never less than at a smaller j. */
        R relief(int j);

        /** Perimeter j in full with its relief; null when it carries no load (it cannot govern). */
        P perimeter(int j, R relief);

        /** The utilisation of a perimeter the search found. */
        double utilisation(P perimeter);

        /**
         * At least the utilisation of perimeter j for any relief between {@code least} and {@code most}
         * (the reliefs at perimeters below and above j); at most 0 when it can carry no load then.
         */
        double bound(int j, R least, R most);
    }

    private PerimeterSearch() {
    }

    /** The first perimeter of greatest utilisation among j = 1 … count; null when none carries a load. */
    public static <R, P> P governing(int count, Perimeters<R, P> perimeters) {
        if (count < 1) {
            return null;
        }
        Search<R, P> s = new Search<>(count, perimeters);
        R last = s.evaluate(count);
        s.refine(0, perimeters.none(), count, last);
        P governing = null;
        for (P p : s.found) {
            if (p != null && (governing == null || perimeters.utilisation(p) > perimeters.utilisation(governing))) {
                governing = p;
            }
        }
        return governing;
    }

    /** One search: the perimeters evaluated so far (by j) and the greatest utilisation among them. */
    private static final class Search<R, P> {

        private final Perimeters<R, P> perimeters;
        private final List<P> found;
        private double greatest;

        Search(int count, Perimeters<R, P> perimeters) {
            this.perimeters = perimeters;
            this.found = new ArrayList<>(count);
            for (int j = 0; j < count; j++) {
                found.add(null);
            }
            this.greatest = 0;
        }

        /** Evaluates perimeter j in full; returns its relief. */
        R evaluate(int j) {
            R relief = perimeters.relief(j);
            P p = perimeters.perimeter(j, relief);
            found.set(j - 1, p);
            if (p != null) {
                greatest = Math.max(greatest, perimeters.utilisation(p));
            }
            return relief;
        }

        /** Evaluates the perimeters strictly between jl and jh that could govern (reliefs at both ends known). */
        void refine(int jl, R least, int jh, R most) {
            if (jh - jl < 2 || !anyCouldGovern(jl, least, jh, most)) {
                return;
            }
            int mid = (jl + jh) >>> 1;
            R relief = evaluate(mid);
            refine(jl, least, mid, relief);
            refine(mid, relief, jh, most);
        }

        private boolean anyCouldGovern(int jl, R least, int jh, R most) {
            for (int j = jl + 1; j < jh; j++) {
                double bound = perimeters.bound(j, least, most);
                if (bound > 0 && bound * (1 + MARGIN) >= greatest) {
                    return true;
                }
            }
            return false;
        }
    }
}
