package com.baysheet.engine.member;

import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;

import java.util.LinkedHashSet;
import java.util.Set;

/** Cautions every record carries, and flags on numbers and clause labels a firm should confirm. */
final class Cautions {
    private Cautions() {}

    static final String REVIEW = "Results must be checked by a licensed engineer; the adopted local code and its amendments govern.";

    static void standard(CalcContext ctx, LoadBook book, RecordBuilder rec) {
        Set<String> ids = new LinkedHashSet<>(book.floorAreas.keySet());
        ids.addAll(book.roofAreas.keySet());
        for (String id : ids) {
            Occupancy o = ctx.catalogue().get(id);
            if (o.confidence().equals("uncertain"))
                rec.caution(o.name() + ": catalogue values are uncertain; confirm them against the adopted code.",
                        ctx.edition().clause("loads.table"));
            if (o.confidence().equals("firm"))
                rec.caution(o.name() + ": a row of the firm's own catalogue, not of the code table.", Clause.NONE);
        }
        rec.caution(REVIEW, Clause.NONE);
    }
}
