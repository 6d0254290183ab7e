package dev.countercheck.docs;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every relative link of the user-facing documents resolves inside the repository: README.md,
 * DEVELOPERS.md, docs/**.md and the schema. A link to a heading must name a heading of its page.
 * Nothing may point outside the repository or at the project's internal files.
 */
class RelativeLinksTest {

    private static final Pattern MARKDOWN_LINK = Pattern.compile("\\]\\(([^)\\s]+)\\)");
    private static final Pattern SCHEMA_FILE = Pattern.compile("\\(((?:\\.\\./|\\./)?[\\w./-]+\\.(?:md|json|yaml))\\)"
            + "|\\b((?:docs|schema|rulesets|sample-submissions)/[\\w./-]+\\.(?:md|json|yaml))");
    private static final Pattern HEADING = Pattern.compile("(?m)^#{1,6} (.+)$");

    static List<Path> documents() throws IOException {
        List<Path> docs = new ArrayList<>(List.of(Path.of("README.md"), Path.of("DEVELOPERS.md"),
                Path.of("schema/README.md"), Path.of("schema/submission.schema.json")));
        try (Stream<Path> s = Files.walk(Path.of("docs"))) {
            s.filter(p -> p.toString().endsWith(".md")).sorted().forEach(docs::add);
        }
        return docs;
    }

    /** The relative link targets written in {@code file}, with any #fragment. */
    static List<String> links(Path file) throws IOException {
        String text = Files.readString(file, StandardCharsets.UTF_8);
        List<String> found = new ArrayList<>();
        Matcher m = (file.toString().endsWith(".md") ? MARKDOWN_LINK : SCHEMA_FILE).matcher(text);
        while (m.find()) {
            String target = m.group(1) != null ? m.group(1) : m.group(2);
            if (!target.matches("^[a-z]+:.*")) {
                found.add(target);
            }
        }
        return found;
    }

    /** GitHub's anchor of a heading: lower case, punctuation dropped, spaces to hyphens. */
    static String anchor(String heading) {
        return heading.trim().toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}\\p{N} _-]", "").replace(' ', '-');
    }

    @Test
    void everyRelativeLinkResolvesInsideTheRepository() throws IOException {
        Path root = Path.of("").toAbsolutePath().normalize();
        List<String> broken = new ArrayList<>();
        int checked = 0;
        for (Path doc : documents()) {
            for (String link : links(doc)) {
                checked++;
                String file = link.contains("#") ? link.substring(0, link.indexOf('#')) : link;
                String fragment = link.contains("#") ? link.substring(link.indexOf('#') + 1) : "";
                Path base = doc.toString().endsWith(".json") ? root : doc.toAbsolutePath().getParent();
                Path target = file.isEmpty() ? doc.toAbsolutePath() : base.resolve(file).normalize();
                if (!target.startsWith(root) || !Files.exists(target)) {
                    broken.add(doc + ": " + link + " (no such file in the repository)");
                } else if (!fragment.isEmpty() && !headings(target).contains(fragment)) {
                    broken.add(doc + ": " + link + " (no such heading)");
                }
            }
        }
        assertThat(checked).as("links found").isGreaterThan(10);
        assertThat(broken).isEmpty();
    }

    @Test
    void noUserDocumentPointsAtTheProjectsInternalFiles() throws IOException {
        for (Path doc : documents()) {
            if (doc.equals(Path.of("DEVELOPERS.md"))) {
                continue; // contributors may name the project's internal contract; users never see it
            }
            assertThat(Files.readString(doc, StandardCharsets.UTF_8)).as(doc.toString())
                    .doesNotContain("../shared").doesNotContain("spec/");
        }
    }

    private static List<String> headings(Path file) throws IOException {
        if (!file.toString().endsWith(".md")) {
            return List.of();
        }
        Matcher m = HEADING.matcher(Files.readString(file, StandardCharsets.UTF_8));
        List<String> anchors = new ArrayList<>();
        while (m.find()) {
            anchors.add(anchor(m.group(1)));
        }
        return anchors;
    }
}
