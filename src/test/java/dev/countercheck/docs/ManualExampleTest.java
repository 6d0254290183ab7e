package dev.countercheck.docs;

import dev.countercheck.element.ElementKinds;
import dev.countercheck.submission.PileCap;
import dev.countercheck.submission.Submission;
import dev.countercheck.submission.SubmissionReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The complete annotated example of docs/submission.md is a valid submission, read as documented. */
class ManualExampleTest {

    @Test
    void theAnnotatedExampleIsAValidSubmission(@TempDir Path dir) throws Exception {
        String page = Files.readString(Path.of("docs/submission.md"), StandardCharsets.UTF_8);
        String heading = "## A complete annotated example";
        String from = page.substring(page.indexOf(heading));
        int start = from.indexOf("```yaml\n") + "```yaml\n".length();
        String yaml = from.substring(start, from.indexOf("```", start));
        Path file = Files.writeString(dir.resolve("example.yaml"), yaml, StandardCharsets.UTF_8);

        Submission s = new SubmissionReader(ElementKinds.binders()).read(file);

        PileCap cap = (PileCap) s.elements().get(0);
        assertThat(cap.materials().exposure()).containsExactly("XC2"); // one class written alone
        assertThat(cap.actions().get(1).nKn()).isEqualTo(6100); // "6.1 MN"
        assertThat(cap.piles().positions()).hasSize(4);
    }
}
