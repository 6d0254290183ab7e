package dev.countercheck.ruleset;

import com.ezylang.evalex.BaseException;
import com.ezylang.evalex.Expression;
import com.ezylang.evalex.config.ExpressionConfiguration;
import com.ezylang.evalex.data.EvaluationValue;
import com.ezylang.evalex.functions.FunctionIfc;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * The expressions of a ruleset, evaluated by EvalEx 3: arithmetic, comparisons, logic and the
 * library's standard functions (MAX, MIN, SQRT, IF, ABS ...), plus one function per table of the
 * ruleset. No access to Java objects: values in are numbers, text, booleans and lists of text.
 */
public final class RuleExpressions {

    private final ExpressionConfiguration configuration;
    private final Set<String> tables;

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
        Set<String> used = new TreeSet<>(e.getUsedVariables());
        used.removeAll(tables);
        return used;
    }

    /** Evaluates {@code expression} with {@code values} (Double, String, Boolean, or List of String). */
    public EvaluationValue evaluate(String expression, Map<String, Object> values) throws BaseException {
        Expression e = new Expression(expression, configuration);
        for (Map.Entry<String, Object> v : values.entrySet()) {
            Object value = v.getValue() instanceof Double d ? BigDecimal.valueOf(d) : v.getValue();
            e.with(v.getKey(), value);
        }
        return e.evaluate();
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
