package com.baysheet.engine.record;

/**
 * One line of a hand calculation: what is computed, the symbolic formula, the numbers substituted,
 * the result at full precision in the system base unit {@code unit}, the shown text in {@code shownUnit}
 * (the sheet unit), and the clause that allows it.
 */
public record Step(String symbol, String description, String formula, String substituted,
                   double result, String unit, String shown, String shownUnit, Clause clause) {}
