package dev.countercheck.review;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** A finding as one line of text outside the report (JUnit XML, SARIF): its basis cited once. */
class FindingTest {

    private static Finding finding(String message, String basis) {
        return new Finding("F-1/cover/cover-bottom", Severity.MAJOR, "cover", message, basis);
    }

    @Test
    void citesTheBasisAfterTheMessage() {
        assertThat(finding("VEd = 873.6 kN exceeds VRd,c = 461.1 kN (ULS-1).", "EN 1992-1-1 6.2.2").withBasis())
                .isEqualTo("VEd = 873.6 kN exceeds VRd,c = 461.1 kN (ULS-1). (EN 1992-1-1 6.2.2)");
    }

    @Test
    void aMessageThatEndsWithItsBasisKeepsItOnce() {
        assertThat(finding("Bottom cover 60 mm is less than the 75 mm required (EN 1992-1-1 4.4.1)",
                "EN 1992-1-1 4.4.1").withBasis())
                .isEqualTo("Bottom cover 60 mm is less than the 75 mm required (EN 1992-1-1 4.4.1)");
    }

    @Test
    void aMessageCitingAnotherClauseGetsTheBasisToo() {
        assertThat(finding("Starter bars need lbd = 571.8 mm (EN 1992-1-1 8.4.4)", "EN 1992-1-1 8.4").withBasis())
                .isEqualTo("Starter bars need lbd = 571.8 mm (EN 1992-1-1 8.4.4) (EN 1992-1-1 8.4)");
    }
}
