package com.baysheet.review;

import com.baysheet.auth.Tokens;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.RecordJson;

import java.util.List;

/**
 * SHA-256 of what a calculation was made from: the code edition, the unit system and the inputs of the
 * record, as deterministic JSON. Two records with the same fingerprint were computed from the same data;
 * an issued sheet whose member's fingerprint changes is superseded.
 */
public final class InputsFingerprint {
    private InputsFingerprint() {}

    private record Basis(String edition, String units, List<Entry> inputs) {}

    public static String of(CalcRecord record) {
        return Tokens.sha256(RecordJson.write(new Basis(record.edition(), record.units(), record.inputs())));
    }
}
