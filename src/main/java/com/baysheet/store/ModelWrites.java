package com.baysheet.store;

import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Building;

import java.util.function.Function;

/**
 * The one way a project's framing model (grid, levels, bays) changes: in one transaction, claim the next
 * version (refusing a stale one), apply the change, then derive the changed building so that a model the
 * derivation refuses (a bay outside the grid, a cantilever on an interior edge) is rolled back with the
 * derivation's error and nothing is saved.
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
            if (!m.building().levels().isEmpty()) derive.apply(m.building());
            return result;
        });
    }

    Sql sql() { return sql; }
}
