package dev.countercheck.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** A text file packaged in the jar (the starter submission, the schema), for commands that print one. */
final class BundledText {

    private BundledText() {
    }

    static String read(String resource) {
        try (InputStream in = BundledText.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("the build did not package " + resource);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Prints {@code resource} to the command's output; the exit status of a command that only prints. */
    static int print(picocli.CommandLine.Model.CommandSpec spec, String resource) {
        spec.commandLine().getOut().print(read(resource));
        spec.commandLine().getOut().flush();
        return ExitCodes.OK;
    }
}
