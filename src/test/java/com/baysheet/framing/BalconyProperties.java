package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Giving cantilever slabs their own occupancy moves their area from one load source to another, never adds
 * or loses any: over random models (see {@link Buildings#random}), the slabs' area arrives at the columns
 * exactly once, under the balcony rows, and the level's whole floored area still sums on the columns.
 */
class BalconyProperties {
    private static double tol(double a) { return 1e-9 * Math.max(1, a); }

    @Property(tries = 200)
    void cantileverAreaReachesTheColumnsOnceUnderTheBalconyRows(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b);
        for (Level l : b.levels()) {
            double balcony = 0, columnsBalcony = 0, columnsAll = 0;
            for (Bay bay : l.bays()) {
                if (bay.opening() || !Buildings.cantileverUse(bay).startsWith("balcony:")) continue;
                for (Map.Entry<Side, Double> c : bay.cantilevers().entrySet())
                    balcony += c.getValue() * (c.getKey() == Side.NORTH || c.getKey() == Side.SOUTH
                            ? b.grid().x().spacing(bay.col()) : b.grid().y().spacing(bay.row()));
            }
            for (DerivedMember m : d.onLevel(l.name())) {
                if (m.role() != MemberRole.COLUMN) continue;
                for (Map.Entry<String, Double> e : m.areas().entrySet()) {
                    columnsAll += e.getValue();
                    if (e.getKey().startsWith("balcony:")) columnsBalcony += e.getValue();
                }
            }
            double floored = Buildings.flooredArea(b.grid(), l);
            assertThat(columnsBalcony).as("balcony area on %s, seed %d", l.name(), seed).isCloseTo(balcony, within(tol(balcony)));
            assertThat(columnsAll).as("floored area on %s, seed %d", l.name(), seed).isCloseTo(floored, within(tol(floored)));
        }
    }

    @Property(tries = 60)
    void everyMemberCarryingBalconyAreaSaysSoOnItsRecord(@ForAll long seed) {
        Derived d = Derivation.derive(Buildings.random(seed));
        for (DerivedMember m : d.members()) {
            // a column also carries the areas of the levels above: read them from its record
            var areas = m.role() == MemberRole.COLUMN ? Loads.recordAreas(m.result().record()) : m.areas();
            long balconies = areas.keySet().stream().filter(k -> k.startsWith("balcony:")).count();
            long notes = m.result().record().notes().stream().filter(n -> n.text().startsWith("Balcony or deck serving")).count();
            assertThat(notes).as("%s, seed %d", m.id(), seed).isEqualTo(balconies);
        }
    }
}
