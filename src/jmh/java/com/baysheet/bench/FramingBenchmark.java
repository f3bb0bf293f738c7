package com.baysheet.bench;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Full recompute of a 24 × 24-bay building, 6 to 60 levels (the framing figures of docs/benchmarks.md). Two plans:
 * <ul>
 * <li>{@code uniform}: equal 30 ft × 25 ft bays, office floors, slab spanning between grid beams (no infill
 * beams): about 600 beams a level, the issue's "35,000 beams and girders" at 60 levels;</li>
 * <li>{@code varied}: unequal spacings, two infill beams a bay in alternating directions, a corridor strip,
 * retail at the ground, a parking level, a cantilever edge, an opening and a sloped roof: about 2,300 beams
 * and girders a level, and far fewer repeated members.</li>
 * </ul>
 * Run: {@code mvn -B -ntp -Pbench compile exec:java -Dexec.args="FramingBenchmark -f 1 -wi 2 -i 3 -prof gc"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xmx6g"})
@Warmup(iterations = 2)
@Measurement(iterations = 3)
public class FramingBenchmark {
    static final int BAYS = 24;

    @Param({"6", "12", "24", "48", "60"})
    public int levels;

    @Param({"uniform", "varied"})
    public String plan;

    private Building building;

    @Setup
    public void setUp() {
        building = plan.equals("uniform") ? uniform(levels) : varied(levels);
    }

    @Benchmark
    public Derived fullRecompute() {
        return Derivation.derive(building);
    }

    static Building uniform(int levels) {
        Grid g = new Grid(axis("x", "", spacings(30, 0)), axis("y", "Y", spacings(25, 0)));
        List<Level> out = new ArrayList<>();
        for (int k = 1; k <= levels; k++) {
            List<Bay> bays = new ArrayList<>();
            for (int c = 0; c < BAYS; c++)
                for (int r = 0; r < BAYS; r++) bays.add(Bay.floor(c, r, "office", 60, new Framing(Direction.X, 0)));
            out.add(Level.floor("F" + k, 13.0 * k, bays));
        }
        return new Building("uniform", CalcContext.of(UnitSystem.US), g, out);
    }

    static Building varied(int levels) {
        Grid g = new Grid(axis("x", "", spacings(28, 7)), axis("y", "Y", spacings(24, 5)));
        List<Level> out = new ArrayList<>();
        for (int k = 1; k <= levels; k++) {
            boolean roof = k == levels, parking = k == 2, ground = k == 1;
            List<Bay> bays = new ArrayList<>();
            for (int c = 0; c < BAYS; c++)
                for (int r = 0; r < BAYS; r++) {
                    if (!roof && c >= 10 && c <= 11 && r >= 10 && r <= 11) { bays.add(Bay.opening(c, r)); continue; }
                    String use = roof ? "roof-ordinary" : parking ? "garage-passenger" : ground ? "retail-first"
                            : r == 12 ? "office-corridor" : (c + r + k) % 11 == 0 ? "storage-light" : "office";
                    Framing f = new Framing((c + r) % 2 == 0 ? Direction.X : Direction.Y, 2);
                    Bay b = Bay.floor(c, r, use, roof ? 25 : 55 + (c % 3) * 5, f);
                    if (r == 0 && !roof) b = b.withCantilever(Side.SOUTH, 6);
                    bays.add(b);
                }
            out.add(roof ? Level.roof("R", 13.0 * k, 0.5, bays) : Level.floor("F" + k, 13.0 * k, bays));
        }
        return new Building("varied", CalcContext.of(UnitSystem.US), g, out);
    }

    /** {@code base} ft, plus up to {@code spread} ft varying from bay to bay. */
    private static double[] spacings(double base, int spread) {
        double[] s = new double[BAYS];
        for (int i = 0; i < BAYS; i++) s[i] = base + (spread == 0 ? 0 : (i * 5 % (spread + 1)));
        return s;
    }

    private static GridAxis axis(String axis, String prefix, double[] spacings) {
        List<String> names = new ArrayList<>();
        List<Double> s = new ArrayList<>();
        for (int i = 0; i <= spacings.length; i++) names.add(prefix + (i + 1));
        for (double d : spacings) s.add(d);
        return new GridAxis(axis, names, s);
    }
}
