package com.baysheet.engine.record;

/**
 * One line of a hand calculation: what is computed, the symbolic formula, the numbers substituted,
 * the result (full precision, in the system base unit) with its sheet unit and shown text, and the
 * clause that allows it.
 */
public record Step(String symbol, String description, String formula, String substituted,
                   double result, String unit, String shown, Clause clause) {}
