package dev.countercheck.cli;

import dev.countercheck.input.UnusableInputException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.countercheck.revision.FindingSnapshot;
import dev.countercheck.revision.ResultFile;
import dev.countercheck.revision.RevisionComparison;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;

/** {@code compare OLD.json NEW.json}: what became of each finding from one revision's review to the next. */
@Command(name = CompareCommand.NAME, mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Compare the JSON results of two revisions: each finding, matched by its id, is closed,"
                + " still-open, changed (other severity or values) or new; the counts close the list.",
        exitCodeListHeading = "%nExit status:%n",
        exitCodeList = {"0:compared", "2:a result file cannot be used, or wrong usage"})
public final class CompareCommand implements Callable<Integer> {

    /** The sub-command's name on the command line. */
    static final String NAME = "compare";

    @Parameters(index = "0", paramLabel = "OLD.json", description = "The result of the earlier revision.")
    Path older;

    @Parameters(index = "1", paramLabel = "NEW.json", description = "The result of the later revision.")
    Path newer;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text (default) or json.")
    String format;

    @picocli.CommandLine.Mixin
    Console console;

    @Override
    public Integer call() {
        PrintWriter out = console.out();
        PrintWriter err = console.err();
        if (!format.equals("text") && !format.equals("json")) {
            err.println("countercheck compare: --format " + format + " is not one of text, json");
            return ExitCodes.UNUSABLE;
        }
        RevisionComparison comparison;
        ResultFile after;
        try {
            ResultFile before = ResultFile.read(older);
            after = ResultFile.read(newer);
            comparison = RevisionComparison.compare(before.label(), before.findings(), after.findings());
        } catch (UnusableInputException e) {
            err.println(e.getMessage());
            return ExitCodes.UNUSABLE;
        }
        if (format.equals("json")) {
            out.println(json(comparison, after.label()));
        } else {
            for (RevisionComparison.Entry e : comparison.entries()) {
                out.printf("%-10s %-48s %s%n", e.change().label(), e.id(), severities(e));
            }
            out.println(comparison.previous() + " -> " + after.label() + ": " + comparison.countsLine());
        }
        out.flush();
        return ExitCodes.OK;
    }

    /** "major" for a finding of one revision, "critical -> major" for a changed one. */
    private static String severities(RevisionComparison.Entry e) {
        String before = e.before().map(FindingSnapshot::severity).orElse("");
        String after = e.after().map(FindingSnapshot::severity).orElse("");
        return before.isEmpty() || after.isEmpty() || before.equals(after) ? before + (before.isEmpty() ? after : "")
                : before + " -> " + after;
    }

    private static String json(RevisionComparison comparison, String later) {
        ObjectMapper mapper = new ObjectMapper();
        ObjectNode root = mapper.createObjectNode();
        root.put("previous", comparison.previous());
        root.put("current", later);
        ObjectNode counts = root.putObject("counts");
        comparison.counts().forEach((c, n) -> counts.put(c.label(), n));
        ArrayNode entries = root.putArray("findings");
        for (RevisionComparison.Entry e : comparison.entries()) {
            ObjectNode node = entries.addObject();
            node.put("id", e.id());
            node.put("change", e.change().label());
            node.put("element", e.latest().element());
            e.before().ifPresent(b -> node.put("severity_before", b.severity()));
            e.after().ifPresent(a -> node.put("severity", a.severity()));
            node.put("message", e.latest().message());
        }
        try {
            return mapper.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("the comparison could not be written", e);
        }
    }
}
