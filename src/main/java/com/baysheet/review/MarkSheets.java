package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabel;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.TypicalGroup;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A project's typical members, each with its mark: one sheet per mark, the unit of review. A mark sheet's
 * subject is {@link #PREFIX} and the mark's stored id, so that renaming a mark keeps its sheet and history.
 */
public final class MarkSheets {
    public static final String PREFIX = "mark-";

    /** One mark's sheet: the mark, its group of members, and the text of the mark it was split from (or null). */
    public record MarkSheet(Mark mark, TypicalGroup group, String origin) {
        public String text() { return mark.text(); }

        /** The record the sheet prints and is checked on: the group's calculation under the mark, with its locations. */
        public CalcRecord record() { return group.record(mark.text()); }

        public SheetRef ref(long projectId) { return new SheetRef(projectId, PREFIX + mark.id()); }

        /** Whether the mark is stored, so that its sheet can be checked (a mark is stored by the model write). */
        public boolean stored() { return mark.id() != 0; }
    }

    /** Where a member of the table a layer lies over has no sheet in this one. */
    private static final MarkSheet NONE = new MarkSheet(null, null, null);

    private final List<MarkSheet> sheets;
    /** Each member's sheet: all of them ({@code layer} null), or as an earlier write left them. */
    private final Map<String, MarkSheet> table;
    /** The members whose sheet has changed since {@code table} was made, and their sheet now. */
    private final Map<String, MarkSheet> layer;
    private final Map<Long, MarkSheet> byId = new HashMap<>();

    public MarkSheets(List<MarkSheet> sheets) {
        this.sheets = List.copyOf(sheets);
        this.table = new HashMap<>();
        this.layer = null;
        for (MarkSheet s : this.sheets) {
            for (DerivedMember m : s.group().members()) table.put(m.id(), s);
            if (s.stored()) byId.put(s.mark().id(), s);
        }
    }

    private MarkSheets(List<MarkSheet> sheets, Map<String, MarkSheet> table, Map<String, MarkSheet> layer) {
        this.sheets = sheets;
        this.table = table;
        this.layer = layer;
        for (MarkSheet s : sheets) if (s.stored()) byId.put(s.mark().id(), s);
    }

    /**
     * The sheets {@code now}: those of {@code before} but the sheets in {@code left}, with those in {@code added} (the
     * others are the very sheet objects of {@code before}, with the same members). Each member's sheet is looked up
     * among those changed since a whole table was last made, then in that table, so that a write which changed a few
     * groups of a large building indexes only their members. One layer at most (a sheet replaced is held once, not
     * once a write): made whole again once the changes reach a quarter of the table.
     */
    public static MarkSheets after(MarkSheets before, List<MarkSheet> now, List<MarkSheet> left, List<MarkSheet> added) {
        Map<String, MarkSheet> changed = before.layer == null ? new HashMap<>() : new HashMap<>(before.layer);
        for (MarkSheet s : left) for (DerivedMember m : s.group().members()) changed.put(m.id(), NONE);
        for (MarkSheet s : added) for (DerivedMember m : s.group().members()) changed.put(m.id(), s);
        if (changed.size() > before.table.size() / 4) return new MarkSheets(now);
        return new MarkSheets(List.copyOf(now), before.table, changed);
    }

    private MarkSheet sheetOf(String memberId) {
        MarkSheet s = layer == null ? null : layer.get(memberId);
        if (s == null) s = table.get(memberId);
        return s == NONE ? null : s;
    }

    /** The marks a derivation is given when none are stored yet (what a project's first model write stores), unsaved. */
    public static MarkSheets fresh(com.baysheet.framing.Derived d) {
        var r = MarkAssignment.of(com.baysheet.framing.Typicals.of(d), List.of(), Map.of());
        return new MarkSheets(r.assigned().stream().map(a -> new MarkSheet(a.mark(), a.group(), null)).toList());
    }

    /** The id of the mark the member carries, or null where it has none (as the member → mark rows stand after the write of these sheets). */
    public Long markOf(String memberId) {
        MarkSheet s = sheetOf(memberId);
        return s == null ? null : s.mark().id();
    }

    /** In reading order (by each mark's first location). */
    public List<MarkSheet> all() { return sheets; }

    public Optional<MarkSheet> ofMember(String memberId) { return Optional.ofNullable(sheetOf(memberId)); }

    public Optional<MarkSheet> byId(long markId) { return Optional.ofNullable(byId.get(markId)); }

    /** The member → label lookup other sheets and schedules print: the member's mark, or its id where it has none. */
    public String label(String memberId) {
        MarkSheet s = sheetOf(memberId);
        return s == null ? memberId : s.text();
    }

    /**
     * The labelling the plans and schedules print: each member's mark, and for a member with none (a model not
     * written since marks came in) its place, never its id.
     */
    public MemberLabels labels() {
        return m -> {
            MarkSheet s = sheetOf(m.id());
            return s == null ? MemberLabel.of(m) : s.text();
        };
    }

    /** The mark id a sheet subject names, or empty when the subject is not a mark sheet's. */
    public static Optional<Long> markId(String subject) {
        if (subject == null || !subject.startsWith(PREFIX)) return Optional.empty();
        try {
            return Optional.of(Long.parseLong(subject.substring(PREFIX.length())));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }
}
