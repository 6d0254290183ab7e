package dev.countercheck.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A ruleset's expression written in the notation of the other derivation steps, for the report only (the JSON keeps
 * the ruleset's own expression). Each name becomes its symbol ({@code phi} φ, {@code as_min_coefficient} stays as
 * it is when it has none), {@code *} becomes ·, {@code - <= >= != ==} become − ≤ ≥ ≠ =, {@code ||} and {@code &&}
 * "or" and "and", {@code MAX(a, b)} max(a; b), {@code MIN} min, {@code ABS(x)} |x|, {@code SQRT(x)} √(x), a table's
 * lookup its symbol with the arguments after it, and {@code IF(c, a, b)} "a if c, else b", in brackets wherever it
 * is part of something larger. Brackets are written where the order of operations needs them, and always around an
 * "and" inside an "or"; a quoted text, a list ([XC2]), true and false stay as written. The same rendering serves the
 * formula and the formula with its values, which the rule engine writes in the same syntax.
 */
final class RuleNotation {


    /** The precedence of each kind of node, loosest first. */
    private static final int CONDITIONAL = 0;
    private static final int OR = 1;
    private static final int AND = 2;
    private static final int COMPARE = 3;
    private static final int SUM = 4;
    private static final int PRODUCT = 5;
    private static final int UNARY = 6;
    private static final int POWER = 7;
    private static final int ATOM = 8;

    private static final List<String> TWO_CHARACTER_OPERATORS = List.of("||", "&&", "<=", ">=", "==", "!=");
    private static final List<String> COMPARISONS = List.of("<=", ">=", "==", "!=", "<", ">");
    private static final Memo<Optional<Node>> FORMULAS = new Memo<>(RuleNotation::parse, 4096);

    private final Map<String, String> symbols;

    /** @param symbols the symbol of each name that has one */
    RuleNotation(Map<String, String> symbols) {
        this.symbols = symbols;
    }

    /** The expression in the report's notation, or empty when it is not written in the rules' syntax. */
    Optional<String> render(String expression) {
        return parse(expression).map(this::text);
    }

    /** A parsed expression in the report's notation. */
    String text(Node expression) {
        return expression.text(this);
    }

    /** The names an expression writes (variables, parameters, tables), each once, in order; none when it is not one. */
    static List<String> names(String expression) {
        return parse(expression).map(RuleNotation::names).orElse(List.of());
    }

    /** The names a parsed expression writes, each once, in order. */
    static List<String> names(Node expression) {
        List<String> names = new ArrayList<>();
        expression.collect(names);
        return names;
    }

    /**
     * {@link #parse} of a rule's formula, kept: the trees are immutable and every element's step of the same rule
     * has the same formula (the substituted text, which differs, is parsed each time).
     */
    static Optional<Node> parsedFormula(String formula) {
        return FORMULAS.get(formula);
    }

    /** The symbol the report writes for {@code name}, or the name itself when it has none. */
    String symbol(String name) {
        return symbols.getOrDefault(name, name);
    }

    static Optional<Node> parse(String expression) {
        List<String> tokens = tokens(expression);
        if (tokens == null || tokens.isEmpty()) {
            return Optional.empty();
        }
        Parser p = new Parser(tokens);
        try {
            Node node = p.conditional();
            return p.at == tokens.size() ? Optional.of(node) : Optional.empty();
        } catch (IllegalArgumentException | IndexOutOfBoundsException e) {
            return Optional.empty();
        }
    }

    /**
     * The tokens of the expression, or null when something in it is not a token of the rules' syntax: numbers
     * ({@code 12}, {@code 0.5}, {@code 2e-3}), names, quoted texts, lists ({@code [XC2, XD1]}) and the operators
     * {@code || && <= >= == != - + * / ^ < > ( ) , !}, with spaces between them.
     */
    static List<String> tokens(String expression) {
        List<String> tokens = new ArrayList<>();
        int length = expression.length();
        int at = 0;
        while (at < length) {
            int start = at;
            while (start < length && isSpace(expression.charAt(start))) {
                start++;
            }
            int end = start < length ? tokenEnd(expression, start) : -1;
            if (end < 0) {
                return expression.substring(at).isBlank() ? tokens : null;
            }
            tokens.add(expression.substring(start, end));
            at = end;
        }
        return tokens;
    }

    /** Where the token starting at {@code start} ends, or -1 when none starts there. */
    private static int tokenEnd(String s, int start) {
        char c = s.charAt(start);
        if (isDigit(c)) {
            int end = digits(s, start);
            if (end + 1 < s.length() && s.charAt(end) == '.' && isDigit(s.charAt(end + 1))) {
                end = digits(s, end + 1);
            }
            if (end < s.length() && (s.charAt(end) == 'e' || s.charAt(end) == 'E')) {
                int exponent = end + 1;
                if (exponent < s.length() && (s.charAt(exponent) == '+' || s.charAt(exponent) == '-')) {
                    exponent++;
                }
                if (exponent < s.length() && isDigit(s.charAt(exponent))) {
                    end = digits(s, exponent);
                }
            }
            return end;
        }
        if (isLetter(c) || c == '_') {
            int end = start + 1;
            while (end < s.length() && (isLetter(s.charAt(end)) || isDigit(s.charAt(end)) || s.charAt(end) == '_')) {
                end++;
            }
            return end;
        }
        if (c == '"') {
            int close = s.indexOf('"', start + 1);
            return close < 0 ? -1 : close + 1;
        }
        if (c == '[') {
            for (int i = start + 1; i < s.length(); i++) {
                char d = s.charAt(i);
                if (d == ']') {
                    return i + 1;
                }
                if (d == '[' || d == '"') {
                    return -1;
                }
            }
            return -1;
        }
        if (start + 1 < s.length() && TWO_CHARACTER_OPERATORS.contains(s.substring(start, start + 2))) {
            return start + 2;
        }
        return "-+*/^<>(),!".indexOf(c) >= 0 ? start + 1 : -1;
    }

    private static int digits(String s, int from) {
        int end = from;
        while (end < s.length() && isDigit(s.charAt(end))) {
            end++;
        }
        return end;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static boolean isLetter(char c) {
        return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z';
    }

    /** The white space between tokens: space, tab, the line breaks, form feed, vertical tab. */
    private static boolean isSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\013' || c == '\f' || c == '\r';
    }

    /** A node of the expression's tree. */
    sealed interface Node {
        int precedence();

        String text(RuleNotation notation);

        default void collect(List<String> names) {
        }
    }

    /** A number, a quoted text, a list, true or false: written as it is. */
    record Literal(String text) implements Node {
        public int precedence() {
            return ATOM;
        }

        public String text(RuleNotation notation) {
            return text;
        }
    }

    /** A name: its symbol, in brackets when the symbol is itself an expression ({@code z/d}). */
    record Name(String name) implements Node {
        public int precedence() {
            return ATOM;
        }

        public String text(RuleNotation notation) {
            String symbol = notation.symbol(name);
            return isExpression(symbol) ? "(" + symbol + ")" : symbol;
        }

        private static boolean isExpression(String symbol) {
            for (int i = 0; i < symbol.length(); i++) {
                if ("/·+−".indexOf(symbol.charAt(i)) >= 0) {
                    return true;
                }
            }
            return false;
        }

        @Override
        public void collect(List<String> names) {
            if (!names.contains(name)) {
                names.add(name);
            }
        }
    }

    record Negation(String operator, Node operand) implements Node {
        public int precedence() {
            return UNARY;
        }

        public String text(RuleNotation notation) {
            return (operator.equals("-") ? "−" : "not ") + bracketed(operand, UNARY, notation);
        }

        @Override
        public void collect(List<String> names) {
            operand.collect(names);
        }
    }

    record Binary(String operator, Node left, Node right) implements Node {
        public int precedence() {
            return switch (operator) {
                case "||" -> OR;
                case "&&" -> AND;
                case "+", "-" -> SUM;
                case "*", "/" -> PRODUCT;
                case "^" -> POWER;
                default -> COMPARE;
            };
        }

        public String text(RuleNotation notation) {
            int p = precedence();
            if (operator.equals("^")) {
                String exponent = right instanceof Literal ? right.text(notation) : "(" + right.text(notation) + ")";
                return bracketed(left, ATOM, notation) + "^" + exponent;
            }
            boolean strictRight = switch (operator) {
                case "-", "/" -> true;
                default -> p == COMPARE;
            };
            String l = bracketed(left, operator.equals("||") && !isOr(left) ? AND + 1 : p, notation);
            String r = right instanceof Negation ? "(" + right.text(notation) + ")"
                    : bracketed(right, operator.equals("||") ? AND + 1 : strictRight ? p + 1 : p, notation);
            return l + symbol() + r;
        }

        private static boolean isOr(Node node) {
            return node instanceof Binary b && b.operator.equals("||");
        }

        private String symbol() {
            return switch (operator) {
                case "||" -> " or ";
                case "&&" -> " and ";
                case "*" -> "·";
                case "/" -> "/";
                case "-" -> " − ";
                case "<=" -> " ≤ ";
                case ">=" -> " ≥ ";
                case "!=" -> " ≠ ";
                case "==" -> " = ";
                default -> " " + operator + " ";
            };
        }

        @Override
        public void collect(List<String> names) {
            left.collect(names);
            right.collect(names);
        }
    }

    /** A function of the rules (MAX, MIN, ABS, SQRT) or a table's lookup. */
    record Call(String function, List<Node> arguments) implements Node {
        public int precedence() {
            return ATOM;
        }

        public String text(RuleNotation notation) {
            List<String> args = arguments.stream().map(a -> bracketed(a, OR, notation)).toList();
            return switch (function) {
                case "MAX", "MIN" -> function.toLowerCase() + "(" + String.join("; ", args) + ")";
                case "ABS" -> "|" + String.join("; ", args) + "|";
                case "SQRT" -> "√(" + String.join("; ", args) + ")";
                default -> new Name(function).text(notation) + "(" + String.join("; ", args) + ")";
            };
        }

        @Override
        public void collect(List<String> names) {
            if (!function.equals(function.toUpperCase()) && !names.contains(function)) {
                names.add(function);
            }
            arguments.forEach(a -> a.collect(names));
        }
    }

    /** IF(condition, then, otherwise). */
    record Conditional(Node condition, Node then, Node otherwise) implements Node {
        public int precedence() {
            return CONDITIONAL;
        }

        public String text(RuleNotation notation) {
            return bracketed(then, OR, notation) + " if " + bracketed(condition, OR, notation) + ", else "
                    + bracketed(otherwise, OR, notation);
        }

        @Override
        public void collect(List<String> names) {
            condition.collect(names);
            then.collect(names);
            otherwise.collect(names);
        }
    }

    /** The node's text, in brackets when it binds more loosely than {@code least}. */
    private static String bracketed(Node node, int least, RuleNotation notation) {
        String text = node.text(notation);
        return node.precedence() < least ? "(" + text + ")" : text;
    }

    /** Recursive descent over the rules' syntax: IF, ||, &&, comparisons, + -, * /, unary - and !, ^, calls. */
    private static final class Parser {
        private final List<String> tokens;
        private int at;

        Parser(List<String> tokens) {
            this.tokens = tokens;
        }

        Node conditional() {
            return or();
        }

        private Node or() {
            Node node = and();
            while (accept("||")) {
                node = new Binary("||", node, and());
            }
            return node;
        }

        private Node and() {
            Node node = comparison();
            while (accept("&&")) {
                node = new Binary("&&", node, comparison());
            }
            return node;
        }

        private Node comparison() {
            Node node = sum();
            for (String op : COMPARISONS) {
                if (accept(op)) {
                    return new Binary(op, node, sum());
                }
            }
            return node;
        }

        private Node sum() {
            Node node = product();
            while (peek("+") || peek("-")) {
                String op = tokens.get(at++);
                node = new Binary(op, node, product());
            }
            return node;
        }

        private Node product() {
            Node node = unary();
            while (peek("*") || peek("/")) {
                String op = tokens.get(at++);
                node = new Binary(op, node, unary());
            }
            return node;
        }

        private Node unary() {
            if (accept("-")) {
                return new Negation("-", unary());
            }
            if (accept("!")) {
                return new Negation("!", unary());
            }
            return power();
        }

        private Node power() {
            Node node = atom();
            if (accept("^")) {
                return new Binary("^", node, unary());
            }
            return node;
        }

        private Node atom() {
            String token = tokens.get(at++);
            if (token.equals("(")) {
                Node inner = conditional();
                expect(")");
                return inner;
            }
            char first = token.charAt(0);
            if (Character.isDigit(first) || first == '"' || first == '[') {
                return new Literal(token);
            }
            if (!Character.isLetter(first) && first != '_') {
                throw new IllegalArgumentException("unexpected " + token);
            }
            if (token.equals("true") || token.equals("false")) {
                return new Literal(token);
            }
            if (!accept("(")) {
                return new Name(token);
            }
            List<Node> arguments = new ArrayList<>();
            if (!accept(")")) {
                do {
                    arguments.add(conditional());
                } while (accept(","));
                expect(")");
            }
            if (token.equals("IF")) {
                if (arguments.size() != 3) {
                    throw new IllegalArgumentException("IF takes three arguments");
                }
                return new Conditional(arguments.get(0), arguments.get(1), arguments.get(2));
            }
            return new Call(token, List.copyOf(arguments));
        }

        private boolean peek(String token) {
            return at < tokens.size() && tokens.get(at).equals(token);
        }

        private boolean accept(String token) {
            if (peek(token)) {
                at++;
                return true;
            }
            return false;
        }

        private void expect(String token) {
            if (!accept(token)) {
                throw new IllegalArgumentException("expected " + token);
            }
        }
    }
}
