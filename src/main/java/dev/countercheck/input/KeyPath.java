package dev.countercheck.input;

/**
 * The path of keys to an item of a file, as error messages name it: {@code elements[3].piles.positions[2]}
 * (list indices from 0; the empty path is the whole file).
 */
public final class KeyPath {

    private KeyPath() {
    }

    /** {@code path.key}, or {@code key} at the top of the file; the key as {@link Shown} shows it. */
    public static String join(String path, String key) {
        return path.isEmpty() ? Shown.text(key) : path + "." + Shown.text(key);
    }

    /** {@code path[index]} */
    public static String item(String path, int index) {
        return path + "[" + index + "]";
    }
}
