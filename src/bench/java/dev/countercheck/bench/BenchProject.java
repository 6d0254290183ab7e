package dev.countercheck.bench;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Writes invented pile-cap projects for the benchmarks: caps of 2, 3, 4, 5, 6 and 9 piles, pile
 * diameters, spacings, depths, loads and bars varied element by element (all dimensions chosen here
 * for timing only; they are no design and no published example).
 */
final class BenchProject {

    /** Pile layouts in units of the pile spacing, by pile count. */
    private static final int[] PILE_COUNTS = {4, 2, 9, 3, 6, 5};
    private static final int[] DIAMETERS = {500, 600, 750};
    private static final int[] BARS = {20, 25, 32};

    private BenchProject() {
    }

    /** A project of {@code count} elements, cycling through the layouts, written to {@code file}. */
    static Path write(Path file, int count) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write(header(count));
            for (int i = 0; i < count; i++) {
                w.write(element(i, PILE_COUNTS[i % PILE_COUNTS.length]));
            }
        }
        return file;
    }

    /** A project of one cap of {@code piles} piles. */
    static Path writeOne(Path file, int piles) throws IOException {
        Files.writeString(file, header(1) + element(0, piles), StandardCharsets.UTF_8);
        return file;
    }

    private static String header(int count) {
        return """
                countercheck: 1
                project:
                  title: Benchmark project of %d invented pile caps
                  reference: BENCH-%d
                  revision: P01
                  prepared_by: countercheck benchmark (invented)
                  date: 2026-01-01
                basis:
                  ruleset: en1992-recommended
                materials:
                  concrete: C35/45
                  fyk: 500
                  aggregate: 20
                  exposure: [XC2]
                  structural_class: S4
                  cover_deviation: 10
                elements:
                """.formatted(count, count);
    }

    private static String element(int i, int piles) {
        int phi = DIAMETERS[(i / 6) % DIAMETERS.length];
        int spacing = roundTo50(3.2 * phi);
        int overhang = phi / 2 + 225;
        List<int[]> positions = layout(piles, spacing);
        int extentX = positions.stream().mapToInt(p -> p[0]).max().orElseThrow();
        int extentY = positions.stream().mapToInt(p -> p[1]).max().orElseThrow();
        int planX = 2 * (extentX + overhang);
        int planY = 2 * (extentY + overhang);
        int depth = roundTo50(0.6 * spacing + 350 + 50 * (i % 3));
        int capacity = roundTo50(phi * phi * 0.0075);
        int n = roundTo50(piles * capacity * (0.7 + 0.05 * (i % 5)));
        int bar = BARS[(i / 2) % BARS.length];
        int countX = Math.max(4, planY / 150);
        int countY = Math.max(4, planX / 150);
        int column = 450 + 50 * (i % 5);
        StringBuilder pos = new StringBuilder();
        for (int[] p : positions) {
            pos.append(pos.length() == 0 ? "" : ", ").append('[').append(p[0]).append(", ").append(p[1]).append(']');
        }
        return """
                  - id: B-%05d
                    type: pile-cap
                    description: Benchmark cap %d, %d piles
                    plan: {x: %d, y: %d}
                    depth: %d
                    cast_against: blinding
                    piles:
                      diameter: %d
                      positions: [%s]
                      capacity: {compression: %d, tension: 0}
                      embedment: 75
                      tolerance: 75
                    column:
                      shape: rectangular
                      size: [%d, %d]
                      position: [0, 0]
                      starter_bars: {count: 8, diameter: 25}
                    actions:
                      - {name: ULS-1, kind: uls, N: %d, Mx: %d, My: %d}
                      - {name: ULS-2, kind: uls, N: %d, My: %d, Hx: 40}
                    reinforcement:
                      cover: {bottom: 100, top: 50, side: 75}
                      bottom:
                        - {direction: x, count: %d, diameter: %d, layer: 1, ends: bent}
                        - {direction: y, count: %d, diameter: %d, layer: 2, ends: bent}
                    claims:
                      method: truss
                      pile-reactions: {max: %d}
                """.formatted(i, i, piles, planX, planY, depth, phi, pos, capacity, column, column,
                n, 20 * (i % 7), 30 * (i % 4), roundTo50(0.8 * n), -25 * (i % 6), countX, bar, countY, bar,
                roundTo50(1.05 * n / piles));
    }

    private static List<int[]> layout(int piles, int s) {
        List<int[]> out = new ArrayList<>();
        switch (piles) {
            case 2 -> {
                out.add(new int[] {-s / 2, 0});
                out.add(new int[] {s / 2, 0});
            }
            case 3 -> {
                int h = roundTo50(s * Math.sqrt(3) / 2);
                out.add(new int[] {0, 2 * h / 3});
                out.add(new int[] {-s / 2, -h / 3});
                out.add(new int[] {s / 2, -h / 3});
            }
            case 5 -> {
                out.addAll(layout(4, s));
                out.add(new int[] {0, 0});
            }
            case 4 -> grid(out, 2, 2, s);
            case 6 -> grid(out, 3, 2, s);
            case 9 -> grid(out, 3, 3, s);
            default -> throw new IllegalArgumentException("no layout of " + piles + " piles");
        }
        return out;
    }

    private static void grid(List<int[]> out, int nx, int ny, int s) {
        for (int j = 0; j < ny; j++) {
            for (int i = 0; i < nx; i++) {
                out.add(new int[] {(2 * i - (nx - 1)) * s / 2, (2 * j - (ny - 1)) * s / 2});
            }
        }
    }

    private static int roundTo50(double v) {
        return (int) Math.round(v / 50) * 50;
    }
}
