package com.baysheet.engine.load;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.MemberKind;

import java.util.List;

/**
 * One floor a column supports: the floor's name, the column's place on that floor (its Table 4.7-1 row, so
 * its K_LL there) and the floor areas tributary to the column on that floor. A column over several floors
 * whose place differs from floor to floor (a cantilever slab on some floors only) is reduced with the
 * influence area Σ K_LL,i A_T,i over these floors.
 *
 * @param areas floor (not roof) area by occupancy on this floor, ft² or m²; together more than 0
 */
public record SupportedFloor(String name, MemberKind kind, List<AreaShare> areas) {
    public SupportedFloor {
        Check.text("name", name);
        Check.present("kind", kind);
        if (!kind.isColumn())
            throw new InputError("kind", kind.name(), "a supported floor takes a column kind (INTERIOR_COLUMN, EXTERIOR_COLUMN, "
                    + "EDGE_COLUMN_CANTILEVER or CORNER_COLUMN_CANTILEVER)");
        areas = List.copyOf(areas);
        double a = 0;
        for (AreaShare s : areas) a += s.area();
        if (!(a > 0)) throw new InputError("areas", a, "a supported floor brings some floor area to the column");
    }

    /** Total floor area on this floor, ft² or m². */
    public double area() {
        double a = 0;
        for (AreaShare s : areas) a += s.area();
        return a;
    }

    /**
     * Whether the floors call for the per-floor influence area: some floor's K_LL differs from the member's
     * own. Where every floor shares the member's K_LL, the sum is K_LL × ΣA_T, and the record stays as for one K_LL.
     */
    public static boolean kllVaries(Edition edition, MemberKind member, List<SupportedFloor> floors) {
        double k = edition.kll(member);
        for (SupportedFloor f : floors) if (edition.kll(f.kind()) != k) return true;
        return false;
    }
}
