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

    /** One of the firm's occupancies by its id; an id the firm has not is not found. */
    public FirmOccupancy find(String id) {
        return sql.tx(c -> find(c, id));
    }

    /**
     * The projects whose model uses the occupancy (a bay, its cantilever slabs as the occupancy's balcony, a line or
     * point load's live load), as "job number name", by job number.
     */
    public List<String> usedBy(String id) {
        return sql.tx(c -> usedBy(c, id));
    }

    /**
     * New values for one of the firm's occupancies (its id stays). Every project that uses it computes with them from
     * now on: the catalogue version moves, so every result is computed again; the caller names the issued sheets it
     * changed in each project's audit entry ({@link ProjectStore#firmChanged}).
     */
    public void update(Editor who, FirmOccupancy o) {
        sql.tx(c -> {
            Instant at = sql.now();
            FirmOccupancy was = find(c, o.id());
            try (Handle h = Sql.on(c)) {
                h.createUpdate("UPDATE firm_occupancy SET name = :name, unit_system = :units, uniform_load = :uniform, "
                                + "concentrated_load = :concentrated, contact_side = :contactSide, reduction_rule = :rule, "
                                + "assembly = :assembly WHERE id = :id")
                        .bind("id", o.id()).bind("name", o.name()).bind("units", o.units().name()).bind("uniform", o.uniform())
                        .bind("concentrated", o.concentrated()).bind("contactSide", o.contactSide()).bind("rule", o.rule().name())
                        .bind("assembly", o.assembly()).execute();
                bumpCatalogue(h);
            }
            ModelWrites.append(c, who, "occupancy catalogue", "occupancy changed: " + o.id() + " " + describe(o)
                    + "; was: " + describe(was) + "; used by: " + listed(usedBy(c, o.id())), at);
            return null;
        });
    }

    /** Removes one of the firm's occupancies that no project uses; one in use is refused, naming the projects. */
    public void delete(Editor who, String id) {
        sql.tx(c -> {
            FirmOccupancy was = find(c, id);
            List<String> users = usedBy(c, id);
            if (!users.isEmpty())
                throw new InputError("occupancy", id, "is used by " + String.join(", ", users)
                        + ": change those bays and loads to another occupancy first");
            try (Handle h = Sql.on(c)) {
                h.createUpdate("DELETE FROM firm_occupancy WHERE id = :id").bind("id", id).execute();
                bumpCatalogue(h);
            }
            ModelWrites.append(c, who, "occupancy catalogue", "occupancy removed: " + id + " " + describe(was), sql.now());
            return null;
        });
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
                bumpCatalogue(h);
            }
            // a new id changes no existing bay's load, so nothing issued is superseded
            ModelWrites.append(c, who, "occupancy catalogue", "occupancy added: " + o.id() + " " + o.name(), at);
            return null;
        });
    }

    private static void bumpCatalogue(Handle h) {
        h.createUpdate("UPDATE firm_state SET catalogue_version = catalogue_version + 1 WHERE id = 1").execute();
    }

    private static FirmOccupancy find(Connection c, String id) {
        return findAll(c).stream().filter(o -> o.id().equals(id)).findFirst().orElseThrow(() -> new NotFound("occupancy", id));
    }

    private static List<String> usedBy(Connection c, String id) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT DISTINCT p.job_number, p.name FROM project p JOIN building_level l ON l.project_id = p.id "
                            + "WHERE EXISTS (SELECT 1 FROM bay b WHERE b.level_id = l.id AND (b.occupancy = :id OR b.cantilever_occupancy IN (:id, :balcony))) "
                            + "OR EXISTS (SELECT 1 FROM line_load w WHERE w.level_id = l.id AND w.live_occupancy IN (:id, :balcony)) "
                            + "OR EXISTS (SELECT 1 FROM point_load q WHERE q.level_id = l.id AND q.live_occupancy IN (:id, :balcony)) "
                            + "ORDER BY p.job_number")
                    .bind("id", id).bind("balcony", com.baysheet.engine.code.BalconyRule.PREFIX + id)
                    .map((rs, ctx) -> rs.getString("job_number") + " " + rs.getString("name")).list();
        }
    }

    private static String describe(FirmOccupancy o) {
        return o.name() + ", " + o.units() + " " + o.uniform() + " uniform, " + o.concentrated() + " concentrated on a "
                + o.contactSide() + " side, " + o.rule() + (o.assembly() ? ", assembly" : "");
    }

    private static String listed(List<String> projects) {
        return projects.isEmpty() ? "no project" : String.join(", ", projects);
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
