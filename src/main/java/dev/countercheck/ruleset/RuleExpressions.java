package dev.countercheck.ruleset;

import com.ezylang.evalex.BaseException;
import com.ezylang.evalex.Expression;
import com.ezylang.evalex.config.ExpressionConfiguration;
import com.ezylang.evalex.data.EvaluationValue;
import com.ezylang.evalex.functions.FunctionIfc;
import com.ezylang.evalex.parser.ParseException;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The expressions of a ruleset, evaluated by EvalEx 3: arithmetic, comparisons, logic and the
 * library's standard functions (MAX, MIN, SQRT, IF, ABS ...), plus one function per table of the
 * ruleset. No access to Java objects: values in are numbers, text, booleans and lists of text.
 *
 * <p>Each expression is parsed once, the first time it is used, and evaluated with only the values
 * of the names it uses (names are case-insensitive, as EvalEx reads them).
 */
public final class RuleExpressions {

    private final ExpressionConfiguration configuration;
    private final Set<String> tables;
    private final Map<String, Parsed> parsed = new ConcurrentHashMap<>();

    RuleExpressions(Map<String, TableDef> tables) {
        List<Map.Entry<String, FunctionIfc>> functions = new ArrayList<>();
        tables.values().forEach(t -> functions.add(Map.entry(t.name(), new TableFunction(t))));
        @SuppressWarnings("unchecked")
        Map.Entry<String, FunctionIfc>[] array = functions.toArray(new Map.Entry[0]);
        this.configuration = ExpressionConfiguration.builder()
                .mathContext(MathContext.DECIMAL64)
                .structuresAllowed(false)
                .implicitMultiplicationAllowed(false)
                .build()
                .withAdditionalFunctions(array);
        this.tables = new TreeSet<>(String.CASE_INSENSITIVE_ORDER);
        this.tables.addAll(tables.keySet());
    }

    /** The variable names an expression uses (table function names excluded); throws on a syntax error. */
    Set<String> variablesOf(String expression) throws BaseException {
        Expression e = new Expression(expression, configuration);
        e.validate();
        Set<String> used = new TreeSet<>(parse(expression).variables());
        used.removeAll(tables);
        return used;
    }

    /** Evaluates {@code expression} with {@code values} (Double, String, Boolean, or List of String). */
    public EvaluationValue evaluate(String expression, Map<String, Object> values) throws BaseException {
        Parsed p = parse(expression);
        Expression e = p.expression().copy();
        for (String name : p.variables()) {
            String key = keyOf(name, values);
            if (key != null) {
                Object value = values.get(key);
                e.with(name, value instanceof Double d ? BigDecimal.valueOf(d) : value);
            }
        }
        return e.evaluate();
    }

    private Parsed parse(String expression) throws ParseException {
        Parsed p = parsed.get(expression);
        if (p == null) {
            Expression e = new Expression(expression, configuration);
            e.getAbstractSyntaxTree();
            p = new Parsed(e, List.copyOf(e.getUsedVariables()));
            parsed.put(expression, p);
        }
        return p;
    }

    /** The key of {@code values} that {@code name} stands for, as written or else ignoring case; null when none. */
    private static String keyOf(String name, Map<String, Object> values) {
        if (values.containsKey(name)) {
            return name;
        }
        for (String key : values.keySet()) {
            if (key.equalsIgnoreCase(name)) {
                return key;
            }
        }
        return null;
    }

    /** A parsed expression (its syntax tree is shared by every copy) and the variable names it uses. */
    private record Parsed(Expression expression, List<String> variables) {
    }

    /** A number result, or an exception naming the expression when it is not one. */
    public double number(String expression, Map<String, Object> values) throws BaseException {
        EvaluationValue v = evaluate(expression, values);
        if (!v.isNumberValue()) {
            throw new IllegalArgumentException("'" + expression + "' does not give a number");
        }
        return v.getNumberValue().doubleValue();
    }

    /** A boolean result, or an exception naming the expression when it is not one. */
    public boolean bool(String expression, Map<String, Object> values) throws BaseException {
        EvaluationValue v = evaluate(expression, values);
        if (!v.isBooleanValue()) {
            throw new IllegalArgumentException("'" + expression + "' is not a condition (true or false)");
        }
        return v.getBooleanValue();
    }
}
