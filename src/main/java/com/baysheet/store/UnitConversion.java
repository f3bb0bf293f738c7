package com.baysheet.store;

import com.baysheet.project.Project;
import com.baysheet.engine.InputError;
import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.List;

/**
 * Converts an existing project between US and SI units: every stored length, slope, pressure and load per length
 * is multiplied (US to SI) or divided (SI to US) by the exact factor of {@link Convert}, and the project's unit
 * system changes, in one model change. The results change with it, since an SI project uses the SI values printed in
 * the tables and the SI forms of the equations; the change supersedes every issued sheet whose calculation it alters.
 */
public final class UnitConversion {
    /** A stored number, where its rows are found from the project id, and what kind of value it is. */
    private record Column(String table, String column, String rowsOf, Quantity quantity) {}

    private static final String PROJECT = "id = :project";
    private static final String GRID = "project_id = :project";
    private static final String LEVEL = "project_id = :project";
    private static final String ON_LEVELS = "level_id IN (SELECT id FROM building_level WHERE project_id = :project)";

    /** Every number a project stores in its unit system (the firm's self weights are kept in plf and converted on reading). */
    private static final List<Column> COLUMNS = List.of(
            new Column("project", "ground_snow", PROJECT, Quantity.PRESSURE),
            new Column("grid_line", "spacing_after", GRID, Quantity.LENGTH),
            new Column("building_level", "elevation", LEVEL, Quantity.LENGTH),
            new Column("building_level", "roof_slope", LEVEL, Quantity.SLOPE),
            new Column("building_level", "eave_to_ridge", LEVEL, Quantity.LENGTH),
            new Column("bay", "dead_load", ON_LEVELS, Quantity.PRESSURE),
            new Column("bay", "cantilever_north", ON_LEVELS, Quantity.LENGTH),
            new Column("bay", "cantilever_south", ON_LEVELS, Quantity.LENGTH),
            new Column("bay", "cantilever_east", ON_LEVELS, Quantity.LENGTH),
            new Column("bay", "cantilever_west", ON_LEVELS, Quantity.LENGTH),
            new Column("line_load", "dead_load", ON_LEVELS, Quantity.LINE_LOAD),
            new Column("line_load", "dead_pressure", ON_LEVELS, Quantity.PRESSURE),
            new Column("line_load", "height", ON_LEVELS, Quantity.LENGTH),
            new Column("line_load", "live_load", ON_LEVELS, Quantity.LINE_LOAD),
            new Column("point_load", "x_offset", ON_LEVELS, Quantity.LENGTH),
            new Column("point_load", "y_offset", ON_LEVELS, Quantity.LENGTH),
            new Column("point_load", "dead_load", ON_LEVELS, Quantity.FORCE),
            new Column("point_load", "live_load", ON_LEVELS, Quantity.FORCE),
            new Column("project", "sw_infill_beam", PROJECT, Quantity.LINE_LOAD),
            new Column("project", "sw_grid_beam", PROJECT, Quantity.LINE_LOAD),
            new Column("project", "sw_girder", PROJECT, Quantity.LINE_LOAD),
            new Column("project", "sw_column", PROJECT, Quantity.LINE_LOAD),
            new Column("member_weight", "weight", GRID, Quantity.LINE_LOAD));

    private final ModelWrites writes;

    public UnitConversion(ModelWrites writes) {
        this.writes = writes;
    }

    /** Converts the project to {@code to}; refused when it is in that system already. */
    public Project convert(Editor who, long projectId, long version, UnitSystem to) {
        return writes.change(who, c -> "project converted from " + ProjectStore.find(c, projectId).info().units() + " to " + to
                + " units (exact factors)", projectId, version, c -> {
            UnitSystem from = ProjectStore.find(c, projectId).info().units();
            if (from == to) throw new InputError("units", to, "is already the project's unit system");
            for (Column col : COLUMNS) scale(c, col, projectId, from);
            // a cladding load stays the product of its weight per area and its height, as entered
            try (Handle h = Sql.on(c)) {
                h.createUpdate("UPDATE line_load SET dead_load = dead_pressure * height WHERE "
                        + "dead_pressure IS NOT NULL AND height IS NOT NULL AND " + ON_LEVELS).bind("project", projectId).execute();
                h.createUpdate("UPDATE project SET unit_system = :units WHERE id = :project")
                        .bind("units", to.name()).bind("project", projectId).execute();
            }
            return ProjectStore.find(c, projectId);
        });
    }

    /** US to SI multiplies by the factor, SI to US divides by it (as {@link Convert#toSi} and {@link Convert#toUs} do). */
    private static void scale(Connection c, Column col, long projectId, UnitSystem from) throws SQLException {
        String op = from == UnitSystem.US ? " * :factor" : " / :factor";
        try (Handle h = Sql.on(c)) {
            h.createUpdate("UPDATE " + col.table() + " SET " + col.column() + " = " + col.column()
                            + op + " WHERE " + col.column() + " IS NOT NULL AND " + col.rowsOf())
                    .bind("factor", Convert.toSi(col.quantity(), 1.0)).bind("project", projectId).execute();
        }
    }
}
