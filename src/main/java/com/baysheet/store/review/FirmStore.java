package com.baysheet.store.review;

import com.baysheet.project.Firm;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Sql;

import org.jdbi.v3.core.Handle;

/** The one row of firm settings, changed only over the version the form was opened at. */
public final class FirmStore {
    private final Sql sql;

    public FirmStore(Sql sql) {
        this.sql = sql;
    }

    public Firm get() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT firm_name, logo_text, default_edition, sw_infill_beam, sw_grid_beam, sw_girder, "
                                + "sw_column, version FROM firm_setting WHERE id = 1")
                        .map((rs, ctx) -> new Firm(rs.getString(1), rs.getString(2), rs.getString(3), rs.getDouble(4),
                                rs.getDouble(5), rs.getDouble(6), rs.getDouble(7), rs.getLong(8)))
                        .one();
            }
        });
    }

    public void update(Firm f, AuditEvent event) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                int changed = h.createUpdate("UPDATE firm_setting SET firm_name = :name, logo_text = :logoText, "
                                + "default_edition = :edition, sw_infill_beam = :infillBeam, sw_grid_beam = :gridBeam, "
                                + "sw_girder = :girder, sw_column = :column, version = version + 1 WHERE id = 1 AND version = :version")
                        .bind("name", f.name()).bind("logoText", f.logoText()).bind("edition", f.defaultEdition())
                        .bind("infillBeam", f.infillBeamWeight()).bind("gridBeam", f.gridBeamWeight())
                        .bind("girder", f.girderWeight()).bind("column", f.columnWeight()).bind("version", f.version())
                        .execute();
                if (changed == 0) throw new ConcurrentChange("The firm's settings");
            }
            AuditTrail.append(c, event, sql.now());
            return null;
        });
    }
}
