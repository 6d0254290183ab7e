package dev.countercheck.cli;

/** Wrong use of the command line that picocli itself cannot see (a bad date, a clash of outputs). */
final class UsageException extends RuntimeException {

    UsageException(String message) {
        super(message);
    }
}
