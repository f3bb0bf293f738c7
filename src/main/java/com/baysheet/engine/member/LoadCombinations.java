package com.baysheet.engine.member;

import com.baysheet.engine.Check;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;

import java.util.List;

/**
 * The gravity combinations of D, L, Lr and S of ASCE 7-16 2.3.1 (LRFD) and 2.4.1 (ASD), S taking the place of Lr
 * in the "(Lr or S or R)" terms; those with W, R or E are outside this engine (with no wind, "(L or 0.5W)" of
 * combination 3 is L, or 0.5 L by Exception 1). Effects are combined as the sum of each case's largest effect, which is exact
 * where the cases peak together and conservative where they do not.
 */
public final class LoadCombinations {
    private LoadCombinations() {}

    /** A combination: factors on D, L and Lr; {@code halfL} marks the L factor that may be 0.5 (2.3.1 Exception 1). */
    public record Combination(String name, double d, double l, double lr, boolean halfL, boolean strength) {
        double apply(double dv, double lv, double lrv, boolean halfAllowed) {
            double fl = halfL && halfAllowed ? 0.5 : l;
            return d * dv + fl * lv + lr * lrv;
        }

        /** The edition's clause key of this combination ("combo.lrfd.2"); the clause numbers are edition data. */
        String clauseKey() {
            return (strength ? "combo.lrfd." : "combo.asd.") + name.substring(name.lastIndexOf(' ') + 1);
        }

        String formula(boolean halfAllowed, RecordBuilder rec) {
            if (!rec.writesText()) return "";
            double fl = halfL && halfAllowed ? 0.5 : l;
            StringBuilder s = new StringBuilder(24).append(shown(d)).append("D");
            if (fl != 0) s.append(" + ").append(shown(fl)).append("L");
            if (lr != 0) s.append(" + ").append(shown(lr)).append("Lr");
            return s.toString();
        }
    }

    public static final List<Combination> GRAVITY = List.of(
            new Combination("LRFD 1", 1.4, 0, 0, false, true),
            new Combination("LRFD 2", 1.2, 1.6, 0.5, false, true),
            new Combination("LRFD 3", 1.2, 1.0, 1.6, true, true),
            new Combination("ASD 1", 1.0, 0, 0, false, false),
            new Combination("ASD 2", 1.0, 1.0, 0, false, false),
            new Combination("ASD 3", 1.0, 0, 1.0, false, false),
            new Combination("ASD 4", 1.0, 0.75, 0.75, false, false));

    /**
     * The governing strength or service value of one effect, recorded as a step.
     *
     * @param roofTerm the roof load that took the combination's "(Lr or S or R)" place: "Lr" or "S"
     */
    public record Governing(double value, Combination combination, String roofTerm, String formula) {
        /** The combination as named in result labels: "LRFD 3", or with snow on the member "LRFD 3: 1.2D + 1.6S + 0.5L". */
        public String label() { return formula.isEmpty() ? combination.name() : combination.name() + ": " + formula; }
    }

    /**
     * One effect of a member by load case, unfactored, as the combinations take it: what it is ("moment", "axial
     * load"), the largest effect of D, of L (the design live load), of Lr and of S (NaN where the member carries no
     * snow), all in the unit of {@code q}; whether L may take 0.5 (2.3.1 Exception 1); and the edition's clauses of
     * the strength and the service combinations. The strength and the service value are governed from the same one.
     */
    public record Unfactored(String what, double d, double l, double lr, double s, boolean halfAllowed, Quantity q,
                             Clause lrfd, Clause asd) {
        public Unfactored {
            Check.present("what", what);
            Check.present("q", q);
            Check.present("lrfd", lrfd);
            Check.present("asd", asd);
        }

        /** D, L and Lr only (no snow on the member). */
        public Unfactored(String what, double d, double l, double lr, boolean halfAllowed, Quantity q, Clause lrfd, Clause asd) {
            this(what, d, l, lr, Double.NaN, halfAllowed, q, lrfd, asd);
        }
    }

    /**
     * The governing strength or service value of one effect, recorded as the step {@code symbol}. With a snow effect,
     * each combination whose roof term is "(Lr or S or R)" is evaluated with Lr and with S, and the larger taken
     * (ASCE 7-16 2.3.1, 2.4.1); rain R is not computed. On a tie Lr is named.
     */
    public static Governing govern(boolean strength, String symbol, Unfactored e, RecordBuilder rec) {
        double d = e.d(), l = e.l(), lr = e.lr(), s = e.s();
        boolean halfAllowed = e.halfAllowed();
        Quantity q = e.q();
        boolean snow = !Double.isNaN(s);
        Combination best = null;
        double bestV = 0, bestRoof = 0;
        String term = "Lr";
        for (Combination c : GRAVITY) {
            if (c.strength() != strength) continue;
            double v = c.apply(d, l, lr, halfAllowed);
            if (best == null || Math.abs(v) > Math.abs(bestV)) { best = c; bestV = v; bestRoof = lr; term = "Lr"; }
            if (snow && c.lr != 0) {
                double vs = c.apply(d, l, s, halfAllowed);
                if (Math.abs(vs) > Math.abs(bestV)) { best = c; bestV = vs; bestRoof = s; term = "S"; }
            }
        }
        String sub = "";
        double fl = best.halfL && halfAllowed ? 0.5 : best.l;
        if (rec.writesText()) {
            StringBuilder b = new StringBuilder(48).append(shown(best.d)).append(" × ").append(rec.num(d, q));
            if (fl != 0) b.append(" + ").append(shown(fl)).append(" × ").append(rec.num(l, q));
            if (best.lr != 0) b.append(" + ").append(shown(best.lr)).append(" × ").append(rec.num(bestRoof, q));
            sub = b.toString();
        }
        // the label leaves out L on a member that carries none (a roof member): the value is the same either way
        String formula = snow ? brief(best, l == 0 ? 0 : fl, term) : "";
        rec.step(symbol, !rec.writesText() ? "" : (strength ? "Factored " : "Service ") + e.what() + ", " + best.name + " governs"
                        + (snow && best.lr != 0 ? " (" + term + " as the roof load)" : ""),
                snow ? formula : best.formula(halfAllowed, rec), sub, bestV, q, strength ? e.lrfd() : e.asd());
        return new Governing(bestV, best, term, formula);
    }

    /** The load factors of {@link #GRAVITY} and 0.5 L, with their shown text written once. */
    private static final double[] FACTORS = {0, 0.5, 0.75, 1.0, 1.2, 1.4, 1.6};
    private static final String[] FACTOR_SHOWN = new String[FACTORS.length];

    static {
        for (int i = 0; i < FACTORS.length; i++) FACTOR_SHOWN[i] = Display.sig3(FACTORS[i]);
    }

    /** A load factor to three figures, as {@link Display#sig3} writes it. */
    static String shown(double f) {
        for (int i = 0; i < FACTORS.length; i++) if (FACTORS[i] == f) return FACTOR_SHOWN[i];
        return Display.sig3(f);
    }

    /** "1.2D + 1.6S + 0.5L": the roof term first where its factor leads, as the standard writes combination 3. */
    static String brief(Combination c, double fl, String term) {
        StringBuilder b = new StringBuilder(factor(c.d)).append("D");
        String lt = fl != 0 ? " + " + factor(fl) + "L" : "", rt = c.lr != 0 ? " + " + factor(c.lr) + term : "";
        return b.append(c.lr > fl ? rt + lt : lt + rt).toString();
    }

    private static String factor(double f) { return f == 1 ? "" : Display.plain(f); }
}
