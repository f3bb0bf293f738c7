package com.baysheet.review;

import com.baysheet.auth.Tokens;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordJson;

/**
 * SHA-256 of everything a sheet says: the whole calculation record (edition, inputs, steps with their
 * substituted values, results, notes, load diagram) as the engine's deterministic JSON. The record's input
 * table does not list every load (a bay's dead load shows only in the steps), so the inputs alone would miss
 * changes; two records with one fingerprint print the same sheet. An issued sheet whose member's
 * fingerprint changes is superseded; a submitted one must be resubmitted.
 */
public final class CalcFingerprint {
    private CalcFingerprint() {}

    public static String of(CalcRecord record) {
        return Tokens.sha256(RecordJson.write(record));
    }
}
