package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;

import java.util.List;
import java.util.Map;

/**
 * A floor live load reduction method. The edition's own is named by its {@code floorMethod}; the others a project may
 * choose are data sets in the {@code floorMethods} block of editions.json, each naming one implementation registered
 * in {@link ReductionMethods}.
 */
public interface FloorReductionMethod {
    String id();

    /**
     * @param areas   floor tributary area by occupancy id (ft² or m²), roofs excluded
     * @param byFloor a column's floors, each with its own K_LL and areas (adding up to {@code areas}); empty for
     *                one K_LL throughout, the member's own
     * @param floors number of floors the member supports, at least 1
     * @param span   span for the one-way slab cap; ignored for other kinds
     */
    LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, List<SupportedFloor> byFloor,
                       int floors, double span, RecordBuilder record);

    /**
     * With the dead load that the tributary area brings, for a method that weighs it against the live load (the IBC
     * alternative's D/L0). A method that does not need it ignores it.
     */
    default LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, List<SupportedFloor> byFloor,
                               int floors, double span, SupportedDead dead, RecordBuilder record) {
        return reduce(ctx, kind, areas, byFloor, floors, span, record);
    }

    /** The method's name as a sheet prints it. */
    default String title(CalcContext ctx) { return ctx.edition().id() + " basic live load reduction"; }

    /** The clause the reduced floor live load cites on the record (the edition's equation, or the chosen method's). */
    default com.baysheet.engine.record.Clause clause(CalcContext ctx) { return ctx.edition().clause("reduction.eq"); }

    /** One K_LL throughout: the member's own. */
    default LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, int floors, double span,
                               RecordBuilder record) {
        return reduce(ctx, kind, areas, List.of(), floors, span, record);
    }
}
