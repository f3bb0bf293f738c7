package com.baysheet.store.review;

import com.baysheet.review.Caller;
import com.baysheet.review.MarkupNote;
import com.baysheet.review.MarkupRules;
import com.baysheet.review.MarkupTarget;
import com.baysheet.review.SheetRef;
import com.baysheet.store.NotFound;
import com.baysheet.store.Sql;

import java.sql.Connection;
import java.sql.SQLException;

import static com.baysheet.store.review.Reviews.current;
import static com.baysheet.store.review.Reviews.event;

/**
 * Markups on the current revision of a sheet. Each change also bumps the revision's version, so an approval
 * racing a new or reopened markup is refused as a concurrent change rather than approving past it.
 */
public final class ReviewMarkups {
    private final Sql sql;

    public ReviewMarkups(Sql sql) {
        this.sql = sql;
    }

    /** @param target "sheet", "input:KEY" or "step:SYMBOL" of the revision's record as submitted */
    public long add(SheetRef ref, Caller who, String target, String text) {
        return sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            MarkupRules.add(cur.revision(), who.actor());
            MarkupTarget t = MarkupTarget.parse("target", target, cur.record().orElseThrow());
            String body = MarkupNote.text("text", text);
            claim(c, cur);
            long id = Markups.add(c, cur.id(), t, who.actor(), body, sql.now());
            AuditTrail.append(c, event(who, "markup", ref, "markup " + id + " on " + t.code() + ": " + body), sql.now());
            return id;
        });
    }

    public void reply(SheetRef ref, long markupId, Caller who, String text) {
        sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            MarkupNote m = onCurrent(c, cur, markupId);
            MarkupRules.reply(cur.revision(), who.actor());
            String body = MarkupNote.text("text", text);
            claim(c, cur);
            Markups.reply(c, m.id(), who.actor(), body, sql.now());
            AuditTrail.append(c, event(who, "reply", ref, "reply to markup " + m.id() + ": " + body), sql.now());
            return null;
        });
    }

    /** Resolves ({@code resolved} true) or reopens a markup last seen at {@code version}. */
    public void resolve(SheetRef ref, long markupId, long version, Caller who, boolean resolved) {
        sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            MarkupNote m = onCurrent(c, cur, markupId);
            if (resolved) MarkupRules.resolve(cur.revision(), who.actor(), m);
            else MarkupRules.reopen(cur.revision(), who.actor(), m);
            if (m.version() != version || !Markups.setResolved(c, m.id(), version, resolved))
                throw new ConcurrentChange("Markup " + m.id());
            claim(c, cur);
            AuditTrail.append(c, event(who, resolved ? "resolve" : "reopen", ref, "markup " + m.id()), sql.now());
            return null;
        });
    }

    private static MarkupNote onCurrent(Connection c, StoredRevision cur, long markupId) throws SQLException {
        Markups.Found f = Markups.find(c, markupId).orElseThrow(() -> new NotFound("markup", markupId));
        if (!cur.stored() || f.revisionId() != cur.id()) throw new NotFound("markup on this sheet", markupId);
        return f.markup();
    }

    private static void claim(Connection c, StoredRevision cur) throws SQLException {
        if (!Revisions.claim(c, cur.id(), cur.version())) throw new ConcurrentChange("The sheet " + cur.sheet().subject());
    }
}
