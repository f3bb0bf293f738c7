package com.baysheet.store.review;

import com.baysheet.project.Firm;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Sql;

import java.sql.PreparedStatement;
import java.sql.ResultSet;

/** The one row of firm settings, changed only over the version the form was opened at. */
public final class FirmStore {
    private final Sql sql;

    public FirmStore(Sql sql) {
        this.sql = sql;
    }

    public Firm get() {
        return sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement(
                    "SELECT firm_name, logo_text, default_edition, sw_infill_beam, sw_grid_beam, sw_girder, sw_column, version "
                            + "FROM firm_setting WHERE id = 1");
                 ResultSet rs = ps.executeQuery()) {
                rs.next();
                return new Firm(rs.getString(1), rs.getString(2), rs.getString(3), rs.getDouble(4), rs.getDouble(5),
                        rs.getDouble(6), rs.getDouble(7), rs.getLong(8));
            }
        });
    }

    public void update(Firm f, AuditEvent event) {
        sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement("UPDATE firm_setting SET firm_name = ?, logo_text = ?, "
                    + "default_edition = ?, sw_infill_beam = ?, sw_grid_beam = ?, sw_girder = ?, sw_column = ?, version = version + 1 "
                    + "WHERE id = 1 AND version = ?")) {
                ps.setString(1, f.name());
                ps.setString(2, f.logoText());
                ps.setString(3, f.defaultEdition());
                ps.setDouble(4, f.infillBeamWeight());
                ps.setDouble(5, f.gridBeamWeight());
                ps.setDouble(6, f.girderWeight());
                ps.setDouble(7, f.columnWeight());
                ps.setLong(8, f.version());
                if (ps.executeUpdate() == 0) throw new ConcurrentChange("The firm's settings");
            }
            AuditTrail.append(c, event, sql.now());
            return null;
        });
    }
}
