package dev.countercheck.cli;

import picocli.CommandLine;

import java.io.PrintWriter;
import picocli.CommandLine.Command;

import java.util.concurrent.Callable;

/** The top-level command: only sub-commands; alone it prints the help and exits as a usage error. */
@Command(name = "countercheck", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Independent design review of reinforced-concrete foundations to EN 1992-1-1.",
        subcommands = {ReviewCommand.class, ValidateCommand.class, RulesCommand.class, ExampleCommand.class, CombineCommand.class,
                SchemaCommand.class, CompareCommand.class, CommandLine.HelpCommand.class})
public final class CountercheckCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.UNUSABLE;
    }

    /**
     * The configured command line; tests call {@code execute} on it with their own writers. Every
     * failure ends in one line and an exit status: a usage error 2, an exception or a JVM error
     * (stack overflow, out of memory) 3, output that could not be written 2. What the commands
     * print is escaped (see {@link ConsoleText}).
     */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new CountercheckCommand());
        cl.setExitCodeExceptionMapper(e -> ExitCodes.UNUSABLE);
        cl.setExecutionExceptionHandler((e, commandLine, parseResult) -> internalError(commandLine, e));
        cl.getCommandSpec().exitCodeOnInvalidInput(ExitCodes.UNUSABLE);
        cl.getCommandSpec().exitCodeOnExecutionException(ExitCodes.INTERNAL);
        cl.getSubcommands().values().forEach(sub -> {
            sub.getCommandSpec().exitCodeOnInvalidInput(ExitCodes.UNUSABLE);
            sub.getCommandSpec().exitCodeOnExecutionException(ExitCodes.INTERNAL);
        });
        cl.setExecutionStrategy(CountercheckCommand::execute);
        // help in plain text: its colours would be control characters, which ConsoleText escapes
        cl.setColorScheme(CommandLine.Help.defaultColorScheme(CommandLine.Help.Ansi.OFF));
        return cl;
    }

    private static int execute(CommandLine.ParseResult parseResult) {
        CommandLine root = parseResult.commandSpec().commandLine();
        PrintWriter out = root.getOut();
        PrintWriter err = root.getErr();
        root.setOut(ConsoleText.escaping(out));
        root.setErr(ConsoleText.escaping(err));
        int code;
        try {
            code = new CommandLine.RunLast().execute(parseResult);
        } catch (Error e) { // a stack overflow, out of memory: a fault to report in one line like any other
            code = internalError(root, e);
        }
        root.getOut().flush();
        root.getErr().flush();
        if (out.checkError()) {
            err.println("countercheck: the output could not be written (standard output closed or full)");
            err.flush();
            code = Math.max(code, ExitCodes.UNUSABLE);
        }
        return code;
    }

    private static int internalError(CommandLine commandLine, Throwable e) {
        commandLine.getErr().println("countercheck: " + InternalFailure.line(e, false));
        return ExitCodes.INTERNAL;
    }
}
