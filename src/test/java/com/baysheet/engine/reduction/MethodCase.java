package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.UnitSystem;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** One call of a chosen floor method, keeping its record, for the method tests. */
final class MethodCase {
    final CalcContext ctx;
    RecordBuilder rec;

    MethodCase(String method, UnitSystem units) {
        ctx = CalcContext.of(units).withFloorMethod(method);
    }

    /** The reduction of the given areas ("id", area, ...), with D per unit area over the whole area (0 for none). */
    LiveFactors reduce(MemberKind kind, int floors, double span, double dead, Object... idAndArea) {
        return reduce(kind, floors, span, dead, List.of(), idAndArea);
    }

    LiveFactors reduce(MemberKind kind, int floors, double span, double dead, List<SupportedFloor> byFloor, Object... idAndArea) {
        Map<String, Double> areas = new LinkedHashMap<>();
        double total = 0;
        for (int i = 0; i < idAndArea.length; i += 2) {
            double a = ((Number) idAndArea[i + 1]).doubleValue();
            areas.merge((String) idAndArea[i], a, Double::sum);
            total += a;
        }
        rec = new RecordBuilder("T", ctx.edition().id(), ctx.system());
        SupportedDead d = dead > 0 ? new SupportedDead(dead * total, total) : SupportedDead.NONE;
        return ReductionMethods.of(ctx).reduce(ctx, kind, areas, byFloor, floors, span, d, rec);
    }

    CalcRecord record() { return rec.build(); }
}
