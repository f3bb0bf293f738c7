package com.baysheet.web.entry;

import com.baysheet.engine.units.Unit;

import java.math.BigDecimal;
import java.math.MathContext;

/** A value read from a field, shown back beside it with its unit ("= 25.5 ft"), to six significant figures. */
public final class Shown {
    private Shown() {}

    public static String of(double value, Unit unit) {
        String n = value == 0 ? "0" : new BigDecimal(value).round(new MathContext(6)).stripTrailingZeros().toPlainString();
        return "= " + n + " " + unit.symbol();
    }
}
