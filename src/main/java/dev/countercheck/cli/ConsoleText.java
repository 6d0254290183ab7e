package dev.countercheck.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;

/**
 * Everything the commands print passes through here: control characters (other than line feed
 * and tab), bidirectional overrides and other invisible formatting characters are written as
 * {@code \\u001B}, so that no file name or message can move the cursor, recolour the terminal or
 * reorder what it shows.
 */
final class ConsoleText extends FilterWriter {

    private ConsoleText(Writer out) {
        super(out);
    }

    /** {@code out}, escaping what it is given; an already escaping writer is returned as it is. */
    static PrintWriter escaping(PrintWriter out) {
        return out instanceof Escaping ? out : new Escaping(out);
    }

    /** Marks a writer that escapes, so that it is not wrapped twice. */
    private static final class Escaping extends PrintWriter {
        Escaping(PrintWriter out) {
            super(new ConsoleText(out), true);
        }
    }

    static boolean shownAsEscape(int c) {
        if (c == '\n' || c == '\t') {
            return false;
        }
        int type = Character.getType(c);
        return Character.isISOControl(c) || type == Character.FORMAT || type == Character.LINE_SEPARATOR
                || type == Character.PARAGRAPH_SEPARATOR;
    }

    @Override
    public void write(int c) throws IOException {
        if (shownAsEscape(c)) {
            out.write(String.format("\\u%04X", c));
        } else {
            out.write(c);
        }
    }

    @Override
    public void write(char[] chars, int offset, int length) throws IOException {
        for (int i = offset; i < offset + length; i++) {
            write(chars[i]);
        }
    }

    @Override
    public void write(String text, int offset, int length) throws IOException {
        for (int i = offset; i < offset + length; i++) {
            write(text.charAt(i));
        }
    }
}
