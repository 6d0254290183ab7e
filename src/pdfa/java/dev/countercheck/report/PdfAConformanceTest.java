package dev.countercheck.report;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.verapdf.gf.foundry.VeraGreenfieldFoundryProvider;
import org.verapdf.pdfa.Foundries;
import org.verapdf.pdfa.PDFAParser;
import org.verapdf.pdfa.PDFAValidator;
import org.verapdf.pdfa.flavours.PDFAFlavour;
import org.verapdf.pdfa.results.TestAssertion;
import org.verapdf.pdfa.results.ValidationResult;

import java.io.ByteArrayInputStream;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The PDF validated as PDF/A-3U by veraPDF, the general-purpose PDF/A validator, against the rules of
 * ISO 19005-3 level U (fonts embedded and mapped to Unicode, the output intent, the XMP metadata
 * agreeing with the document information, the associated file). Run by the {@code pdfa} profile
 * ({@code mvn -B test -Ppdfa -Dtest=PdfAConformanceTest}, a step of {@code .ci/run} after the suite): a
 * validation of the sample's hundred pages takes longer than the rest of the report tests together.
 */
class PdfAConformanceTest {

    @BeforeAll
    static void startTheValidator() {
        VeraGreenfieldFoundryProvider.initialise();
    }

    @Test
    void theReportOfBothElementTypesConformsToPdfA3u() throws Exception {
        assertConforms("the fixture's report (a pile cap and a pad, hostile text)",
                new PdfReportWriter().write(ReviewFixture.review("<script>alert(1)</script> & \"Unit 3\"")));
    }

    @Test
    void theSixCapSampleReportConformsToPdfA3u() throws Exception {
        assertConforms("harbour-lane.yaml",
                new PdfReportWriter().write(SampleReviews.review(Path.of("sample-submissions", "harbour-lane.yaml"))));
    }

    /** Validates {@code pdf} as PDF/A-3U and lists every failed rule (clause, test, what it says, where). */
    private static void assertConforms(String what, byte[] pdf) throws Exception {
        try (PDFAParser parser = Foundries.defaultInstance().createParser(new ByteArrayInputStream(pdf),
                PDFAFlavour.PDFA_3_U)) {
            PDFAValidator validator = Foundries.defaultInstance().createValidator(PDFAFlavour.PDFA_3_U, false);
            ValidationResult result = validator.validate(parser);
            List<String> failed = result.getTestAssertions().stream()
                    .filter(a -> a.getStatus() == TestAssertion.Status.FAILED)
                    .map(a -> a.getRuleId().getClause() + "-" + a.getRuleId().getTestNumber() + " " + a.getMessage()
                            + " at " + a.getLocation().getContext())
                    .distinct().limit(40).toList();
            assertThat(failed).as(what + ": failed PDF/A-3U rules").isEmpty();
            assertThat(result.isCompliant()).as(what + " is PDF/A-3U").isTrue();
            assertThat(result.getPDFAFlavour()).isEqualTo(PDFAFlavour.PDFA_3_U);
        }
    }
}
