package com.baysheet.engine.member;


import com.baysheet.engine.beam.BeamActions;
import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.record.ResultKey;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.ReductionMethods;
import com.baysheet.engine.units.Quantity;

import java.util.List;

/**
 * Reactions, shears, moments and deflections of a beam or girder for D, L, Lr and S, the concentrated-load
 * check against L, and the gravity combinations of the governing effects.
 */
final class BendingActions {
    private BendingActions() {}

    /**
     * Effects reported for a support kind: the reactions R_A (left, x = 0) and R_B (right, x = span), V, M+, M−.
     * The reactions are not R1, R2: on roof sheets those are the reduction factors of Eq. 4.8-1.
     */
    enum Effect {
        RA("RA", "R_A", "Left reaction R_A"), RB("RB", "R_B", "Right reaction R_B"), V("V", "V", "Maximum shear"),
        MPOS("M+", "M+", "Maximum positive moment"), MNEG("M-", "M-", "Maximum negative moment");
        /** key in result keys ("D.RA"), symbol in step symbols ("R_A.D"). */
        final String key, symbol, title, lower;
        Effect(String key, String symbol, String title) {
            this.key = key; this.symbol = symbol; this.title = title;
            this.lower = Character.toLowerCase(title.charAt(0)) + title.substring(1);
        }
        Quantity q() { return this == MPOS || this == MNEG ? Quantity.MOMENT : Quantity.FORCE; }
    }

    private static final List<Effect> CANTILEVER = List.of(Effect.RA, Effect.V, Effect.MNEG),
            OVERHANG = List.of(Effect.RA, Effect.RB, Effect.V, Effect.MPOS, Effect.MNEG),
            SIMPLE = List.of(Effect.RA, Effect.RB, Effect.V, Effect.MPOS);

    private static final double[] ZEROS = new double[Effect.values().length];

    static List<Effect> effects(Support s) {
        if (s instanceof Support.Cantilever) return CANTILEVER;
        if (s instanceof Support.Overhang) return OVERHANG;
        return SIMPLE;
    }

    /**
     * A load case's names on the record, written once rather than per member: the step symbol ("R_A.D"), result key
     * ("D.RA") and label ("Left reaction R_A, dead load") of each effect, by {@link Effect#ordinal}.
     */
    static final class Case {
        final String name, what, total, totalTitle, deflection, deflectionKey, deflectionTitle;
        final String[] symbol = new String[Effect.values().length], key = new String[symbol.length], label = new String[symbol.length];

        Case(String name, String what) {
            this.name = name;
            this.what = what;
            total = "W." + name;
            totalTitle = "Total " + what;
            deflection = "Δ." + name;
            deflectionKey = ResultKey.of(name, "Δ").text();
            deflectionTitle = "Deflection, " + what;
            for (Effect e : Effect.values()) {
                symbol[e.ordinal()] = e.symbol + "." + name;
                key[e.ordinal()] = ResultKey.of(name, e.key).text();
                label[e.ordinal()] = e.title + ", " + what;
            }
        }
    }

    static final Case DEAD = new Case("D", "dead load"), UNREDUCED = new Case("L0", "floor live load, unreduced"),
            REDUCED = new Case("L", "floor live load, reduced"), ROOF = new Case("Lr", "roof live load"),
            SNOW = new Case("S", "snow load, not reduced");

    /** The combination results' keys and labels by effect: design live load, factored, service. */
    private static final String[] DESIGN_KEY = new String[Effect.values().length], DESIGN_LABEL = new String[DESIGN_KEY.length],
            FACTORED_KEY = new String[DESIGN_KEY.length], SERVICE_KEY = new String[DESIGN_KEY.length];
    /** "Left reaction R_A, factored (LRFD 2)" by effect and combination, for members without snow (the label names the combination alone). */
    private static final String[][] COMBINED_LABEL = new String[DESIGN_KEY.length][LoadCombinations.GRAVITY.size()];

    static {
        for (Effect e : Effect.values()) {
            int i = e.ordinal();
            DESIGN_KEY[i] = ResultKey.of("Ldes", e.key).text();
            DESIGN_LABEL[i] = e.title + ", design live load";
            FACTORED_KEY[i] = ResultKey.of("LRFD", e.key).text();
            SERVICE_KEY[i] = ResultKey.of("ASD", e.key).text();
            for (int c = 0; c < LoadCombinations.GRAVITY.size(); c++) {
                var combination = LoadCombinations.GRAVITY.get(c);
                COMBINED_LABEL[i][c] = e.title + (combination.strength() ? ", factored (" : ", service (") + combination.name() + ")";
            }
        }
    }

    private static String combinedLabel(Effect e, LoadCombinations.Governing g, boolean strength) {
        if (g.formula().isEmpty()) {
            int c = LoadCombinations.GRAVITY.indexOf(g.combination());
            if (c >= 0) return COMBINED_LABEL[e.ordinal()][c];
        }
        return e.title + (strength ? ", factored (" : ", service (") + g.label() + ")";
    }

    static void record(CalcContext ctx, MemberInput in, LoadBook book, BeamLoads floor0, BeamLoads floor,
                       BeamLoads roof0, BeamLoads roof, boolean halfL, boolean snow, RecordBuilder rec) {
        Edition ed = ctx.edition();
        Support s = in.support();
        List<Effect> effects = effects(s);
        double ei = in.stiffness();
        // statics of the dead load: no code clause (the beam formulas are those of any handbook)
        double[] d = caseEffects(rec, DEAD, s, List.of(book.dead), effects, ei, Clause.NONE);
        // a case the member does not carry has no effects: the shared zeros, read only (concentrated() copies them)
        double[] l = ZEROS;
        if (!floor0.isEmpty()) {
            caseEffects(rec, UNREDUCED, s, List.of(floor0), effects, Double.NaN, ed.clause("loads.table"));
            l = caseEffects(rec, REDUCED, s, patterns(s, floor), effects, ei, ReductionMethods.of(ctx).clause(ctx));
        }
        double[] lr = ZEROS;
        if (!roof.isEmpty()) lr = caseEffects(rec, ROOF, s, patterns(s, roof), effects, ei, ed.clause("roof.reduction"));
        double[] sn = ZEROS;
        if (snow) sn = caseEffects(rec, SNOW, s, patterns(s, book.snow), effects, ei, ed.clause("snow.sloped"));
        if (s instanceof Support.Overhang && !(floor.isEmpty() && roof.isEmpty()))
            rec.info("Live load placed on the back span, on the overhang and on both; the worst of the three is used for each effect.",
                    ed.clause("reduction.basic"));

        double[] design = concentrated(ctx, book.floorAreas.keySet(), s, effects, l, ConcentratedCheck.FLOOR, rec);
        double[] lrDesign = concentrated(ctx, book.roofAreas.keySet(), s, effects, lr, ConcentratedCheck.ROOF, rec);
        Clause lrfd = ed.clause("combo.lrfd"), asd = ed.clause("combo.asd");
        for (int i = 0; i < effects.size(); i++) {
            Effect e = effects.get(i);
            int k = e.ordinal();
            double si = snow ? sn[i] : Double.NaN;
            var cases = new LoadCombinations.Unfactored(e.lower, d[i], design[i], lrDesign[i], si, halfL, e.q(), lrfd, asd);
            var u = LoadCombinations.govern(true, FACTORED_KEY[k], cases, rec);
            var a = LoadCombinations.govern(false, SERVICE_KEY[k], cases, rec);
            rec.result(DESIGN_KEY[k], DESIGN_LABEL[k], design[i], e.q())
               .result(FACTORED_KEY[k], combinedLabel(e, u, true), u.value(), e.q())
               .result(SERVICE_KEY[k], combinedLabel(e, a, false), a.value(), e.q())
               .governs(FACTORED_KEY[k]);
        }
        if (s instanceof Support.Overhang o && !(floor0.isEmpty() && roof0.isEmpty()))
            MinimumReactions.record(ctx, o, book, floor0, roof0, rec);
        if (halfL && !floor0.isEmpty()) rec.info("0.5 L permitted in LRFD 3 (every L0 at most 100 psf, no garage or assembly use).", ed.clause("combo.halfL"));
        if (!Double.isNaN(ei)) {
            BeamLoads total = new BeamLoads().add(book.dead, 1).add(floor, 1).add(roof, 1);
            BeamActions t = MemberCalculation.solve(s, total, ei);
            rec.step("Δ.total", "Deflection under D + L + Lr (all spans loaded)", "Δ from ∫∫ M/EI",
                    rec.writesText() ? "at x = " + rec.show(t.maxDeflectionAt(), Quantity.LENGTH) : "",
                    t.maxDeflection(), Quantity.SMALL_LENGTH, Clause.NONE);
            rec.result("Δ.total", "Deflection, D + L + Lr", t.maxDeflection(), Quantity.SMALL_LENGTH);
        }
    }

    /** Live load patterns: the whole member, and for an overhang the back span and the overhang alone. */
    static List<BeamLoads> patterns(Support s, BeamLoads live) {
        if (!(s instanceof Support.Overhang o)) return List.of(live);
        return List.of(live, live.within(0, o.span()), live.within(o.span(), o.length()));
    }

    /** Records the effects of one load case, worst over its patterns, and returns them in the order of {@code effects}. */
    private static double[] caseEffects(RecordBuilder rec, Case c, Support s, List<BeamLoads> patterns,
                                        List<Effect> effects, double ei, Clause clause) {
        boolean text = rec.writesText();
        BeamActions[] acts = new BeamActions[patterns.size()];
        for (int j = 0; j < acts.length; j++) acts[j] = MemberCalculation.solve(s, patterns.get(j), ei);
        BeamActions full = acts[0];
        double w = patterns.get(0).total();
        rec.step(c.total, c.totalTitle, "W = Σ w·ℓ + Σ P", StaticsText.total(rec, patterns.get(0)), w, Quantity.FORCE, clause);
        double[] out = new double[effects.size()];
        for (int i = 0; i < effects.size(); i++) {
            Effect e = effects.get(i);
            double best = 0;
            int k = 0;
            for (int j = 0; j < acts.length; j++) {
                double v = value(acts[j], e, s);
                // M− is the most negative; every other effect the largest (a reaction's uplift is not a gravity design value)
                if (e == Effect.MNEG ? v < best : v > best) { best = v; k = j; }
            }
            out[i] = best;
            String label = c.label[e.ordinal()];
            if (text) {
                String placed = patterns.size() > 1 && k > 0 ? " (" + PATTERNS[k] + ")" : "";
                boolean closed = StaticsText.simpleUniform(s, patterns.get(k));
                String sub = substituted(rec, e, s, patterns.get(k), acts[k], closed);
                if ((e == Effect.RA || e == Effect.RB) && value(acts[k], e, s) < 0) sub += " < 0, taken as 0 (see the least reactions)";
                rec.step(c.symbol[e.ordinal()], label + placed, formula(e, s, closed), sub, best, e.q(), clause);
            } else rec.step(c.symbol[e.ordinal()], label, "", "", best, e.q(), clause);
            rec.result(c.key[e.ordinal()], label, best, e.q());
        }
        if (!Double.isNaN(ei) && c != UNREDUCED) {
            rec.step(c.deflection, c.deflectionTitle, "Δ from ∫∫ M/EI", text ? "at x = " + rec.show(full.maxDeflectionAt(), Quantity.LENGTH) : "",
                    full.maxDeflection(), Quantity.SMALL_LENGTH, clause);
            rec.result(c.deflectionKey, c.deflectionTitle, full.maxDeflection(), Quantity.SMALL_LENGTH);
        }
        return out;
    }

    /** The names of one concentrated-load check on the record, by {@link Effect#ordinal}, written once. */
    private static final class ConcentratedText {
        final String[] symbol = new String[Effect.values().length], key = new String[symbol.length], label = new String[symbol.length],
                governsKey = new String[symbol.length], governsLabel = new String[symbol.length],
                designKey = new String[symbol.length], designLabel = new String[symbol.length];

        ConcentratedText(ConcentratedCheck.Keys k) {
            for (Effect e : Effect.values()) {
                int n = e.ordinal();
                symbol[n] = e.symbol + "." + k.step();
                key[n] = ResultKey.of(k.step(), e.key).text();
                label[n] = e.title + ", " + k.concentrated();
                governsKey[n] = ResultKey.of(k.governs(), e.key).text();
                governsLabel[n] = e.title + ": governing " + k.live();
                designKey[n] = ResultKey.of(k.design(), e.key).text();
                designLabel[n] = e.title + ", design " + k.live();
            }
        }
    }

    private static final ConcentratedText FLOOR_CHECK = new ConcentratedText(ConcentratedCheck.FLOOR),
            ROOF_CHECK = new ConcentratedText(ConcentratedCheck.ROOF);

    /** The placements of {@link #patterns}, as the record names them. */
    static final String[] PATTERNS = {"live load on the whole member", "live load on the back span only", "live load on the overhang only"};

    static double value(BeamActions a, Effect e, Support s) {
        return switch (e) {
            case RA -> a.left();
            case RB -> a.right();
            case V -> Math.abs(a.maxShear());
            case MPOS -> Math.max(0, a.maxMoment());
            case MNEG -> Math.min(0, a.minMoment());
        };
    }

    private static String formula(Effect e, Support s, boolean closed) {
        boolean cant = s instanceof Support.Cantilever;
        return switch (e) {
            case RA -> cant ? "R = W" : closed ? "R_A = wℓ/2" : "ΣM_B = 0: R_A = Σ load × (ℓ − x) / ℓ";
            case RB -> closed ? "R_B = wℓ/2" : "ΣM_A = 0: R_B = Σ load × x / ℓ";
            case V -> closed ? "V = wℓ/2" : "V_max = max |V(x)|";
            case MPOS -> closed ? "M+ = wℓ²/8" : "M+ = max M(x), at zero shear or under a load";
            case MNEG -> cant ? "M− = −Σ load × x at the fixed end" : "M− = min M(x), over the support";
        };
    }

    /** The numbers put in, from the loads of the pattern that gave the value (x from the left support or fixed end). */
    private static String substituted(RecordBuilder rec, Effect e, Support s, BeamLoads loads, BeamActions a, boolean closed) {
        if (closed) return StaticsText.closedForm(rec, e, s, loads);
        return switch (e) {
            case RA, RB -> StaticsText.reaction(rec, e, s, loads);
            case V -> "at x = " + rec.show(a.maxShearAt(), Quantity.LENGTH);
            case MPOS -> "at x = " + rec.show(a.maxMomentAt(), Quantity.LENGTH);
            case MNEG -> s instanceof Support.Cantilever ? StaticsText.fixedMoment(rec, loads)
                    : "at x = " + rec.show(a.minMomentAt(), Quantity.LENGTH);
        };
    }

    /**
     * ASCE 7-16 4.4: the largest concentrated load of the occupancies {@code ids} (the floor's or the roof's), on
     * its contact area, placed for each effect; compared with the uniform live load {@code l} of the same kind
     * (reduced L, or Lr), never added to it. Returns the design live effect for each effect.
     */
    private static double[] concentrated(CalcContext ctx, java.util.Set<String> ids, Support s, List<Effect> effects, double[] l,
                                         ConcentratedCheck.Keys k, RecordBuilder rec) {
        double[] design = l.clone();
        Occupancy worst = ConcentratedCheck.largest(ctx, ids);
        if (worst == null) return design;
        Edition ed = ctx.edition();
        double p = worst.concentrated(ctx.system()), side = worst.contactSide(ctx.system());
        boolean text = rec.writesText();
        Clause clause = ed.clause("concentrated");
        rec.step(k.load(), text ? "Concentrated load, " + worst.name() + ", on a " + rec.show(side, Quantity.LENGTH) + " square, not reduced" : "",
                k.load(), rec.num(p, Quantity.FORCE), p, Quantity.FORCE, clause);
        rec.info("The full concentrated load is taken on this member (no spread to neighbouring members: common practice, conservative).",
                clause);
        ConcentratedText names = k == ConcentratedCheck.FLOOR ? FLOOR_CHECK : ROOF_CHECK;
        for (int i = 0; i < effects.size(); i++) {
            Effect e = effects.get(i);
            ConcentratedCheck.Effect ce = switch (e) {
                case RA -> ConcentratedCheck.Effect.LEFT_REACTION;
                case RB -> ConcentratedCheck.Effect.RIGHT_REACTION;
                case V -> ConcentratedCheck.Effect.SHEAR;
                case MPOS -> ConcentratedCheck.Effect.MAX_MOMENT;
                case MNEG -> ConcentratedCheck.Effect.MIN_MOMENT;
            };
            ConcentratedCheck.Placement pl = ConcentratedCheck.place(s, p, side, ce);
            double v = e == Effect.MNEG ? Math.min(0, pl.effect()) : e == Effect.MPOS ? Math.max(0, pl.effect()) : Math.abs(pl.effect());
            int n = e.ordinal();
            rec.step(names.symbol[n], names.label[n], "placed for the largest effect",
                    text ? "centre at x = " + rec.show(pl.at(), Quantity.LENGTH) : "", v, e.q(), clause);
            rec.result(names.key[n], names.label[n], v, e.q());
            boolean conc = Math.abs(v) > Math.abs(l[i]);
            if (conc) design[i] = e == Effect.RA || e == Effect.RB ? Math.copySign(v, l[i] == 0 ? 1 : l[i]) : v;
            rec.resultText(names.governsKey[n], names.governsLabel[n], conc ? "concentrated" : "uniform");
            // the floor's design live load is recorded with the combinations, for every member
            if (k == ConcentratedCheck.ROOF) rec.result(names.designKey[n], names.designLabel[n], design[i], e.q());
        }
        return design;
    }
}
