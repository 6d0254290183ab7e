package dev.countercheck.report;

import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.report.HtmlModel.Definition;
import dev.countercheck.report.HtmlModel.StepView;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A check's trace as a numbered derivation: each step names its quantity in words, and every symbol is defined
 * where it first appears in the check's derivation: the step's own symbol by the quantity's name, the symbols
 * of its formula by a definition under the line. The meanings come from the {@link Glossary}, and a name a
 * rule's formula writes from the ruleset's own declarations. Built when the report is rendered, never during
 * the review.
 */
final class Derivation {

    private static final String PARAMETER_PREFIX = "ruleset parameter ";
    private static final Pattern PARAMETER = Pattern.compile(PARAMETER_PREFIX + "\\S+");
    private static final Pattern PARAMETER_VALUE = Pattern.compile("(\\S+) (\\(.+\\))");

    private final Glossary glossary;
    private final Map<String, String> rulesetNames;
    private final RuleNotation notation;

    /**
     * @param rulesetNames what each name a rule's formula may write means ({@code <element type>/<name>} for a
     *                     kind's scope variable)
     * @param ruleSymbols  the symbol of each such name that has one
     */
    Derivation(Glossary glossary, Map<String, String> rulesetNames, Map<String, String> ruleSymbols) {
        this.glossary = glossary;
        this.rulesetNames = rulesetNames;
        this.notation = new RuleNotation(ruleSymbols);
    }

    /**
     * The steps of the trace of check {@code checkId} of an element of {@code elementType}, numbered from 1, anchored
     * {@code <anchor>-s<n>}.
     */
    List<StepView> of(String elementType, String checkId, List<Step> trace, String anchor) {
        Map<String, String> defined = new HashMap<>();
        List<StepView> steps = new ArrayList<>(trace.size());
        for (int i = 0; i < trace.size(); i++) {
            Step step = trace.get(i);
            String name = FormulaSymbols.base(step.symbol());
            boolean fromRule = step.fromRule();
            String symbol = fromRule || name.indexOf('_') >= 0 ? notation.symbol(name) : name;
            Optional<String> quantity = meaning(symbol, elementType, checkId).or(() -> named(elementType, name));
            boolean definesSymbol = quantity.isPresent() && !quantity.get().equals(defined.get(symbol));
            quantity.ifPresent(q -> defined.put(symbol, q));
            List<String> uses = new ArrayList<>();
            uses.add(symbol);
            List<Definition> where = new ArrayList<>();
            Optional<RuleNotation.Node> rule = fromRule ? RuleNotation.parsedFormula(step.formula()) : Optional.empty();
            if (rule.isPresent()) {
                defineRuleNames(RuleNotation.names(rule.get()), symbol, elementType, defined, uses, where);
            } else {
                defineSymbols(step.formula(), symbol, elementType, checkId, defined, uses, where);
            }
            String formula = rule.map(notation::text).orElse(step.formula());
            String substituted = rule.isPresent()
                    ? notation.render(step.substituted()).orElse(step.substituted()) : step.substituted();
            String value = ReportNumbers.display(step.value(), step.unit());
            if (formula.startsWith(PARAMETER_PREFIX) && PARAMETER.matcher(formula).matches()) {
                Matcher parameter = PARAMETER_VALUE.matcher(substituted);
                if (parameter.matches()) {
                    formula = formula + " " + parameter.group(2);
                    substituted = parameter.group(1);
                }
            }
            if (substituted.equals(formula) || substituted.equals(value) || substituted.equals(Num.f(step.value()))) {
                substituted = "";
            }
            steps.add(new StepView(anchor + "-s" + (i + 1), i + 1, step.symbol(), symbol,
                    FormulaSymbols.qualifier(step.symbol()), quantity.orElse(""), definesSymbol, formula,
                    substituted, value, ReportNumbers.unit(step.unit()),
                    step.clause(), step.remark().orElse(""), List.copyOf(where), String.join("|", uses)));
        }
        return steps;
    }

    /** The symbols of a formula the code wrote, each defined by the glossary (or the ruleset) at its first use. */
    private void defineSymbols(String formula, String symbol, String elementType, String checkId,
                               Map<String, String> defined, List<String> uses, List<Definition> where) {
        for (String name : glossary.symbolsIn(formula)) {
            if (name.equals(symbol)) {
                continue;
            }
            uses.add(name);
            Optional<String> meaning = meaning(name, elementType, checkId);
            if (meaning.isPresent() && !meaning.get().equals(defined.get(name))) {
                defined.put(name, meaning.get());
                where.add(new Definition(name, meaning.get()));
            }
        }
    }

    /**
     * The names of a rule's formula ({@code names}), each written as its symbol and defined by the ruleset's declaration at its
     * first use, unless an earlier step defined that symbol already (a derived quantity by its own step).
     */
    private void defineRuleNames(List<String> names, String symbol, String elementType, Map<String, String> defined,
                                 List<String> uses, List<Definition> where) {
        for (String name : names) {
            String shown = notation.symbol(name);
            if (shown.equals(symbol) || uses.contains(shown)) {
                continue;
            }
            uses.add(shown);
            Optional<String> meaning = named(elementType, name);
            if (meaning.isPresent() && !defined.containsKey(shown)) {
                defined.put(shown, meaning.get());
                where.add(new Definition(shown, meaning.get()));
            }
        }
    }

    private Optional<String> meaning(String symbol, String elementType, String checkId) {
        return glossary.meaning(symbol, elementType, checkId).or(() -> named(elementType, symbol));
    }

    /** What a rule's name means for an element of {@code elementType}: as its kind's scopes describe it, else as declared. */
    private Optional<String> named(String elementType, String name) {
        return Optional.ofNullable(rulesetNames.getOrDefault(elementType + "/" + name, rulesetNames.get(name)));
    }
}
