package dev.countercheck.cli;

import dev.countercheck.cli.HostileInputCliTest.Run;
import dev.countercheck.report.OutputSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import picocli.CommandLine;
import picocli.CommandLine.Command;

import java.io.File;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;

import static dev.countercheck.cli.HostileInputCliTest.names;
import static dev.countercheck.cli.HostileInputCliTest.run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

/**
 * A consultant's file cannot reach beyond the review, and a failure of any kind ends in one line,
 * a documented exit status and the last good reports left whole.
 */
class ContainedFailuresCliTest {

    private static final Path SAMPLE = Path.of("src/test/resources/submissions/good/harbour-lane.yaml");
    private static final Path BAD = Path.of("src/test/resources/submissions/bad");
    private static final String DATE = "2026-01-01";

    @TempDir
    Path temp;

    private Path submission(String name, String rulesetLine) throws IOException {
        String text = Files.readString(SAMPLE).replace("  ruleset: en1992-recommended", "  ruleset: " + rulesetLine);
        return Files.writeString(Files.createDirectories(temp.resolve("in")).resolve(name), text);
    }

    private Path secret() throws IOException {
        return Files.writeString(temp.resolve("secrets.yaml"), "db_password: hunter2-s3cret\n"
                + "api_token: tok-98127361\n- a list after a map\n\"unterminated: [\n");
    }

    private static void assertNoLineOf(Path file, Run run) throws IOException {
        for (String line : Files.readAllLines(file)) {
            assertThat(run.all()).as("a line of %s in the output", file).doesNotContain(line.strip());
        }
        assertThat(run.all()).doesNotContain("hunter2").doesNotContain("tok-9812");
    }

    @Test
    void aSecretFileNamedInTheSubmissionIsNeverReadAndNoLineOfItIsShown() throws IOException {
        Path secret = secret();
        Path job = submission("job.yaml", secret.toAbsolutePath().toString());
        Path relative = submission("job2.yaml", "../secrets.yaml");
        Path out = temp.resolve("out");

        for (Path s : List.of(job, relative)) {
            Run review = run("review", s.toString(), "--out", out.toString(), "--date", DATE);
            Run validate = run("validate", s.toString());

            assertThat(review.code()).isEqualTo(ExitCodes.UNUSABLE);
            assertThat(validate.code()).isEqualTo(ExitCodes.UNUSABLE);
            assertThat(review.err()).contains(s + ":13:12: ").contains("is not a ruleset id")
                    .contains("--ruleset");
            assertNoLineOf(secret, review);
            assertNoLineOf(secret, validate);
        }
        assertThat(Files.exists(out)).isFalse();
    }

    @Test
    void aFileThatIsNotARulesetGivenOnTheCommandLineIsRefusedWithoutShowingItsContent() throws IOException {
        Path secret = secret();

        Run review = run("review", SAMPLE.toString(), "--ruleset", secret.toString(), "--out",
                temp.resolve("out").toString(), "--date", DATE);
        Run rules = run("rules", "--ruleset", secret.toString());

        assertThat(review.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(rules.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(review.err()).contains("is not a ruleset");
        assertNoLineOf(secret, review);
        assertNoLineOf(secret, rules);
    }

    @Test
    void aLocalRulesetInPlaceOfABundledOneIsAnnouncedAndNamedInTheReport() throws IOException {
        Path folder = Files.createDirectories(temp.resolve("firm-rulesets"));
        Files.writeString(folder.resolve("en1992-recommended.yaml"), Files.readString(
                Path.of("rulesets/en1992-recommended.yaml")).replace("\ntitle: ", "\ntitle: Firm copy of "));
        Path out = temp.resolve("out");

        Run run = run("review", SAMPLE.toString(), "--rulesets-dir", folder.toString(), "--out", out.toString(),
                "--date", DATE);

        assertThat(run.code()).as(run.err()).isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        String used = folder.resolve("en1992-recommended.yaml") + " (in place of the bundled ruleset en1992-recommended)";
        assertThat(run.err()).contains("ruleset en1992-recommended: using " + used);
        assertThat(Files.readString(out.resolve("harbour-lane.json"))).contains(used);
        assertThat(Files.readString(out.resolve("harbour-lane.html"))).contains("in place of the bundled ruleset");
    }

    /**
     * The working folder's {@code rulesets/} is not read: run from a folder holding a changed
     * copy of a bundled ruleset, the review still uses the bundled one (a separate process,
     * started in that folder).
     */
    @Test
    void aRulesetsFolderInTheWorkingFolderDoesNotReplaceABundledRuleset() throws Exception {
        Path work = Files.createDirectories(temp.resolve("work/rulesets"));
        Files.writeString(work.resolve("en1992-recommended.yaml"), "ruleset: 1\nid: en1992-recommended\n"
                + "title: Planted\nparameters: {}\n");
        Path sample = Files.copy(SAMPLE, temp.resolve("work/job.yaml"));
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-cp", classPath(), Main.class.getName(), "review", "job.yaml",
                "--out", "out", "--date", DATE)
                .directory(temp.resolve("work").toFile()).redirectErrorStream(true)
                .redirectOutput(temp.resolve("log.txt").toFile()).start();

        assertThat(p.waitFor()).as(Files.readString(temp.resolve("log.txt"))).isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        assertThat(Files.readString(sample.resolveSibling("out/job.json")))
                .contains("\"rulesets/en1992-recommended.yaml\"").doesNotContain("Planted");
    }

    /** The class path with absolute entries, for a process started in another folder. */
    private static String classPath() {
        List<String> entries = new ArrayList<>();
        for (String entry : System.getProperty("java.class.path").split(File.pathSeparator)) {
            entries.add(Path.of(entry).toAbsolutePath().toString());
        }
        return String.join(File.pathSeparator, entries);
    }

    @Test
    void aFileTheToolDidNotWriteIsNeverOverwritten() throws IOException {
        Path folder = Files.createDirectories(temp.resolve("job"));
        Path mine = Files.copy(SAMPLE, folder.resolve("harbour-lane.yaml"));
        Path theirs = Files.writeString(folder.resolve("harbour-lane.json"), "{\"countercheck\": 1, \"elements\": []}\n");

        Run run = run("review", mine.toString(), "--out", folder.toString(), "--date", DATE);

        assertThat(run.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(run.err()).contains("exists and was not written by countercheck");
        assertThat(Files.readString(theirs)).isEqualTo("{\"countercheck\": 1, \"elements\": []}\n");
        assertThat(names(folder)).containsExactly("harbour-lane.json", "harbour-lane.yaml");
    }

    @Test
    void aReportTheToolWroteIsReplacedOnTheNextRun() throws IOException {
        Path out = temp.resolve("out");
        assertThat(run("review", SAMPLE.toString(), "--out", out.toString(), "--date", DATE).code())
                .isIn(ExitCodes.OK, ExitCodes.FINDINGS);

        Run again = run("review", SAMPLE.toString(), "--out", out.toString(), "--date", "2026-02-02");

        assertThat(again.code()).as(again.err()).isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        assertThat(Files.readString(out.resolve("harbour-lane.json"))).contains("2026-02-02");
    }

    /** The disk fills, or the folder refuses, while the HTML is written: the previous reports stay as they were. */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"full", "read-only"})
    void aWriteThatFailsLeavesThePreviousReportsWholeAndSaysWhy(String failure) throws IOException {
        Path out = temp.resolve("out");
        String previousRevision = Files.readString(SAMPLE).replace("revision: C03", "revision: C02");
        Path previous = Files.writeString(Files.createDirectories(temp.resolve("p02")).resolve("harbour-lane.yaml"),
                previousRevision);
        assertThat(run("review", previous.toString(), "--out", out.toString(), "--date", DATE).code())
                .isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        byte[] json = Files.readAllBytes(out.resolve("harbour-lane.json"));
        byte[] html = Files.readAllBytes(out.resolve("harbour-lane.html"));
        List<Path> attempted = new ArrayList<>();
        OutputSet.Sink failing = (file, content) -> {
            attempted.add(file);
            if (file.getFileName().toString().contains(".html.")) {
                throw "full".equals(failure) ? new FileSystemException(file.toString(), null, "No space left on device")
                        : new AccessDeniedException(file.toString());
            }
            OutputSet.DISK.write(file, content);
        };
        CommandLine cl = CountercheckCommand.commandLine();
        ((ReviewCommand) cl.getSubcommands().get("review").getCommand()).sink = failing;
        StringWriter err = new StringWriter();

        int code = cl.setOut(new PrintWriter(new StringWriter())).setErr(new PrintWriter(err))
                .execute("review", SAMPLE.toString(), "--out", out.toString(), "--date", DATE);

        assertThat(code).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(attempted).as("the JSON was written before the HTML failed").hasSize(2);
        assertThat(err.toString()).contains("cannot write the reports")
                .contains("full".equals(failure) ? "No space left on device" : "permission denied")
                .contains("previous reports, if any, are left as they were");
        assertThat(names(out)).containsExactly("harbour-lane.html", "harbour-lane.json", "harbour-lane.responses.csv",
                "harbour-lane.responses.xlsx");
        assertThat(Files.readAllBytes(out.resolve("harbour-lane.json"))).isEqualTo(json);
        assertThat(Files.readAllBytes(out.resolve("harbour-lane.html"))).isEqualTo(html);
    }

    /** The PDF needs the machine's temporary folder: when it cannot be used, the previous reports stay whole. */
    @Test
    void anUnusableTemporaryFolderLeavesThePreviousReportsWholeAndSaysWhy() throws Exception {
        Path out = temp.resolve("out");
        assertThat(run("review", SAMPLE.toString(), "--out", out.toString(), "--date", DATE).code())
                .isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        byte[] json = Files.readAllBytes(out.resolve("harbour-lane.json"));
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-Djava.io.tmpdir=" + temp.resolve("no-such-folder"),
                "-cp", System.getProperty("java.class.path"), Main.class.getName(), "review", SAMPLE.toString(),
                "--out", out.toString(), "--date", "2026-02-02", "--pdf")
                .redirectErrorStream(true).redirectOutput(temp.resolve("log.txt").toFile()).start();

        assertThat(p.waitFor()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(Files.readString(temp.resolve("log.txt"))).contains("the temporary folder cannot be used for the PDF")
                .doesNotContain("internal error").doesNotContain("\tat ");
        assertThat(names(out)).containsExactly("harbour-lane.html", "harbour-lane.json", "harbour-lane.responses.csv",
                "harbour-lane.responses.xlsx");
        assertThat(Files.readAllBytes(out.resolve("harbour-lane.json"))).isEqualTo(json);
    }

    @Test
    void aBatchWithNothingReviewableWritesNothing() throws IOException {
        Path folder = Files.createDirectories(temp.resolve("batch"));
        Files.copy(BAD.resolve("zero-diameter.yaml"), folder.resolve("a.yaml"));
        Files.copy(BAD.resolve("missing-elements.yaml"), folder.resolve("b.yaml"));
        Path out = temp.resolve("out");

        Run run = run("review", folder.toString(), "--out", out.toString(), "--date", DATE);

        assertThat(run.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(run.err()).contains("no submission could be reviewed: nothing written");
        assertThat(Files.exists(out)).as("not even index.html").isFalse();
    }

    @Test
    void aFolderWithNoSubmissionExitsTwoWithAMessage() throws IOException {
        Path empty = Files.createDirectories(temp.resolve("empty"));
        Path notes = Files.createDirectories(temp.resolve("notes"));
        Files.writeString(notes.resolve("readme.txt"), "nothing to review");

        for (Path folder : List.of(empty, notes)) {
            for (String command : List.of("review", "validate")) {
                Run run = run(command, folder.toString(), "--out", temp.resolve("out").toString());
                Run plain = command.equals("validate") ? run("validate", folder.toString()) : run;
                assertThat(plain.code()).as(command + " " + folder).isEqualTo(ExitCodes.UNUSABLE);
                assertThat(plain.err()).contains("holds no submission");
            }
        }
        assertThat(Files.exists(temp.resolve("out"))).isFalse();
    }

    @ParameterizedTest
    @ValueSource(strings = {"+10000-01-01", "10000-01-01", "-0001-01-01", "999-01-01", "2026-1-1"})
    void aDateWithoutAFourDigitYearIsRefused(String date) {
        Run run = run("review", SAMPLE.toString(), "--out", temp.resolve("out").toString(), "--date", date);

        assertThat(run.code()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(run.err()).contains("is not a date of the form YYYY-MM-DD");
    }

    @Test
    void controlCharactersInAFileNameReachTheConsoleAsEscapes() throws IOException {
        Path named = Files.copy(SAMPLE, Files.createDirectories(temp.resolve("in"))
                .resolve("plan\u001b[2J\u001b]0;owned\u0007\u202e.yaml"));

        Run review = run("review", named.toString(), "--out", temp.resolve("out").toString(), "--date", DATE);
        Run validate = run("validate", named.toString());

        for (Run run : List.of(review, validate)) {
            assertThat(run.all()).doesNotContain("\u001b").doesNotContain("\u0007").doesNotContain("\u202e")
                    .contains("plan\\u001B[2J\\u001B]0;owned\\u0007\\u202E.yaml");
        }
    }

    /** Stands for any fault of the tool: a command that throws what it is given. */
    @Command(name = "fault")
    static final class Fault implements Callable<Integer> {
        private final Throwable thrown;

        Fault(Throwable thrown) {
            this.thrown = thrown;
        }

        @Override
        public Integer call() throws Exception {
            if (thrown instanceof Error e) {
                throw e;
            }
            throw (Exception) thrown;
        }
    }

    @Test
    void errorsAndExceptionsEndInOneLineAndExitThree() {
        for (Throwable thrown : List.of(new StackOverflowError(), new OutOfMemoryError("Java heap space"),
                new NoClassDefFoundError("a missing class"), new IllegalStateException("a bug"), new IOException("a bug"))) {
            CommandLine cl = CountercheckCommand.commandLine();
            cl.addSubcommand("fault", new Fault(thrown));
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();

            int code = cl.setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute("fault");

            assertThat(code).as(thrown.toString()).isEqualTo(ExitCodes.INTERNAL);
            assertThat(err.toString().lines()).as(thrown.toString()).singleElement()
                    .satisfies(line -> assertThat(line).startsWith("countercheck: internal error (")
                            .contains(thrown.getClass().getSimpleName()).doesNotContain("\tat "));
        }
    }

    @Test
    void aReviewThatMeetsAnInternalErrorExitsThree() throws IOException {
        Run run = run("review", SAMPLE.toString(), "--out", temp.resolve("out").toString(), "--date", DATE,
                "--fail-on", "note");
        assertThat(run.code()).as("a sound review is not an internal error").isNotEqualTo(ExitCodes.INTERNAL);
        assertThat(ExitCodes.INTERNAL).isGreaterThan(ExitCodes.UNUSABLE).isGreaterThan(ExitCodes.FINDINGS);
    }

    @Test
    void outputToAClosedStandardOutputExitsNonZero() {
        Writer closed = new Writer() {
            @Override
            public void write(char[] chars, int offset, int length) throws IOException {
                throw new IOException("Broken pipe");
            }

            @Override
            public void flush() throws IOException {
                throw new IOException("Broken pipe");
            }

            @Override
            public void close() {
            }
        };
        StringWriter err = new StringWriter();

        int code = CountercheckCommand.commandLine().setOut(new PrintWriter(closed)).setErr(new PrintWriter(err))
                .execute("schema");

        assertThat(code).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(err.toString()).contains("the output could not be written");
    }

    @Test
    void outputToAFullDeviceExitsNonZero() throws Exception {
        File full = new File("/dev/full");
        assumeTrue(full.exists(), "this platform has no /dev/full: the closed-output case above covers the writer");
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-cp", System.getProperty("java.class.path"), Main.class.getName(),
                "example").redirectOutput(full).redirectError(temp.resolve("err.txt").toFile()).start();

        assertThat(p.waitFor()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(Files.readString(temp.resolve("err.txt"))).contains("the output could not be written");
    }
}
