package com.baysheet.bench;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.Occupancy;
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
 * cantilevers and columns), on one thread, and the one member's numbers as bare arithmetic for the ratio. Run with
 * {@code mvn -B -ntp -Pbench compile exec:exec -Dbench="EngineBenchmark -f 1 -wi 3 -i 5 -w 2s -r 2s -t 1"}; see docs/benchmarks.md.
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
    /** The baseline's inputs, read from fields so that the compiler cannot fold them, and its output slots. */
    double[] bare;
    final double[] bareOut = new double[BareMember.SLOTS];

    @Setup
    public void setUp() {
        ctx = CalcContext.of(UnitSystem.US);
        officeBeam = MemberInput.beam("B-1", MemberKind.INTERIOR_BEAM, new Support.Simple(BareMember.SPAN),
                List.of(new AreaStrip("office", BareMember.WIDTH, 0, BareMember.SPAN, BareMember.DEAD)));
        Occupancy office = ctx.catalogue().get("office");
        bare = new double[] {BareMember.SPAN, BareMember.WIDTH, BareMember.DEAD, office.uniform(ctx.system()),
                ctx.edition().kll(MemberKind.INTERIOR_BEAM), office.concentrated(ctx.system()), office.contactSide(ctx.system()),
                ctx.constant("threshold"), ctx.edition().constant("limit.oneFloor")};
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

    /**
     * The same member's numbers as bare arithmetic ({@link BareMember}: the formulas inline, plain doubles, no record):
     * the floor under the engine's numbers pass, which the engine's figure is given as a ratio of.
     */
    @Benchmark
    public void oneMemberBareArithmetic(Blackhole bh) {
        double[] in = bare;
        BareMember.calculate(in[0], in[1], in[2], in[3], in[4], in[5], in[6], in[7], in[8], bareOut);
        bh.consume(bareOut);
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
