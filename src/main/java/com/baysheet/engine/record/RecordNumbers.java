package com.baysheet.engine.record;

import java.util.Arrays;

/**
 * What a numbers-only pass keeps of a record: each result's key, value and label and each step's symbol and value,
 * in parallel arrays in the order written. The framing model reads thousands of members this way; a member someone
 * reads has its full {@link CalcRecord} written by the same calculation. No text beyond keys and labels, no objects
 * per step.
 */
public final class RecordNumbers {
    private String[] keys = new String[48], labels = new String[48], symbols = new String[48];
    private double[] values = new double[48], results = new double[48];
    private int nr, ns;

    void result(String key, String label, double value) {
        if (nr == keys.length) {
            keys = Arrays.copyOf(keys, nr * 2);
            labels = Arrays.copyOf(labels, nr * 2);
            values = Arrays.copyOf(values, nr * 2);
        }
        keys[nr] = key;
        labels[nr] = label;
        values[nr++] = value;
    }

    void step(String symbol, double result) {
        if (ns == symbols.length) {
            symbols = Arrays.copyOf(symbols, ns * 2);
            results = Arrays.copyOf(results, ns * 2);
        }
        symbols[ns] = symbol;
        results[ns++] = result;
    }

    /** A result by key (the first of that key, as {@link CalcRecord#result} reads it), or NaN when absent. */
    public double result(String key) {
        int i = indexOf(keys, nr, key);
        return i < 0 ? Double.NaN : values[i];
    }

    /** The label of a result, or "" when absent. */
    public String label(String key) {
        int i = indexOf(keys, nr, key);
        return i < 0 ? "" : labels[i];
    }

    /** A step's result by symbol, or NaN when the calculation had no such step. */
    public double step(String symbol) {
        int i = indexOf(symbols, ns, symbol);
        return i < 0 ? Double.NaN : results[i];
    }

    private static int indexOf(String[] in, int n, String key) {
        for (int i = 0; i < n; i++) if (in[i].equals(key)) return i;
        return -1;
    }
}
