package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.project.Project;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.SnowInput;
import com.baysheet.project.StoredLevel;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.SqlStatement;
import org.jdbi.v3.core.statement.StatementContext;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

/** Projects: listing, creating, settings, and the version that guards every change to a project. */
public final class ProjectStore {
    private static final String COLUMNS = "id, version, job_number, name, address, client, edition, unit_system, "
            + "partition_allowance, reduce_partitions, uplift_reduced_dead, " + SnowColumns.NAMES + ", floor_method, archived";

    private final Sql sql;
    private final ModelWrites writes;

    public ProjectStore(ModelWrites writes) {
        this.sql = writes.sql();
        this.writes = writes;
    }

    /** The projects' submittal data: engineer of record, licence, building code as adopted. */
    public SubmittalStore submittals() { return new SubmittalStore(writes); }

    /** Every project, archived ones too, by job number. */
    public List<Project> findAll() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT " + COLUMNS + " FROM project ORDER BY job_number").map(ProjectStore::read).list();
            }
        });
    }

    /** The projects in this state (archived or current), by job number. */
    public List<Project> findAll(boolean archived) {
        return findAll().stream().filter(p -> p.archived() == archived).toList();
    }

    public Project find(long id) {
        return sql.tx(c -> find(c, id));
    }

    /** Creates a project with a starting grid (three lines each way), so that bays can be laid out at once. */
    public Project create(Editor who, ProjectInfo info) {
        return sql.tx(c -> {
            OffsetDateTime now = sql.stamp();
            Project p = find(c, insert(c, info, startingGrid(info.units()), now));
            ModelWrites.append(c, who, ModelWrites.subject(p), "project created: " + info.name(), now.toInstant());
            return p;
        });
    }

    /** Inserts a project at version 1 with this grid (every line a fresh id), refusing a job number in use; returns its id. */
    static long insert(Connection c, ProjectInfo info, Grid grid, OffsetDateTime now) throws SQLException {
        requireFreeJobNumber(c, info.jobNumber(), -1);
        long id;
        try (Handle h = Sql.on(c)) {
            id = bind(h.createUpdate("INSERT INTO project (version, job_number, name, address, client, edition, unit_system, "
                    + "partition_allowance, reduce_partitions, uplift_reduced_dead, " + SnowColumns.NAMES + ", floor_method, "
                    + "created_at, updated_at) VALUES (1, :jobNumber, :name, :address, :client, :edition, :units, :partitions, "
                    + ":reducePartitions, :upliftReducedDead, " + SnowColumns.VALUES + ", :floorMethod, :now, :now)"), info)
                    .bind("now", Sql.stampOf(now.toInstant()))
                    .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
        }
        GridStore.create(c, id, grid);
        return id;
    }

    /** After a change to the firm's settings: each project's marks, and the issued sheets it changed named in its audit entry (see ModelWrites). */
    public void firmChanged(Editor who, String action) {
        writes.firmChanged(who, action, findAll().stream().map(Project::id).toList());
    }

    /** Saves new settings over {@code version}; the unit system cannot change once the project has levels. */
    public Project update(Editor who, long id, long version, ProjectInfo info) {
        return writes.change(who, c -> "project settings saved: " + settings(info) + "; was: " + settings(find(c, id).info()), id, version, c -> {
            Project old = find(c, id);
            requireFreeJobNumber(c, info.jobNumber(), id);
            if (old.info().units() != info.units() && !LevelStore.findByProject(c, id).isEmpty())
                throw new InputError("units", info.units(), "cannot change once the project has levels: "
                        + "its lengths and loads are stored in " + old.info().units());
            for (StoredLevel l : LevelStore.findByProject(c, id)) SnowInput.checkRoof(info, l.info(), "groundSnow");
            try (Handle h = Sql.on(c)) {
                bind(h.createUpdate("UPDATE project SET job_number = :jobNumber, name = :name, address = :address, "
                        + "client = :client, edition = :edition, unit_system = :units, partition_allowance = :partitions, "
                        + "reduce_partitions = :reducePartitions, uplift_reduced_dead = :upliftReducedDead, " + SnowColumns.SETS
                        + ", floor_method = :floorMethod WHERE id = :id"), info).bind("id", id).execute();
            }
            return find(c, id);
        });
    }

    /** Whether any sheet or package of the project was ever issued: such a project cannot be deleted. */
    public boolean issued(long id) {
        return sql.tx(c -> com.baysheet.store.review.IssuedChanges.everIssued(c, id));
    }

    /**
     * Deletes a project that has never issued a sheet (one that has is refused, saying so), kept for 30 days as a
     * model file ({@link DeletedItems}); its reviews and audit subject stay with the office.
     */
    public void delete(Editor who, long id, long version) {
        int members = writes.members(id, null);
        sql.tx(c -> {
            touch(c, id, version, sql.now());
            Project p = find(c, id);
            if (com.baysheet.store.review.IssuedChanges.everIssued(c, id))
                throw new InputError("project", p.info().jobNumber(), "cannot be deleted: it has issued sheets, which stay with the office");
            DeletedItems.keep(c, new DeletedItem(0, id, p.info().jobNumber(), DeletedItem.PROJECT,
                    p.info().jobNumber() + " " + p.info().name(), members, who.username(), sql.now()), ModelExport.write(c, id));
            ModelWrites.append(c, who, ModelWrites.subject(p), "project deleted at version " + version + " (kept 30 days)", sql.now());
            try (Handle h = Sql.on(c)) {
                return h.createUpdate("DELETE FROM project WHERE id = :id").bind("id", id).execute();
            }
        });
    }

    /**
     * Archives a project (or un-archives it): it stays in the store, leaves the default list, and its model takes no
     * change while archived ({@link Archived}). The version moves, so that every page kept for the old one is rendered
     * again saying so; the audit entry records it.
     */
    public Project archive(Editor who, long id, long version, boolean archived) {
        return sql.tx(c -> {
            Instant at = sql.now();
            Project was = find(c, id);
            if (was.archived() == archived)
                throw new InputError("archived", was.state(), "the project is " + was.state() + " already");
            try (Handle h = Sql.on(c)) {
                if (h.createUpdate("UPDATE project SET version = version + 1, updated_at = :at, archived = :archived "
                        + "WHERE id = :id AND version = :version").bind("at", Sql.stampOf(at)).bind("archived", archived)
                        .bind("id", id).bind("version", version).execute() != 1)
                    throw new StaleVersion(id, version, was.version());
            }
            ModelWrites.append(c, who, ModelWrites.subject(was), (archived ? "project archived" : "project un-archived")
                    + "; model version " + version + " → " + (version + 1), at);
            return find(c, id);
        });
    }

    /**
     * Claims the next version of a project for a change in this transaction, or refuses a change based on
     * an old version or to an archived project. Every write to a project or anything in it goes through here.
     */
    static long touch(Connection c, long id, long version, Instant at) throws SQLException {
        Project p = find(c, id);
        if (p.archived()) throw new Archived(p.info().jobNumber() + " " + p.info().name());
        try (Handle h = Sql.on(c)) {
            if (h.createUpdate("UPDATE project SET version = version + 1, updated_at = :at WHERE id = :id AND version = :version")
                    .bind("at", Sql.stampOf(at)).bind("id", id).bind("version", version).execute() == 1) return version + 1;
        }
        throw new StaleVersion(id, version, find(c, id).version());
    }

    static Project find(Connection c, long id) throws SQLException {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT " + COLUMNS + " FROM project WHERE id = :id").bind("id", id).map(ProjectStore::read)
                    .findFirst().orElseThrow(() -> new NotFound("project", id));
        }
    }

    private static void requireFreeJobNumber(Connection c, String jobNumber, long self) throws SQLException {
        try (Handle h = Sql.on(c)) {
            var other = h.createQuery("SELECT name FROM project WHERE job_number = :jobNumber AND id <> :self")
                    .bind("jobNumber", jobNumber).bind("self", self).mapTo(String.class).findFirst();
            if (other.isPresent()) throw new Duplicate("jobNumber", jobNumber, "is already the job number of " + other.get());
        }
    }

    private static GridAxis axis(String axis, String first, int lines, double spacing) {
        List<String> names = new ArrayList<>();
        List<Double> spacings = new ArrayList<>();
        for (int i = 0; i < lines; i++) {
            names.add(String.valueOf((char) (first.charAt(0) + i)));
            if (i > 0) spacings.add(spacing);
        }
        return new GridAxis(axis, names, spacings);
    }

    private static Grid startingGrid(UnitSystem units) {
        double spacing = units == UnitSystem.US ? 30 : 9;
        return new Grid(axis("x", "1", 3, spacing), axis("y", "A", 3, spacing));
    }

    /** The settings that change a calculation, as the audit entry records them before and after. */
    static String settings(ProjectInfo i) {
        return i.jobNumber() + " " + i.name() + ", " + i.edition() + ", " + i.units() + (i.partitionAllowance() ? ", partitions" : "")
                + (i.reducePartitions() ? " reduced" : "") + (i.upliftReducedDead() ? ", uplift with reduced dead" : "")
                + (i.floorMethod() != null ? ", floor reduction " + i.floorMethod() : "");
    }

    private static <S extends SqlStatement<S>> S bind(S st, ProjectInfo p) {
        return SnowColumns.bind(st, p.snow()).bind("jobNumber", p.jobNumber()).bind("name", p.name())
                .bind("address", p.address()).bind("client", p.client()).bind("edition", p.edition())
                .bind("units", p.units().name()).bind("partitions", p.partitionAllowance())
                .bind("reducePartitions", p.reducePartitions()).bind("upliftReducedDead", p.upliftReducedDead())
                .bind("floorMethod", p.floorMethod());
    }

    private static Project read(ResultSet rs, StatementContext ctx) throws SQLException {
        return new Project(rs.getLong("id"), rs.getLong("version"), new ProjectInfo(rs.getString("job_number"),
                rs.getString("name"), rs.getString("address"), rs.getString("client"), rs.getString("edition"),
                UnitSystem.valueOf(rs.getString("unit_system")), rs.getBoolean("partition_allowance"),
                rs.getBoolean("reduce_partitions"), rs.getBoolean("uplift_reduced_dead"),
                SnowColumns.read(rs), rs.getString("floor_method")), rs.getBoolean("archived"));
    }
}
