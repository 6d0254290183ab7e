package dev.countercheck.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

import java.io.PrintWriter;

/**
 * A command's standard output and error, as the command line gives them (escaped, see {@link ConsoleText}):
 * a mixin of the commands that print ({@code @Command} only so that picocli takes it as one; it adds nothing
 * to their usage).
 */
@Command
final class Console {

    @Spec(Spec.Target.MIXEE)
    CommandSpec command;

    PrintWriter out() {
        return command.commandLine().getOut();
    }

    PrintWriter err() {
        return command.commandLine().getErr();
    }
}
