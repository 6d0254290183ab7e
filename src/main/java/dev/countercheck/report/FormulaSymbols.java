package dev.countercheck.report;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The symbols a trace step writes: its own symbol (without the case or place in brackets after it) and the
 * names in its formula. A name is a run of letters, digits, {@code _}, primes, commas and points (the standard's
 * subscripts: {@code VRd,c}, {@code γR;v}), a trailing {@code *} kept ({@code My*}); a number written before a symbol is
 * dropped ({@code 2d} writes d), and so are numbers, the article a before a word, the words the glossary lists as words, and the ruleset key
 * that {@code "ruleset parameter <key>"} names (the step's own symbol stands for it).
 */
final class FormulaSymbols {

    private static final Pattern NAME = Pattern.compile("(?:(?![Σ²³¹⁰])[\\p{L}\\p{M}\\p{N}_'′,.;])+\\*?");
    private static final Pattern LEADING_NUMBER = Pattern.compile("^[\\d.,]+(?=[^\\d.,])");
    private static final Pattern NUMBER = Pattern.compile("[\\d.,]+");
    private static final Pattern ARTICLE = Pattern.compile(" \\p{Ll}{2}");
    private static final Pattern PARAMETER = Pattern.compile("ruleset parameter \\S+");

    private FormulaSymbols() {
    }

    /** The step's symbol without what follows it in brackets: {@code "V (ULS-1)"} is {@code V}. */
    static String base(String symbol) {
        int open = symbol.indexOf(" (");
        return open < 0 ? symbol : symbol.substring(0, open);
    }

    /** What follows the symbol in brackets (the case, the place), or empty. */
    static String qualifier(String symbol) {
        int open = symbol.indexOf(" (");
        return open < 0 ? "" : symbol.substring(open + 1);
    }

    /** The symbols of a formula, each once, in the order written; words the glossary lists are left out. */
    static List<String> in(String formula, Glossary glossary) {
        List<String> names = new ArrayList<>();
        Matcher m = NAME.matcher(PARAMETER.matcher(formula).replaceAll(" "));
        while (m.find()) {
            String name = trim(LEADING_NUMBER.matcher(m.group()).replaceFirst(""));
            if (!name.isEmpty() && !NUMBER.matcher(name).matches() && !glossary.isWord(name)
                    && !article(formula, m) && !names.contains(name)) {
                names.add(name);
            }
        }
        return names;
    }

    /** Whether the name is the article "a" of the formula's text ("of a pile centre"), not the symbol a. */
    private static boolean article(String formula, Matcher m) {
        return m.group().equals("a") && ARTICLE.matcher(formula).region(m.end(), formula.length()).lookingAt();
    }

    /** Without the commas, points and semicolons that end a clause of the formula's text. */
    private static String trim(String name) {
        int start = 0;
        int end = name.length();
        while (start < end && ",.;".indexOf(name.charAt(start)) >= 0) {
            start++;
        }
        while (end > start && ",.;".indexOf(name.charAt(end - 1)) >= 0) {
            end--;
        }
        return name.substring(start, end);
    }
}
