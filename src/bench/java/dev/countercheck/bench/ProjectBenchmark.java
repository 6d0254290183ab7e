package dev.countercheck.bench;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import org.yaml.snakeyaml.LoaderOptions;
import dev.countercheck.cli.CountercheckCommand;
import picocli.CommandLine;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * The benchmark command: times a full review of a generated project to JSON and HTML against a floor
 * in the same JVM (reading the same file with Jackson and writing JSON of the reports' size), and
 * prints both medians, their ratio and the peak heap of a review.
 *
 * <p>Arguments: element counts (default {@code 2000 20000}); {@code -Druns=N} sets the timed runs
 * (default 5, after one untimed run of each).
 */
public final class ProjectBenchmark {

    /** Reads a document as large as the tool's reader accepts (SnakeYAML's default stops at 3 M code points). */
    private static final ObjectMapper YAML = new ObjectMapper(YAMLFactory.builder().loaderOptions(largeDocuments()).build());
    private static final ObjectMapper JSON = new ObjectMapper();

    private ProjectBenchmark() {
    }

    private static LoaderOptions largeDocuments() {
        LoaderOptions options = new LoaderOptions();
        options.setCodePointLimit(Integer.MAX_VALUE);
        return options;
    }

    public static void main(String[] args) throws Exception {
        int runs = Integer.getInteger("runs", 5);
        List<Integer> sizes = args.length == 0 ? List.of(2000, 20000)
                : Arrays.stream(args).map(Integer::valueOf).toList();
        System.out.printf("java %s, %d processors, max heap %d MB, %d timed runs each%n",
                System.getProperty("java.version"), Runtime.getRuntime().availableProcessors(),
                Runtime.getRuntime().maxMemory() >> 20, runs);
        Path dir = Files.createTempDirectory("countercheck-bench");
        try {
            for (int size : sizes) {
                measure(dir, size, runs);
            }
        } finally {
            deleteTree(dir);
        }
    }

    private static void measure(Path dir, int size, int runs) throws IOException {
        Path file = BenchProject.write(dir.resolve("project-" + size + ".yaml"), size);
        Path out = dir.resolve("reports-" + size);
        StringWriter errors = new StringWriter();
        int status = review(file, out, errors);
        if (status == 2) {
            System.out.printf("%,d elements (%,d bytes of YAML): refused by the reader, not timed:%n  %s%n", size,
                    Files.size(file), errors.toString().strip().replace("\n", "\n  "));
            return;
        }
        long reportBytes = sizeOf(out, ".json") + sizeOf(out, ".html");
        floor(file, dir.resolve("floor.json"), reportBytes);
        List<Long> reviewTimes = new ArrayList<>();
        List<Long> floorTimes = new ArrayList<>();
        List<Long> reviewCpu = new ArrayList<>();
        List<Long> floorCpu = new ArrayList<>();
        long peak = 0;
        for (int i = 0; i < runs; i++) {
            System.gc();
            resetPeaks();
            long c0 = processCpu();
            long t0 = System.nanoTime();
            review(file, out, new StringWriter());
            reviewTimes.add(System.nanoTime() - t0);
            reviewCpu.add(processCpu() - c0);
            peak = Math.max(peak, heapPeak());
            System.gc();
            long c1 = processCpu();
            long t1 = System.nanoTime();
            floor(file, dir.resolve("floor.json"), reportBytes);
            floorTimes.add(System.nanoTime() - t1);
            floorCpu.add(processCpu() - c1);
        }
        double review = median(reviewTimes);
        double floor = median(floorTimes);
        System.out.printf("%,d elements (%,d bytes of YAML, %,d bytes of JSON+HTML out):%n", size, Files.size(file),
                reportBytes);
        System.out.printf("  review to JSON+HTML: median %.0f ms (%s)%n", review / 1e6, spread(reviewTimes));
        System.out.printf("  floor (Jackson read + same-sized JSON write): median %.0f ms (%s)%n", floor / 1e6,
                spread(floorTimes));
        System.out.printf("  ratio review/floor %.1f; peak heap during a review %,d MB%n", review / floor, peak >> 20);
        System.out.printf("  CPU time of the process (all threads, less disturbed by a busy machine): review median"
                + " %.0f ms, floor %.0f ms, ratio %.1f%n", median(reviewCpu) / 1e6, median(floorCpu) / 1e6,
                median(reviewCpu) / median(floorCpu));
        System.out.printf("  HTML: %d file(s), the largest %,d bytes; JSON %,d bytes%n", count(out, ".html"),
                largest(out, ".html"), sizeOf(out, ".json"));
    }

    private static int review(Path file, Path out, StringWriter errors) {
        CommandLine cl = CountercheckCommand.commandLine();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(errors, true));
        return cl.execute("review", file.toString(), "--out", out.toString(), "--date", "2026-01-01",
                "--fail-on", "note");
    }

    /** Reads {@code file} into a tree and writes it as JSON, repeated until {@code bytes} are written. */
    private static void floor(Path file, Path target, long bytes) throws IOException {
        JsonNode tree = YAML.readTree(file.toFile());
        try (OutputStream os = Files.newOutputStream(target);
             CountingStream counting = new CountingStream(os);
             JsonGenerator g = JSON.getFactory().createGenerator(counting)) {
            g.writeStartArray();
            while (counting.count < bytes) {
                JSON.writeTree(g, tree);
                g.flush();
            }
            g.writeEndArray();
        }
    }

    private static void resetPeaks() {
        ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
    }

    /** The sum of the heap pools' peaks since the last reset (an upper bound of the heap in use). */
    private static long heapPeak() {
        return ManagementFactory.getMemoryPoolMXBeans().stream().filter(p -> p.getType() == MemoryType.HEAP)
                .mapToLong(p -> p.getPeakUsage().getUsed()).sum();
    }

    private static long sizeOf(Path dir, String extension) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            long total = 0;
            for (Path p : files.filter(p -> p.toString().endsWith(extension)).toList()) {
                total += Files.size(p);
            }
            return total;
        }
    }

    /** The CPU time of every thread of this JVM (compiler and collector included), in nanoseconds. */
    private static long processCpu() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    private static long count(Path dir, String extension) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.filter(p -> p.toString().endsWith(extension)).count();
        }
    }

    private static long largest(Path dir, String extension) throws IOException {
        long max = 0;
        try (Stream<Path> files = Files.list(dir)) {
            for (Path p : files.filter(p -> p.toString().endsWith(extension)).toList()) {
                max = Math.max(max, Files.size(p));
            }
        }
        return max;
    }

    private static double median(List<Long> times) {
        List<Long> sorted = times.stream().sorted().toList();
        int n = sorted.size();
        return n % 2 == 1 ? sorted.get(n / 2) : (sorted.get(n / 2 - 1) + sorted.get(n / 2)) / 2.0;
    }

    private static String spread(List<Long> times) {
        return String.format("min %.0f, max %.0f ms over %d runs",
                times.stream().mapToLong(Long::longValue).min().orElseThrow() / 1e6,
                times.stream().mapToLong(Long::longValue).max().orElseThrow() / 1e6, times.size());
    }

    private static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> all = Files.walk(dir)) {
            for (Path p : all.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }

    /** Counts the bytes passed through. */
    private static final class CountingStream extends OutputStream {
        private final OutputStream out;
        private long count;

        CountingStream(OutputStream out) {
            this.out = out;
        }

        @Override
        public void write(int b) throws IOException {
            out.write(b);
            count++;
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
            count += len;
        }

        @Override
        public void close() throws IOException {
            out.close();
        }
    }
}
