package com.baysheet.review;

import com.baysheet.auth.Tokens;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordJson;

/**
 * SHA-256 of everything a sheet says: the whole calculation record (edition, inputs, steps with their
 * substituted values, results, notes, load diagram) as the engine's deterministic JSON. The record's input
 * table does not list every load (a bay's dead load shows only in the steps), so the inputs alone would miss
 * changes; two records with one fingerprint print the same sheet. An issued sheet whose member's
 * fingerprint changes is changed since issue; a submitted one must be resubmitted.
 *
 * <p>The JSON hashed is the record's first form ({@link FirstRecordForm}: each number with the unit it is shown
 * in, without the name of its base unit), so a sheet issued before records named their base units keeps its
 * fingerprint and is not flagged by a change of format alone.
 */
public final class CalcFingerprint {
    private CalcFingerprint() {}

    public static String of(CalcRecord record) {
        return Tokens.sha256(RecordJson.write(FirstRecordForm.of(record)));
    }
}
