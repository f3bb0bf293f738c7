package com.baysheet.bench;

import com.baysheet.framing.Derived;
import com.baysheet.framing.Rederivation;
import com.baysheet.framing.Typicals;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Typical members grouped after a one-bay edit, on the varied plan of {@link FramingBenchmark} at 24 levels (the edit
 * of {@link EditTiming}): from the last grouping ({@code Typicals.grouped(d, last)}, what a model write does) against
 * from nothing ({@code Typicals.of(d)}). Not a test: prints milliseconds (docs/benchmarks.md, One-bay edit). Run, after
 * building the class path as for the sheet benchmark:
 * {@code java -Xmx3g -cp target/classes:$(cat target/bench.cp) com.baysheet.bench.GroupingTiming [runs]}.
 */
public final class GroupingTiming {
    private GroupingTiming() {}

    public static void main(String[] args) {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 20;
        Building plain = FramingBenchmark.varied(24);
        List<Level> keyed = new ArrayList<>();
        for (int k = 0; k < plain.levels().size(); k++) keyed.add(plain.levels().get(k).withKey("L" + (k + 1)));
        Building a = new Building(plain.name(), plain.context(), plain.grid(), keyed), b = EditTiming.edited(a, 12, 5, 7);
        Rederivation again = new Rederivation();
        Derived d = again.derive(a);
        Typicals.Grouping last = Typicals.grouped(d, null);
        double[] from = new double[runs], whole = new double[runs];
        for (int k = -4; k < runs; k++) {
            d = again.derive((k & 1) == 0 ? b : a);
            long t0 = System.nanoTime();
            last = Typicals.grouped(d, last);
            long t1 = System.nanoTime();
            int groups = Typicals.of(d).size();
            long t2 = System.nanoTime();
            if (groups != last.groups().size()) throw new IllegalStateException("the groups differ");
            if (k >= 0) {
                from[k] = (t1 - t0) / 1e6;
                whole[k] = (t2 - t1) / 1e6;
            }
        }
        System.out.printf("%,d members, %,d groups%n", d.members().size(), last.groups().size());
        report("from the last grouping", from);
        report("from nothing", whole);
    }

    private static void report(String what, double[] ms) {
        double[] s = ms.clone();
        Arrays.sort(s);
        System.out.printf("%s: median %.1f ms, min %.1f ms, max %.1f ms over %d edits%n", what, s[s.length / 2], s[0], s[s.length - 1], s.length);
    }
}
