package dev.countercheck.submission;

import dev.countercheck.input.Suggestions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class SuggestionsTest {

    private static final List<String> PILE_KEYS = PileGroupBinder.KEYS;

    /** Levenshtein distances by hand calculation: count the single-character edits. */
    @ParameterizedTest
    @CsvSource({
            "diameter, diameter, 0",
            "diametre, diameter, 2",   // two substitutions: r→e, e→r
            "Diameter, diameter, 0",   // case is ignored
            "positon, positions, 2",   // insert i, append s
            "'', abc, 3",              // three insertions
            "kitten, sitting, 3"       // k→s, e→i, append g
    })
    void distanceCountsSingleCharacterEdits(String a, String b, int expected) {
        assertThat(Suggestions.distance(a, b)).isEqualTo(expected);
    }

    @Test
    void suggestsTheNearestKeyForASlip() {
        assertThat(Suggestions.nearest("diametre", PILE_KEYS)).contains("diameter");
        assertThat(Suggestions.nearest("position", PILE_KEYS)).contains("positions");
        assertThat(Suggestions.nearest("embed", PILE_KEYS)).as("an abbreviation").contains("embedment");
    }

    @Test
    void suggestsNothingForAWordFarFromEveryKey() {
        assertThat(Suggestions.nearest("colour", PILE_KEYS)).isEmpty();
        assertThat(Suggestions.hint("colour", PILE_KEYS))
                .isEqualTo("; expected one of: diameter, positions, capacity, embedment, tolerance");
    }

    @Test
    void suggestsNothingWhenTwoKeysAreEquallyNear() {
        assertThat(Suggestions.nearest("XC5", List.of("XC1", "XC2", "XC4"))).isEmpty();
    }
}
