package com.baysheet.store.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TypicalGroup;
import com.baysheet.framing.Typicals;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.Mark;
import com.baysheet.review.MarkAssignment;
import com.baysheet.review.MarkSheets;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.function.Function;

/**
 * A model write's marks: every typical group of the derivation given its mark ({@link MarkAssignment}) and stored on
 * the write's connection, so that a mark, once given, is the same on every page. Only the rows that differ are written.
 *
 * <p>A write may start from what the project's last write left its marks as ({@link Kept}), when the caller knows the
 * rows are unchanged since. Then the groups are worked out from that write's grouping, and a group it left as it was
 * (the same group object: same members, same calculation) keeps its mark, its members' rows and its sheet without being
 * looked at again: the work is that of the groups the edit changed. The rows written are exactly those a write that
 * reads them would write (KeptMarksTest).
 */
public final class MarkWrites {
    private MarkWrites() {}

    /**
     * What a model write left a project's marks as: its stored marks (as their rows now stand), the grouping the marks
     * were given to, and the sheets (which member carries which mark, as the member → mark rows now stand).
     */
    public record Kept(List<Mark> stored, Typicals.Grouping grouping, MarkSheets sheets) {}

    /** The marks a write gave, and what it left them as. */
    public record Reconciled(MarkSheets sheets, Kept kept) {}

    /** Gives every group of the derivation its mark and stores them; returns them. */
    public static MarkSheets reconcile(Connection c, long projectId, Derived d, Instant at) throws SQLException {
        return reconcile(c, projectId, d, at, CalcFingerprint::of, null).sheets();
    }

    /**
     * As {@link #reconcile(Connection, long, Derived, Instant)}, each calculation fingerprinted by {@code fingerprint}, from
     * {@code before}: what the project's last write left its marks as, its rows unchanged since (null: read the rows).
     */
    public static Reconciled reconcile(Connection c, long projectId, Derived d, Instant at, Function<CalcRecord, String> fingerprint,
                                       Kept before) throws SQLException {
        List<Mark> stored = before != null ? before.stored() : MarkRows.all(c, projectId);
        Typicals.Grouping grouping = d.members().isEmpty() ? null : Typicals.grouped(d, before == null ? null : before.grouping());
        List<TypicalGroup> groups = grouping == null ? List.of() : grouping.groups();
        Map<String, Long> read = before != null ? null : MarkRows.carried(c, projectId);
        Function<String, Long> carriedBefore = before != null ? before.sheets()::markOf : read::get;
        // the groups the last write gave a mark to, by identity: those still here are unchanged
        Map<TypicalGroup, MarkSheets.MarkSheet> last = new IdentityHashMap<>();
        if (before != null) for (MarkSheets.MarkSheet s : before.sheets().all()) last.put(s.group(), s);
        Map<TypicalGroup, Mark> unchanged = new IdentityHashMap<>();
        for (TypicalGroup g : groups) {
            MarkSheets.MarkSheet s = last.get(g);
            if (s != null) unchanged.put(g, s.mark());
        }
        MarkAssignment.Result r = MarkAssignment.of(groups, stored, carriedBefore, fingerprint, unchanged);
        // the rows as they stand, and those the write changes or adds: each written row is the mark as written
        Map<Long, Mark> was = new HashMap<>(stored.size() * 4 / 3 + 1);
        for (Mark m : stored) was.put(m.id(), m);
        Map<Long, Mark> rewritten = new HashMap<>();
        List<Mark> inserted = new ArrayList<>();
        List<Mark> updated = new ArrayList<>();
        for (Mark m : r.retired()) if (changed(was, m, updated)) rewritten.put(m.id(), m);
        // the members whose row may change: every member of a group that is not unchanged, before and after
        Set<String> moved = new HashSet<>();
        List<MarkSheets.MarkSheet> left = new ArrayList<>(), added = new ArrayList<>();
        if (before != null)
            for (MarkSheets.MarkSheet s : before.sheets().all())
                if (!unchanged.containsKey(s.group())) {
                    left.add(s);
                    for (DerivedMember x : s.group().members()) moved.add(x.id());
                }
        if (read != null) moved.addAll(read.keySet());
        List<MarkSheets.MarkSheet> sheets = new ArrayList<>(r.assigned().size());
        for (MarkAssignment.Assigned a : r.assigned()) {
            MarkSheets.MarkSheet kept = unchanged.containsKey(a.group()) ? last.get(a.group()) : null;
            if (kept != null) {
                sheets.add(kept);
                continue;
            }
            Mark m = a.mark();
            if (m.id() == 0) {
                m = new Mark(MarkRows.insert(c, projectId, m, at), m.prefix(), m.seq(), m.text(), m.calc(), m.originId(), true);
                inserted.add(m);
            } else if (changed(was, m, updated)) rewritten.put(m.id(), m);
            for (DerivedMember x : a.group().members()) moved.add(x.id());
            Mark origin = m.originId() == null ? null : was.get(m.originId());
            MarkSheets.MarkSheet made = new MarkSheets.MarkSheet(m, a.group(), origin == null ? null : origin.text());
            sheets.add(made);
            added.add(made);
        }
        MarkRows.update(c, updated);
        MarkSheets given = before != null ? MarkSheets.after(before.sheets(), sheets, left, added) : new MarkSheets(sheets);
        MarkRows.locate(c, projectId, moved, carriedBefore, given::markOf);
        List<Mark> after = new ArrayList<>(stored.size() + inserted.size());
        for (Mark m : stored) after.add(rewritten.getOrDefault(m.id(), m));
        if (!inserted.isEmpty()) {
            after.addAll(inserted);
            after.sort(Comparator.comparing((Mark m) -> m.prefix()).thenComparingInt(Mark::seq));
        }
        return new Reconciled(given, new Kept(List.copyOf(after), grouping, given));
    }

    /** The sheets of an assignment, each with the text of the mark it was split from. */
    static MarkSheets sheets(MarkAssignment.Result r, List<Mark> stored) {
        Map<Long, String> text = texts(stored);
        List<MarkSheets.MarkSheet> out = new ArrayList<>();
        for (MarkAssignment.Assigned a : r.assigned())
            out.add(new MarkSheets.MarkSheet(a.mark(), a.group(), a.mark().originId() == null ? null : text.get(a.mark().originId())));
        return new MarkSheets(out);
    }

    private static Map<Long, String> texts(List<Mark> stored) {
        Map<Long, String> text = new HashMap<>();
        for (Mark m : stored) text.put(m.id(), m.text());
        return text;
    }

    /** Adds a stored mark to those to write where its calculation or whether it is carried differs from its row; whether it did. */
    private static boolean changed(Map<Long, Mark> stored, Mark m, List<Mark> updated) {
        Mark was = stored.get(m.id());
        if (was != null && Objects.equals(was.calc(), m.calc()) && was.active() == m.active()) return false;
        updated.add(m);
        return true;
    }
}
