package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.Occupancy;

/**
 * Where the partition allowance of ASCE 7-16 4.3.2 is waived: on floors whose L0 reaches the edition's
 * {@code partition.exempt}. Editions differ at the threshold itself (from memory): ASCE 7-10 waives it only
 * where L0 exceeds 80 psf, ASCE 7-16 where L0 is 80 psf or more; the data says which
 * ({@code partition.exemptAtThreshold}: 1 or 0). The one place the comparison is made, for the loads and the record.
 */
public final class PartitionAllowance {
    private PartitionAllowance() {}

    /** True where the edition waives the allowance on this occupancy's L0 (roofs never take one). */
    public static boolean waived(CalcContext ctx, Occupancy o) {
        double l0 = o.uniform(ctx.system()), exempt = ctx.constant("partition.exempt");
        return atThreshold(ctx) ? l0 >= exempt : l0 > exempt;
    }

    /** How the record words the waiver: "at least" or "over" the threshold. */
    static String wording(CalcContext ctx) { return atThreshold(ctx) ? "at least" : "over"; }

    private static boolean atThreshold(CalcContext ctx) {
        double v = ctx.edition().constant("partition.exemptAtThreshold");
        if (v != 0 && v != 1)
            throw new IllegalStateException(ctx.edition().id() + ": partition.exemptAtThreshold must be 0 or 1, not " + v);
        return v == 1;
    }
}
