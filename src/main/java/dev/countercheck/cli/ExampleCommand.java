package dev.countercheck.cli;

import picocli.CommandLine.Command;

import java.util.concurrent.Callable;

/** {@code example}: prints a commented starter submission. */
@Command(name = ExampleCommand.NAME, mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Print a commented starter submission to adapt: countercheck example > my-project.yaml")
public final class ExampleCommand implements Callable<Integer> {

    /** The sub-command's name on the command line. */
    static final String NAME = "example";

    static final String RESOURCE = "/example-submission.yaml";

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        return BundledText.print(spec, RESOURCE);
    }
}
