package com.baysheet.review;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.record.Sketch;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;

import java.util.ArrayList;
import java.util.List;

/**
 * What a package is checked and issued as: a calculation record whose inputs are the package's mark
 * sheets (one per typical member) and column take-downs, one entry each (key "mark-" and the mark, or "takedown-"
 * and the take-down's id; shown the {@link CalcFingerprint} of its record), and whose results are each mark's
 * governing values.
 * So a package's fingerprint changes exactly when one of its sheets would print differently, "changed since
 * issue" works as for a mark sheet, and comparing two revisions names the members that changed.
 */
public final class PackageManifest {
    public static final String TAKE_DOWN_PREFIX = "takedown-";

    private PackageManifest() {}

    public static CalcRecord of(PackageScope scope, Derived d, MarkSheets marks) {
        List<DerivedMember> members = scope.members(d);
        if (members.isEmpty()) throw new InputError("package", scope.title(), "has no members in this model");
        List<Entry> inputs = new ArrayList<>();
        List<Entry> results = new ArrayList<>();
        for (MarkSheets.MarkSheet s : scope.marks(d, marks)) {
            CalcRecord r = s.record();
            String key = s.stored() ? s.ref(0).subject() : MarkSheets.PREFIX + "new-" + s.text();
            inputs.add(Entry.unitless(key, "Mark " + s.text(), 0, CalcFingerprint.of(r)));
            for (String g : r.governing()) {
                Entry e = r.entry(g);
                results.add(new Entry(key + "." + g, s.text() + ": " + e.label(), e.value(), e.unit(), e.shown(), e.shownUnit()));
            }
        }
        for (TakeDown t : scope.takeDowns(d))
            inputs.add(Entry.unitless(TAKE_DOWN_PREFIX + t.id(), "Column take-down " + t.gridPoint(), 0, CalcFingerprint.of(t.record())));
        CalcRecord first = members.get(0).result().record();
        Note how = new Note(Note.Level.INFO, "Each sheet is listed with the SHA-256 of its whole calculation record; "
                + "a change to any of them changes the package.", Clause.NONE);
        return new CalcRecord(scope.title(), first.edition(), first.units(), inputs, List.of(), results,
                List.of(), List.of(how), Sketch.NONE);
    }

    /** Whether a manifest input is a member sheet (rather than a column take-down). */
    public static boolean isMember(Entry input) {
        return !input.key().startsWith(TAKE_DOWN_PREFIX);
    }
}
