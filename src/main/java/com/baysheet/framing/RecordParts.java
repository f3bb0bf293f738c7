package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;

/**
 * A calculation record but its subject, compared by its parts as objects: its lists and sketch by identity, its
 * edition and units by value. Records are immutable, so equal parts make records equal but for the subject, and a
 * member's record shares the parts of the calculation it was made from ({@link CalcRecord#withSubject}); comparing
 * them so is cheap where comparing records by value walks every step. Two equal records made apart are not equal
 * parts: a key for work that may be done again, never for telling records apart.
 */
public record RecordParts(CalcRecord record) {
    @Override
    public boolean equals(Object o) {
        if (!(o instanceof RecordParts p)) return false;
        CalcRecord a = record, b = p.record;
        return a.inputs() == b.inputs() && a.steps() == b.steps() && a.results() == b.results() && a.governing() == b.governing()
                && a.notes() == b.notes() && a.sketch() == b.sketch()
                && a.edition().equals(b.edition()) && a.units().equals(b.units());
    }

    @Override
    public int hashCode() {
        return (System.identityHashCode(record.steps()) * 31 + System.identityHashCode(record.inputs())) * 31
                + System.identityHashCode(record.results());
    }
}
