package dev.countercheck.element.pilecap;

import dev.countercheck.review.CheckResult;
import dev.countercheck.review.ElementReview;
import dev.countercheck.review.Value;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The one harness for every rule fixture under resources/rule-fixtures: each file is a small
 * submission whose comment names the source of its numbers and states, on lines
 * {@code # expect: <check> <status> [quantity=value[±tolerance]]...}, what the review must compute.
 * Adding a rule adds a fixture, not a test class. Tolerance defaults to 0.05 % of the value.
 */
class RuleFixturesTest {

    static Stream<Path> fixtures() throws IOException {
        return Files.list(Path.of("src/test/resources/rule-fixtures")).filter(p -> p.toString().endsWith(".yaml"))
                .sorted();
    }

    @ParameterizedTest
    @MethodSource("fixtures")
    void ruleComputesWhatItsFixtureStates(Path fixture) throws IOException {
        List<String> expectations = Files.readAllLines(fixture).stream().filter(l -> l.startsWith("# expect: "))
                .map(l -> l.substring("# expect: ".length()).trim()).toList();
        assertThat(expectations).as("a fixture states what it expects").isNotEmpty();
        ElementReview element = CapReviews.elementAsSubmitted("/rule-fixtures/" + fixture.getFileName());
        for (String expectation : expectations) {
            String[] words = expectation.split("\\s+");
            CheckResult check = CapReviews.check(element, words[0]);
            assertThat(check.status().label()).as(expectation + " (reason: " + check.reason().orElse("") + ")")
                    .isEqualTo(words[1]);
            for (int i = 2; i < words.length; i++) {
                String[] nameValue = words[i].split("=");
                String[] valueTolerance = nameValue[1].split("±");
                double expected = Double.parseDouble(valueTolerance[0]);
                double tolerance = valueTolerance.length > 1 ? Double.parseDouble(valueTolerance[1])
                        : Math.abs(expected) * 5e-4;
                Value actual = check.values().get(nameValue[0]);
                assertThat(actual).as(expectation + ": " + nameValue[0] + " computed").isNotNull();
                assertThat(actual.value()).as(expectation + ": " + nameValue[0]).isCloseTo(expected, within(tolerance));
            }
        }
    }
}
