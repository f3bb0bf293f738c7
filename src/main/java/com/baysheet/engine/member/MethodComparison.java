package com.baysheet.engine.member;

import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.LiveFactors;
import com.baysheet.engine.reduction.ReductionMethods;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A member's floor live load under every reduction method its project could choose, beside the project's own: the
 * same loads and areas, reduced by each method. Only the reduction differs; the member's record, its actions and
 * its combinations stay those of the project's own method and edition.
 */
public final class MethodComparison {
    private MethodComparison() {}

    /**
     * One method's outcome.
     *
     * @param id        the method id a project stores ("" for the edition's own)
     * @param own       the project's own method
     * @param factor    the factor the reducible loads take together (Σ f L0 A / Σ L0 A)
     * @param unreduced the floor live load on the member, unreduced (lb or kN; a column's axial load, a beam's total)
     * @param reduced   the same reduced by this method
     */
    public record Row(String id, String title, boolean own, double factor, double unreduced, double reduced) {
        public double ratio() { return unreduced > 0 ? reduced / unreduced : 1; }
    }

    /** The rows, the project's own method first; empty where the member carries no floor live load. */
    public static List<Row> of(CalcContext ctx, MemberInput in) {
        List<Row> out = new ArrayList<>();
        String own = ctx.floorMethod() == null ? "" : ctx.floorMethod();
        Map<String, CalcContext> all = ReductionMethods.applicable(ctx);
        List<String> order = new ArrayList<>(List.of(own));
        for (String id : all.keySet()) if (!id.equals(own)) order.add(id);
        for (String id : order) {
            CalcContext c = all.get(id);
            LoadBook book = LoadBook.of(c, in);
            if (book.floorAreas.isEmpty()) return List.of();
            RecordBuilder rec = RecordBuilder.numbersOnly(in.subject(), c.edition().id(), c.system());
            var method = ReductionMethods.of(c);
            LiveFactors lf = method.reduce(c, in.kind(), book.floorAreas, in.floors(), in.floorsSupported(), in.support().span(),
                    book.supportedDead, rec);
            double unreduced = 0, reduced = 0;
            for (var e : book.live.entrySet()) {
                Double f = lf.bySource().get(e.getKey());
                if (f == null) continue; // roof and line-load live: no floor method reaches them
                double w = e.getValue().total();
                unreduced += w;
                reduced += f * w;
            }
            out.add(new Row(id, method.title(c), id.equals(own), lf.factor(), unreduced, reduced));
        }
        return out;
    }
}
