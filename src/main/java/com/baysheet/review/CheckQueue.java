package com.baysheet.review;

import com.baysheet.framing.MemberRole;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A project's mark sheets as the check queue lists them, and what waits for whom. A checker is waited for by the
 * sheets others submitted (awaiting their check) and those others prepared that are approved (ready to issue); the
 * preparer by their own sheets returned with markups; an engineer also by the sheets nobody has submitted yet and
 * those whose issued revision no longer matches the calculation. A checker prepares too, but their queue leaves the
 * unsubmitted sheets to the list with the state filter, so that what needs their check is not buried under them.
 */
public final class CheckQueue {
    private CheckQueue() {}

    /** Why a sheet waits for this person, in the order the queue shows them. */
    public enum Waiting {
        TO_CHECK("awaiting your check"),
        RETURNED("returned to you with markups"),
        TO_ISSUE("approved, ready to issue"),
        TO_SUBMIT("not yet submitted");

        private final String label;

        Waiting(String label) { this.label = label; }

        public String label() { return label; }
    }

    /**
     * One mark sheet in the queue: its current revision's state, preparer and version (0 for a sheet nobody
     * submitted), and {@code reopens} when its issued revision was withdrawn or its calculation changed since issue,
     * so that the next revision is submitted.
     */
    public record Entry(MarkSheets.MarkSheet sheet, SheetState state, Long preparerId, String preparerInitials,
                        String revision, long version, boolean reopens) {
        public Entry {
            if (sheet == null || state == null) throw new IllegalArgumentException("sheet, state: required");
            preparerInitials = preparerInitials == null ? "" : preparerInitials;
        }

        public long markId() { return sheet.mark().id(); }

        public String level() { return sheet.group().first().level(); }

        public MemberRole role() { return sheet.group().role(); }

        /** The state in words, with "changed since issue" where the next revision is due. */
        public String stateText() { return state.label() + (reopens ? ", changed since issue" : ""); }

        boolean preparedBy(Actor a) { return preparerId != null && preparerId == a.userId(); }
    }

    /**
     * What the person asked to see: blank text means any; {@code state} null means any; {@code mine} only what
     * waits for them; {@code search} the words typed (mark, level, grid place, member names).
     */
    public record Filter(String level, String role, SheetState state, String preparer, boolean mine, SheetSearch search) {
        public Filter {
            level = blank(level);
            role = blank(role);
            preparer = blank(preparer);
            search = search == null ? SheetSearch.ANY : search;
        }

        public Filter(String level, String role, SheetState state, String preparer, boolean mine) {
            this(level, role, state, preparer, mine, SheetSearch.ANY);
        }

        boolean admitsAllButState(Entry e) {
            return search.admits(e.sheet())
                    && (level.isEmpty() || e.level().equals(level))
                    && (role.isEmpty() || e.role().name().equalsIgnoreCase(role))
                    && (preparer.isEmpty() || e.preparerInitials().equalsIgnoreCase(preparer));
        }

        private static String blank(String s) { return s == null ? "" : s.strip(); }
    }

    /** Why this sheet waits for this person, or empty when it does not. */
    public static Optional<Waiting> waiting(Entry e, Actor me) {
        boolean checker = me.role().mayCheck();
        boolean own = e.preparedBy(me);
        if (checker && !own && e.state().awaitingCheck()) return Optional.of(Waiting.TO_CHECK);
        if (own && e.state() == SheetState.RETURNED) return Optional.of(Waiting.RETURNED);
        if (checker && !own && e.state() == SheetState.APPROVED) return Optional.of(Waiting.TO_ISSUE);
        if (!checker && me.role().mayPrepare() && (e.state() == SheetState.PREPARING || e.reopens()))
            return Optional.of(Waiting.TO_SUBMIT);
        return Optional.empty();
    }

    /** The entries the filter admits, in the order given (the marks' reading order). */
    public static List<Entry> select(List<Entry> all, Filter f, Actor me) {
        return all.stream().filter(f::admitsAllButState)
                .filter(e -> f.state() == null || e.state() == f.state())
                .filter(e -> !f.mine() || waiting(e, me).isPresent())
                .toList();
    }

    /** How many sheets stand at each state, among those the filter admits whatever their state. */
    public static Map<SheetState, Integer> counts(List<Entry> all, Filter f, Actor me) {
        Map<SheetState, Integer> n = new EnumMap<>(SheetState.class);
        for (SheetState s : SheetState.values()) n.put(s, 0);
        for (Entry e : all)
            if (f.admitsAllButState(e) && (!f.mine() || waiting(e, me).isPresent())) n.merge(e.state(), 1, Integer::sum);
        return n;
    }

    /** How many sheets wait for this person, for each reason. */
    public static Map<Waiting, Integer> waitingCounts(List<Entry> all, Actor me) {
        Map<Waiting, Integer> n = new EnumMap<>(Waiting.class);
        for (Waiting w : Waiting.values()) n.put(w, 0);
        for (Entry e : all) waiting(e, me).ifPresent(w -> n.merge(w, 1, Integer::sum));
        return n;
    }
}
