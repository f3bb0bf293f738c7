package com.baysheet.engine.record;

/** A named value on a record (an input or a result), full precision and as shown. */
public record Entry(String key, String label, double value, String unit, String shown) {}
