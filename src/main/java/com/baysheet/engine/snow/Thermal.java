package com.baysheet.engine.snow;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * The thermal factor C_t: from the edition's thermal table by the condition of the roof, or given directly.
 *
 * @param given C_t given directly, or NaN where the table is used
 */
public record Thermal(Condition condition, double given) {
    /** Rows of the thermal factor table (ASCE 7-16 Table 7.3-2). */
    public enum Condition {
        /** All structures except those below. */
        HEATED,
        /** Kept just above freezing, or a cold ventilated roof over heated space with the table's thermal resistance. */
        COLD_VENTILATED,
        /** Unheated and open-air structures. */
        UNHEATED,
        FREEZER,
        /** Continuously heated greenhouse with a roof of low thermal resistance. */
        GREENHOUSE
    }

    public Thermal {
        if (Double.isNaN(given)) Check.present("thermalCondition", condition);
        else {
            Check.positive("thermalFactor", given);
            if (condition != null) throw new InputError("thermalFactor", given, "is given directly: leave the thermal condition empty");
        }
    }

    public static Thermal of(Condition condition) { return new Thermal(condition, Double.NaN); }

    public static Thermal given(double ct) {
        com.baysheet.engine.Check.positive("thermalFactor", ct); // NaN here would otherwise mean "from the table"
        return new Thermal(null, ct);
    }

    public boolean fromTable() { return Double.isNaN(given); }
}
