package dev.countercheck.cli;

import picocli.CommandLine;

import java.io.PrintWriter;
import picocli.CommandLine.Command;

import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.stream.Stream;

/** The top-level command: only sub-commands; alone it prints the help and exits as a usage error. */
@Command(name = "countercheck", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = "Independent design review of reinforced-concrete foundations to EN 1992-1-1.")
public final class CountercheckCommand implements Callable<Integer> {

    /**
     * The sub-commands by name, in the order the help lists them (then picocli's {@code help}). Found by their
     * names' constants, so that choosing one reads no annotation: the first one read costs a noticeable part of
     * the start-up, which the commands that load a ruleset spend loading it on a second core instead.
     */
    private static final Map<String, Class<?>> BY_NAME = byName(ReviewCommand.NAME, ReviewCommand.class,
            ValidateCommand.NAME, ValidateCommand.class, RulesCommand.NAME, RulesCommand.class,
            ExampleCommand.NAME, ExampleCommand.class, CombineCommand.NAME, CombineCommand.class,
            SchemaCommand.NAME, SchemaCommand.class, CompareCommand.NAME, CompareCommand.class);
    /** Every sub-command, in the order the help lists them. */
    private static final List<Class<?>> SUBCOMMANDS = Stream.concat(BY_NAME.values().stream(),
            Stream.of(CommandLine.HelpCommand.class)).toList();

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
        return commandLine(SUBCOMMANDS);
    }

    /**
     * The command line for {@code args}: when they start with the name of a sub-command, only that one is
     * built (picocli builds each command's model from its annotations, a noticeable part of the start-up);
     * otherwise (the top command's own options, the {@code help} command, a mistyped name) all of them.
     */
    public static CommandLine commandLine(String... args) {
        return subcommand(args).map(sub -> commandLine(List.<Class<?>>of(sub))).orElseGet(CountercheckCommand::commandLine);
    }

    /** The sub-command that {@code args} start with, the {@code help} command aside (it needs all the others). */
    static Optional<Class<?>> subcommand(String... args) {
        return args.length == 0 ? Optional.empty() : Optional.ofNullable(BY_NAME.get(args[0]));
    }

    /** The sub-commands by their names, each name followed by its command, in the order given. */
    private static Map<String, Class<?>> byName(Object... nameThenCommand) {
        Map<String, Class<?>> byName = new LinkedHashMap<>();
        for (int i = 0; i < nameThenCommand.length; i += 2) {
            byName.put((String) nameThenCommand[i], (Class<?>) nameThenCommand[i + 1]);
        }
        return Collections.unmodifiableMap(byName);
    }

    /** Whether {@code command} applies a ruleset to a submission (it has the {@link RulesetOptions}). */
    static boolean appliesRuleset(Class<?> command) {
        return Arrays.stream(command.getDeclaredFields()).anyMatch(f -> f.getType() == RulesetOptions.class);
    }

    private static CommandLine commandLine(List<Class<?>> subcommands) {
        CommandLine cl = new CommandLine(new CountercheckCommand());
        subcommands.forEach(cl::addSubcommand);
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
