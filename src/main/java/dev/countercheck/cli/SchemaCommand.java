package dev.countercheck.cli;

import picocli.CommandLine.Command;

import java.util.concurrent.Callable;

/**
 * {@code schema}: prints the JSON Schema of the submission format, the file published as
 * {@code schema/submission.schema.json}, for editors that complete and check a submission as it
 * is typed.
 */
@Command(name = SchemaCommand.NAME, mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = {"Print the JSON Schema of the submission format: countercheck schema > submission.schema.json",
                "Editors that read '# yaml-language-server: $schema=<path>' on a file's first line then complete"
                        + " and check submissions as they are typed."})
public final class SchemaCommand implements Callable<Integer> {

    /** The sub-command's name on the command line. */
    static final String NAME = "schema";

    static final String RESOURCE = "/schema/submission.schema.json";

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return BundledText.print(spec, RESOURCE);
    }
}
