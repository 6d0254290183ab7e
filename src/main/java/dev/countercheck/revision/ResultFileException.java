package dev.countercheck.revision;

/** An earlier result that cannot be compared with; the message says where and why. */
public final class ResultFileException extends Exception {

    public ResultFileException(String message) {
        super(message);
    }
}
