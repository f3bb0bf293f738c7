package com.baysheet.framing;

import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.SelfWeights;
import com.baysheet.framing.schedule.ColumnSchedules;
import com.baysheet.framing.schedule.LoadSchedule;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Conservation on the printed table: the dead loads of the foundation reactions add up to every dead load put
 * on the building (the bays' dead load × floored area, cantilever slabs included, and every member's self
 * weight), each reaching the foundation once; the total row is that sum.
 */
class FoundationScheduleProperties {
    @Property(tries = 80)
    void foundationDeadLoadsSumToEveryDeadLoadApplied(@ForAll long seed) {
        Random rnd = new Random(seed);
        SelfWeights w = new SelfWeights(rnd.nextInt(60), rnd.nextInt(60), rnd.nextInt(120), rnd.nextInt(200), "firm default");
        Building b = Buildings.random(seed).withSelfWeights(w);
        Derived d = Derivation.derive(b);
        double applied = 0;
        for (Level l : b.levels()) applied += DerivationProperties.deadLoad(b, l);
        List<Level> up = new ArrayList<>(b.levels());
        up.sort(Comparator.comparingDouble(Level::elevation));
        for (DerivedMember m : d.members())
            applied += switch (m.role()) {
                case INFILL_BEAM -> w.infillBeam() * m.span();
                case GRID_BEAM -> w.gridBeam() * m.span();
                case GIRDER -> w.girder() * m.span();
                case COLUMN -> w.column() * storeyBelow(up, m.level());
            };

        LoadSchedule f = ColumnSchedules.foundations(d);
        int dead = f.column("D");
        double rows = 0;
        for (int r = 0; r < f.rows().size() - 1; r++) rows += (Double) f.rows().get(r).get(dead);
        List<Object> total = f.rows().get(f.rows().size() - 1);
        double tol = 1e-9 * Math.max(1, applied);
        assertThat(rows).as("seed %d", seed).isCloseTo(applied, within(tol));
        assertThat(total.get(0)).isEqualTo("Total");
        assertThat((Double) total.get(dead)).as("seed %d", seed).isCloseTo(applied, within(tol));
        assertThat(f.rows()).hasSize(d.takeDowns().size() + 1);
    }

    private static double storeyBelow(List<Level> ascending, String level) {
        for (int k = 0; k < ascending.size(); k++)
            if (ascending.get(k).name().equals(level))
                return k == 0 ? Math.max(0, ascending.get(0).elevation()) : ascending.get(k).elevation() - ascending.get(k - 1).elevation();
        throw new AssertionError(level);
    }
}
