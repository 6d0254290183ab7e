package dev.countercheck.export;

/** Escaping for XML 1.0 text and attributes; characters XML 1.0 cannot hold become U+FFFD. */
final class Xml {

    private Xml() {
    }

    static String text(String s) {
        return escape(s, false);
    }

    static String attr(String s) {
        return escape(s, true);
    }

    private static String escape(String s, boolean attribute) {
        StringBuilder out = new StringBuilder(s.length());
        s.codePoints().forEach(c -> {
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append(attribute ? "&quot;" : "\"");
                case '\n' -> out.append(attribute ? "&#10;" : "\n");
                case '\r' -> out.append("&#13;");
                case '\t' -> out.append(attribute ? "&#9;" : "\t");
                default -> {
                    boolean allowed = c >= 0x20 && c <= 0xD7FF || c >= 0xE000 && c <= 0xFFFD || c >= 0x10000;
                    out.appendCodePoint(allowed ? c : 0xFFFD);
                }
            }
        });
        return out.toString();
    }
}
