package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.FirmOccupancy;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.time.Instant;
import java.util.List;

/**
 * The firm's own occupancies, added to the built-in catalogue for every project. Each change bumps the
 * catalogue version, which is part of the key of cached results.
 */
public final class OccupancyStore {
    private final Sql sql;

    public OccupancyStore(Sql sql) {
        this.sql = sql;
    }

    public List<FirmOccupancy> findAll() {
        return sql.tx(OccupancyStore::findAll);
    }

    /** The built-in catalogue with the firm's rows. */
    public OccupancyCatalogue catalogue() {
        return sql.tx(OccupancyStore::catalogue);
    }

    public void add(Editor who, FirmOccupancy o) {
        sql.tx(c -> {
            Instant at = sql.now();
            if (OccupancyCatalogue.builtIn().contains(o.id()))
                throw new InputError("id", o.id(), "is a built-in occupancy; choose another id");
            for (FirmOccupancy other : findAll(c))
                if (other.id().equals(o.id())) throw new Duplicate("id", o.id(), "is already one of the firm's occupancies");
            try (Handle h = Sql.on(c)) {
                h.createUpdate("INSERT INTO firm_occupancy (id, name, unit_system, uniform_load, concentrated_load, contact_side, "
                                + "reduction_rule, assembly, created_at) VALUES (:id, :name, :units, :uniform, :concentrated, :contactSide, "
                                + ":rule, :assembly, :createdAt)")
                        .bind("id", o.id()).bind("name", o.name()).bind("units", o.units().name()).bind("uniform", o.uniform())
                        .bind("concentrated", o.concentrated()).bind("contactSide", o.contactSide()).bind("rule", o.rule().name())
                        .bind("assembly", o.assembly()).bind("createdAt", Sql.stampOf(at))
                        .execute();
                h.createUpdate("UPDATE firm_state SET catalogue_version = catalogue_version + 1 WHERE id = 1").execute();
            }
            // a new id changes no existing bay's load, so nothing issued is superseded
            ModelWrites.append(c, who, "occupancy catalogue", "occupancy added: " + o.id() + " " + o.name(), at);
            return null;
        });
    }

    static OccupancyCatalogue catalogue(Connection c) {
        OccupancyCatalogue cat = OccupancyCatalogue.builtIn();
        for (FirmOccupancy o : findAll(c)) cat = cat.with(o.occupancy());
        return cat;
    }

    static long catalogueVersion(Connection c) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT catalogue_version FROM firm_state WHERE id = 1").mapTo(Long.class).one();
        }
    }

    private static List<FirmOccupancy> findAll(Connection c) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT * FROM firm_occupancy ORDER BY id").map((rs, ctx) -> new FirmOccupancy(rs.getString("id"),
                    rs.getString("name"), UnitSystem.valueOf(rs.getString("unit_system")), rs.getDouble("uniform_load"),
                    rs.getDouble("concentrated_load"), rs.getDouble("contact_side"),
                    ReductionRule.valueOf(rs.getString("reduction_rule")), rs.getBoolean("assembly"))).list();
        }
    }
}
