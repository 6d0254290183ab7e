package dev.countercheck.cli;

import dev.countercheck.report.ReviewReports;

import java.util.Optional;

/** Entry point: builds the command line and exits with what it returns. */
public final class Main {

    private Main() {
    }

    /**
     * Runs the command and exits with its status. Whatever escapes it (an error thrown while the
     * command line itself is built) still ends in one line and status 3; standard output that
     * could not be written (closed, or a full disk) ends in status 2 at least.
     */
    public static void main(String[] args) {
        int code;
        try {
            // a command that applies a ruleset most often applies the default one: loaded on a second core meanwhile,
            // and then, for a review, what its reports need whatever the review finds
            Optional<Class<?>> command = CountercheckCommand.subcommand(args);
            if (command.filter(CountercheckCommand::appliesRuleset).isPresent()) {
                Rulesets.loadAhead(command.get() == ReviewCommand.class ? ReviewReports::prepare : () -> { });
            }
            code = CountercheckCommand.commandLine(args).execute(args);
        } catch (Throwable e) {
            System.err.println("countercheck: " + InternalFailure.line(e, false));
            code = ExitCodes.INTERNAL;
        }
        System.out.flush();
        if (System.out.checkError()) {
            System.err.println("countercheck: the output could not be written (standard output closed or full)");
            code = Math.max(code, ExitCodes.UNUSABLE);
        }
        System.exit(code);
    }
}
