package dev.countercheck.review;

import java.util.Locale;
import java.util.regex.Pattern;

/** The last part of a finding id: lower-case words of letters and digits joined by single hyphens. */
public final class Slugs {

    private static final Pattern SLUG = Pattern.compile("[a-z0-9]+(-[a-z0-9]+)*");
    private static final Pattern NOT_SLUG = Pattern.compile("[^a-z0-9]+");
    private static final Pattern END_HYPHENS = Pattern.compile("^-+|-+$");

    private Slugs() {
    }

    /** {@code "ULS 2 (wind)"} → {@code "uls-2-wind"}: a name of the submission turned into a slug. */
    public static String of(String name) {
        String s = END_HYPHENS.matcher(NOT_SLUG.matcher(name.toLowerCase(Locale.ROOT)).replaceAll("-")).replaceAll("");
        return s.isEmpty() ? "unnamed" : s;
    }

    public static boolean isSlug(String text) {
        return SLUG.matcher(text).matches();
    }
}
