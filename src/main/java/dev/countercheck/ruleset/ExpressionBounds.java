package dev.countercheck.ruleset;

import java.util.Collections;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Bounds on the size and cost of a rule expression, checked on its text when a ruleset is read,
 * before the evaluator parses it: a long chain of operators or a deep nesting of parentheses
 * would make the evaluator recurse past its stack, and some library functions cost time without
 * bound ({@code FACT(1e8)} multiplies a hundred million times; {@code ROUND(x, 1e6)}, {@code
 * 2^999999999} and {@code SQRT(1e300000)} take seconds in decimal arithmetic). So an expression may
 * call only a few library functions, write no number above a million, and raise only to a power
 * written as a number of at most 10 ({@code ^ 0.5}, {@code ^ (1/3)}). The rulesets' longest
 * expression has some 120 characters, 25 tokens and 3 levels of parentheses, its largest number is
 * 235 and its one power is {@code ^ 0.5}; the bounds are several times that (common practice).
 */
final class ExpressionBounds {

    static final int MAX_CHARACTERS = 1000;
    /** Names, numbers, texts and operators; the evaluator's tree has at most this many nodes. */
    static final int MAX_TOKENS = 200;
    static final int MAX_NESTING = 20;
    /** The library functions a rule may call ({@link RuleExpressions#OFFERED}); the ruleset's tables are functions too. */
    static final Set<String> FUNCTIONS = RuleExpressions.OFFERED.keySet();
    static final double MAX_NUMBER = 1e6;
    static final double MAX_EXPONENT = 10;

    /**
     * The names of EvalEx's library functions (EvalEx 3.6; {@code ExpressionBoundsTest} holds the list to EvalEx's
     * own dictionary), any case: a call of one of them outside {@link #FUNCTIONS} is refused here. Named rather
     * than asked of EvalEx, whose library builds its seventy-odd function objects, each reading its annotations,
     * a noticeable part of reading a ruleset at start-up; the rules' evaluator holds only {@link #FUNCTIONS}.
     */
    static final Set<String> LIBRARY = caseInsensitive("ABS", "AVERAGE", "CEILING", "COALESCE", "FACT", "FLOOR", "IF",
            "LOG", "LOG10", "MAX", "MIN", "NOT", "RANDOM", "ROUND", "SQRT", "SUM", "SWITCH",
            "ACOS", "ACOSH", "ACOSR", "ACOT", "ACOTH", "ACOTR", "ASIN", "ASINH", "ASINR", "ATAN", "ATAN2", "ATAN2R",
            "ATANH", "ATANR", "COS", "COSH", "COSR", "COT", "COTH", "COTR", "CSC", "CSCH", "CSCR", "DEG", "RAD", "SIN",
            "SINH", "SINR", "SEC", "SECH", "SECR", "TAN", "TANH", "TANR",
            "STR_CONTAINS", "STR_ENDS_WITH", "STR_FORMAT", "STR_LEFT", "STR_LENGTH", "STR_LOWER", "STR_MATCHES",
            "STR_RIGHT", "STR_SPLIT", "STR_STARTS_WITH", "STR_SUBSTRING", "STR_TRIM", "STR_UPPER",
            "DT_DATE_NEW", "DT_DATE_PARSE", "DT_DATE_FORMAT", "DT_DATE_TO_EPOCH", "DT_DURATION_NEW",
            "DT_DURATION_FROM_MILLIS", "DT_DURATION_TO_MILLIS", "DT_DURATION_PARSE", "DT_NOW", "DT_TODAY");
    private static final String NUMBER = "\\d[\\d.]*(?:[eE][+-]?\\d+)?";
    private static final Pattern TOKEN = Pattern.compile(
            "\\s*(?:(?<name>[A-Za-z_][A-Za-z0-9_.]*)(?<call>\\s*\\()?|(?<number>" + NUMBER + ")|\"[^\"]*\"|'[^']*'"
                    + "|(?<other>\\S))");
    /** What may follow {@code ^}: a number, or numbers and arithmetic in parentheses. */
    private static final Pattern EXPONENT = Pattern.compile("\\s*(?:" + NUMBER + "|\\((?:\\s|" + NUMBER
            + "|[-+*/])*\\))");
    private static final Pattern NUMBERS = Pattern.compile(NUMBER);

    private ExpressionBounds() {
    }

    /** Why {@code expression} is refused, or empty when it lies within the bounds. */
    static Optional<String> problem(String expression) {
        if (expression.length() > MAX_CHARACTERS) {
            return Optional.of("the expression has " + expression.length() + " characters, more than the "
                    + MAX_CHARACTERS + " a rule may have");
        }
        Matcher m = TOKEN.matcher(expression);
        int tokens = 0;
        int depth = 0;
        for (int at = 0; at < expression.length() && m.find(at) && m.start() == at && m.end() > at; at = m.end()) {
            if (m.group().isBlank()) {
                break;
            }
            if (++tokens > MAX_TOKENS) {
                return Optional.of("the expression has more than " + MAX_TOKENS + " names, numbers and operators:"
                        + " split it into derived quantities");
            }
            String other = m.group("other");
            String call = m.group("call");
            depth += "(".equals(other) || call != null ? 1 : ")".equals(other) ? -1 : 0;
            if (depth > MAX_NESTING) {
                return Optional.of("the expression nests parentheses and calls deeper than " + MAX_NESTING
                        + " levels");
            }
            if (m.group("number") != null && !(number(m.group("number")) <= MAX_NUMBER)) {
                return Optional.of("the number " + m.group("number") + " is larger than any a rule needs (at most "
                        + (long) MAX_NUMBER + ")");
            }
            if ("^".equals(other) && !smallExponent(expression, m.end())) {
                return Optional.of("a power is raised only to a number of at most " + (long) MAX_EXPONENT
                        + " written out (^ 0.5, ^ (1/3)), so that it cannot take unbounded time");
            }
            String name = m.group("name");
            if (call != null && LIBRARY.contains(name) && !FUNCTIONS.contains(name.toUpperCase(Locale.ROOT))) {
                return Optional.of("the function " + name + " is not offered to rules; they may call "
                        + String.join(", ", new TreeSet<>(FUNCTIONS)) + " and the ruleset's tables");
            }
        }
        return Optional.empty();
    }

    private static Set<String> caseInsensitive(String... names) {
        Set<String> set = new TreeSet<>(String.CASE_INSENSITIVE_ORDER);
        set.addAll(Set.of(names));
        return Collections.unmodifiableSet(set);
    }

    private static boolean smallExponent(String expression, int from) {
        Matcher exponent = EXPONENT.matcher(expression).region(from, expression.length());
        if (!exponent.lookingAt()) {
            return false;
        }
        Matcher numbers = NUMBERS.matcher(exponent.group());
        while (numbers.find()) {
            if (!(number(numbers.group()) <= MAX_EXPONENT)) {
                return false;
            }
        }
        return true;
    }

    /** The value of a number as written; NaN when it is not one (1.2.3), which fails every bound. */
    private static double number(String text) {
        try {
            return Double.parseDouble(text);
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
