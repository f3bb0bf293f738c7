package com.baysheet.store.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.RecordSnapshot;
import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetRevision;

import java.util.Optional;

/**
 * A revision as stored: its row id and the version that guards it, the sheet it belongs to, the rules'
 * value and the calculation record as submitted (absent while being prepared). {@code id} 0 and
 * {@code version} 0 stand for the first revision of a sheet nobody has submitted yet.
 */
public record StoredRevision(long id, SheetRef sheet, long version, SheetRevision revision, String recordJson) {
    public static StoredRevision unsubmitted(SheetRef sheet) {
        return new StoredRevision(0, sheet, 0, SheetRevision.opened(1), null);
    }

    public boolean stored() { return id != 0; }

    /** The revision as its sheet prints it: a mark sheet counts from 0, as drawings do; older sheets and packages from 1. */
    public String label() {
        int n = revision.number();
        return String.valueOf(com.baysheet.review.MarkSheets.markId(sheet.subject()).isPresent() ? n - 1 : n);
    }

    public Optional<CalcRecord> record() {
        return recordJson == null ? Optional.empty() : Optional.of(RecordSnapshot.read(recordJson));
    }
}
