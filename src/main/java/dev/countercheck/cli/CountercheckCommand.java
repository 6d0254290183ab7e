package dev.countercheck.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

import java.util.concurrent.Callable;

/** The top-level command: only sub-commands; alone it prints the help and exits as a usage error. */
@Command(name = "countercheck", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Independent design review of reinforced-concrete foundations to EN 1992-1-1.",
        subcommands = {ReviewCommand.class, ValidateCommand.class, RulesCommand.class, ExampleCommand.class,
                SchemaCommand.class,                 CommandLine.HelpCommand.class})
public final class CountercheckCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.UNUSABLE;
    }

    /** The configured command line; tests call {@code execute} on it with their own writers. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new CountercheckCommand());
        cl.setExitCodeExceptionMapper(e -> ExitCodes.UNUSABLE);
        cl.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            commandLine.getErr().println("countercheck: internal error: " + e
                    + " (please report it with the input file)");
            return ExitCodes.UNUSABLE;
        });
        cl.getCommandSpec().exitCodeOnInvalidInput(ExitCodes.UNUSABLE);
        cl.getCommandSpec().exitCodeOnExecutionException(ExitCodes.UNUSABLE);
        cl.getSubcommands().values().forEach(sub -> {
            sub.getCommandSpec().exitCodeOnInvalidInput(ExitCodes.UNUSABLE);
            sub.getCommandSpec().exitCodeOnExecutionException(ExitCodes.UNUSABLE);
        });
        return cl;
    }
}
