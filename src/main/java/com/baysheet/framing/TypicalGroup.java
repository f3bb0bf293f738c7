package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.Note;

import java.util.ArrayList;
import java.util.List;

/**
 * Members calculated once as one typical member: their engine inputs are equal but for the member's name, so
 * their records are equal but for the subject. {@code members} are in reading order (level from the top down,
 * then west to east, then south to north); the first is the group's representative.
 */
public record TypicalGroup(MemberRole role, List<DerivedMember> members) {
    public TypicalGroup {
        if (role == null) throw new IllegalArgumentException("role: a typical group has its members' role");
        members = List.copyOf(members);
        if (members.isEmpty()) throw new IllegalArgumentException("members: a typical group has at least one member");
    }

    public DerivedMember first() { return members.get(0); }

    /** The calculation the group shares, under a subject that names no member (what identifies the group). */
    public CalcRecord calculation() { return first().result().record().withSubject(Typicals.NEUTRAL); }

    /** How a reader finds one location: its level and grid position, never an internal id. */
    public static String location(DerivedMember m) {
        return m.level() + ": " + m.name();
    }

    public List<String> locations() { return members.stream().map(TypicalGroup::location).toList(); }

    public List<String> memberIds() { return members.stream().map(DerivedMember::id).toList(); }

    /**
     * The sheet's record under its mark: the shared calculation, subject the mark, and a note listing every
     * location it covers. The locations are part of the record, so its fingerprint changes when one is added or
     * removed and the issued sheet is then "changed since issue".
     */
    public CalcRecord record(String mark) {
        CalcRecord r = first().result().record();
        List<Note> notes = new ArrayList<>(r.notes());
        notes.add(new Note(Note.Level.INFO, "Mark " + mark + " is calculated once for " + members.size()
                + (members.size() == 1 ? " location" : " identical locations") + " (each with the same loads, span and support): "
                + String.join("; ", locations()) + ".", Clause.NONE));
        return new CalcRecord(mark, r.edition(), r.units(), r.inputs(), r.steps(), r.results(), r.governing(), notes, r.sketch());
    }
}
