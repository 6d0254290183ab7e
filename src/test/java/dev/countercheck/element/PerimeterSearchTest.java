package dev.countercheck.element;

import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The bounded search finds the perimeter an evaluation of every perimeter in order finds (the first of
 * greatest utilisation, ties included), on invented perimeters whose relief never falls as j grows.
 */
class PerimeterSearchTest {

    /**
     * Perimeter j carries w_j − relief_j (none when that is not positive); a relief between least and most
     * leaves at most w_j − least. Utilisations are whole numbers so that ties are frequent.
     */
    private static final class Invented implements PerimeterSearch.Perimeters<Integer, Integer> {

        final int[] w;
        final int[] relief;
        int evaluated;

        Invented(Random random, int count) {
            w = new int[count + 1];
            relief = new int[count + 1];
            for (int j = 1; j <= count; j++) {
                w[j] = random.nextInt(40);
                relief[j] = relief[j - 1] + (random.nextInt(3) == 0 ? random.nextInt(6) : 0);
            }
        }

        @Override
        public Integer none() {
            return 0;
        }

        @Override
        public Integer relief(int j) {
            evaluated++;
            return relief[j];
        }

        @Override
        public Integer perimeter(int j, Integer relief) {
            return w[j] - relief > 0 ? j : null;
        }

        @Override
        public double utilisation(Integer j) {
            return w[j] - relief[j];
        }

        @Override
        public double bound(int j, Integer least, Integer most) {
            return w[j] - least;
        }

        /** The first perimeter of greatest utilisation, every perimeter evaluated in order. */
        Integer everyPerimeter() {
            Integer governing = null;
            for (int j = 1; j < w.length; j++) {
                Integer p = perimeter(j, relief[j]);
                if (p != null && (governing == null || utilisation(p) > utilisation(governing))) {
                    governing = p;
                }
            }
            return governing;
        }
    }

    @Test
    void findsTheFirstPerimeterOfGreatestUtilisation() {
        Random random = new Random(14);
        for (int trial = 0; trial < 3000; trial++) {
            int count = 1 + random.nextInt(120);
            Invented perimeters = new Invented(random, count);
            assertThat(PerimeterSearch.governing(count, perimeters)).as("trial %d", trial)
                    .isEqualTo(perimeters.everyPerimeter());
        }
    }

    @Test
    void skipsPerimetersThatCannotGovern() {
        // Utilisation rising to a peak at j = 30 and the relief growing beyond it: few of the 100 are evaluated.
        Invented perimeters = new Invented(new Random(1), 100);
        for (int j = 1; j <= 100; j++) {
            perimeters.w[j] = 1000 - Math.abs(30 - j);
            perimeters.relief[j] = Math.max(0, 5 * (j - 30));
        }
        assertThat(PerimeterSearch.governing(100, perimeters)).isEqualTo(30);
        assertThat(perimeters.evaluated).isLessThan(40);
    }

    @Test
    void noneWhenNoPerimeterCarriesALoad() {
        Invented perimeters = new Invented(new Random(2), 10);
        for (int j = 1; j <= 10; j++) {
            perimeters.w[j] = 3;
            perimeters.relief[j] = 3 + j;
        }
        assertThat(PerimeterSearch.governing(10, perimeters)).isNull();
        assertThat(PerimeterSearch.governing(0, perimeters)).isNull();
    }
}
