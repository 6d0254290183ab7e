package dev.countercheck.submission;

import dev.countercheck.element.ElementKinds;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Whatever a damaged submission holds, reading it either succeeds or ends in a
 * {@link SubmissionException} with located, plain-language errors: no other exception escapes.
 * The damage is done to the good test files: cut short, a line dropped or repeated, a character
 * replaced by one that means something in YAML or JSON.
 */
class SubmissionReaderProperties {

    private static final Path GOOD = Path.of("src/test/resources/submissions/good");
    private static final String YAML = read("harbour-lane.yaml");
    private static final String JSON = read("harbour-lane.json");
    private static final String SIGNIFICANT = ":-[]{},\"'\t\n #&*!|>%@`0.9e_xy\u00e9\u0001";

    @Property(tries = 250)
    void damagedYamlNeverEscapesAsAnotherException(@ForAll("damagedYaml") String text) throws IOException {
        readsOrReportsCleanly(text, ".yaml");
    }

    @Property(tries = 150)
    void damagedJsonNeverEscapesAsAnotherException(@ForAll("damagedJson") String text) throws IOException {
        readsOrReportsCleanly(text, ".json");
    }

    @Provide
    Arbitrary<String> damagedYaml() {
        return damage(YAML);
    }

    @Provide
    Arbitrary<String> damagedJson() {
        return damage(JSON);
    }

    private static Arbitrary<String> damage(String text) {
        Arbitrary<Integer> offset = Arbitraries.integers().between(0, text.length() - 1);
        Arbitrary<Character> ch = Arbitraries.of(SIGNIFICANT.chars().mapToObj(c -> (char) c).toList());
        Arbitrary<String> cut = offset.map(i -> text.substring(0, i));
        Arbitrary<String> replaced = Combinators.combine(offset, ch)
                .as((i, c) -> text.substring(0, i) + c + text.substring(i + 1));
        Arbitrary<String> inserted = Combinators.combine(offset, ch)
                .as((i, c) -> text.substring(0, i) + c + text.substring(i));
        Arbitrary<String> lineDropped = offset.map(i -> dropLineAt(text, i));
        Arbitrary<String> lineRepeated = offset.map(i -> repeatLineAt(text, i));
        return Arbitraries.oneOf(cut, replaced, inserted, lineDropped, lineRepeated);
    }

    private static String dropLineAt(String text, int i) {
        int start = text.lastIndexOf('\n', i) + 1;
        int end = text.indexOf('\n', i);
        return text.substring(0, start) + (end < 0 ? "" : text.substring(end + 1));
    }

    private static String repeatLineAt(String text, int i) {
        int start = text.lastIndexOf('\n', i) + 1;
        int end = text.indexOf('\n', i);
        String line = end < 0 ? text.substring(start) + "\n" : text.substring(start, end + 1);
        return text.substring(0, start) + line + text.substring(start);
    }

    private static void readsOrReportsCleanly(String text, String suffix) throws IOException {
        Path file = Files.createTempFile("damaged", suffix);
        try {
            Files.writeString(file, text, StandardCharsets.UTF_8);
            try {
                new SubmissionReader(ElementKinds.binders()).read(file);
            } catch (SubmissionException e) {
                assertThat(e.errors()).isNotEmpty().allSatisfy(error -> {
                    assertThat(error.location().line()).isPositive();
                    assertThat(error.location().column()).isPositive();
                    assertThat(error.message()).isNotBlank().doesNotContain("Exception");
                });
            }
        } finally {
            Files.delete(file);
        }
    }

    private static String read(String name) {
        try {
            return Files.readString(GOOD.resolve(name), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
