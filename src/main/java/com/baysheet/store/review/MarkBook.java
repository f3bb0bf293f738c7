package com.baysheet.store.review;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TypicalGroup;
import com.baysheet.framing.Typicals;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.Caller;
import com.baysheet.review.Mark;
import com.baysheet.review.MarkAssignment;
import com.baysheet.review.MarkSheets;
import com.baysheet.store.NotFound;
import com.baysheet.store.Sql;
import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;

/**
 * The marks of a project's typical members. A model write stores them ({@link #reconcile}) in its own
 * transaction, so that a mark, once given, is the same on every page; a read assigns them the same way without
 * writing, which gives exactly the stored marks (and, for a project not written since marks came in,
 * provisional ones with no sheet yet).
 */
public final class MarkBook {
    private final Sql sql;

    public MarkBook(Sql sql) {
        this.sql = sql;
    }

    /** The marks of this derivation of the project. */
    public MarkSheets of(long projectId, Derived d) {
        return sql.tx(c -> read(c, projectId, d));
    }

    /** The marks of this derivation of the project, read on the caller's connection; writes nothing. */
    public static MarkSheets read(Connection c, long projectId, Derived d) throws SQLException {
        List<Mark> stored = MarkRows.all(c, projectId);
        List<TypicalGroup> groups = d.members().isEmpty() ? List.of() : Typicals.of(d);
        return sheets(MarkAssignment.of(groups, stored, MarkRows.carried(c, projectId)), stored);
    }

    /** A stored mark by id, carried or not (a mark no member carries keeps its sheet's history). */
    public java.util.Optional<Mark> stored(long projectId, long markId) {
        return sql.tx(c -> MarkRows.all(c, projectId).stream().filter(m -> m.id() == markId).findFirst());
    }

    /** Gives every group of the derivation its mark and stores them, on the model write's connection; returns them. */
    public static MarkSheets reconcile(Connection c, long projectId, Derived d, Instant at) throws SQLException {
        return reconcile(c, projectId, d, at, CalcFingerprint::of);
    }

    /** As {@link #reconcile(Connection, long, Derived, Instant)}, each calculation fingerprinted by {@code fingerprint}. */
    public static MarkSheets reconcile(Connection c, long projectId, Derived d, Instant at, Function<CalcRecord, String> fingerprint)
            throws SQLException {
        return reconcile(c, projectId, d, at, fingerprint, null).sheets();
    }

    /**
     * What a model write left a project's marks as: its stored marks (as their rows now stand), which member carries
     * which, and the grouping they were given to. The project's next write starts from them, not from its rows, when
     * nothing has written the rows since (the caller knows, by the project's versions).
     */
    public record Kept(List<Mark> stored, Map<String, Long> carried, Typicals.Grouping grouping) {}

    /** The marks a write gave, and what it left them as. */
    public record Reconciled(MarkSheets sheets, Kept kept) {}

    /**
     * As {@link #reconcile(Connection, long, Derived, Instant, Function)}, from {@code before}: what the project's last
     * write left its marks as, its rows unchanged since (null: read them). The typical members are grouped from that
     * write's grouping, and only the rows that differ are written, as always.
     */
    public static Reconciled reconcile(Connection c, long projectId, Derived d, Instant at, Function<CalcRecord, String> fingerprint,
                                       Kept before) throws SQLException {
        List<Mark> stored = before != null ? before.stored() : MarkRows.all(c, projectId);
        Typicals.Grouping grouping = d.members().isEmpty() ? null : Typicals.grouped(d, before == null ? null : before.grouping());
        List<TypicalGroup> groups = grouping == null ? List.of() : grouping.groups();
        Map<String, Long> carriedBefore = before != null ? before.carried() : MarkRows.carried(c, projectId);
        MarkAssignment.Result r = MarkAssignment.of(groups, stored, carriedBefore, fingerprint);
        // the rows as they will stand, by id in the order read: each written row is the mark as written
        Map<Long, Mark> rows = new LinkedHashMap<>();
        for (Mark m : stored) rows.put(m.id(), m);
        Map<Long, Mark> was = Map.copyOf(rows);
        for (Mark m : r.retired()) {
            updateChanged(c, was, m);
            rows.put(m.id(), m);
        }
        List<MarkAssignment.Assigned> saved = new ArrayList<>();
        Map<String, Long> carried = new HashMap<>(carriedBefore.size() * 4 / 3 + 1);
        for (MarkAssignment.Assigned a : r.assigned()) {
            Mark m = a.mark();
            if (m.id() == 0) m = new Mark(MarkRows.insert(c, projectId, m, at), m.prefix(), m.seq(), m.text(), m.calc(), m.originId(), true);
            else updateChanged(c, was, m);
            rows.put(m.id(), m);
            saved.add(new MarkAssignment.Assigned(a.group(), m));
            for (DerivedMember x : a.group().members()) carried.put(x.id(), m.id());
        }
        MarkRows.locate(c, projectId, carriedBefore, carried);
        List<Mark> after = new ArrayList<>(rows.values());
        after.sort(Comparator.comparing((Mark m) -> m.prefix()).thenComparingInt(Mark::seq));
        return new Reconciled(sheets(new MarkAssignment.Result(saved, r.retired()), after),
                new Kept(List.copyOf(after), Collections.unmodifiableMap(carried), grouping));
    }

    /**
     * Renames a mark; refused naming the field when the text is not a mark or another mark of the project has it.
     * The sheet keeps its history: its printed record now carries the new mark, so an issued sheet is changed since issue.
     */
    public void rename(long projectId, long markId, String text, Caller who) {
        String to = Mark.checkedText(text);
        sql.tx(c -> {
            Mark m = MarkRows.all(c, projectId).stream().filter(x -> x.id() == markId).findFirst()
                    .orElseThrow(() -> new NotFound("mark", markId));
            for (Mark other : MarkRows.all(c, projectId))
                if (other.id() != markId && other.text().equalsIgnoreCase(to))
                    throw new InputError("mark", to, "is taken by another typical member of this project" + (other.active() ? "" : " (one no member carries now)"));
            if (m.text().equals(to)) return null;
            MarkRows.rename(c, markId, to);
            try (Handle h = Sql.on(c)) {
                h.createUpdate("UPDATE project SET marks_version = marks_version + 1 WHERE id = :id").bind("id", projectId).execute();
            }
            AuditTrail.append(c, AuditEvent.of(who.actor().userId(), who.username(), "rename mark", "project " + projectId + " mark " + m.text(),
                    "renamed " + m.text() + " → " + to, who.address()), sql.now());
            return null;
        });
    }

    /** Writes a stored mark's calculation and whether it is carried, where either differs from its row. */
    private static void updateChanged(Connection c, Map<Long, Mark> stored, Mark m) {
        Mark was = stored.get(m.id());
        if (was == null || !Objects.equals(was.calc(), m.calc()) || was.active() != m.active()) MarkRows.update(c, m);
    }

    private static MarkSheets sheets(MarkAssignment.Result r, List<Mark> stored) {
        Map<Long, String> text = new HashMap<>();
        for (Mark m : stored) text.put(m.id(), m.text());
        List<MarkSheets.MarkSheet> out = new ArrayList<>();
        for (MarkAssignment.Assigned a : r.assigned())
            out.add(new MarkSheets.MarkSheet(a.mark(), a.group(), a.mark().originId() == null ? null : text.get(a.mark().originId())));
        return new MarkSheets(out);
    }
}
