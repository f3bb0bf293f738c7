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
import com.baysheet.sheet.CalcPackage;
import com.baysheet.sheet.FramingSheets;
import com.baysheet.sheet.MemberSheet;
import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.sheet.SheetRenderer;
import com.baysheet.sheet.StreamedPdf;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.io.OutputStream;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * The sheet budgets of docs/benchmarks.md: one member sheet warm (at most 50 ms) and a 500-member project package streamed to a
 * discarding stream (at most 10 s) in a JVM capped at 512 MB of heap, so that holding the package whole
 * would show as an OutOfMemoryError. The building: 6 × 5 bays of 30 ft × 25 ft, two infill beams a bay,
 * three office floors under a roof, trimmed to 500 member sheets.
 * Run: {@code mvn -B -ntp -Pbench compile exec:java -Dexec.args="SheetBenchmark -f 1 -wi 3 -i 5 -prof gc"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xmx512m"})
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class SheetBenchmark {
    static final int MEMBERS = 500;

    private MemberSheet girder;
    private CalcPackage pkg;

    @Setup
    public void setUp() {
        Derived d = Derivation.derive(building());
        SheetHeader h = new SheetHeader("Bench Structural", "Bench Building", "B-500", "Project package", "JQR",
                LocalDate.of(2025, 5, 28), "MKL", LocalDate.of(2025, 5, 30), "A", LocalDate.of(2025, 6, 2));
        CalcPackage all = FramingSheets.project(h, d, List.of());
        if (all.sheets().size() < MEMBERS) throw new IllegalStateException("only " + all.sheets().size() + " members");
        pkg = new CalcPackage(all.header(), all.title(), all.criteria(), all.sheets().subList(0, MEMBERS), all.takeDowns(), List.of());
        girder = all.sheets().stream().filter(s -> s.group().equals("Girders")).findFirst().orElseThrow();
    }

    @Benchmark
    public int memberSheet() {
        return SheetRenderer.issued(girder).bytes().length;
    }

    @Benchmark
    @Warmup(iterations = 1)
    @Measurement(iterations = 3)
    public StreamedPdf package500() {
        return PackageRenderer.render(pkg, OutputStream.nullOutputStream(), PackageRenderer.Progress.NONE);
    }

    static Building building() {
        Grid g = new Grid(axis("x", 7, 30), axis("y", 6, 25));
        List<Level> levels = new ArrayList<>();
        for (int k = 1; k <= 3; k++) levels.add(Level.floor("Level " + (k + 1), 14.0 * k, bays(g, "office", 65)));
        levels.add(Level.roof("Roof", 56, 0.25, bays(g, "roof-ordinary", 25)));
        return new Building("Bench Building", CalcContext.of(UnitSystem.US), g, levels);
    }

    private static List<Bay> bays(Grid g, String occupancy, double dead) {
        List<Bay> out = new ArrayList<>();
        for (int c = 0; c < g.x().cells(); c++)
            for (int r = 0; r < g.y().cells(); r++) out.add(Bay.floor(c, r, occupancy, dead, new Framing(Direction.X, 2)));
        return out;
    }

    private static GridAxis axis(String axis, int lines, double spacing) {
        List<String> names = new ArrayList<>();
        List<Double> s = new ArrayList<>();
        for (int i = 0; i < lines; i++) names.add(axis.equals("x") ? String.valueOf(i + 1) : String.valueOf((char) ('A' + i)));
        for (int i = 1; i < lines; i++) s.add(spacing);
        return new GridAxis(axis, names, s);
    }
}
