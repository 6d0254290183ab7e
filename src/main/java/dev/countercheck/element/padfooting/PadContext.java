package dev.countercheck.element.padfooting;

import dev.countercheck.element.Axis;
import dev.countercheck.element.PlanGeometry;
import dev.countercheck.element.Section;
import dev.countercheck.eurocode.Materials;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.statics.BaseActions;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.PadFooting;

import java.util.EnumMap;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * What every pad-footing check needs, computed once: material strengths, the section, the footing's
 * own weight and that of the soil over it, and the resultant of an action case on the base and the ground
 * pressure under it (each case's, kept for the checks that ask for it again: one element's checks run in turn on
 * one thread).
 */
final class PadContext {

    /** One action case on the base: the case and V, Mx*, My* at the base centre. */
    record Resultant(ActionCase action, BaseActions base) {

        double vKn() {
            return base.vKn();
        }

        /** e_x = My* over V, mm. */
        double exMm() {
            return base.myKnm() / base.vKn() * 1000;
        }

        /** e_y = Mx* over V, mm. */
        double eyMm() {
            return base.mxKnm() / base.vKn() * 1000;
        }

        /** V written out as N + W with the case's numbers, for a trace's substituted values. */
        String vTerms() {
            return base.v().substituted();
        }

        /** e_x, the size of My* over V, with the case's numbers (mm). */
        String exTerms() {
            return "|" + Num.f(base.myKnm()) + "·1000/" + Num.f(base.vKn()) + "|";
        }

        /** e_y, the size of Mx* over V, with the case's numbers (mm). */
        String eyTerms() {
            return "|" + Num.f(base.mxKnm()) + "·1000/" + Num.f(base.vKn()) + "|";
        }
    }

    final PadFooting pad;
    final Ruleset rules;
    final Optional<Section> section;
    final Step fck;
    final Step fctm;
    final Step fctk005;
    final Step fcd;
    final Step fcdShear;
    final Step fctd;
    final Step fyd;
    final Step footingWeight;
    final Step overburdenWeight;
    private final Map<ActionCase.Kind, List<ActionCase>> casesByKind = new EnumMap<>(ActionCase.Kind.class);
    private final Map<Weighted, Resultant> resultants = new HashMap<>();
    private final Map<Resultant, Optional<Ground.Contact>> contacts = new IdentityHashMap<>();

    /** A case with the factor on the weights, the key of a resultant. */
    private record Weighted(ActionCase action, double factor) {
    }

    PadContext(PadFooting pad, Ruleset rules) {
        this.pad = pad;
        this.rules = rules;
        this.section = Section.of(pad.reinforcement(), pad.depthMm());
        double fckMpa = pad.materials().fckMpa();
        this.fck = Step.of("fck", "characteristic cylinder strength",
                pad.materials().concreteClass().orElse("fck given"), fckMpa, "MPa", "EN 1992-1-1 Table 3.1");
        this.fctm = Materials.fctm(fckMpa);
        this.fctk005 = Materials.fctk005(fctm.value());
        double gammaC = rules.number("gamma_c");
        this.fcd = Materials.fcd(rules.number("alpha_cc"), fckMpa, gammaC);
        this.fcdShear = Materials.fcd(rules.number("alpha_cc_shear"), fckMpa, gammaC);
        this.fctd = Materials.fctd(rules.number("alpha_ct"), fctk005.value(), gammaC);
        this.fyd = Materials.fyd(pad.materials().fykMpa(), rules.number("gamma_s"));
        double gammaConc = rules.number("concrete_unit_weight");
        this.footingWeight = Step.of("Wf", "γconc·Lx·Ly·h", Num.f(gammaConc) + "·" + Num.f(pad.planXMm() / 1000) + "·"
                        + Num.f(pad.planYMm() / 1000) + "·" + Num.f(pad.depthMm() / 1000),
                gammaConc * pad.planXMm() * pad.planYMm() * pad.depthMm() / 1e9, "kN", clauseOf("concrete_unit_weight"));
        double soilWeight = pad.soil().map(PadFooting.Soil::unitWeightKnM3).orElse(0.0);
        double cover = pad.soil().map(PadFooting.Soil::overburdenMm).orElse(0.0);
        double area = pad.planXMm() * pad.planYMm() - pad.column().areaMm2();
        this.overburdenWeight = Step.of("Ws", "γsoil·(Lx·Ly − Acol)·hs", Num.f(soilWeight) + "·"
                + Num.f(area / 1e6) + "·" + Num.f(cover / 1000), soilWeight * area * cover / 1e9, "kN",
                "soil over the footing, as stated");
    }

    /** The cases of {@code kind}, in submission order. */
    List<ActionCase> cases(ActionCase.Kind kind) {
        return casesByKind.computeIfAbsent(kind, k -> pad.actions().stream().filter(a -> a.kind() == k).toList());
    }

    /**
     * The resultant of case {@code a} on the base with the footing's and the overburden's weight factored by
     * {@code gammaG} for a designer's case, by the combination's own factor on the permanent actions for a generated
     * case (EN 1990 Table A1.2, note on γG: all permanent actions of one source take the same factor), and by 0 when
     * {@code gammaG} is 0 (the column actions alone).
     */
    Resultant resultant(ActionCase a, double gammaG) {
        return resultants.computeIfAbsent(new Weighted(a, weightFactor(a, gammaG)), w -> new Resultant(a,
                BaseActions.of(a.name(), a.nKn(), a.mxKnm(), a.myKnm(), a.hxKn(), a.hyKn(), pad.depthMm(),
                        PlanGeometry.point(pad.column().position()),
                        w.factor() * (footingWeight.value() + overburdenWeight.value()))));
    }

    /**
     * The ground pressure under {@code r} (a resultant of this context), or empty when it leaves the footing
     * ({@link Ground#solve}, solved once per resultant).
     */
    Optional<Ground.Contact> contact(Resultant r) {
        return contacts.computeIfAbsent(r, k -> Ground.solve(pad, k));
    }

    /**
     * The factor on the footing's and the overburden's weight under case {@code a}: {@code designer} for a designer's
     * case (the check chooses γG,sup or γG,inf), the combination's factor on the permanent actions for a generated
     * one; 0 stays 0 (the column actions alone).
     */
    static double weightFactor(ActionCase a, double designer) {
        return designer == 0 ? 0 : a.selfWeightFactor().orElse(designer);
    }

    /** The face of the column (or of its equivalent square) on side {@code sign} along {@code axis}, mm. */
    double face(Axis axis, int sign) {
        return axis.along(pad.column().position()) + sign * columnHalf(axis);
    }

    /**
     * The side of the square that stands for a circular column in one-way shear and bending,
     * {@code circular_column_square}·D (common practice); empty for a rectangular column.
     */
    Optional<Step> equivalentSquare() {
        if (pad.column().shape() != Column.ColumnShape.CIRCULAR) {
            return Optional.empty();
        }
        double factor = rules.number("circular_column_square");
        return Optional.of(Step.of("c,eq", "(c,eq/D)·D, the square standing for the circular column",
                Num.f(factor) + "·" + Num.f(pad.column().cxMm()), factor * pad.column().cxMm(), "mm",
                clauseOf("circular_column_square")));
    }

    /** Half the column's size along an axis for bending and one-way shear, mm. */
    double columnHalf(Axis axis) {
        return equivalentSquare().map(s -> s.value() / 2).orElse(axis.columnHalf(pad.column()));
    }

    String clauseOf(String parameter) {
        return rules.parameter(parameter).clause();
    }

    /** A value squared as a term of a substituted formula: {@code 58.5²}, {@code (-3)²}. */
    static String squared(double value) {
        return (value < 0 ? "(" + Num.f(value) + ")" : Num.f(value)) + "²";
    }
}
