package dev.countercheck.report;

import java.io.Writer;
import java.util.Arrays;

/**
 * A report written into memory: a {@link Writer} over a growing {@code char} array, unsynchronised (unlike
 * {@link java.io.StringWriter}'s {@code StringBuffer} and {@link java.io.CharArrayWriter}), for the JSON and HTML
 * texts made whole (the PDF's input, the one-call writers). Text is copied in bulk ({@link String#getChars},
 * {@link System#arraycopy}), not char by char as a {@link StringBuilder} takes a part of a string once it holds
 * a character beyond Latin-1. Never fails.
 */
final class TextWriter extends Writer {

    private char[] text = new char[1 << 14];
    private int length;

    @Override
    public void write(int c) {
        room(1);
        text[length++] = (char) c;
    }

    @Override
    public void write(char[] chars, int offset, int count) {
        room(count);
        System.arraycopy(chars, offset, text, length, count);
        length += count;
    }

    @Override
    public void write(String s, int offset, int count) {
        room(count);
        s.getChars(offset, offset + count, text, length);
        length += count;
    }

    @Override
    public void write(String s) {
        write(s, 0, s.length());
    }

    @Override
    public Writer append(CharSequence chars) {
        write(String.valueOf(chars));
        return this;
    }

    /** Makes room for {@code count} more characters, doubling the array as needed. */
    private void room(int count) {
        if (count > text.length - length) {
            text = Arrays.copyOf(text, Math.max(text.length * 2, length + count));
        }
    }

    @Override
    public void flush() {
    }

    @Override
    public void close() {
    }

    @Override
    public String toString() {
        return new String(text, 0, length);
    }
}
