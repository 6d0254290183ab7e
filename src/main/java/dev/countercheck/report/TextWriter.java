package dev.countercheck.report;

import java.io.Writer;

/**
 * A report written into memory: a {@link Writer} over a {@link StringBuilder}, unsynchronised (unlike
 * {@link java.io.StringWriter}'s {@code StringBuffer}), for the JSON and HTML texts made whole (the PDF's
 * input, the one-call writers). Never fails.
 */
final class TextWriter extends Writer {

    private final StringBuilder text = new StringBuilder(1 << 14);

    @Override
    public void write(int c) {
        text.append((char) c);
    }

    @Override
    public void write(char[] chars, int offset, int length) {
        text.append(chars, offset, length);
    }

    @Override
    public void write(String s, int offset, int length) {
        text.append(s, offset, offset + length);
    }

    @Override
    public void write(String s) {
        text.append(s);
    }

    @Override
    public Writer append(CharSequence chars) {
        text.append(chars);
        return this;
    }

    @Override
    public void flush() {
    }

    @Override
    public void close() {
    }

    @Override
    public String toString() {
        return text.toString();
    }
}
