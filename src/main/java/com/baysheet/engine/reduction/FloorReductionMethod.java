package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;

import java.util.List;
import java.util.Map;

/**
 * A floor live load reduction method. A new method (the IBC alternative, EN 1991-1-1, NBC) is an edition in
 * editions.json naming it, plus one implementation registered in {@link ReductionMethods}.
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

    /** One K_LL throughout: the member's own. */
    default LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, int floors, double span,
                               RecordBuilder record) {
        return reduce(ctx, kind, areas, List.of(), floors, span, record);
    }
}
