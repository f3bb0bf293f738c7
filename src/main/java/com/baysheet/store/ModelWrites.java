package com.baysheet.store;

import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Limits;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.review.AuditTrail;
import com.baysheet.store.review.Supersession;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.util.List;
import java.util.function.Function;

/**
 * The one way a project changes: in one transaction, claim the next version (refusing a stale one), apply
 * the change, derive the changed building so that a model the derivation refuses (a bay outside the grid, a
 * cantilever on an interior edge) or one past its bounds ({@link Limits}) is rolled back with the error and
 * nothing is saved, supersede the issued sheets whose calculation the change alters, and append the audit
 * entry. The change, its supersessions and its entry commit together or not at all.
 */
public final class ModelWrites {
    /** The audit trail's name for a change to a project's model or settings. */
    static final String EDIT = "edit";

    private final Sql sql;
    private final Function<Building, Derived> derive;
    private final Results results;

    /** @param results where a change's derived building goes once committed (null: kept nowhere) */
    public ModelWrites(Sql sql, Function<Building, Derived> derive, Results results) {
        this.sql = sql;
        this.derive = derive;
        this.results = results;
    }

    public ModelWrites(Sql sql, Function<Building, Derived> derive) { this(sql, derive, null); }

    /**
     * @param who    who asks for the change, as the audit entry names them
     * @param action what changed in the user's words ("grid saved", "level added: Level 4")
     */
    public <T> T change(Editor who, String action, long projectId, long version, Sql.Work<T> work) {
        return change(who, c -> action, projectId, version, work);
    }

    /**
     * As {@link #change(Editor, String, long, long, Sql.Work)}, where the action is read in the transaction ahead
     * of the work, so that it can say what the model held before ("... was: unframed").
     */
    public <T> T change(Editor who, Sql.Work<String> action, long projectId, long version, Sql.Work<T> work) {
        Results.Computed[] done = new Results.Computed[1];
        T out = sql.tx(c -> {
            Instant at = sql.now();
            long next = ProjectStore.touch(c, projectId, version, at);
            String said = action.run(c);
            T result = work.run(c);
            Model m = BuildingMapper.load(c, projectId);
            Derived d = checked(m);
            done[0] = new Results.Computed(m, d);
            List<String> superseded = Supersession.apply(c, projectId, d, by(who), at);
            append(c, who, subject(m.project()), said
                    + "; model version " + version + " → " + next
                    + (superseded.isEmpty() ? "" : "; superseded: " + String.join(", ", superseded)), at);
            return result;
        });
        // the building this change derived is the next page's: committed, it need not be derived again on read
        if (results != null) results.offer(done[0]);
        return out;
    }

    /**
     * Creates a whole project in one transaction (an imported model file): {@code work} inserts it and returns its
     * id; the building is derived and checked as on every change, and the audit entry says {@code action}. A model
     * the derivation refuses leaves nothing behind.
     */
    public Project create(Editor who, String action, Sql.Work<Long> work) {
        Results.Computed[] done = new Results.Computed[1];
        Project out = sql.tx(c -> {
            long id = work.run(c);
            Model m = BuildingMapper.load(c, id);
            done[0] = new Results.Computed(m, checked(m));
            append(c, who, subject(m.project()), action, sql.now());
            return m.project();
        });
        if (results != null) results.offer(done[0]);
        return out;
    }

    /**
     * After a firm-wide change that enters every project's calculation (the firm's self weights), supersedes in
     * each project the issued sheets whose calculation it altered, each project in its own transaction with its
     * audit entry. A project whose model no longer derives is left as it is (its next change reports why).
     */
    public void firmChanged(Editor who, String action, List<Long> projectIds) {
        for (long id : projectIds) {
            sql.tx(c -> {
                Instant at = sql.now();
                Model m = BuildingMapper.load(c, id);
                Derived d;
                try {
                    d = checked(m);
                } catch (com.baysheet.engine.InputError e) {
                    return null;
                }
                List<String> superseded = Supersession.apply(c, id, d, by(who), at);
                if (!superseded.isEmpty())
                    append(c, who, subject(m.project()), action + "; superseded: " + String.join(", ", superseded), at);
                return null;
            });
        }
    }

    /** Appends an entry for a change to a project that has no model version to claim (created, deleted). */
    static void append(Connection c, Editor who, String subject, String detail, Instant at) throws SQLException {
        AuditTrail.append(c, AuditEvent.of(who.userId(), who.username(), EDIT, subject, detail, who.address()), at);
    }

    static String subject(Project p) {
        return "project " + p.info().jobNumber();
    }

    private Derived checked(Model m) {
        Limits.check(m.building());
        Limits.count("levels", m.levels().size(), Limits.MAX_LEVELS, "levels in a project");
        for (StoredLevel l : m.levels())
            Limits.level(m.project().info().units(), l.info().elevation(), l.info().roof(), l.info().roofSlope());
        if (m.building().levels().isEmpty() && m.building().lineLoads().isEmpty()) return new Derived(m.building(), List.of(), List.of());
        Derived d = derive.apply(m.building());
        Limits.count("members", d.members().size(), Limits.MAX_MEMBERS, "members in a project");
        return d;
    }

    private static Supersession.By by(Editor who) {
        return new Supersession.By(who.userId(), who.username(), who.address());
    }

    Sql sql() { return sql; }
}
