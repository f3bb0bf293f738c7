package com.baysheet.web;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.framing.DerivedMember;

import java.util.ArrayList;
import java.util.List;

/** A member as a line of the member list: what it is, where, and its governing numbers as the record shows them. */
record MemberRow(DerivedMember member, String href, String span, String area, List<Entry> governing) {
    static MemberRow of(DerivedMember m, String href, UnitLabels units) {
        return new MemberRow(m, href, m.span() > 0 ? units.length(m.span()) : "—", units.area(m.tributaryArea()),
                governing(m.result().record()));
    }

    /** The record's governing results, in its order. */
    static List<Entry> governing(CalcRecord r) {
        List<Entry> out = new ArrayList<>();
        for (String key : r.governing())
            for (Entry e : r.results()) if (e.key().equals(key)) out.add(e);
        return out;
    }
}
