package dev.countercheck.actions;

import dev.countercheck.actions.Combination.Kind;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Consumer;
import java.util.function.ToDoubleFunction;

/**
 * Generates the combinations of EN 1990 6.4.3 and 6.5.3 from characteristic actions, in a fixed
 * order: STR (Exp. (6.10), or (6.10a) and (6.10b)), GEO for DA1-2, EQU, the accidental combination
 * (Exp. (6.11b), only when an accidental action is given), characteristic (6.14b) and
 * quasi-permanent (6.16b). In each, every variable action leads in turn while each other one
 * accompanies or is left out (a variable action counts only where unfavourable); all permanent
 * actions take γG,sup together and again γG,inf (single source); a reversible action enters with
 * each sign; the permanent actions also stand alone. Combinations with the same effects and the same
 * factor on the permanent actions are generated once (the first name stands).
 */
public final class CombinationGenerator {

    private static final double SAME = 1e6;

    /** An action with its unique label. */
    private record Labelled(String label, CharacteristicAction action) {
    }

    /** A variable action taken with one sign. */
    private record Directed(Labelled action, int sign) {

        String label() {
            return action.label + (action.action.reversible() ? (sign > 0 ? "+" : "−") : "");
        }

        Effects effects() {
            return action.action.effects().times(sign);
        }
    }

    /** How the permanent actions enter: their label in the name, factor and how it was formed. */
    private record Permanent(String name, double factor, String how) {
    }

    /** How a variable action enters: the factor from its ψ factors, and how it was formed. */
    private record Share(ToDoubleFunction<Psi> factor, String how, String suffix) {
    }

    private final Factors factors;
    private final Effects permanent;
    private final List<Directed> variables = new ArrayList<>();
    private final List<Directed> accidental = new ArrayList<>();
    private final List<Combination> out = new ArrayList<>();
    private final Set<String> seen = new HashSet<>();

    private CombinationGenerator(List<CharacteristicAction> actions, Factors factors) {
        this.factors = factors;
        Effects g = Effects.ZERO;
        Map<String, Integer> count = new HashMap<>();
        actions.forEach(a -> count.merge(a.label(), 1, Integer::sum));
        Map<String, Integer> index = new HashMap<>();
        for (CharacteristicAction a : actions) {
            if (a.source() == Source.G) {
                g = g.plus(a.effects());
                continue;
            }
            int i = index.merge(a.label(), 1, Integer::sum);
            Labelled l = new Labelled(count.get(a.label()) > 1 ? a.label() + i : a.label(), a);
            List<Directed> into = a.source() == Source.A ? accidental : variables;
            into.add(new Directed(l, 1));
            if (a.reversible()) {
                into.add(new Directed(l, -1));
            }
        }
        this.permanent = g;
    }

    /**
     * Every combination of {@code actions} with {@code factors}.
     *
     * @throws IllegalArgumentException when the factors give no ψ for a variable action's kind
     */
    public static List<Combination> generate(List<CharacteristicAction> actions, Factors factors) {
        return new CombinationGenerator(actions, factors).all();
    }

    private List<Combination> all() {
        Factors.Partial str = factors.str();
        Share leadQ = new Share(p -> str.gammaQ(), "γQ", " lead");
        Share withPsi0 = new Share(p -> str.gammaQ() * p.psi0(), "γQ·ψ0", " ψ0");
        Permanent inf = new Permanent("G inf", str.gammaGInf(), "γG,inf");
        if (factors.split()) {
            String clauseA = "EN 1990 6.4.3.2(3), Exp. (6.10a); " + str.clause();
            String clauseB = "EN 1990 6.4.3.2(3), Exp. (6.10b); " + str.clause();
            for (Permanent g : List.of(new Permanent("G sup", str.gammaGSup(), "γG,sup"), inf)) {
                accompanied(Kind.ULS, "6.10a", g, withPsi0, clauseA);
            }
            for (Permanent g : List.of(new Permanent("G sup", factors.xi() * str.gammaGSup(), "ξ·γG,sup"), inf)) {
                led(Kind.ULS, "6.10b", g, leadQ, withPsi0, clauseB);
            }
        } else {
            String clause = "EN 1990 6.4.3.2(3), Exp. (6.10); " + str.clause();
            for (Permanent g : List.of(new Permanent("G sup", str.gammaGSup(), "γG,sup"), inf)) {
                led(Kind.ULS, "6.10", g, leadQ, withPsi0, clause);
            }
        }
        Factors.Partial geo = factors.geo();
        String geoClause = "EN 1990 6.4.3.2(3), Exp. (6.10); " + geo.clause();
        for (Permanent g : List.of(new Permanent("G", geo.gammaGSup(), "γG"), new Permanent("G inf", geo.gammaGInf(),
                "γG,inf"))) {
            led(Kind.ULS_GEO, "GEO", g, new Share(p -> geo.gammaQ(), "γQ", " lead"),
                    new Share(p -> geo.gammaQ() * p.psi0(), "γQ·ψ0", " ψ0"), geoClause);
        }
        Factors.Partial equ = factors.equ();
        String equClause = "EN 1990 6.4.3.1, Exp. (6.10); " + equ.clause();
        for (Permanent g : List.of(new Permanent("G sup", equ.gammaGSup(), "γG,sup"), new Permanent("G inf",
                equ.gammaGInf(), "γG,inf"))) {
            led(Kind.EQU, "EQU", g, new Share(p -> equ.gammaQ(), "γQ", " lead"),
                    new Share(p -> equ.gammaQ() * p.psi0(), "γQ·ψ0", " ψ0"), equClause);
        }
        accidentals();
        Permanent unfactored = new Permanent("G", 1.0, "1");
        led(Kind.SLS_CHARACTERISTIC, "6.14b", unfactored, new Share(p -> 1.0, "1", " lead"),
                new Share(Psi::psi0, "ψ0", " ψ0"), "EN 1990 6.5.3(2)a, Exp. (6.14b); " + factors.psiClause());
        accompanied(Kind.SLS_QUASI_PERMANENT, "6.16b", unfactored, new Share(Psi::psi2, "ψ2", " ψ2"),
                "EN 1990 6.5.3(2)c, Exp. (6.16b); " + factors.psiClause());
        return List.copyOf(out);
    }

    /** Exp. (6.11b) for each accidental action (each sign), only when one is given. */
    private void accidentals() {
        String clause = "EN 1990 6.4.3.3, Exp. (6.11b); Table A1.3; " + factors.psiClause();
        Permanent g = new Permanent("G", factors.gammaGA(), "γGA");
        Share lead = factors.accidentalPsi1() ? new Share(Psi::psi1, "ψ1", " ψ1") : new Share(Psi::psi2, "ψ2", " ψ2");
        Share others = new Share(Psi::psi2, "ψ2", " ψ2");
        for (Directed a : accidental) {
            Draft base = new Draft("6.11b", g, permanent).with(a.label(), a.effects(), 1.0, "Ad", "");
            for (Directed l : variables) {
                Draft led = base.with(l, factor(lead, l), lead);
                others(l.action, led, others, d -> emit(Kind.ACCIDENTAL, d, clause));
            }
            others(null, base, others, d -> emit(Kind.ACCIDENTAL, d, clause));
        }
    }

    /** The permanent actions alone, then each variable action leading with the others accompanying or left out. */
    private void led(Kind kind, String expr, Permanent g, Share lead, Share accompanying, String clause) {
        Draft base = new Draft(expr, g, permanent);
        emit(kind, base, clause);
        for (Directed l : variables) {
            Draft led = base.with(l, factor(lead, l), lead);
            others(l.action, led, accompanying, d -> emit(kind, d, clause));
        }
    }

    /** The permanent actions with every choice of accompanying variable actions (none leads). */
    private void accompanied(Kind kind, String expr, Permanent g, Share accompanying, String clause) {
        others(null, new Draft(expr, g, permanent), accompanying, d -> emit(kind, d, clause));
    }

    /** Every choice, for each variable action other than {@code leading}: left out, or in with each sign. */
    private void others(Labelled leading, Draft start, Share share, Consumer<Draft> sink) {
        List<Labelled> rest = new ArrayList<>();
        variables.stream().map(Directed::action).filter(a -> a != leading && !rest.contains(a)).forEach(rest::add);
        choose(rest, 0, start, share, sink);
    }

    private void choose(List<Labelled> rest, int i, Draft draft, Share share, Consumer<Draft> sink) {
        if (i == rest.size()) {
            sink.accept(draft);
            return;
        }
        choose(rest, i + 1, draft, share, sink);
        for (Directed d : variables) {
            if (d.action == rest.get(i)) {
                choose(rest, i + 1, draft.with(d, factor(share, d), share), share, sink);
            }
        }
    }

    private double factor(Share share, Directed d) {
        Psi psi = factors.psiOf(d.action.action).orElseThrow(() -> new IllegalArgumentException(
                "the ruleset gives no ψ factors for " + d.action.action.label()));
        return share.factor().applyAsDouble(psi);
    }

    private void emit(Kind kind, Draft d, String clause) {
        Effects e = d.effects;
        String key = kind + "|" + round(e.n()) + "|" + round(e.mx()) + "|" + round(e.my()) + "|" + round(e.hx()) + "|"
                + round(e.hy()) + "|" + round(d.g.factor);
        if (seen.add(key)) {
            out.add(new Combination(d.name, kind, e, d.g.factor, List.copyOf(d.terms), clause));
        }
    }

    private static long round(double v) {
        return Math.round(v * SAME);
    }

    /** A combination being formed: its name so far, effects and terms. */
    private static final class Draft {
        final String name;
        final Permanent g;
        final Effects effects;
        final List<Term> terms;

        Draft(String expr, Permanent g, Effects permanent) {
            this(expr + " " + g.name, g, permanent.times(g.factor), List.of(new Term("G", g.factor, g.how)));
        }

        private Draft(String name, Permanent g, Effects effects, List<Term> terms) {
            this.name = name;
            this.g = g;
            this.effects = effects;
            this.terms = terms;
        }

        Draft with(Directed d, double factor, Share share) {
            return with(d.label(), d.effects(), factor, share.how(), share.suffix());
        }

        Draft with(String label, Effects e, double factor, String how, String suffix) {
            List<Term> t = new ArrayList<>(terms);
            t.add(new Term(label, factor, how));
            return new Draft(name + " + " + label + suffix, g, effects.plus(e.times(factor)), t);
        }
    }
}
