package com.baysheet.store;

import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.Thermal;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;

/** A project's snow site in its columns (all NULL for no snow). */
final class SnowColumns {
    private SnowColumns() {}

    static final String NAMES = "ground_snow, snow_terrain, snow_exposure, snow_exposure_factor, snow_thermal, "
            + "snow_thermal_factor, snow_risk_category";
    static final String SETS = "ground_snow = ?, snow_terrain = ?, snow_exposure = ?, snow_exposure_factor = ?, "
            + "snow_thermal = ?, snow_thermal_factor = ?, snow_risk_category = ?";
    static final int COUNT = 7;

    /** Binds the seven columns from {@code i}; returns the next index. */
    static int bind(PreparedStatement ps, int i, SnowSite s) throws SQLException {
        Exposure e = s == null ? null : s.exposure();
        Thermal t = s == null ? null : s.thermal();
        number(ps, i++, s == null ? Double.NaN : s.groundLoad());
        ps.setString(i++, e == null || !e.fromTable() ? null : e.terrain().name());
        ps.setString(i++, e == null || !e.fromTable() ? null : e.shelter().name());
        number(ps, i++, e == null || e.fromTable() ? Double.NaN : e.given());
        ps.setString(i++, t == null || !t.fromTable() ? null : t.condition().name());
        number(ps, i++, t == null || t.fromTable() ? Double.NaN : t.given());
        ps.setString(i++, s == null ? null : s.importance().category().name());
        return i;
    }

    static SnowSite read(ResultSet rs) throws SQLException {
        double pg = rs.getDouble("ground_snow");
        if (rs.wasNull()) return null;
        double ce = rs.getDouble("snow_exposure_factor");
        Exposure e = rs.wasNull() ? Exposure.of(Exposure.Terrain.valueOf(rs.getString("snow_terrain")),
                Exposure.Shelter.valueOf(rs.getString("snow_exposure"))) : Exposure.given(ce);
        double ct = rs.getDouble("snow_thermal_factor");
        Thermal t = rs.wasNull() ? Thermal.of(Thermal.Condition.valueOf(rs.getString("snow_thermal"))) : Thermal.given(ct);
        return new SnowSite(pg, e, t, Importance.of(Importance.RiskCategory.valueOf(rs.getString("snow_risk_category"))));
    }

    private static void number(PreparedStatement ps, int i, double v) throws SQLException {
        if (Double.isNaN(v)) ps.setNull(i, Types.DOUBLE);
        else ps.setDouble(i, v);
    }
}
