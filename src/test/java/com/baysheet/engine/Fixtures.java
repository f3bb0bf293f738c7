package com.baysheet.engine;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.units.UnitSystem;

import java.util.List;

/** Small builders shared by the engine tests, so that each test states only what it varies. */
public final class Fixtures {
    private Fixtures() {}

    public static final CalcContext US = CalcContext.of(UnitSystem.US);
    public static final CalcContext SI = CalcContext.of(UnitSystem.SI);

    /** A simple-span beam carrying one strip of one occupancy over its whole span. */
    public static MemberInput beam(MemberKind kind, double span, String occupancy, double width, double dead) {
        return MemberInput.beam("B", kind, new Support.Simple(span), List.of(new AreaStrip(occupancy, width, 0, span, dead)));
    }

    public static MemberInput beam(Support support, List<AreaStrip> strips, List<PointLoad> points, double roofSlope, double ei) {
        return new MemberInput("B", MemberKind.INTERIOR_BEAM, support, 1, strips, List.of(), points, 0, roofSlope, ei, false);
    }

    /** A column carrying the given areas over {@code floors} floors, with a roof slope where a roof acts. */
    public static MemberInput column(MemberKind kind, int floors, double roofSlope, AreaLoad... areas) {
        return new MemberInput("C", kind, new Support.Axial(), floors, List.of(), List.of(areas), List.of(), 0, roofSlope,
                Double.NaN, false);
    }

    public static CalcRecord calc(CalcContext ctx, MemberInput in) {
        return MemberCalculation.calculate(ctx, in).record();
    }

    /** The result of a step by its symbol. */
    public static double step(CalcRecord r, String symbol) { return r.step(symbol).result(); }

    public static boolean hasStep(CalcRecord r, String symbol) {
        return r.steps().stream().anyMatch(s -> s.symbol().equals(symbol));
    }
}
