package com.baysheet.engine.member;

import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;

import java.util.List;

/**
 * The gravity combinations of D, L and Lr of ASCE 7-16 2.3.1 (LRFD) and 2.4.1 (ASD); those with W, S, R or E
 * are outside this engine. Effects are combined as the sum of each case's largest effect, which is exact
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
            StringBuilder s = new StringBuilder(Display.sig3(d)).append("D");
            if (fl != 0) s.append(" + ").append(Display.sig3(fl)).append("L");
            if (lr != 0) s.append(" + ").append(Display.sig3(lr)).append("Lr");
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

    /** The governing strength or service value of one effect, recorded as a step. */
    public record Governing(double value, Combination combination) {}

    public static Governing govern(boolean strength, String key, String what, double d, double l, double lr, boolean halfAllowed,
                                   Quantity q, Clause lrfd, Clause asd, RecordBuilder rec) {
        Combination best = null;
        double bestV = 0;
        for (Combination c : GRAVITY) {
            if (c.strength() != strength) continue;
            double v = c.apply(d, l, lr, halfAllowed);
            if (best == null || Math.abs(v) > Math.abs(bestV)) { best = c; bestV = v; }
        }
        String sub = "";
        if (rec.writesText()) {
            double fl = best.halfL && halfAllowed ? 0.5 : best.l;
            sub = Display.sig3(best.d) + " × " + rec.num(d, q);
            if (fl != 0) sub += " + " + Display.sig3(fl) + " × " + rec.num(l, q);
            if (best.lr != 0) sub += " + " + Display.sig3(best.lr) + " × " + rec.num(lr, q);
        }
        rec.step(key, (strength ? "Factored " : "Service ") + what + ", " + best.name + " governs", best.formula(halfAllowed, rec), sub,
                bestV, q, strength ? lrfd : asd);
        return new Governing(bestV, best);
    }
}
