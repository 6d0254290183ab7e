package dev.countercheck.input;

/**
 * Text from an input file as an error message may repeat it: at most {@link #MAX_CODE_POINTS}
 * characters (longer text is cut, with "…" and its full length), and control and formatting
 * characters written as {@code \u001B} so that a message cannot move the cursor, recolour the
 * terminal or reorder what it shows (bidirectional overrides).
 */
public final class Shown {

    /** How much of a text a message repeats. */
    public static final int MAX_CODE_POINTS = 60;

    private Shown() {
    }

    public static String text(String raw) {
        StringBuilder shown = new StringBuilder();
        int count = 0;
        for (int i = 0; i < raw.length(); ) {
            int c = raw.codePointAt(i);
            i += Character.charCount(c);
            if (++count > MAX_CODE_POINTS) {
                return shown.append("… (").append(raw.codePointCount(0, raw.length())).append(" characters)")
                        .toString();
            }
            if (Character.isISOControl(c) || Character.getType(c) == Character.FORMAT
                    || Character.getType(c) == Character.LINE_SEPARATOR
                    || Character.getType(c) == Character.PARAGRAPH_SEPARATOR) {
                shown.append(String.format("\\u%04X", c));
            } else {
                shown.appendCodePoint(c);
            }
        }
        return shown.toString();
    }
}
