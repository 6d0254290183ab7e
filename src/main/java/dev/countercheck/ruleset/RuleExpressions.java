package dev.countercheck.ruleset;

import com.ezylang.evalex.BaseException;
import com.ezylang.evalex.Expression;
import com.ezylang.evalex.config.ExpressionConfiguration;
import com.ezylang.evalex.config.FunctionDictionaryIfc;
import com.ezylang.evalex.config.MapBasedFunctionDictionary;
import com.ezylang.evalex.data.EvaluationValue;
import com.ezylang.evalex.functions.FunctionIfc;
import com.ezylang.evalex.functions.basic.AbsFunction;
import com.ezylang.evalex.functions.basic.IfFunction;
import com.ezylang.evalex.functions.basic.MaxFunction;
import com.ezylang.evalex.functions.basic.MinFunction;
import com.ezylang.evalex.functions.basic.SqrtFunction;
import com.ezylang.evalex.parser.ParseException;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Supplier;
import java.util.function.ToIntFunction;

/**
 * The expressions of a ruleset, read and validated by EvalEx 3: arithmetic, comparisons, logic and the
 * library's standard functions (MAX, MIN, SQRT, IF, ABS ...), plus one function per table of the
 * ruleset. No access to Java objects: values in are numbers, text, booleans and lists of text.
 *
 * <p>Each expression is parsed once, the first time it is used. A check's runs go through its {@link
 * RuleLayout}: its expressions compiled to double arithmetic over slots ({@link CompiledExpression}), EvalEx
 * behind them for anything the compiled form does not answer. EvalEx evaluates with only the values of the
 * names an expression uses (names are case-insensitive, as EvalEx reads them); each thread keeps one copy of
 * each expression (they share the syntax tree) and binds its names anew for every evaluation.
 */
public final class RuleExpressions {

    private final ExpressionConfiguration configuration;
    private final Set<String> tables;
    private final Map<String, Double> parameterValues;
    /** The parameters and tables marked as recalled from memory, by name. */
    private final Set<String> recalled = new HashSet<>();
    private final Map<String, Parsed> parsed = new ConcurrentHashMap<>();
    /** The layout of each check for each scope, by their identity: built once, used for every element. */
    private final Map<LayoutKey, RuleLayout> layouts = new ConcurrentHashMap<>();
    /** This thread's copy of each expression, bound anew for each evaluation. */
    private final ThreadLocal<Map<String, Expression>> copies = ThreadLocal.withInitial(HashMap::new);

    RuleExpressions(Map<String, TableDef> tables, Map<String, Parameter> parameters) {
        List<Map.Entry<String, FunctionIfc>> functions = new ArrayList<>();
        tables.values().forEach(t -> functions.add(Map.entry(t.name(), new TableFunction(t))));
        @SuppressWarnings("unchecked")
        Map.Entry<String, FunctionIfc>[] array = functions.toArray(new Map.Entry[0]);
        this.configuration = ExpressionConfiguration.builder()
                .functionDictionary(offeredFunctions())
                .mathContext(MathContext.DECIMAL64)
                .structuresAllowed(false)
                .implicitMultiplicationAllowed(false)
                .build()
                .withAdditionalFunctions(array);
        this.tables = new TreeSet<>(String.CASE_INSENSITIVE_ORDER);
        this.tables.addAll(tables.keySet());
        Map<String, Double> values = new HashMap<>();
        parameters.forEach((name, p) -> values.put(name, p.value()));
        this.parameterValues = Map.copyOf(values);
        parameters.forEach((name, p) -> {
            if (p.source().recalled()) {
                recalled.add(name);
            }
        });
        tables.forEach((name, t) -> {
            if (t.source().recalled()) {
                recalled.add(name);
            }
        });
    }

    /** Whether a parameter or table of this name is marked as recalled from memory. */
    boolean isRecalled(String name) {
        return recalled.contains(name);
    }

    /**
     * The library functions a rule may call, by name, each as EvalEx's own function object. EvalEx's default
     * dictionary would build all its seventy-odd functions first; a call of any other is refused when the ruleset is
     * read ({@link ExpressionBounds}), so that none could be reached.
     */
    static final Map<String, Supplier<FunctionIfc>> OFFERED = Map.of("IF", IfFunction::new, "MAX", MaxFunction::new,
            "MIN", MinFunction::new, "ABS", AbsFunction::new, "SQRT", SqrtFunction::new);

    /** A new dictionary of the {@link #OFFERED} functions, to which the tables are added. */
    static FunctionDictionaryIfc offeredFunctions() {
        FunctionDictionaryIfc functions = new MapBasedFunctionDictionary();
        OFFERED.forEach((name, function) -> functions.addFunction(name, function.get()));
        return functions;
    }

    /**
     * The names and compiled expressions of {@code check} run with the variables of {@code scope}, made the
     * first time they are asked for.
     */
    public RuleLayout layout(CheckDef check, Map<String, Variable> scope) {
        return layouts.computeIfAbsent(new LayoutKey(check, scope),
                k -> new RuleLayout(this, check, scope.keySet(), parameterValues));
    }

    /** A check and a scope, compared by identity (hashing the records' contents costs more than the lookup saves). */
    private record LayoutKey(CheckDef check, Map<String, Variable> scope) {
        @Override
        public boolean equals(Object o) {
            return o instanceof LayoutKey k && k.check == check && k.scope == scope;
        }

        @Override
        public int hashCode() {
            return 31 * System.identityHashCode(check) + System.identityHashCode(scope);
        }
    }

    /** EvalEx's configuration: its decimals, the library's functions and the tables. */
    ExpressionConfiguration configuration() {
        return configuration;
    }

    /** {@code expression} compiled with its names in the slots {@code slotOf} gives; null when not compiled. */
    CompiledExpression compile(String expression, ToIntFunction<String> slotOf) {
        try {
            return CompiledExpression.of(parse(expression).expression().getAbstractSyntaxTree(), slotOf,
                    configuration);
        } catch (ParseException e) {
            return null;
        }
    }

    /** The variable names an expression uses (table function names excluded); throws on a syntax error. */
    Set<String> variablesOf(String expression) throws BaseException {
        Set<String> used = new TreeSet<>(parse(expression).variables());
        used.removeAll(tables);
        return used;
    }

    /**
     * Evaluates {@code expression} with {@code values} (Double or BigDecimal, String, Boolean, or List of
     * String). A name without a value is left unbound, and the evaluator says so.
     */
    public EvaluationValue evaluate(String expression, Map<String, Object> values) throws BaseException {
        Parsed p = parse(expression);
        List<String> names = p.variables();
        Object[] bound = new Object[names.size()];
        for (int i = 0; i < bound.length; i++) {
            String key = keyOf(names.get(i), values);
            if (key == null) {
                return unbound(p, values);
            }
            Object value = values.get(key);
            bound[i] = value instanceof Double d ? BigDecimal.valueOf(d) : value;
        }
        Map<String, Expression> mine = copies.get();
        Expression e = mine.get(expression);
        if (e == null) {
            e = p.expression().copy();
            mine.put(expression, e);
        }
        for (int i = 0; i < bound.length; i++) {
            e.with(names.get(i), bound[i]);
        }
        return e.evaluate();
    }

    /** An evaluation in which some name has no value: on a fresh copy, so that no earlier value stands in. */
    private static EvaluationValue unbound(Parsed p, Map<String, Object> values) throws BaseException {
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
    double number(String expression, Map<String, Object> values) throws BaseException {
        EvaluationValue v = evaluate(expression, values);
        if (!v.isNumberValue()) {
            throw new IllegalArgumentException("'" + expression + "' does not give a number");
        }
        return v.getNumberValue().doubleValue();
    }

    /** A boolean result, or an exception naming the expression when it is not one. */
    boolean bool(String expression, Map<String, Object> values) throws BaseException {
        EvaluationValue v = evaluate(expression, values);
        if (!v.isBooleanValue()) {
            throw new IllegalArgumentException("'" + expression + "' is not a condition (true or false)");
        }
        return v.getBooleanValue();
    }
}
