package dev.countercheck.ruleset;

import com.ezylang.evalex.BaseException;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The names one check's expressions see, each given a slot once: the ruleset's parameters, {@code dir}, the
 * variables of the check's scope and its derived quantities; and its expressions compiled against those slots
 * ({@link CompiledExpression}), each with EvalEx behind it for what the compiled form does not answer; its
 * formulas and messages split at their names ({@link NamedText}), and the recalled values each formula uses. A run
 * of the check on one subject holds its values in a {@link Frame}. Built once per check and scope ({@link
 * RuleExpressions#layout}).
 *
 * <p>The values stand as they would in one map filled in this order, each name replacing an earlier of the same
 * spelling: the scope's variables, {@code dir}, the parameters, then each derived quantity as it is computed.
 */
public final class RuleLayout {

    private static final String DIR = "dir";
    private static final Pattern IDENTIFIER = Pattern.compile("[A-Za-z_][A-Za-z0-9_]*");

    private final RuleExpressions expressions;
    private final Map<String, Integer> slots = new HashMap<>();
    private final List<String> names = new ArrayList<>();
    /** The slots with the parameters' values filled in. */
    private final Object[] parameters;
    private final boolean[] isParameter;
    /** The scope's variables in the order it declares them, and their slots: a frame's values come in that order. */
    private final String[] declared;
    private final Integer[] declaredSlots;
    private final int dirSlot;
    private final Map<String, CompiledExpression> compiled = new HashMap<>();
    /** Each derived quantity's formula, in the check's order, and the remark naming the recalled values it uses. */
    private final NamedText[] formulas;
    private final String[] recalled;
    private final Map<String, NamedText> messages = new HashMap<>();

    RuleLayout(RuleExpressions expressions, CheckDef check, Iterable<String> variables,
               Map<String, Double> parameterValues) {
        this.expressions = expressions;
        parameterValues.keySet().forEach(this::slot);
        slot(DIR);
        this.dirSlot = slots.get(DIR);
        variables.forEach(this::slot);
        check.derived().forEach(d -> slot(d.name()));
        List<String> scope = new ArrayList<>();
        variables.forEach(scope::add);
        this.declared = scope.toArray(new String[0]);
        this.declaredSlots = new Integer[declared.length];
        for (int i = 0; i < declared.length; i++) {
            declaredSlots[i] = slots.get(declared[i]);
        }
        this.parameters = new Object[names.size()];
        this.isParameter = new boolean[names.size()];
        parameterValues.forEach((name, value) -> {
            parameters[slots.get(name)] = value;
            isParameter[slots.get(name)] = true;
        });
        List<String> texts = new ArrayList<>();
        check.appliesWhen().ifPresent(texts::add);
        check.derived().forEach(d -> texts.add(d.formula()));
        check.requirements().forEach(r -> {
            texts.add(r.that());
            r.utilisation().ifPresent(texts::add);
        });
        check.cautions().forEach(c -> texts.add(c.when()));
        for (String text : texts) {
            CompiledExpression c = expressions.compile(text, this::slotOf);
            if (c != null) {
                compiled.put(text, c);
            }
        }
        this.formulas = check.derived().stream().map(d -> new NamedText(d.formula(), NamedText.FORMULA_NAME, slots))
                .toArray(NamedText[]::new);
        this.recalled = check.derived().stream().map(d -> recalledIn(d.formula())).toArray(String[]::new);
        List<String> messageTexts = new ArrayList<>();
        messageTexts.add(check.notApplicable());
        check.requirements().forEach(r -> messageTexts.add(r.message()));
        check.cautions().forEach(c -> messageTexts.add(c.text()));
        messageTexts.forEach(m -> messages.computeIfAbsent(m, t -> new NamedText(t, NamedText.PLACEHOLDER, slots)));
    }

    /**
     * The remark for a formula that writes a parameter or table the ruleset marks as recalled from memory (every
     * name it writes but text literals, once each, in order); null when it writes none.
     */
    private String recalledIn(String formula) {
        Set<String> names = new LinkedHashSet<>();
        Matcher m = IDENTIFIER.matcher(formula);
        while (m.find()) {
            if ((m.start() == 0 || formula.charAt(m.start() - 1) != '"') && expressions.isRecalled(m.group())) {
                names.add(m.group());
            }
        }
        return names.isEmpty() ? null : String.join(", ", names) + " " + ValueSource.MARK;
    }

    private void slot(String name) {
        if (!slots.containsKey(name)) {
            slots.put(name, names.size());
            names.add(name);
        }
    }

    /**
     * The slot an expression's name reads, as EvalEx finds it among the values: the name as written, else the
     * one name that differs from it only in case; -1 when there is none or several (the evaluator then
     * resolves it). A slot without a value at the evaluation leaves it to the evaluator too.
     */
    private int slotOf(String name) {
        Integer exact = slots.get(name);
        if (exact != null) {
            return exact;
        }
        int found = -1;
        for (int i = 0; i < names.size(); i++) {
            if (names.get(i).equalsIgnoreCase(name)) {
                if (found >= 0) {
                    return -1;
                }
                found = i;
            }
        }
        return found;
    }

    /** The compiled form of one of the check's expressions; null when it is left to EvalEx. */
    CompiledExpression compiled(String expression) {
        return compiled.get(expression);
    }

    /** The formula of the check's derived quantity {@code index}, split at its names. */
    public NamedText formula(int index) {
        return formulas[index];
    }

    /** The remark naming the recalled values the formula of derived quantity {@code index} uses, if any. */
    public Optional<String> recalled(int index) {
        return Optional.ofNullable(recalled[index]);
    }

    /** One of the check's messages (not-applicable, requirements', cautions'), split at its placeholders. */
    public NamedText message(String text) {
        return messages.get(text);
    }

    /** A run of the check on one subject: {@code variables} are its scope's values for it. */
    public Frame frame(Map<String, Object> variables, String subject) {
        return new Frame(variables, subject);
    }

    /** The values of one run of the check. */
    public final class Frame {

        private final Object[] values = parameters.clone();
        /** Variables outside the layout (a scope that gives more than it declares); the evaluator takes these. */
        private Map<String, Object> extra;

        private Frame(Map<String, Object> variables, String subject) {
            int i = 0;
            for (Map.Entry<String, Object> e : variables.entrySet()) {
                String name = e.getKey();
                // The scope's values come in the order it declares its variables: the slot is then known.
                Integer slot = i < declared.length && name.equals(declared[i]) ? declaredSlots[i] : slots.get(name);
                i++;
                if (slot == null) {
                    extra = extra == null ? new HashMap<>() : extra;
                    extra.put(name, e.getValue());
                } else if (!isParameter[slot]) {
                    values[slot] = e.getValue();
                }
            }
            if (!isParameter[dirSlot]) {
                values[dirSlot] = subject;
            }
        }

        /** Sets a derived quantity, computed. */
        public void put(String derived, double value) {
            values[slots.get(derived)] = value;
        }

        /** The value of {@code name} as spelled, null when it has none. */
        public Object get(String name) {
            return get(slots.getOrDefault(name, -1), name);
        }

        /** The value of {@code name}, found at {@code slot} (-1: outside the layout); null when it has none. */
        Object get(int slot, String name) {
            return slot >= 0 ? values[slot] : extra == null ? null : extra.get(name);
        }

        /** A number result, or an exception naming the expression when it is not one. */
        public double number(String expression) throws BaseException {
            CompiledExpression c = compiled(expression);
            double v = c == null ? Double.NaN : c.number(values);
            return Double.isNaN(v) ? expressions.number(expression, asMap()) : v;
        }

        /** A boolean result, or an exception naming the expression when it is not one. */
        public boolean bool(String expression) throws BaseException {
            CompiledExpression c = compiled(expression);
            Boolean b = c == null ? null : c.bool(values);
            return b != null ? b : expressions.bool(expression, asMap());
        }

        private CompiledExpression compiled(String expression) {
            return extra == null ? compiled.get(expression) : null;
        }

        /** The values by slot, as the compiled expressions read them. */
        Object[] slots() {
            return values;
        }

        /** Every value by name, for EvalEx. */
        Map<String, Object> asMap() {
            Map<String, Object> map = extra == null ? new HashMap<>() : new HashMap<>(extra);
            for (int i = 0; i < values.length; i++) {
                if (values[i] != null) {
                    map.put(names.get(i), values[i]);
                }
            }
            return map;
        }
    }
}
