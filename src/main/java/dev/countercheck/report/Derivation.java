package dev.countercheck.report;

import dev.countercheck.eurocode.Step;
import dev.countercheck.report.HtmlModel.Definition;
import dev.countercheck.report.HtmlModel.StepView;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A check's trace as a numbered derivation: each step names its quantity in words, and every symbol is defined
 * where it first appears in the check's derivation: the step's own symbol by the quantity's name, the symbols
 * of its formula by a definition under the line. The meanings come from the {@link Glossary}, and a name a
 * rule's formula writes from the ruleset's own declarations. Built when the report is rendered, never during
 * the review.
 */
final class Derivation {

    private final Glossary glossary;
    private final Map<String, String> rulesetNames;

    Derivation(Glossary glossary, Map<String, String> rulesetNames) {
        this.glossary = glossary;
        this.rulesetNames = rulesetNames;
    }

    /** The steps of check {@code checkId}'s trace, numbered from 1, anchored {@code <anchor>-s<n>}. */
    List<StepView> of(String checkId, List<Step> trace, String anchor) {
        Map<String, String> defined = new HashMap<>();
        List<StepView> steps = new ArrayList<>(trace.size());
        for (int i = 0; i < trace.size(); i++) {
            Step step = trace.get(i);
            String symbol = FormulaSymbols.base(step.symbol());
            Optional<String> quantity = meaning(symbol, checkId);
            boolean definesSymbol = quantity.isPresent() && !quantity.get().equals(defined.get(symbol));
            quantity.ifPresent(q -> defined.put(symbol, q));
            List<String> uses = new ArrayList<>();
            uses.add(symbol);
            List<Definition> where = new ArrayList<>();
            for (String name : FormulaSymbols.in(step.formula(), glossary)) {
                if (name.equals(symbol)) {
                    continue;
                }
                uses.add(name);
                Optional<String> meaning = meaning(name, checkId);
                if (meaning.isPresent() && !meaning.get().equals(defined.get(name))) {
                    defined.put(name, meaning.get());
                    where.add(new Definition(name, meaning.get()));
                }
            }
            String substituted = step.substituted().equals(step.formula()) ? "" : step.substituted();
            steps.add(new StepView(anchor + "-s" + (i + 1), i + 1, step.symbol(), symbol,
                    FormulaSymbols.qualifier(step.symbol()), quantity.orElse(""), definesSymbol, step.formula(),
                    substituted, ReportNumbers.display(step.value(), step.unit()), ReportNumbers.unit(step.unit()),
                    step.clause(), step.remark().orElse(""), List.copyOf(where), String.join("|", uses)));
        }
        return steps;
    }

    private Optional<String> meaning(String symbol, String checkId) {
        return glossary.meaning(symbol, checkId).or(() -> Optional.ofNullable(rulesetNames.get(symbol)));
    }
}
