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

    /**
     * A project of one pad footing: moments about both axes (two-way partial contact under the
     * ULS case, solved by the no-tension solver), soil strength with uls-geo and equ cases (bearing
     * resistance, sliding, overturning), service cases. Dimensions invented for timing only.
     */
    static Path writeOnePad(Path file) throws IOException {
        Files.writeString(file, header(1) + """
                  - id: P-00001
                    type: pad-footing
                    description: Benchmark pad, moments about both axes
                    plan: {x: 2700, y: 2300}
                    depth: 650
                    cast_against: soil
                    soil: {allowable_bearing: 325, overburden: 550, unit_weight: 19, phi_k: 31, gamma_k: 19, groundwater_depth: 2800}
                    column: {shape: rectangular, size: [450, 400], position: [50, 0], starter_bars: {count: 8, diameter: 16}}
                    actions:
                      - {name: ULS-1, kind: uls, N: 1350, Mx: 310, My: 420, Hx: 35}
                      - {name: ULS-2, kind: uls, N: 1700, Mx: 90, My: 120}
                      - {name: GEO-1, kind: uls-geo, N: 1050, Mx: 240, My: 330, Hx: 30}
                      - {name: EQU-1, kind: equ, N: 800, Mx: 260, My: 350, Hx: 35}
                      - {name: SLS-1, kind: sls-characteristic, N: 980, Mx: 200, My: 270, Hx: 25}
                    reinforcement:
                      cover: {bottom: 75, top: 50, side: 75}
                      bottom:
                        - {direction: x, count: 13, diameter: 20, layer: 1}
                        - {direction: y, count: 15, diameter: 16, layer: 2}
                    claims:
                      bearing-pressure: {q_max: 330}
                """, StandardCharsets.UTF_8);
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
