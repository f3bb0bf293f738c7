package com.baysheet.bench;

import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Building;

import java.lang.management.ManagementFactory;
import java.util.Arrays;

/**
 * The full derivation of {@link FramingBenchmark}'s buildings timed without JMH, for a quick before-and-after and for
 * profiling (docs/benchmarks.md, Framing). Not a test: prints the median and spread of ms per derivation and the bytes
 * allocated per derivation. Run, after building the class path as for the sheet benchmark:
 * {@code java -Xmx4g -cp target/classes:$(cat target/bench.cp) com.baysheet.bench.FramingTiming varied 6,24,60 5}.
 */
public final class FramingTiming {
    private FramingTiming() {}

    public static void main(String[] args) {
        String plan = args.length > 0 ? args[0] : "varied";
        String[] levels = (args.length > 1 ? args[1] : "6,24,60").split(",");
        int runs = args.length > 2 ? Integer.parseInt(args[2]) : 5;
        var threads = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long self = Thread.currentThread().getId();
        for (String l : levels) {
            int n = Integer.parseInt(l.trim());
            Building b = plan.equals("uniform") ? FramingBenchmark.uniform(n) : FramingBenchmark.varied(n);
            for (int w = 0; w < 2; w++) Derivation.derive(b);
            double[] ms = new double[runs];
            long bytes = 0;
            int members = 0;
            for (int r = 0; r < runs; r++) {
                long a0 = threads.getThreadAllocatedBytes(self), t0 = System.nanoTime();
                Derived d = Derivation.derive(b);
                ms[r] = (System.nanoTime() - t0) / 1e6;
                bytes += threads.getThreadAllocatedBytes(self) - a0;
                members = d.members().size();
            }
            Arrays.sort(ms);
            System.out.printf("%s %d levels: %d members, median %.1f ms (%.1f to %.1f), %.0f MB allocated per derivation%n",
                    plan, n, members, ms[runs / 2], ms[0], ms[runs - 1], bytes / 1e6 / runs);
        }
    }
}
