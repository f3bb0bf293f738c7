package com.baysheet.bench;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

/**
 * One member calculation with its full record, and a batch of 10,000 varied members (simple beams, overhangs,
 * cantilevers and columns), on one thread. Run with {@code mvn -B -ntp -Pbench compile exec:java
 * -Dexec.args="EngineBenchmark -f 1 -wi 3 -i 5"}; see docs/benchmarks.md.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
public class EngineBenchmark {
    static final int BATCH = 10_000;

    CalcContext ctx;
    MemberInput officeBeam;
    List<MemberInput> members;

    @Setup
    public void setUp() {
        ctx = CalcContext.of(UnitSystem.US);
        officeBeam = MemberInput.beam("B-1", MemberKind.INTERIOR_BEAM, new Support.Simple(30),
                List.of(new AreaStrip("office", 10, 0, 30, 65)));
        Random r = new Random(20240601);
        String[] floors = {"office", "retail-upper", "school-classroom", "storage-heavy", "assembly-other"};
        members = new ArrayList<>(BATCH);
        for (int i = 0; i < BATCH; i++) {
            String occ = floors[r.nextInt(floors.length)];
            double span = 10 + r.nextInt(30);
            members.add(switch (i % 4) {
                case 0 -> MemberInput.beam("B" + i, MemberKind.INTERIOR_BEAM, new Support.Simple(span),
                        List.of(new AreaStrip(occ, 4 + r.nextInt(8), 0, span, 60)));
                case 1 -> MemberInput.beam("E" + i, MemberKind.EDGE_BEAM, new Support.Overhang(span, 2 + r.nextInt(6)),
                        List.of(new AreaStrip(occ, 4 + r.nextInt(8), 0, span, 60)));
                case 2 -> MemberInput.beam("K" + i, MemberKind.CANTILEVER_BEAM, new Support.Cantilever(4 + r.nextInt(8)),
                        List.of(new AreaStrip(occ, 3, 0, 4, 60)));
                default -> MemberInput.column("C" + i, MemberKind.INTERIOR_COLUMN, 1 + r.nextInt(6),
                        List.of(new AreaLoad(occ, 200 + r.nextInt(2000), 80)));
            });
        }
    }

    @Benchmark
    public MemberResult oneMember() {
        return MemberCalculation.calculate(ctx, officeBeam);
    }

    /** The member with its full record written (what a page or sheet asks for). */
    @Benchmark
    public Object oneMemberWithRecord() {
        return MemberCalculation.calculate(ctx, officeBeam).record();
    }

    /** Reported per member: the batch time divided by its size. Numbers only (the framing model's path). */
    @Benchmark
    @OperationsPerInvocation(BATCH)
    public void tenThousandMembers(Blackhole bh) {
        for (MemberInput m : members) bh.consume(MemberCalculation.calculate(ctx, m));
    }

    /** The same batch with every record written. */
    @Benchmark
    @OperationsPerInvocation(BATCH)
    public void tenThousandMembersWithRecord(Blackhole bh) {
        for (MemberInput m : members) bh.consume(MemberCalculation.calculate(ctx, m).record());
    }
}
