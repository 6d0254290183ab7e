package dev.countercheck.submission;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.input.InputError;
import dev.countercheck.input.SourceLocation;
import dev.countercheck.submission.ActionCase.Kind;
import dev.countercheck.submission.Column.ColumnShape;
import dev.countercheck.submission.PileCap.CastAgainst;
import dev.countercheck.submission.PileCap.SelfWeight;
import dev.countercheck.submission.PileCap.TieMethod;
import dev.countercheck.submission.Reinforcement.BarEnds;
import dev.countercheck.submission.Reinforcement.BarSet;
import dev.countercheck.submission.Reinforcement.Direction;
import org.assertj.core.groups.Tuple;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;
import static org.assertj.core.api.Assertions.within;

/**
 * Reading good submissions. Expected values are those written in the test files (invented data,
 * {@code src/test/resources/submissions/good/}); values written with a unit are converted by hand
 * in the comment beside them.
 */
class SubmissionReaderTest {

    private static final Path GOOD = Path.of("src/test/resources/submissions/good");

    private final SubmissionReader reader = new SubmissionReader(ElementKinds.binders());

    private Submission readGood(String name) throws SubmissionException {
        return reader.read(GOOD.resolve(name));
    }

    private static PileCap pileCap(Submission s, int index) {
        assertThat(s.elements().get(index)).isInstanceOf(PileCap.class);
        return (PileCap) s.elements().get(index);
    }

    @Test
    void readsTheFileLevelBlocks() throws Exception {
        Submission s = readGood("harbour-lane.yaml");

        assertThat(s.file()).isEqualTo(GOOD.resolve("harbour-lane.yaml").toString());
        assertThat(s.project()).isEqualTo(new Project(Optional.of("Harbour Lane Pumping Station"),
                Optional.of("HLP-S-114"), Optional.of("C03"), Optional.of("Invented Engineers LLP"),
                Optional.of("2027-03-05")));
        assertThat(s.ruleset()).contains("en1992-recommended");
        assertThat(s.elements()).extracting(ElementInput::id).containsExactly("PC-A1", "PC-B7");
    }

    @Test
    void readsEveryFieldOfAFullPileCap() throws Exception {
        PileCap cap = pileCap(readGood("harbour-lane.yaml"), 0);

        assertThat(cap.description()).isEqualTo("Wet well, grid A/1");
        assertThat(cap.location().line()).as("the element's mapping starts at its 'id' line").isEqualTo(22);
        assertThat(cap.planXMm()).isEqualTo(4200);
        assertThat(cap.planYMm()).as("\"2.7 m\": hand calculation 2.7 × 1000 = 2700 mm").isEqualTo(2700, within(1e-9));
        assertThat(cap.depthMm()).isEqualTo(1300);
        assertThat(cap.castAgainst()).as("a plain cast_against is the bottom face; the sides are taken as formed")
                .isEqualTo(new PileCap.Casting(CastAgainst.SOIL, CastAgainst.FORMWORK, false));
        assertThat(cap.selfWeight()).isEqualTo(SelfWeight.ADD);
        assertThat(cap.claims()).as("punching_beta is the claim punching-face.beta")
                .anyMatch(c -> c.checkId().equals("punching-face") && c.quantity().equals("beta") && c.value() == 1.15);
        assertThat(cap.materials()).isEqualTo(new Materials(Optional.of("C35/45"), 35, 500, 20, List.of("XC2", "XA1"),
                "S4", Optional.of(10.0)));

        PileGroup piles = cap.piles();
        assertThat(piles.diameterMm()).isEqualTo(600);
        assertThat(piles.positions()).containsExactly(new Point(-1500, -900), new Point(0, -900),
                new Point(1500, -900), new Point(-1500, 900), new Point(0, 900), new Point(1500, 900));
        assertThat(piles.compressionKn()).as("\"1.9 MN\": hand calculation 1.9 × 1000 = 1900 kN")
                .isEqualTo(1900, within(1e-9));
        assertThat(piles.tensionKn()).isEqualTo(150);
        assertThat(piles.embedmentMm()).isEqualTo(100);
        assertThat(piles.toleranceMm()).contains(75.0);

        assertThat(cap.column()).isEqualTo(new Column(ColumnShape.RECTANGULAR, 700, 500, new Point(50, -25),
                Optional.of(new Column.StarterBars(10, 32))));

        assertThat(cap.actions()).hasSize(2);
        ActionCase uls = cap.actions().get(0);
        assertThat(uls.name()).isEqualTo("ULS-gravity");
        assertThat(uls.kind()).isEqualTo(Kind.ULS);
        assertThat(uls.nKn()).isEqualTo(8650);
        assertThat(uls.mxKnm()).isEqualTo(240);
        assertThat(uls.myKnm()).as("\"-0.31 MNm\": hand calculation -0.31 × 1000 = -310 kNm").isEqualTo(-310, within(1e-9));
        assertThat(uls.hxKn()).isEqualTo(35);
        assertThat(uls.hyKn()).isEqualTo(0);
        ActionCase qp = cap.actions().get(1);
        assertThat(qp.kind()).isEqualTo(Kind.SLS_QUASI_PERMANENT);
        assertThat(List.of(qp.mxKnm(), qp.myKnm(), qp.hxKn(), qp.hyKn())).as("moments and H default to 0")
                .containsOnly(0.0);

        Reinforcement r = cap.reinforcement().orElseThrow();
        assertThat(r.cover()).isEqualTo(new Reinforcement.Covers(100, 50, 75));
        assertThat(r.bottom()).containsExactly(
                new BarSet(Direction.X, 18, 25, 1, BarEnds.BENT, Optional.of(900.0), Optional.empty()),
                new BarSet(Direction.Y, 24, 20, 2, BarEnds.HOOKED, Optional.empty(), Optional.empty()));
        assertThat(r.top()).containsExactly(
                new BarSet(Direction.X, 12, 16, 1, BarEnds.STRAIGHT, Optional.empty(), Optional.empty()),
                new BarSet(Direction.Y, 18, 16, 2, BarEnds.STRAIGHT, Optional.empty(), Optional.empty()));
        assertThat(r.sides()).contains(new Reinforcement.SideBars(12, 200));

        assertThat(cap.tieMethod()).isEqualTo(TieMethod.TRUSS);
        assertThat(cap.claims()).extracting(Claim::checkId, Claim::quantity, Claim::value).containsExactly(
                Tuple.tuple("pile-reactions", "max", 1610.0),
                Tuple.tuple("pile-reactions", "min", 1190.0),
                Tuple.tuple("tie-x", "force", 2310.0),
                Tuple.tuple("tie-x", "as_required", cap.claims().get(3).value()),
                Tuple.tuple("shear-y", "av", 260.0),
                Tuple.tuple("shear-y", "beta", 0.21),
                Tuple.tuple("shear-y", "ved", 1030.0),
                Tuple.tuple("node-pile", "strut_angle", 41.0),
                Tuple.tuple("punching-face", "beta", 1.15)); // punching_beta: 1.15
        assertThat(cap.claims().get(3).value()).as("\"53.1 cm2\": hand calculation 53.1 × 100 = 5310 mm2")
                .isEqualTo(5310, within(1e-9));
    }

    @Test
    void readsWhatEachFaceIsCastAgainst(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("faces.yaml");
        String text = Files.readString(GOOD.resolve("harbour-lane.yaml"), StandardCharsets.UTF_8);
        assertThat(text).contains("cast_against: soil");
        Files.writeString(file, text.replace("cast_against: soil", "cast_against: {bottom: blinding, sides: soil}"),
                StandardCharsets.UTF_8);

        PileCap cap = pileCap(reader.read(file), 0);

        assertThat(cap.castAgainst()).isEqualTo(new PileCap.Casting(CastAgainst.BLINDING, CastAgainst.SOIL, true));
    }

    @Test
    void appliesTheDefaultsOfTheFormat() throws Exception {
        PileCap cap = pileCap(readGood("harbour-lane.yaml"), 1);

        assertThat(cap.description()).as("description is optional").isEmpty();
        assertThat(cap.castAgainst().bottom()).as("cast_against defaults to blinding").isEqualTo(CastAgainst.BLINDING);
        assertThat(cap.selfWeight()).as("self_weight defaults to add").isEqualTo(SelfWeight.ADD);
        assertThat(cap.claims()).as("no punching_beta, no β claim").noneMatch(c -> c.quantity().equals("beta")
                && c.checkId().equals("punching-face"));
        assertThat(cap.piles().tensionKn()).as("tension capacity defaults to 0").isZero();
        assertThat(cap.piles().embedmentMm()).as("embedment defaults to 0").isZero();
        assertThat(cap.piles().toleranceMm()).isEmpty();
        assertThat(cap.column().position()).as("column position defaults to the origin").isEqualTo(new Point(0, 0));
        assertThat(cap.column().starterBars()).isEmpty();
        assertThat(cap.column().cyMm()).as("a circular column's cy is its diameter").isEqualTo(450);
        assertThat(cap.reinforcement()).isEmpty();
        assertThat(cap.tieMethod()).as("claims.method defaults to truss").isEqualTo(TieMethod.TRUSS);
        assertThat(cap.claims()).isEmpty();
        assertThat(cap.depthMm()).as("\"1.05 m\": hand calculation 1.05 × 1000 = 1050 mm").isEqualTo(1050, within(1e-9));
    }

    @Test
    void elementMaterialsOverrideTheFileMaterialsKeyByKey() throws Exception {
        PileCap cap = pileCap(readGood("harbour-lane.yaml"), 1);

        assertThat(cap.materials()).as("fck 40 replaces the file's C35/45 (class and fck are one item);"
                        + " exposure is the element's; fyk, aggregate, structural class and Δc_dev are the file's")
                .isEqualTo(new Materials(Optional.empty(), 40, 500, 20, List.of("XC4"), "S4", Optional.of(10.0)));
    }

    @Test
    void yamlAndJsonOfTheSameTreeGiveEqualModels() throws Exception {
        Submission yaml = readGood("harbour-lane.yaml");
        Submission json = readGood("harbour-lane.json");

        assertThat(json).usingRecursiveComparison()
                .ignoringFields("file", "sha256")
                .ignoringFieldsOfTypes(SourceLocation.class)
                .isEqualTo(yaml);
        assertThat(json.sha256()).isNotEqualTo(yaml.sha256());
    }

    @Test
    void aNameWithoutAKnownExtensionIsReadByItsContent(@TempDir Path dir) throws Exception {
        Path json = Files.writeString(dir.resolve("broken.txt"), "  {\"countercheck\": 1,}");
        Path yaml = Files.writeString(dir.resolve("broken"), "countercheck: 1: 2");

        assertThat(catchSubmissionErrors(json)).singleElement().asString().contains("JSON syntax");
        assertThat(catchSubmissionErrors(yaml)).singleElement().asString().contains("YAML syntax");
    }

    private List<InputError> catchSubmissionErrors(Path file) {
        SubmissionException e = catchThrowableOfType(SubmissionException.class, () -> reader.read(file));
        assertThat(e).isNotNull();
        return e.errors();
    }

    @Test
    void sha256IsThatOfTheFileBytes() throws Exception {
        Path file = GOOD.resolve("harbour-lane.yaml");
        assertThat(readGood("harbour-lane.yaml").sha256()).isEqualTo(SubmissionReader.sha256(Files.readAllBytes(file)));
        // Source: FIPS 180-2, Appendix B.1 (SHA-256 of the message "abc")
        assertThat(SubmissionReader.sha256("abc".getBytes(StandardCharsets.US_ASCII)))
                .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    }

    @Test
    void anIncompleteElementIsReportedBesideAGoodOne() throws Exception {
        Submission s = readGood("one-incomplete.yaml");

        assertThat(s.elements()).hasSize(2);
        assertThat(s.elements().get(0)).isInstanceOf(IncompleteElement.class);
        IncompleteElement incomplete = (IncompleteElement) s.elements().get(0);
        assertThat(incomplete.id()).isEqualTo("PC-N1");
        assertThat(incomplete.type()).isEqualTo("pile-cap");
        assertThat(incomplete.missing()).containsExactly("column", "a ULS action case (kind: uls)");
        assertThat(s.elements().get(1)).isInstanceOf(PileCap.class);
    }

    @Test
    void anElementWithoutPilesOrActionsIsIncomplete() throws Exception {
        Submission s = readGood("bare-element.yaml");

        assertThat(((IncompleteElement) s.elements().get(0)).missing())
                .containsExactly("plan", "depth", "piles", "column", "actions");
    }

    @Test
    void bottomLayersDefaultToTheOrderOfListing(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("layers.yaml");
        String good = Files.readString(GOOD.resolve("harbour-lane.yaml"), StandardCharsets.UTF_8);
        String listed = "        - {direction: x, count: 18, diameter: 25, layer: 1, ends: bent, leg: 900}\n"
                + "        - {direction: y, count: 24, diameter: 20, layer: 2, ends: hooked}\n";
        String unlayered = "        - {direction: y, count: 24, diameter: 20}\n"
                + "        - {direction: x, count: 10, diameter: 25}\n"
                + "        - {direction: y, count: 4, diameter: 16}\n"
                + "        - {direction: x, count: 8, diameter: 25}\n";
        assertThat(good).contains(listed);
        Files.writeString(file, good.replace(listed, unlayered), StandardCharsets.UTF_8);

        List<BarSet> bottom = pileCap(reader.read(file), 0).reinforcement().orElseThrow().bottom();

        assertThat(bottom).extracting(BarSet::direction, BarSet::layer).containsExactly(
                Tuple.tuple(Direction.Y, 1), Tuple.tuple(Direction.X, 2),
                Tuple.tuple(Direction.Y, 1), Tuple.tuple(Direction.X, 2));
    }

    @Test
    void aSingleExposureClassMayBeWrittenWithoutAList(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("single-exposure.yaml");
        String good = Files.readString(GOOD.resolve("harbour-lane.yaml"), StandardCharsets.UTF_8);
        assertThat(good).contains("exposure: [XC4]");
        Files.writeString(file, good.replace("exposure: [XC4]", "exposure: XC4"), StandardCharsets.UTF_8);

        assertThat(pileCap(reader.read(file), 1).materials().exposure()).containsExactly("XC4");
    }

    @Test
    void aMissingFileIsAnInputErrorNotACrash(@TempDir Path dir) {
        Path missing = dir.resolve("nowhere.yaml");
        assertThatThrownBy(() -> reader.read(missing))
                .isInstanceOf(SubmissionException.class)
                .hasMessage(missing + ":1:1: no such file");
    }

    @Test
    void theFileIsNotWritten() throws Exception {
        Path file = GOOD.resolve("harbour-lane.yaml");
        byte[] before = Files.readAllBytes(file);
        var modified = Files.getLastModifiedTime(file);

        readGood("harbour-lane.yaml");

        assertThat(Files.readAllBytes(file)).isEqualTo(before);
        assertThat(Files.getLastModifiedTime(file)).isEqualTo(modified);
    }
}
