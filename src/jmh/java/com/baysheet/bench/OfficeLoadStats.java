package com.baysheet.bench;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.Map;

/** Latencies and errors per kind of request, recorded by many threads, reported as percentiles. */
final class OfficeLoadStats {
    enum Kind { MEMBER_PAGE, OTHER_PAGE, FORM_SAVE, PDF }

    private final Map<Kind, long[]> nanos = new EnumMap<>(Kind.class);
    private final Map<Kind, int[]> counts = new EnumMap<>(Kind.class);
    private final Map<Kind, int[]> errors = new EnumMap<>(Kind.class);

    OfficeLoadStats(int capacity) {
        for (Kind k : Kind.values()) {
            nanos.put(k, new long[capacity]);
            counts.put(k, new int[1]);
            errors.put(k, new int[1]);
        }
    }

    synchronized void record(Kind k, long elapsedNanos, boolean ok) {
        int[] n = counts.get(k);
        long[] all = nanos.get(k);
        if (n[0] < all.length) all[n[0]] = elapsedNanos;
        n[0]++;
        if (!ok) errors.get(k)[0]++;
    }

    synchronized int total() {
        int t = 0;
        for (int[] n : counts.values()) t += n[0];
        return t;
    }

    synchronized int totalErrors() {
        int t = 0;
        for (int[] n : errors.values()) t += n[0];
        return t;
    }

    synchronized String table() {
        StringBuilder b = new StringBuilder(String.format("| %-11s | %7s | %6s | %8s | %8s | %8s | %8s |%n",
                "kind", "count", "errors", "p50 ms", "p90 ms", "p99 ms", "max ms"));
        b.append("|-------------|---------|--------|----------|----------|----------|----------|\n");
        for (Kind k : Kind.values()) {
            int n = Math.min(counts.get(k)[0], nanos.get(k).length);
            if (n == 0) continue;
            long[] s = Arrays.copyOf(nanos.get(k), n);
            Arrays.sort(s);
            b.append(String.format("| %-11s | %7d | %6d | %8.1f | %8.1f | %8.1f | %8.1f |%n", k.name().toLowerCase().replace('_', ' '),
                    counts.get(k)[0], errors.get(k)[0], ms(s, 0.50), ms(s, 0.90), ms(s, 0.99), s[n - 1] / 1e6));
        }
        return b.toString();
    }

    private static double ms(long[] sorted, double q) {
        return sorted[Math.min(sorted.length - 1, (int) Math.ceil(q * sorted.length) - 1)] / 1e6;
    }
}
