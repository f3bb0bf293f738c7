package com.baysheet.store;

import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.Thermal;

import org.jdbi.v3.core.statement.SqlStatement;

import java.sql.ResultSet;
import java.sql.SQLException;

/** A project's snow site in its columns (all NULL for no snow). */
final class SnowColumns {
    private SnowColumns() {}

    static final String NAMES = "ground_snow, snow_terrain, snow_exposure, snow_exposure_factor, snow_thermal, "
            + "snow_thermal_factor, snow_risk_category";
    static final String VALUES = ":groundSnow, :snowTerrain, :snowExposure, :snowExposureFactor, :snowThermal, "
            + ":snowThermalFactor, :snowRiskCategory";
    static final String SETS = "ground_snow = :groundSnow, snow_terrain = :snowTerrain, snow_exposure = :snowExposure, "
            + "snow_exposure_factor = :snowExposureFactor, snow_thermal = :snowThermal, snow_thermal_factor = :snowThermalFactor, "
            + "snow_risk_category = :snowRiskCategory";

    /** Binds the seven columns by the names of {@link #VALUES} and {@link #SETS}: a factor read from a table is NULL. */
    static <S extends SqlStatement<S>> S bind(S st, SnowSite s) {
        Exposure e = s == null ? null : s.exposure();
        Thermal t = s == null ? null : s.thermal();
        return st.bind("groundSnow", Sql.orNull(s == null ? Double.NaN : s.groundLoad()))
                .bind("snowTerrain", e == null || !e.fromTable() ? null : e.terrain().name())
                .bind("snowExposure", e == null || !e.fromTable() ? null : e.shelter().name())
                .bind("snowExposureFactor", Sql.orNull(e == null || e.fromTable() ? Double.NaN : e.given()))
                .bind("snowThermal", t == null || !t.fromTable() ? null : t.condition().name())
                .bind("snowThermalFactor", Sql.orNull(t == null || t.fromTable() ? Double.NaN : t.given()))
                .bind("snowRiskCategory", s == null ? null : s.importance().category().name());
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
}
