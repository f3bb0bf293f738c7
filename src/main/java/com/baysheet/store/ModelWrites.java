package com.baysheet.store;

import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Limits;
import com.baysheet.project.Model;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.Fingerprints;
import com.baysheet.store.review.AuditTrail;
import com.baysheet.store.review.IssuedChanges;
import com.baysheet.store.review.MarkBook;
import com.baysheet.store.review.MarkWrites;
import com.baysheet.review.MarkSheets;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.util.List;
import java.util.Set;
import java.util.function.Function;

/**
 * The one way a project changes: in one transaction, claim the next version (refusing a stale one), apply
 * the change, derive the changed building so that a model the derivation refuses (a bay outside the grid, a
 * cantilever on an interior edge) or one past its bounds ({@link Limits}) is rolled back with the error and
 * nothing is saved, give the typical members their marks (never renumbering one), and append the audit entry,
 * which names the issued sheets the change alters (they are changed since issue, never superseded by the
 * write: an issued revision stands until the next is issued). The change, its marks and its entry commit
 * together or not at all.
 */
public final class ModelWrites {
    /** The audit trail's name for a change to a project's model or settings. */
    static final String EDIT = "edit";

    private final Sql sql;
    private final Function<Building, Derived> derive;
    private final Results results;
    /** The calculations' fingerprints of each write, for the next write of the project to look up rather than work out. */
    private final Fingerprints fingerprints = new Fingerprints();
    /** What each project's last write left its marks as, for its next write to start from. */
    private final KeptMarks kept = new KeptMarks();

    /** @param results where a change's derived building goes once committed (null: kept nowhere) */
    public ModelWrites(Sql sql, Function<Building, Derived> derive, Results results) {
        this.sql = sql;
        this.derive = derive;
        this.results = results;
    }

    public ModelWrites(Sql sql, Function<Building, Derived> derive) { this(sql, derive, null); }

    /** How many writes started from the marks the project's last write left (rather than from its rows), for tests. */
    long keptStarts() { return kept.starts(); }

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
        return change(who, action, projectId, version, work, false, null);
    }

    /**
     * As {@link #change(Editor, Sql.Work, long, long, Sql.Work)} for work that writes the bays of level {@code levelId}
     * and no other level's: the model after it reads that level's bays and takes the others' from the model before
     * ({@link BuildingMapper#load(Connection, long, Model, Set)}). {@code removes}: members go ({@link #removal}).
     */
    <T> T bayChange(Editor who, Sql.Work<String> action, long projectId, long version, long levelId, boolean removes, Sql.Work<T> work) {
        return change(who, action, projectId, version, work, removes, Set.of(levelId));
    }

    /**
     * As {@link #change(Editor, Sql.Work, long, long, Sql.Work)} for a change that deletes members (a level): the
     * issued sheets it removes are withdrawn in the same transaction (kept, no longer in force, withdrawn for good),
     * and the audit entry names them.
     */
    public <T> T removal(Editor who, Sql.Work<String> action, long projectId, long version, Sql.Work<T> work) {
        return change(who, action, projectId, version, work, true, null);
    }

    private <T> T change(Editor who, Sql.Work<String> action, long projectId, long version, Sql.Work<T> work, boolean withdraw,
                         Set<Long> baysWritten) {
        Results.Computed[] done = new Results.Computed[1];
        MarkSheets[] marked = new MarkSheets[1];
        long[] renames = new long[1];
        KeptMarks.Entry[] left = new KeptMarks.Entry[1];
        T out = sql.tx(c -> {
            Instant at = sql.now();
            ProjectVersions.Version start = ProjectVersions.read(c, projectId);
            MarkWrites.Kept from = kept.at(projectId, start);
            long next = ProjectStore.touch(c, projectId, version, at);
            String said = action.run(c);
            // the model as it stands before the change: the one derived at these versions where it is held (the same but
            // for the project's version and time, which the change's own claim has just moved and the entry leaves out)
            Model held = results == null ? null : results.modelAt(start);
            Model was = held != null ? held : BuildingMapper.load(c, projectId);
            IssuedChanges.Snapshot before = issuedBefore(c, projectId, was);
            T result = work.run(c);
            Model m = BuildingMapper.load(c, projectId, was, baysWritten);
            String diff = ModelDiff.between(was, m);
            Derived d = checked(m);
            done[0] = new Results.Computed(m, d);
            MarkWrites.Reconciled given = MarkWrites.reconcile(c, projectId, d, at, r -> fingerprints.of(projectId, r), from);
            marked[0] = given.sheets();
            fingerprints.turn(projectId);
            ProjectVersions.Version now = ProjectVersions.read(c, projectId);
            renames[0] = now.marks();
            left[0] = new KeptMarks.Entry(now, given.kept());
            IssuedChanges.Snapshot after = IssuedChanges.snapshot(c, projectId, d, marked[0]);
            List<String> withdrawn = withdraw ? IssuedChanges.withdrawGone(c, projectId, before, after, at) : List.of();
            List<String> changed = IssuedChanges.between(before, after).stream().filter(n -> !withdrawn.contains(n)).toList();
            append(c, who, subject(m.project()), said
                    + "; model version " + version + " → " + next + (diff.isEmpty() ? "" : "; " + diff)
                    + (changed.isEmpty() ? "" : "; changed since issue: " + String.join(", ", changed))
                    + (withdrawn.isEmpty() ? "" : "; issued sheets withdrawn (kept): " + String.join(", ", withdrawn)), at);
            return result;
        });
        // the building this change derived, and its marks, are the next page's: committed, neither need be worked out again on read
        if (results != null) results.offer(done[0], marked[0], renames[0]);
        kept.put(projectId, left[0]);
        return out;
    }

    /**
     * Creates a whole project in one transaction (an imported model file): {@code work} inserts it and returns its
     * id; the building is derived and checked as on every change, and the audit entry says {@code action}. A model
     * the derivation refuses leaves nothing behind.
     */
    public Project create(Editor who, String action, Sql.Work<Long> work) {
        Results.Computed[] done = new Results.Computed[1];
        KeptMarks.Entry[] left = new KeptMarks.Entry[1];
        Project out = sql.tx(c -> {
            long id = work.run(c);
            Model m = BuildingMapper.load(c, id);
            Derived d = checked(m);
            done[0] = new Results.Computed(m, d);
            MarkWrites.Kept given = MarkWrites.reconcile(c, id, d, sql.now(), r -> fingerprints.of(id, r), null).kept();
            fingerprints.turn(id);
            left[0] = new KeptMarks.Entry(ProjectVersions.read(c, id), given);
            append(c, who, subject(m.project()), action, sql.now());
            return m.project();
        });
        if (results != null) results.offer(done[0]);
        kept.put(out.id(), left[0]);
        return out;
    }

    /**
     * The issued sheets a change would alter (changed since issue), by name, without saving it: the change is made,
     * derived and given its marks in a transaction that is then rolled back, so the answer comes from the same
     * fingerprints a save compares. A stale version or a change the derivation refuses is reported as a save would.
     */
    public List<String> touched(long projectId, long version, Sql.Work<?> work) {
        try {
            sql.tx(c -> {
                ProjectStore.touch(c, projectId, version, sql.now());
                IssuedChanges.Snapshot before = issuedBefore(c, projectId, BuildingMapper.load(c, projectId));
                work.run(c);
                Model m = BuildingMapper.load(c, projectId);
                Derived d = checked(m);
                throw new TriedOnly(issuedAfter(c, projectId, d, before, MarkWrites.reconcile(c, projectId, d, sql.now())));
            });
        } catch (TriedOnly t) {
            return t.touched;
        }
        throw new IllegalStateException("a tried change always rolls back");
    }

    /**
     * How the project's issued sheets print before the change, from the model {@code m} as it stands before it
     * (derived only where some sheet is issued). A model that no longer derives compares as empty, so every issued
     * sheet counts as changed.
     */
    private IssuedChanges.Snapshot issuedBefore(Connection c, long projectId, Model m) throws SQLException {
        if (!IssuedChanges.any(c, projectId)) return IssuedChanges.Snapshot.NONE;
        Derived d;
        try {
            d = m.building().levels().isEmpty() ? new Derived(m.building(), List.of(), List.of()) : derive.apply(m.building());
        } catch (com.baysheet.engine.InputError e) {
            return IssuedChanges.Snapshot.NONE;
        }
        return IssuedChanges.snapshot(c, projectId, d, MarkBook.read(c, projectId, d));
    }

    private static List<String> issuedAfter(Connection c, long projectId, Derived d, IssuedChanges.Snapshot before, MarkSheets marks)
            throws SQLException {
        return IssuedChanges.between(before, IssuedChanges.snapshot(c, projectId, d, marks));
    }

    /** Carries the answer of a tried change out of its transaction, which throwing rolls back. */
    private static final class TriedOnly extends RuntimeException {
        final List<String> touched;

        TriedOnly(List<String> touched) {
            super(null, null, false, false);
            this.touched = touched;
        }
    }

    /**
     * After a firm-wide change that enters every project's calculation (the firm's self weights), gives each
     * project's typical members their marks and names, in its audit entry, the issued sheets it changed since
     * issue, each project in its own transaction. A project whose model no longer derives is left as it is (its next change reports why).
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
                // the firm's settings are saved already: the sheets are compared with what was issued
                List<String> changed = IssuedChanges.between(IssuedChanges.asIssued(c, id),
                        IssuedChanges.snapshot(c, id, d, MarkWrites.reconcile(c, id, d, at)));
                if (!changed.isEmpty())
                    append(c, who, subject(m.project()), action + "; changed since issue: " + String.join(", ", changed), at);
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
        if (m.building().levels().isEmpty() && m.building().lineLoads().isEmpty() && m.building().pointLoads().isEmpty()) return new Derived(m.building(), List.of(), List.of());
        Derived d = derive.apply(m.building());
        Limits.count("members", d.members().size(), Limits.MAX_MEMBERS, "members in a project");
        return d;
    }

    Sql sql() { return sql; }

    /** How many members of the level of this name carry only these bays (by name), and so go when they are cleared. */
    int membersOf(long projectId, String level, java.util.Set<String> bays) {
        if (results == null) return 0;
        return (int) results.of(projectId).derived().members().stream()
                .filter(m -> m.level().equals(level) && !m.bays().isEmpty() && bays.containsAll(m.bays())).count();
    }

    /** How many members the project's current building has at the level of this name (every level: null). */
    int members(long projectId, String level) {
        if (results == null) return 0;
        return (int) results.of(projectId).derived().members().stream().filter(m -> level == null || m.level().equals(level)).count();
    }
}
