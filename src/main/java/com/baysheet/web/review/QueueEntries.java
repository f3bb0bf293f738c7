package com.baysheet.web.review;

import com.baysheet.engine.InputError;
import com.baysheet.issue.Batch;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.CheckQueue;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.SheetState;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;
import io.javalin.http.Context;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** The check queue's entries read from the store, and the queue's and batches' request parameters. */
final class QueueEntries {
    private QueueEntries() {}

    /** Every stored mark sheet of the project, in reading order, with its current revision. */
    static List<CheckQueue.Entry> of(Reviews reviews, long project, MarkSheets marks) {
        Map<String, StoredRevision> latest = new HashMap<>();
        for (StoredRevision r : reviews.latestOf(project)) latest.put(r.sheet().subject(), r);
        Set<String> withdrawn = reviews.withdrawn(project);
        List<CheckQueue.Entry> out = new ArrayList<>();
        for (MarkSheets.MarkSheet s : marks.all()) {
            if (!s.stored()) continue;
            var ref = s.ref(project);
            StoredRevision r = latest.getOrDefault(ref.subject(), StoredRevision.unsubmitted(ref));
            var rev = r.revision();
            // an issued sheet is due its next revision when withdrawn or changed since issue (as its page says)
            boolean reopens = rev.state() == SheetState.ISSUED
                    && (withdrawn.contains(ref.subject()) || rev.outdatedBy(CalcFingerprint.of(s.record())));
            out.add(new CheckQueue.Entry(s, rev.state(), rev.preparer() == null ? null : rev.preparer().userId(),
                    rev.preparer() == null ? null : rev.preparer().initials(), r.label(), r.version(), reopens));
        }
        return out;
    }

    /** The queue's filter from the query: level, role, state, preparer's initials, search words, and {@code show=all} for every sheet. */
    static CheckQueue.Filter filter(Context ctx) {
        String state = ctx.queryParam("state");
        return new CheckQueue.Filter(ctx.queryParam("level"), ctx.queryParam("role"), state(state),
                ctx.queryParam("preparer"), !"all".equals(ctx.queryParam("show")), com.baysheet.review.SheetSearch.of(ctx.queryParam("q")));
    }

    private static SheetState state(String text) {
        if (text == null || text.isBlank()) return null;
        for (SheetState s : SheetState.values()) if (s.name().equalsIgnoreCase(text.strip())) return s;
        throw new InputError("state", "\"" + text + "\"", "must be one of the sheet states, or blank for any");
    }

    /** The ticked sheets of a batch form ({@code sheet=MARK:VERSION}), counted against the cap before any is read. */
    static List<Batch.Pick> picks(List<String> values) {
        Batch.cap("sheet", values.size());
        List<Batch.Pick> out = new ArrayList<>(values.size());
        for (String v : values) {
            String[] parts = v.strip().split(":", -1);
            try {
                if (parts.length != 2) throw new NumberFormatException();
                out.add(new Batch.Pick(Long.parseLong(parts[0]), Long.parseLong(parts[1])));
            } catch (NumberFormatException e) {
                throw new InputError("sheet", "\"" + v + "\"", "each ticked sheet is its mark and the version the queue showed; reload the queue");
            }
        }
        return out;
    }

    /** The mark ids of {@code sheets=1,2,3} (the selection a batch issue confirms), capped like a batch. */
    static List<Long> markIds(String sheets) {
        List<Long> out = new ArrayList<>();
        if (sheets == null || sheets.isBlank()) return out;
        String[] parts = sheets.split(",");
        Batch.cap("sheets", parts.length);
        for (String p : parts) {
            try {
                out.add(Long.parseLong(p.strip()));
            } catch (NumberFormatException e) {
                throw new InputError("sheets", "\"" + p + "\"", "the marks of the sheets to issue, separated by commas");
            }
        }
        return out;
    }
}
