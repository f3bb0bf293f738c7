package com.baysheet.store;

import com.baysheet.framing.Derivation;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;
import com.baysheet.project.Model;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.time.Clock;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The audit entry's list of what a change did to a model: each difference by its path, an unchanged level left out. */
class ModelDiffTest {
    static Database db;
    static Model demo;

    @BeforeAll
    static void open() {
        db = Database.open(TestDatabases.h2());
        Store store = Store.on(db.dataSource(), Derivation::derive, Clock.systemUTC());
        demo = store.results().of(Demo.loadIfEmpty(store).get(0).id()).model();
    }

    @AfterAll
    static void close() { db.close(); }

    @Test
    void theSameModelHasNoDifferences() {
        assertThat(ModelDiff.between(demo, demo)).isEmpty();
    }

    @Test
    void aBaysDeadLoadIsNamedByItsLevelAndBayAndNothingElseIs() {
        Level l = demo.building().levels().get(1);
        Bay x = l.bays().get(2);
        List<Bay> bays = new ArrayList<>(l.bays());
        bays.set(2, new Bay(x.col(), x.row(), x.occupancy(), x.deadLoad() + 5, x.framing(), x.opening(), x.cantilevers(), x.cantileverOccupancy()));
        Model after = with(demo, 1, new Level(l.name(), l.elevation(), l.roof(), l.roofSlope(), bays, l.key(), l.surface()));
        assertThat(ModelDiff.between(demo, after))
                .isEqualTo("changed: building.levels[1].bays[2].deadLoad: " + x.deadLoad() + " → " + (x.deadLoad() + 5));
    }

    @Test
    void aLevelRemovedIsNamedWhole() {
        List<Level> levels = new ArrayList<>(demo.building().levels());
        Level gone = levels.remove(levels.size() - 1);
        Building b = demo.building();
        Model after = new Model(demo.project(), demo.catalogueVersion(), new Building(b.name(), b.context(), b.grid(), levels,
                b.selfWeights(), b.lineLoads(), b.pointLoads()), demo.levels(), demo.unframed(), demo.firmVersion());
        assertThat(ModelDiff.between(demo, after))
                .startsWith("changed: building.levels[" + levels.size() + "]: {")
                .contains("\"name\":\"" + gone.name() + "\"")
                .endsWith(" → (none)");
    }

    private static Model with(Model m, int k, Level l) {
        Building b = m.building();
        List<Level> levels = new ArrayList<>(b.levels());
        levels.set(k, l);
        return new Model(m.project(), m.catalogueVersion(), new Building(b.name(), b.context(), b.grid(), levels, b.selfWeights(),
                b.lineLoads(), b.pointLoads()), m.levels(), m.unframed(), m.firmVersion());
    }
}
