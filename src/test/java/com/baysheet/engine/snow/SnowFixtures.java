package com.baysheet.engine.snow;

import com.baysheet.engine.code.Editions;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;

/** Builders for the snow tests: a site with C_e = C_t = I_s = 1.0 from the tables, a roof by its slope. */
final class SnowFixtures {
    private SnowFixtures() {}

    static final CalcContext US = CalcContext.of(UnitSystem.US), SI = CalcContext.of(UnitSystem.SI);
    static final CalcContext US_7_10 = US.withEdition(Editions.builtIn().get("ASCE 7-10"));

    /** Terrain C partially exposed (C_e 1.0), heated (C_t 1.0), risk category II (I_s 1.0). */
    static SnowSite unit(double pg) {
        return new SnowSite(pg, Exposure.of(Exposure.Terrain.C, Exposure.Shelter.PARTIALLY),
                Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.II));
    }

    static SnowSite site(double pg, Thermal.Condition t, Importance.RiskCategory rc) {
        return new SnowSite(pg, Exposure.of(Exposure.Terrain.C, Exposure.Shelter.PARTIALLY), Thermal.of(t), Importance.of(rc));
    }

    static SnowRoof flat() { return SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 0, false, Double.NaN); }

    /** The rise in in/ft (US) or percent (SI) of a roof of the given angle. */
    static double rise(UnitSystem sys, double deg) {
        return (sys == UnitSystem.US ? 12 : 100) * Math.tan(Math.toRadians(deg));
    }

    record Run(SnowLoads loads, CalcRecord record) {
        double step(String symbol) { return record.step(symbol).result(); }

        boolean hasStep(String symbol) { return record.steps().stream().anyMatch(s -> s.symbol().equals(symbol)); }

        boolean caution(String ref) {
            return record.notes().stream().anyMatch(n -> n.level() == Note.Level.CAUTION && n.clause().ref().equals(ref));
        }
    }

    static Run run(CalcContext ctx, SnowSite site, SnowRoof roof) {
        RecordBuilder rec = new RecordBuilder("Roof", ctx.edition().id(), ctx.system());
        SnowLoads l = RoofSnow.calculate(ctx, site, roof, rec);
        return new Run(l, rec.build());
    }
}
