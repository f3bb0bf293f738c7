package com.baysheet.store;

import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Limits;

import java.util.function.Function;

/**
 * The one way a project's framing model (grid, levels, bays) changes: in one transaction, claim the next
 * version (refusing a stale one), apply the change, then derive the changed building so that a model the
 * derivation refuses (a bay outside the grid, a cantilever on an interior edge) is rolled back with the
 * derivation's error and nothing is saved. The model's bounds ({@link Limits}) are checked the same way.
 */
public final class ModelWrites {
    private final Sql sql;
    private final Function<Building, Derived> derive;

    public ModelWrites(Sql sql, Function<Building, Derived> derive) {
        this.sql = sql;
        this.derive = derive;
    }

    public <T> T change(long projectId, long version, Sql.Work<T> work) {
        return sql.tx(c -> {
            ProjectStore.touch(c, projectId, version);
            T result = work.run(c);
            Model m = BuildingMapper.load(c, projectId);
            Limits.check(m.building());
            Limits.count("levels", m.levels().size(), Limits.MAX_LEVELS, "levels in a project");
            for (StoredLevel l : m.levels())
                Limits.level(m.project().info().units(), l.info().elevation(), l.info().roof(), l.info().roofSlope());
            if (!m.building().levels().isEmpty() || !m.building().lineLoads().isEmpty())
                Limits.count("members", derive.apply(m.building()).members().size(), Limits.MAX_MEMBERS, "members in a project");
            return result;
        });
    }

    Sql sql() { return sql; }
}
