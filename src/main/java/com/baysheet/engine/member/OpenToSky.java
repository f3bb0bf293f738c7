package com.baysheet.engine.member;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.record.RecordBuilder;

import java.util.List;

/**
 * The caution on a member of a floor level (not a roof) some of whose tributary bays no higher level covers: a
 * terrace, a podium, a top floor not marked as a roof. Such a bay is open to the sky, yet as a floor it carries its
 * floor occupancy only, with no roof live load and no snow, and nothing else would say so. Our choice: the roof live
 * part is cautioned in any case (every project has roof live load); the snow part only where the project has a snow
 * site (without one no snow is applied anywhere).
 */
public final class OpenToSky {
    private OpenToSky() {}

    static void record(CalcContext ctx, MemberInput in, RecordBuilder rec) {
        caution(ctx, in.openToSky(), in.kind().isColumn(), rec);
    }

    /**
     * @param where  the floor levels' bays open to the sky that the member carries, each as the framing names them
     *               ("every bay of F2", "bays A-B/1-2, B-C/1-2 of F1"): the level's, not the member's own, so that
     *               identical members keep identical records
     * @param column the record is a column's or a column take-down's
     */
    public static void caution(CalcContext ctx, List<String> where, boolean column, RecordBuilder rec) {
        if (where.isEmpty()) return;
        Edition ed = ctx.edition();
        boolean snow = ctx.snow() != null;
        String loads = snow ? "no roof live load and no snow" : "no roof live load";
        rec.caution("Open to the sky: this " + (column ? "column" : "member") + " carries floor bays that no higher level covers ("
                + String.join("; ", where) + "). A floor level carries its floor occupancy only: " + loads + " is applied there."
                + " Where a bay is open to the sky, model it as a roof level (the roof rows of " + ed.clause("loads.table").label()
                + (snow ? ", and the roof's snow" : "") + ") or, where people use it (a terrace, a roof garden), as an occupiable"
                + " roof (" + ed.clause("roof.occupiable").label() + ").", ed.clause("roof.occupiable"));
    }
}
