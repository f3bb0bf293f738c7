package com.baysheet.bench;

import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.Rederivation;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Function;

/**
 * A one-bay edit followed by the member page's derivation, on the varied plan of {@link FramingBenchmark} at 24
 * levels: the building is derived after a bay's dead load changes on one floor, then the edited bay's first infill
 * beam has its record written (what its page renders). Two ways: the whole building derived
 * ({@link Derivation#derive}) and derived again from the previous state ({@link Rederivation}). The edit alternates
 * between two dead loads, so each run is a real change. Not a test: prints milliseconds per edit (docs/benchmarks.md,
 * One-bay edit). Run, after building the class path as for the sheet benchmark:
 * {@code java -Xmx4g -cp target/classes:$(cat target/bench.cp) com.baysheet.bench.EditTiming [levels] [runs]}.
 */
public final class EditTiming {
    private EditTiming() {}

    public static void main(String[] args) {
        int levels = args.length > 0 ? Integer.parseInt(args[0]) : 24, runs = args.length > 1 ? Integer.parseInt(args[1]) : 6;
        Building plain = FramingBenchmark.varied(levels);
        List<Level> keyed = new ArrayList<>();
        for (int k = 0; k < plain.levels().size(); k++) keyed.add(plain.levels().get(k).withKey("L" + (k + 1)));
        Building a = new Building(plain.name(), plain.context(), plain.grid(), keyed), b = edited(a, levels / 2, 5, 7);
        String member = "L" + (levels / 2) + "-bay" + 5 + "x" + 7 + "-b1";
        Rederivation again = new Rederivation();
        report("full derivation", time(Derivation::derive, a, b, member, runs));
        again.derive(a);
        report("derived again", time(again::derive, a, b, member, runs * 3));
    }

    /** Building {@code a} with the dead load of the bay at (col, row) on level {@code level} (1 the lowest) raised by 5. */
    static Building edited(Building a, int level, int col, int row) {
        List<Level> levels = new ArrayList<>(a.levels());
        Level l = levels.get(level - 1);
        List<Bay> bays = new ArrayList<>(l.bays());
        for (int k = 0; k < bays.size(); k++) {
            Bay x = bays.get(k);
            if (x.col() == col && x.row() == row)
                bays.set(k, new Bay(col, row, x.occupancy(), x.deadLoad() + 5, x.framing(), false, x.cantilevers(), x.cantileverOccupancy()));
        }
        levels.set(level - 1, new Level(l.name(), l.elevation(), l.roof(), l.roofSlope(), bays, l.key(), l.surface()));
        return new Building(a.name(), a.context(), a.grid(), levels);
    }

    /** ms of each edit: derive the other state, then write the edited member's record. The first two are warm-up. */
    private static double[] time(Function<Building, Derived> derive, Building a, Building b, String member, int runs) {
        double[] ms = new double[runs];
        for (int k = -2; k < runs; k++) {
            Building next = (k & 1) == 0 ? b : a;
            long t0 = System.nanoTime();
            Derived d = derive.apply(next);
            int steps = d.member(member).orElseThrow().result().record().steps().size();
            double took = (System.nanoTime() - t0) / 1e6;
            if (k >= 0) ms[k] = took;
            if (steps == 0) throw new IllegalStateException("a record without steps");
        }
        return ms;
    }

    private static void report(String what, double[] ms) {
        double[] s = ms.clone();
        Arrays.sort(s);
        System.out.printf("%s: median %.1f ms, min %.1f ms, max %.1f ms over %d edits%n", what, s[s.length / 2], s[0], s[s.length - 1], s.length);
    }
}
