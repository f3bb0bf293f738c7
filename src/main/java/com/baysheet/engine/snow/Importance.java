package com.baysheet.engine.snow;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * The snow importance factor I_s: from the edition's importance table by risk category, or given directly.
 *
 * @param given I_s given directly, or NaN where the table is used
 */
public record Importance(RiskCategory category, double given) {
    public enum RiskCategory { I, II, III, IV }

    public Importance {
        if (Double.isNaN(given)) Check.present("riskCategory", category);
        else {
            Check.positive("snowImportanceFactor", given);
            if (category != null) throw new InputError("snowImportanceFactor", given, "is given directly: leave the risk category empty");
        }
    }

    public static Importance of(RiskCategory category) { return new Importance(category, Double.NaN); }

    public static Importance given(double is) {
        com.baysheet.engine.Check.positive("snowImportanceFactor", is); // NaN here would otherwise mean "from the table"
        return new Importance(null, is);
    }

    public boolean fromTable() { return Double.isNaN(given); }
}
