package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.FirmOccupancy;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
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
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO firm_occupancy (id, name, unit_system, "
                    + "uniform_load, concentrated_load, contact_side, reduction_rule, assembly, created_at) "
                    + "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
                ps.setString(1, o.id());
                ps.setString(2, o.name());
                ps.setString(3, o.units().name());
                ps.setDouble(4, o.uniform());
                ps.setDouble(5, o.concentrated());
                ps.setDouble(6, o.contactSide());
                ps.setString(7, o.rule().name());
                ps.setBoolean(8, o.assembly());
                ps.setObject(9, Sql.stamp(at));
                ps.executeUpdate();
            }
            try (PreparedStatement ps = c.prepareStatement(
                    "UPDATE firm_state SET catalogue_version = catalogue_version + 1 WHERE id = 1")) {
                ps.executeUpdate();
            }
            // a new id changes no existing bay's load, so nothing issued is superseded
            ModelWrites.append(c, who, "occupancy catalogue", "occupancy added: " + o.id() + " " + o.name(), at);
            return null;
        });
    }

    static OccupancyCatalogue catalogue(Connection c) throws SQLException {
        OccupancyCatalogue cat = OccupancyCatalogue.builtIn();
        for (FirmOccupancy o : findAll(c)) cat = cat.with(o.occupancy());
        return cat;
    }

    static long catalogueVersion(Connection c) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT catalogue_version FROM firm_state WHERE id = 1");
             ResultSet rs = ps.executeQuery()) {
            rs.next();
            return rs.getLong(1);
        }
    }

    private static List<FirmOccupancy> findAll(Connection c) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT * FROM firm_occupancy ORDER BY id");
             ResultSet rs = ps.executeQuery()) {
            List<FirmOccupancy> out = new ArrayList<>();
            while (rs.next())
                out.add(new FirmOccupancy(rs.getString("id"), rs.getString("name"),
                        UnitSystem.valueOf(rs.getString("unit_system")), rs.getDouble("uniform_load"),
                        rs.getDouble("concentrated_load"), rs.getDouble("contact_side"),
                        ReductionRule.valueOf(rs.getString("reduction_rule")), rs.getBoolean("assembly")));
            return out;
        }
    }
}
