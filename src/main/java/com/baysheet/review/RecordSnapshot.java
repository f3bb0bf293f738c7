package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordJson;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * A calculation record as kept with a revision: the engine's deterministic JSON, read back for comparing
 * revisions and for showing markups beside the steps they were written against. Derived properties the
 * JSON carries besides the record components (a clause's label) are ignored on reading. A record stored in
 * its first form (one {@code unit} field holding the shown unit) reads back in today's form, with the base
 * unit named and the shown unit apart ({@link FirstRecordForm}).
 */
public final class RecordSnapshot {
    private static final ObjectMapper READER = RecordJson.mapper().copy()
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    private RecordSnapshot() {}

    public static String write(CalcRecord r) {
        return RecordJson.write(r);
    }

    public static CalcRecord read(String json) {
        try {
            CalcRecord r = READER.readValue(json, CalcRecord.class);
            return FirstRecordForm.isFirstForm(r) ? FirstRecordForm.upgrade(r) : r;
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a stored calculation record does not read back: " + e.getOriginalMessage(), e);
        }
    }
}
