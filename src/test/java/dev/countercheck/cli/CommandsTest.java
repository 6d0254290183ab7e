package dev.countercheck.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;

import dev.countercheck.element.ProjectReviewer;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.ruleset.RulesetLoader;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import static dev.countercheck.cli.SampleSubmissionsTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/** The commands other than a plain review: exit codes and what they print. */
class CommandsTest {

    @Test
    void versionIsPrinted() {
        SampleSubmissionsTest.Run r = run("--version");
        assertThat(r.exit()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).startsWith("countercheck ");
    }

    @Test
    void withoutArgumentsTheHelpIsPrintedAsAUsageError() {
        SampleSubmissionsTest.Run r = run();
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(r.err()).contains("Usage: countercheck").contains("review").contains("validate");
    }

    @Test
    void anUnknownRulesetIsNamedWithoutAnInventedFilePosition() {
        SampleSubmissionsTest.Run r = run("rules", "--ruleset", "nosuch");
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(r.err()).contains("--ruleset: no ruleset with id 'nosuch'").doesNotContain("--ruleset:1:1");
    }

    @Test
    void theStarterSubmissionIsValid(@TempDir Path dir) throws IOException {
        SampleSubmissionsTest.Run example = run("example");
        assertThat(example.exit()).isEqualTo(ExitCodes.OK);
        Path file = dir.resolve("starter.yaml");
        Files.writeString(file, example.out());
        SampleSubmissionsTest.Run validate = run("validate", file.toString());
        assertThat(validate.exit()).as(validate.err()).isEqualTo(ExitCodes.OK);
        assertThat(validate.out()).contains("valid, 1 element");
    }

    @Test
    void validateRefusesABrokenFileWithItsLocation(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("broken.yaml");
        Files.writeString(file, "countercheck: 1\nproject: {title: x}\nelemnts: []\n");
        SampleSubmissionsTest.Run r = run("validate", file.toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(r.err()).contains(file + ":3:1").contains("did you mean 'elements'");
    }

    @Test
    void reviewOfAMissingFileIsUnusableInput(@TempDir Path dir) {
        SampleSubmissionsTest.Run r = run("review", dir.resolve("nowhere.yaml").toString(), "--out", dir.toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(r.err()).contains("nowhere.yaml").doesNotContain("Exception");
    }

    @Test
    void aBadDateIsAUsageError(@TempDir Path dir) {
        SampleSubmissionsTest.Run r = run("review", "sample-submissions/quayside-annex.yaml", "--out", dir.toString(),
                "--date", "1st of May");
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(r.err()).contains("--date");
        assertThat(dir).isEmptyDirectory();
    }

    @Test
    void anUnknownRulesetStopsTheReviewBeforeAnyReport(@TempDir Path dir) {
        SampleSubmissionsTest.Run r = run("review", "sample-submissions/quayside-annex.yaml", "--out", dir.toString(),
                "--ruleset", "en1992-atlantis");
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(r.err()).contains("en1992-atlantis");
        assertThat(dir).isEmptyDirectory();
    }

    @Test
    void failOnMinorTurnsMinorFindingsIntoExitOne(@TempDir Path dir) throws IOException {
        // quayside-annex less its incomplete elements (PC-Q2, whose column node under ULS-wind could not be
        // checked, and PC-Q3, not reviewed) has only minor findings (its comment says so): exit 0 by
        // default, 1 with --fail-on minor.
        ObjectNode sample = (ObjectNode) new ObjectMapper(new YAMLFactory())
                .readTree(Path.of("sample-submissions/quayside-annex.yaml").toFile());
        ArrayNode elements = (ArrayNode) sample.get("elements");
        for (int i = elements.size() - 1; i >= 0; i--) {
            String id = elements.get(i).get("id").asText();
            if (id.equals("PC-Q2") || id.equals("PC-Q3")) {
                elements.remove(i);
            }
        }
        Path reviewed = dir.resolve("quayside-reviewed.json");
        Files.writeString(reviewed, new ObjectMapper().writeValueAsString(sample));
        Path out = dir.resolve("out");
        assertThat(run("review", reviewed.toString(), "--out", out.toString()).exit()).isEqualTo(ExitCodes.OK);
        assertThat(run("review", reviewed.toString(), "--out", out.toString(), "--fail-on", "minor").exit())
                .isEqualTo(ExitCodes.FINDINGS);
        assertThat(run("review", reviewed.toString(), "--out", out.toString(), "--fail-on", "severe").exit())
                .isEqualTo(ExitCodes.UNUSABLE);
    }

    @Test
    void anElementThatCouldNotBeReviewedFailsTheGateWhateverFailOnSays(@TempDir Path dir) {
        // quayside-annex's PC-Q3 has no actions: its only finding is major, yet --fail-on critical exits 1.
        assertThat(run("review", "sample-submissions/quayside-annex.yaml", "--out", dir.toString(),
                "--fail-on", "critical").exit()).isEqualTo(ExitCodes.FINDINGS);
    }

    @Test
    void rulesListsEachParameterWithTheFileThatSetIt() {
        SampleSubmissionsTest.Run r = run("rules", "--ruleset", "en1992-uk-na");
        assertThat(r.exit()).isEqualTo(ExitCodes.OK);
        // The UK annex overrides αcc (0.85) and keeps γc from the recommended file.
        assertThat(r.out()).containsPattern("alpha_cc +αcc +0\\.85 .*en1992-uk-na\\.yaml");
        assertThat(r.out()).containsPattern("gamma_c +γc +1\\.5 .*en1992-recommended\\.yaml");
    }

    @Test
    void rulesWritesAMarkdownReference() {
        SampleSubmissionsTest.Run r = run("rules", "--ruleset", "house-example", "--format", "markdown");
        assertThat(r.exit()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("# Ruleset house-example").contains("| `min_edge_distance` |")
                .contains("house rule HR-3");
    }

    @Test
    void theCommittedRuleReferenceIsTheGeneratedOne() throws IOException {
        // docs/rules-en1992-recommended.md is generated by `rules --format markdown`; regenerate it when a
        // ruleset changes (DEVELOPERS.md says how), so that the reference cannot drift from the rules.
        SampleSubmissionsTest.Run r = run("rules", "--format", "markdown");
        assertThat(r.out()).isEqualTo(Files.readString(Path.of("docs/rules-en1992-recommended.md")));
    }

    @Test
    void validateAlsoRefusesARulesetThatDoesNotResolve(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("starter.yaml");
        Files.writeString(file, run("example").out().replace("ruleset: en1992-recommended", "ruleset: en1992-mars"));
        SampleSubmissionsTest.Run r = run("validate", file.toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(r.err()).contains("en1992-mars").contains("cannot be used")
                .containsPattern("starter\\.yaml:\\d+:\\d+: "); // located at basis.ruleset in the submission
    }

    @Test
    void validateTakesTheRulesetTheCommandLineNamesInPlaceOfTheSubmissions(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("starter.yaml");
        Files.writeString(file, run("example").out().replace("ruleset: en1992-recommended", "ruleset: en1992-mars"));
        SampleSubmissionsTest.Run named = run("validate", file.toString(), "--ruleset", "en1992-uk-na");
        assertThat(named.exit()).as(named.err()).isEqualTo(ExitCodes.OK);
        SampleSubmissionsTest.Run unknown = run("validate", file.toString(), "--ruleset", "nosuch");
        assertThat(unknown.exit()).isEqualTo(ExitCodes.UNUSABLE);
        assertThat(unknown.err()).contains("--ruleset: no ruleset with id 'nosuch'").doesNotContain("en1992-mars");
    }

    @Test
    void theCommandLineBuiltForOneSubCommandAnswersAsTheWholeOneDoes() {
        for (String[] args : List.of(new String[] {"validate", "--help"}, new String[] {"review", "--bogus"},
                new String[] {"combine"}, new String[] {"--version"}, new String[] {"help", "rules"},
                new String[] {"revew"})) {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            var one = CountercheckCommand.commandLine(args);
            one.setOut(new PrintWriter(out, true));
            one.setErr(new PrintWriter(err, true));
            int exit = one.execute(args);
            SampleSubmissionsTest.Run all = run(args);
            assertThat(new SampleSubmissionsTest.Run(exit, out.toString(), err.toString())).as(String.join(" ", args))
                    .isEqualTo(all);
        }
        assertThat(CountercheckCommand.commandLine("validate", "x.yaml").getSubcommands()).containsOnlyKeys("validate");
        // each sub-command is found by the name its annotation gives it
        CountercheckCommand.commandLine().getSubcommands().forEach((name, sub) -> assertThat(
                CountercheckCommand.subcommand(name)).as(name).isEqualTo(name.equals("help") ? Optional.empty()
                : Optional.of(sub.getCommand().getClass())));
        assertThat(CountercheckCommand.commandLine("help", "validate").getSubcommands()).containsKeys("review", "rules");
    }

    @Test
    void theDefaultRulesetLoadedAheadIsTheOneLoadedOnTheSpot() throws Exception {
        Rulesets.loadAhead(() -> { });
        StringWriter console = new StringWriter();
        Ruleset ahead = new Rulesets(Optional.empty(), new PrintWriter(console)).load(Rulesets.DEFAULT);
        Ruleset direct = new RulesetLoader(Optional.empty(), ProjectReviewer.RULE_VOCABULARY).load(Rulesets.DEFAULT);
        assertThat(ahead.sha256()).isEqualTo(direct.sha256());
        assertThat(ahead.files()).isEqualTo(direct.files());
        assertThat(ahead.checks().keySet()).isEqualTo(direct.checks().keySet());
        assertThat(console.toString()).isEmpty();
        assertThat(CountercheckCommand.appliesRuleset(ValidateCommand.class)).isTrue();
        assertThat(CountercheckCommand.appliesRuleset(CompareCommand.class)).isFalse();
    }

    @Test
    void aFolderReviewWritesEveryReportAndTheIndex(@TempDir Path out) {
        SampleSubmissionsTest.Run r = run("review", "sample-submissions", "--out", out.toString(), "--date",
                "2026-12-01");
        // harbour-lane has critical findings (its comment says so): exit 1.
        assertThat(r.exit()).as(r.err()).isEqualTo(ExitCodes.FINDINGS);
        assertThat(r.err()).contains("[1/5]").contains("[2/5]").contains("[5/5]");
        for (String base : new String[] {"harbour-lane", "mill-road-depot", "orchard-yard-pads", "quayside-annex",
                "tannery-row-pads"}) {
            assertThat(out.resolve(base + ".json")).isNotEmptyFile();
            assertThat(out.resolve(base + ".html")).isNotEmptyFile();
            assertThat(out.resolve(base + ".pdf")).as("no PDF without --pdf").doesNotExist();
        }
        assertThat(out.resolve("index.html")).content().contains("harbour-lane.html").contains("mill-road-depot.html")
                .contains("quayside-annex.html").contains("tannery-row-pads.html");
    }

    /**
     * With {@code --pdf} a folder review writes each submission's PDF beside its JSON and HTML: shown on a folder of
     * the two smallest samples (a cap and a pad; SampleReportsTest reads the PDF of every sample).
     */
    @Test
    void aFolderReviewWithPdfWritesEachSubmissionsPdf(@TempDir Path dir) throws IOException {
        Path folder = Files.createDirectories(dir.resolve("submissions"));
        Path out = dir.resolve("reports");
        for (String base : new String[] {"mill-road-depot", "tannery-row-pads"}) {
            Files.copy(Path.of("sample-submissions", base + ".yaml"), folder.resolve(base + ".yaml"));
        }
        SampleSubmissionsTest.Run r = run("review", folder.toString(), "--out", out.toString(), "--date",
                "2026-12-01", "--pdf");
        assertThat(r.exit()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        assertThat(r.err()).contains("[1/2]").contains("[2/2]");
        for (String base : new String[] {"mill-road-depot", "tannery-row-pads"}) {
            assertThat(out.resolve(base + ".json")).isNotEmptyFile();
            assertThat(out.resolve(base + ".html")).isNotEmptyFile();
            assertThat(out.resolve(base + ".pdf")).isNotEmptyFile();
        }
        assertThat(out.resolve("index.html")).content().contains("mill-road-depot.html").contains("tannery-row-pads.html");
    }

    /** The combinations of the Mill Road sample: text by default, YAML items ready to paste as actions. */
    @Test
    void combinePrintsTheGeneratedCasesOfEachElement() {
        SampleSubmissionsTest.Run text = run("combine", "sample-submissions/mill-road-depot.yaml");
        assertThat(text.exit()).as(text.err()).isEqualTo(ExitCodes.OK);
        assertThat(text.out()).contains("# PC-M1: ").contains("6.10 G sup + Q(B) lead + S ψ0 + W− ψ0")
                .contains("sls-quasi-permanent");
        SampleSubmissionsTest.Run yaml = run("combine", "sample-submissions/mill-road-depot.yaml", "--format", "yaml");
        assertThat(yaml.exit()).isEqualTo(ExitCodes.OK);
        // PC-M2's G 1650 alone by Exp. (6.10) with γG,sup 1.35: N = 2227.5 kN
        assertThat(yaml.out()).contains("  - {name: \"6.10 G sup\", kind: uls, N: 2227.5, Mx: 0, My: 0, Hx: 0, Hy: 0}");
    }

    @Test
    void thePdfCarriesTheJsonWrittenBesideItIsRepeatableUnderADateAndTheLineNamesEveryFile(@TempDir Path dir)
            throws IOException {
        Path first = Files.createDirectories(dir.resolve("first"));
        Path second = Files.createDirectories(dir.resolve("second"));
        SampleSubmissionsTest.Run r = run("review", "sample-submissions/mill-road-depot.yaml", "--out", first.toString(),
                "--date", "2026-12-01", "--pdf");
        run("review", "sample-submissions/mill-road-depot.yaml", "--out", second.toString(), "--date", "2026-12-01",
                "--pdf");
        assertThat(r.exit()).as(r.err()).isIn(ExitCodes.OK, ExitCodes.FINDINGS);
        List<Path> written;
        try (Stream<Path> files = Files.list(first)) {
            written = files.sorted().toList();
        }
        assertThat(written).extracting(p -> p.getFileName().toString()).contains("mill-road-depot.json",
                "mill-road-depot.html", "mill-road-depot.pdf", "mill-road-depot.responses.csv");
        for (Path file : written) {
            assertThat(r.out()).as("the output line names " + file).contains(file.toString());
        }
        byte[] pdf = Files.readAllBytes(first.resolve("mill-road-depot.pdf"));
        assertThat(Files.readAllBytes(second.resolve("mill-road-depot.pdf"))).as("same bytes under --date").isEqualTo(pdf);
        try (PDDocument document = Loader.loadPDF(pdf)) {
            var attached = document.getDocumentCatalog().getNames().getEmbeddedFiles().getNames()
                    .get("mill-road-depot.json").getEmbeddedFile();
            assertThat(attached.toByteArray()).as("the attachment is the JSON file, byte for byte")
                    .isEqualTo(Files.readAllBytes(first.resolve("mill-road-depot.json")));
        }
    }
}
