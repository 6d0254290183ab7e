package dev.countercheck.cli;

import picocli.CommandLine;

/** Entry point: builds the command line and exits with what it returns. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(CountercheckCommand.commandLine().execute(args));
    }
}
