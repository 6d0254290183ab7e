package dev.countercheck.cli;

import dev.countercheck.report.OutputSet;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Hostile and broken input through the command line, as the checker meets it: every file of the
 * bad-input corpus ends in exit 2 with located messages, no stack trace and no report; {@code
 * --out} never writes outside its folder or onto a submission; a run killed while it writes its
 * reports leaves the previous reports or the new ones, never a truncated one.
 */
class HostileInputCliTest {

    private static final Path CORPUS = Path.of("src/test/resources/submissions/bad");
    private static final Path SAMPLE = Path.of("src/test/resources/submissions/good/harbour-lane.yaml");
    private static final Path SAMPLE_JSON = Path.of("src/test/resources/submissions/good/harbour-lane.json");
    private static final String DATE = "2026-01-01";

    @TempDir
    Path temp;

    /** What one run of the command printed and returned. */
    record Run(int code, String out, String err) {
        String all() {
            return out + err;
        }
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = CountercheckCommand.commandLine().setOut(new PrintWriter(out)).setErr(new PrintWriter(err))
                .execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void everyCorpusFileIsRefusedWithLocatedMessagesNoStackTraceAndNoReport() throws IOException {
        List<Path> files;
        try (Stream<Path> listing = Files.list(CORPUS)) {
            files = listing.filter(f -> !f.toString().endsWith(".expect")).sorted().toList();
        }
        assertThat(files).as("the corpus the issue asks for").hasSizeGreaterThanOrEqualTo(100);

        SoftAssertions soft = new SoftAssertions();
        int refusals = 0;
        int crashes = 0;
        long slowestNanos = 0;
        Path slowest = files.get(0);
        for (int i = 0; i < files.size(); i++) {
            Path file = files.get(i);
            Path out = temp.resolve("out-" + i);
            long start = System.nanoTime();
            Run run = run("review", file.toString(), "--out", out.toString(), "--date", DATE);
            long nanos = System.nanoTime() - start;
            if (nanos > slowestNanos) {
                slowestNanos = nanos;
                slowest = file;
            }
            boolean located = Pattern.compile("(?m)^" + Pattern.quote(file.toString()) + ":\\d+:\\d+: ").matcher(run.err())
                    .find();
            boolean crashed = run.all().contains("internal error") || run.all().contains("Exception")
                    || run.all().contains("at dev.");
            refusals += run.code() == ExitCodes.UNUSABLE && located ? 1 : 0;
            crashes += crashed ? 1 : 0;
            soft.assertThat(run.code()).as("exit status for %s", file).isEqualTo(ExitCodes.UNUSABLE);
            soft.assertThat(located).as("a file:line:column: message for %s in%n%s", file, run.err()).isTrue();
            soft.assertThat(crashed).as("no internal error or stack trace for %s in%n%s", file, run.all()).isFalse();
            soft.assertThat(Files.exists(out) ? names(out) : List.of()).as("reports written for %s", file).isEmpty();
        }
        System.out.printf("Corpus through the CLI: %d files tried, %d clean refusals, %d crashes; slowest %d ms (%s)%n",
                files.size(), refusals, crashes, slowestNanos / 1_000_000, slowest.getFileName());
        soft.assertAll();
    }

    @Test
    void aReportThatWouldReplaceTheSubmissionIsRefusedAndTheSubmissionKept() throws IOException {
        Path folder = Files.createDirectories(temp.resolve("job"));
        Path submission = Files.copy(SAMPLE_JSON, folder.resolve("harbour-lane.json"));
        byte[] before = Files.readAllBytes(submission);

        Run run = run("review", submission.toString(), "--out", folder.toString(), "--date", DATE);

        assertThat(run.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(run.err()).contains("would replace the submission");
        assertThat(Files.readAllBytes(submission)).as("the submission is only ever read").isEqualTo(before);
        assertThat(names(folder)).as("nothing written, not even the HTML report").containsExactly("harbour-lane.json");
    }

    @Test
    void aReportThatWouldReplaceTheSubmissionThroughALinkIsRefused() throws IOException {
        Path folder = Files.createDirectories(temp.resolve("job"));
        Path submission = Files.copy(SAMPLE_JSON, folder.resolve("harbour-lane.json"));
        Path out = Files.createDirectories(temp.resolve("reports"));
        Files.createSymbolicLink(out.resolve("harbour-lane.json"), submission.toAbsolutePath());
        byte[] before = Files.readAllBytes(submission);

        Run run = run("review", submission.toString(), "--out", out.toString(), "--date", DATE);

        assertThat(run.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(run.err()).contains("would replace the submission");
        assertThat(Files.readAllBytes(submission)).isEqualTo(before);
    }

    @Test
    void anOutFolderInsideTheSubmissionsOwnNameIsRefused() throws IOException {
        Path submission = Files.copy(SAMPLE, temp.resolve("plan.yaml"));

        Run itself = run("review", submission.toString(), "--out", submission.toString(), "--date", DATE);
        Run inside = run("review", submission.toString(), "--out", submission.resolve("reports").toString(),
                "--date", DATE);

        assertThat(itself.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(itself.err()).contains("is a file, not a folder");
        assertThat(inside.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(inside.err()).contains("lies inside the name of the submission");
        assertThat(Files.readString(submission)).isEqualTo(Files.readString(SAMPLE));
    }

    @Test
    void aCraftedFileNameCannotLeadTheReportsOutOfTheFolder() throws IOException {
        Path out = temp.resolve("out");
        for (String name : List.of("..yaml", "..\\..\\escape.yaml", "line\nbreak.yaml")) {
            Path submission = Files.copy(SAMPLE, Files.createDirectories(temp.resolve("in")).resolve(name),
                    StandardCopyOption.REPLACE_EXISTING);

            Run run = run("review", submission.toString(), "--out", out.toString(), "--date", DATE);

            assertThat(run.code()).as(name).isEqualTo(ExitCodes.UNUSABLE);
            assertThat(run.err()).as(name).contains("cannot name a report file");
        }
        assertThat(Files.exists(out)).as("nothing written anywhere").isFalse();
        assertThat(names(temp)).containsExactlyInAnyOrder("in");
    }

    @Test
    void aGoodRunWritesItsTwoReportsAndNoTemporaryFile() throws IOException {
        Path out = temp.resolve("out");

        Run run = run("review", SAMPLE.toString(), "--out", out.toString(), "--date", DATE);

        assertThat(run.code()).as(run.err()).isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        assertThat(names(out)).containsExactly("harbour-lane.html", "harbour-lane.json",
                "harbour-lane.responses.csv", "harbour-lane.responses.xlsx");
    }

    /**
     * Kills a run at every step of writing its reports and checks what the folder then holds. The
     * run is a separate Java process (see {@link HaltingRun}) that halts, as a kill would, just
     * before its n-th write step: before a temporary report or the set's journal is created, and
     * before one of them is moved into place; n runs from 1 until a run completes (two runs at a
     * time, each in a folder of its own, and checked in the order of n). The folder
     * starts with the reports of the previous revision; after every halt each report is byte for
     * byte the previous one or the new one, and anything else left is a hidden temporary file or
     * journal. Once the next run has tidied the folder ({@link OutputSet#recover}, the first thing
     * a review does), the set of reports is wholly the previous one or wholly the new one, and no
     * hidden file is left.
     */
    @Test
    void aRunKilledWhileWritingLeavesThePreviousReportOrTheNewOneNeverATruncatedOne() throws Exception {
        String text = read(SAMPLE);
        Path previousSubmission = Files.writeString(Files.createDirectories(temp.resolve("p02")).resolve("plan.yaml"),
                text.replace("revision: C03", "revision: C02"));
        Path newSubmission = Files.writeString(Files.createDirectories(temp.resolve("p03")).resolve("plan.yaml"), text);
        assertThat(read(previousSubmission)).as("the two revisions differ").isNotEqualTo(text);
        Path previous = temp.resolve("previous");
        Path expected = temp.resolve("expected");
        assertThat(run("review", previousSubmission.toString(), "--out", previous.toString(), "--date", DATE).code())
                .isNotEqualTo(ExitCodes.UNUSABLE);
        assertThat(run("review", newSubmission.toString(), "--out", expected.toString(), "--date", DATE).code())
                .isNotEqualTo(ExitCodes.UNUSABLE);
        List<String> reports = names(expected);
        assertThat(reports).containsExactly("plan.html", "plan.json", "plan.responses.csv", "plan.responses.xlsx");

        int halted = 0;
        boolean completed = false;
        for (int first = 1; !completed; first += HaltingRun.AT_ONCE) {
            assertThat(first).as("a run of four reports ends within a few write steps").isLessThan(20);
            Map<Integer, Process> runs = new TreeMap<>();
            for (int n = first; n < first + HaltingRun.AT_ONCE; n++) {
                Path out = temp.resolve("killed-at-" + n);
                Files.createDirectories(out);
                for (String report : reports) {
                    Files.copy(previous.resolve(report), out.resolve(report));
                }
                runs.put(n, HaltingRun.start(n, out, "review", newSubmission.toString(), "--out", out.toString(),
                        "--date", DATE));
            }
            for (Map.Entry<Integer, Process> run : runs.entrySet()) {
                int n = run.getKey();
                Path out = temp.resolve("killed-at-" + n);
                int code = run.getValue().waitFor();

                for (String report : reports) {
                    byte[] left = Files.readAllBytes(out.resolve(report));
                    assertThat(left).as("%s after a halt at write %d", report, n)
                            .satisfiesAnyOf(b -> assertThat(b).isEqualTo(Files.readAllBytes(previous.resolve(report))),
                                    b -> assertThat(b).isEqualTo(Files.readAllBytes(expected.resolve(report))));
                }
                assertThat(names(out)).as("besides the reports, only hidden temporary files and journals")
                        .allMatch(name -> reports.contains(name) || (name.startsWith(".")
                                && (name.endsWith(".tmp") || name.endsWith(".set"))));
                OutputSet.recover(out);
                assertThat(names(out)).as("after the next run's tidying, the reports only").isEqualTo(reports);
                boolean allPrevious = true;
                boolean allNew = true;
                for (String report : reports) {
                    byte[] left = Files.readAllBytes(out.resolve(report));
                    allPrevious &= java.util.Arrays.equals(left, Files.readAllBytes(previous.resolve(report)));
                    allNew &= java.util.Arrays.equals(left, Files.readAllBytes(expected.resolve(report)));
                }
                assertThat(allPrevious || allNew).as("after a halt at write %d the set is the previous or the new one", n)
                        .isTrue();
                if (code != HaltingRun.HALTED) {
                    assertThat(names(out)).as("a completed run leaves the new reports only").isEqualTo(reports);
                    for (String report : reports) {
                        assertThat(Files.readAllBytes(out.resolve(report)))
                                .isEqualTo(Files.readAllBytes(expected.resolve(report)));
                    }
                    completed = true;
                } else {
                    assertThat(completed).as("a run halted at write %d after one completed before it", n).isFalse();
                    halted++;
                }
            }
        }
        assertThat(halted).as("runs halted before each temporary file, the journal, and each move")
                .isGreaterThanOrEqualTo(2 * reports.size());
    }

    /**
     * A review run in its own Java process that halts, as a kill would (no shutdown hooks, no
     * finally blocks), just before its n-th write operation on a hidden file of a given folder:
     * the creation of a temporary report, or its move into place (once it is written and forced
     * to disk). The operations are seen by a security manager's write check, which the file system
     * calls before it creates, opens for writing or moves a file.
     */
    static final class HaltingRun {

        static final int HALTED = 99;
        /** Runs started together: the two cores of the machine CI runs on (the test's own JVM only waits). */
        static final int AT_ONCE = 2;

        /** Starts {@code args} in a new process that halts before write {@code n} in {@code folder}. */
        static Process start(int n, Path folder, String... args) throws IOException {
            List<String> command = new ArrayList<>(List.of(
                    Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-Djava.security.manager=allow", // Java 18 and later refuse a security manager without it
                    "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", // a short run starts faster
                    "-cp", System.getProperty("java.class.path"),
                    HaltingRun.class.getName(), String.valueOf(n), folder.toAbsolutePath().toString()));
            command.addAll(List.of(args));
            return new ProcessBuilder(command).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        }

        @SuppressWarnings("removal")
        public static void main(String[] args) {
            int haltAt = Integer.parseInt(args[0]);
            Path folder = Path.of(args[1]);
            System.setSecurityManager(new SecurityManager() {
                private int writes;

                @Override
                public void checkPermission(java.security.Permission permission) {
                    // everything is allowed; only writes are counted
                }

                @Override
                public void checkWrite(String file) {
                    Path path = Path.of(file);
                    if (folder.equals(path.getParent()) && path.getFileName().toString().startsWith(".")
                            && ++writes == haltAt) {
                        Runtime.getRuntime().halt(HALTED);
                    }
                }
            });
            System.exit(CountercheckCommand.commandLine().execute(java.util.Arrays.copyOfRange(args, 2, args.length)));
        }
    }

    static List<String> names(Path folder) throws IOException {
        List<String> names = new ArrayList<>();
        try (Stream<Path> files = Files.list(folder)) {
            files.forEach(f -> names.add(f.getFileName().toString()));
        }
        names.sort(null);
        return names;
    }

    static String read(Path file) throws IOException {
        return Files.readString(file, StandardCharsets.UTF_8);
    }
}
