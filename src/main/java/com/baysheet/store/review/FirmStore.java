package com.baysheet.store.review;

import com.baysheet.project.Firm;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Sql;

import org.jdbi.v3.core.Handle;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;

/** The one row of firm settings, changed only over the version the form was opened at. */
public final class FirmStore {
    private final Sql sql;

    public FirmStore(Sql sql) {
        this.sql = sql;
    }

    public Firm get() {
        return sql.tx(c -> {
            try (PreparedStatement st = c.prepareStatement("SELECT " + COLUMNS_OF_F + " FROM firm_setting f WHERE f.id = 1");
                 ResultSet rs = st.executeQuery()) {
                if (!rs.next()) throw new IllegalStateException("the firm settings row is missing (migration V100 makes it)");
                return read(rs, 1);
            }
        });
    }

    /** The settings' columns of a query where the firm's row is {@code f}, in the order {@link #read} reads them. */
    public static final String COLUMNS_OF_F = "f.firm_name, f.logo_text, f.default_edition, f.sw_infill_beam, f.sw_grid_beam, "
            + "f.sw_girder, f.sw_column, f.version";

    /** The settings read from the columns {@link #COLUMNS_OF_F} from {@code first} on; null where the row is absent (a null version). */
    public static Firm read(ResultSet rs, int first) throws SQLException {
        long version = rs.getLong(first + 7);
        if (rs.wasNull()) return null;
        return new Firm(rs.getString(first), rs.getString(first + 1), rs.getString(first + 2), rs.getDouble(first + 3),
                rs.getDouble(first + 4), rs.getDouble(first + 5), rs.getDouble(first + 6), version);
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
