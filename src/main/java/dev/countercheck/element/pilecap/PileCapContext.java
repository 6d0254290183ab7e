package dev.countercheck.element.pilecap;

import dev.countercheck.element.Axis;
import dev.countercheck.element.PlanGeometry;
import dev.countercheck.element.Section;
import dev.countercheck.statics.PileGroupReactions;
import dev.countercheck.statics.PileGroupReactions.Distribution;
import dev.countercheck.statics.PileGroupReactions.Load;
import dev.countercheck.statics.PlanPoint;
import dev.countercheck.eurocode.Materials;
import dev.countercheck.eurocode.Num;
import dev.countercheck.eurocode.Step;
import dev.countercheck.ruleset.Ruleset;
import dev.countercheck.submission.ActionCase;
import dev.countercheck.submission.Column;
import dev.countercheck.submission.PileCap;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * What every pile-cap check needs, computed once: material strengths, the section, and the pile
 * reactions of every ULS case (with the cap's own weight, and from the column actions alone).
 */
final class PileCapContext {

    /**
     * One ULS case with its reactions: with the cap's own weight factored by γG,sup (for the largest
     * reactions), from the column actions alone, and with the own weight factored by γG,inf (for the least
     * reaction, EN 1990 Table A1.2(B)).
     */
    record UlsCase(ActionCase action, Distribution withSelfWeight, Distribution columnOnly,
                   Distribution withFavourableSelfWeight) {
    }

    final PileCap cap;
    final Ruleset rules;
    final Optional<Section> section;
    final List<UlsCase> uls;
    final Step selfWeight;
    final Step fck;
    final Step fctm;
    final Step fctk005;
    final Step fcd;
    final Step fcdShear;
    /** fck as the shear resistance of concrete takes it (limited by the ruleset's fck_max_shear). */
    final Step fckShear;
    final Step fctd;
    final Step fyd;
    /** The line the group lies on as designed (empty for a group in plan), found once for every solve. */
    private final Optional<double[]> designLine;
    /** The piles at their positions as designed, prepared once for every case. */
    private final PileGroupReactions.Group designGroup;

    PileCapContext(PileCap cap, Ruleset rules) {
        this.cap = cap;
        this.rules = rules;
        List<PlanPoint> designed = PlanGeometry.points(cap.piles().positions());
        this.designLine = PileGroupReactions.lineOf(designed);
        this.designGroup = PileGroupReactions.group(designed);
        this.section = Section.of(cap.reinforcement(), cap.depthMm());
        double fckMpa = cap.materials().fckMpa();
        this.fck = Step.of("fck", "characteristic cylinder strength",
                cap.materials().concreteClass().orElse("fck given"), fckMpa, "MPa", "EN 1992-1-1 Table 3.1");
        this.fctm = Materials.fctm(fckMpa);
        this.fctk005 = Materials.fctk005(fctm.value());
        double gammaC = rules.number("gamma_c");
        this.fcd = Materials.fcd(rules.number("alpha_cc"), fckMpa, gammaC);
        this.fcdShear = Materials.fcd(rules.number("alpha_cc_shear"), fckMpa, gammaC);
        this.fckShear = Materials.fckShear(fckMpa, rules.number("fck_max_shear"), clauseOf("fck_max_shear"));
        this.fctd = Materials.fctd(rules.number("alpha_ct"), fctk005.value(), gammaC);
        this.fyd = Materials.fyd(cap.materials().fykMpa(), rules.number("gamma_s"));
        double weight = rules.number("concrete_unit_weight") * cap.planXMm() * cap.planYMm() * cap.depthMm() / 1e9;
        this.selfWeight = Step.of("Wcap", "γconc·Lx·Ly·h", Num.f(rules.number("concrete_unit_weight")) + "·"
                        + Num.f(cap.planXMm() / 1000) + "·" + Num.f(cap.planYMm() / 1000) + "·"
                        + Num.f(cap.depthMm() / 1000), weight, "kN", "EN 1991-1-1 Table A.1");
        List<UlsCase> cases = new ArrayList<>();
        for (ActionCase a : cap.actions()) {
            if (a.kind() == ActionCase.Kind.ULS) {
                cases.add(new UlsCase(a, reactions(designGroup, a, gammaSup(a)), reactions(a, false),
                        reactions(designGroup, a, gammaInf(a))));
            }
        }
        this.uls = List.copyOf(cases);
    }

    boolean addsSelfWeight() {
        return cap.selfWeight() == PileCap.SelfWeight.ADD;
    }

    /** γG·Wcap, the factored self weight the review adds to each ULS case (0 when already included). */
    double factoredSelfWeightKn() {
        return factoredSelfWeightKn(gammaGSup());
    }

    /** γ·Wcap for a partial factor γ on the cap's own weight (0 when the actions already include it). */
    double factoredSelfWeightKn(double gamma) {
        return addsSelfWeight() ? gamma * selfWeight.value() : 0.0;
    }

    /** γG,sup, the factor on the own weight where it adds to the effect (EN 1990 Table A1.2(B)). */
    double gammaGSup() {
        return rules.number("gamma_g");
    }

    /** γG,inf, the factor on the own weight where it relieves the effect (EN 1990 Table A1.2(B)). */
    double gammaGInf() {
        return rules.number("gamma_g_inf");
    }

    /** The factor on the own weight where it adds to the effect: a generated case's own γG, else γG,sup. */
    double gammaSup(ActionCase a) {
        return a.selfWeightFactor().orElse(gammaGSup());
    }

    /** The factor on the own weight where it relieves the effect: a generated case's own γG, else γG,inf. */
    double gammaInf(ActionCase a) {
        return a.selfWeightFactor().orElse(gammaGInf());
    }

    Distribution reactions(ActionCase a, boolean withSelfWeight) {
        return reactions(designGroup, a, withSelfWeight ? gammaGSup() : 0.0);
    }

    /**
     * Reactions of the piles of {@code group} (which may be moved off position) under action case {@code a} with
     * the cap's own weight factored by {@code gammaG} (0: without it; ignored when the actions already include it);
     * a group that lies on one line as designed is analysed on that line.
     */
    Distribution reactions(PileGroupReactions.Group group, ActionCase a, double gammaG) {
        List<Load> loads = new ArrayList<>();
        loads.add(new Load("N", a.nKn(), PlanGeometry.point(cap.column().position())));
        if (gammaG > 0 && addsSelfWeight()) {
            loads.add(new Load("γG·Wcap", factoredSelfWeightKn(gammaG), new PlanPoint(0, 0)));
        }
        double h = cap.depthMm() / 1000.0;
        return group.solve(loads, a.mxKnm() + a.hyKn() * h, a.myKnm() + a.hxKn() * h, designLine);
    }

    /**
     * The side of the square that stands for a circular column in one-way shear and the bending method,
     * {@code circular_column_square}·D (common practice); empty for a rectangular column.
     */
    Optional<Step> equivalentSquare() {
        if (cap.column().shape() != Column.ColumnShape.CIRCULAR) {
            return Optional.empty();
        }
        double factor = rules.number("circular_column_square");
        return Optional.of(Step.of("c,eq", "(c,eq/D)·D, the square standing for the circular column",
                Num.f(factor) + "·" + Num.f(cap.column().cxMm()), factor * cap.column().cxMm(), "mm",
                clauseOf("circular_column_square")));
    }

    /** Half the column's size along an axis for one-way shear and the bending method, mm. */
    double columnHalf(Axis axis) {
        return equivalentSquare().map(s -> s.value() / 2).orElse(axis.columnHalf(cap.column()));
    }

    /**
     * δ, the plan positional tolerance of the piles: as stated, else the ruleset's {@code pile_tolerance}
     * (common practice 75 mm, an assumption the checks using it state).
     */
    Step planTolerance() {
        return cap.piles().toleranceMm()
                .map(t -> Step.of("δ", "stated plan tolerance", Num.f(t), t, "mm", "submission"))
                .orElseGet(() -> rules.parameter("pile_tolerance").asStep());
    }

    String clauseOf(String parameter) {
        return rules.parameter(parameter).clause();
    }
}
