package com.baysheet.store.review;

import com.baysheet.auth.Tokens;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.Caller;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.MarkupNote;
import com.baysheet.review.RecordSnapshot;
import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetState;
import com.baysheet.store.NotFound;
import com.baysheet.store.Sql;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;

/**
 * The sheet check over the store: each step reads the current revision, refuses it if the user's page is
 * out of date, applies the lifecycle rules and writes the result with its audit entry in one transaction.
 * The calculation record passed in is the member's current one, as the framing derivation gives it.
 */
public final class Reviews {
    /** What a sheet's page shows: the current revision, its markups and all revisions. */
    /** @param withdrawn whether the issued revision in force was withdrawn (its members were deleted): kept, no longer in force */
    public record SheetView(StoredRevision current, List<MarkupNote> markups, List<StoredRevision> history, boolean withdrawn) {}

    private final Sql sql;

    public Reviews(Sql sql) {
        this.sql = sql;
    }

    public SheetView view(SheetRef ref) {
        return sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            List<MarkupNote> m = cur.stored() ? Markups.forRevision(c, cur.id()) : List.of();
            return new SheetView(cur, m, Revisions.history(c, ref), Revisions.withdrawn(c, ref.projectId()).contains(ref.subject()));
        });
    }

    /** The subjects of the project's sheets whose issued revision was withdrawn. */
    public java.util.Set<String> withdrawn(long projectId) {
        return sql.tx(c -> Revisions.withdrawn(c, projectId));
    }

    public List<StoredRevision> latestOf(long projectId) {
        return sql.tx(c -> Revisions.latestOf(c, projectId));
    }

    public StoredRevision revision(long id) {
        return sql.tx(c -> Revisions.byId(c, id)).orElseThrow(() -> new NotFound("revision", id));
    }

    /** The frozen bytes of an issued (or since superseded) revision. */
    public Optional<byte[]> issuedPdf(long revisionId) {
        return sql.tx(c -> Revisions.pdf(c, revisionId));
    }

    /** Issued revisions whose PDF has this SHA-256. */
    public List<StoredRevision> withPdf(String sha256) {
        return sql.tx(c -> Revisions.withPdf(c, sha256));
    }

    /**
     * Where an issued revision stands now: whether it was itself withdrawn, and its sheet's revision in force (none
     * when the sheet's latest issue was withdrawn). A revision is superseded exactly when its state says so.
     */
    public record Standing(boolean withdrawn, Optional<StoredRevision> inForce) {}

    public Standing standing(StoredRevision r) {
        return sql.tx(c -> new Standing(Revisions.wasWithdrawn(c, r.id()), Revisions.inForce(c, r.sheet())));
    }

    public void submit(SheetRef ref, long version, Caller who, LocalDate today, CalcRecord current) {
        String fp = CalcFingerprint.of(current);
        // on an issued sheet changed since issue, the submission opens the next revision; the issued one stays in force
        // a withdrawn sheet (its members were deleted, then restored) opens the next revision even if unchanged:
        // the withdrawn one never stands again. The flag, once set, is never cleared, so reading it first is safe.
        boolean withdrawn = sql.tx(c -> Revisions.withdrawn(c, ref.projectId()).contains(ref.subject()));
        step(ref, version, who, "submit", r -> (r.state() == SheetState.ISSUED
                        ? (withdrawn ? SheetRevision.opened(r.number() + 1) : r.reopen(fp)) : r).submit(who.actor(), fp, today),
                RecordSnapshot.write(current), null);
    }

    public void resubmit(SheetRef ref, long version, Caller who, LocalDate today, CalcRecord current) {
        String fp = CalcFingerprint.of(current);
        step(ref, version, who, "resubmit", r -> r.resubmit(who.actor(), fp, today), RecordSnapshot.write(current), null);
    }

    /** The preparer takes their submitted sheet back to being prepared; the calculation as submitted is dropped with it. */
    public void takeBack(SheetRef ref, long version, Caller who) {
        sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            int markups = cur.stored() ? Markups.forRevision(c, cur.id()).size() : 0;
            return apply(c, cur, version, who, "take back", r -> r.takeBack(who.actor(), markups), null, null, sql.now());
        });
    }

    public void returnWithMarkups(SheetRef ref, long version, Caller who) {
        sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            int open = cur.stored() ? Markups.openCount(c, cur.id()) : 0;
            return apply(c, cur, version, who, "return", r -> r.returnWithMarkups(who.actor(), open), cur.recordJson(), null, sql.now());
        });
    }

    public void approve(SheetRef ref, long version, Caller who, LocalDate today, CalcRecord current) {
        String fp = CalcFingerprint.of(current);
        sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            int open = cur.stored() ? Markups.openCount(c, cur.id()) : 0;
            return apply(c, cur, version, who, "approve", r -> r.approve(who.actor(), today, open, fp), cur.recordJson(), null, sql.now());
        });
    }

    /**
     * Issues the approved revision with this PDF, rendered from {@code current}, and what it changes; its SHA-256 is
     * computed here. The sheet's earlier issued revision is superseded by it in the same transaction.
     */
    public void issue(SheetRef ref, long version, Caller who, LocalDate today, CalcRecord current, byte[] pdf, String description) {
        String fp = CalcFingerprint.of(current);
        String sha = Tokens.sha256(pdf);
        sql.tx(c -> {
            StoredRevision cur = current(c, ref);
            apply(c, cur, version, who, "issue", r -> r.issue(who.actor(), today, sha, fp, description), RecordSnapshot.write(current), pdf, sql.now());
            Revisions.supersedeEarlier(c, cur.id(), sql.now());
            return null;
        });
    }

    private void step(SheetRef ref, long version, Caller who, String action, UnaryOperator<SheetRevision> rule,
                      String recordJson, byte[] pdf) {
        sql.tx(c -> apply(c, current(c, ref), version, who, action, rule, recordJson, pdf, sql.now()));
    }

    private static Void apply(Connection c, StoredRevision cur, long version, Caller who, String action,
                              UnaryOperator<SheetRevision> rule, String recordJson, byte[] pdf, Instant at) throws SQLException {
        if (cur.version() != version) throw new ConcurrentChange("The sheet " + cur.sheet().subject());
        SheetRevision next = rule.apply(cur.revision());
        if (!cur.stored()) Revisions.insertFirst(c, cur.sheet(), next, recordJson, at);
        else if (!Revisions.claim(c, cur.id(), version)) throw new ConcurrentChange("The sheet " + cur.sheet().subject());
        else if (next.number() > cur.revision().number()) Revisions.insertNext(c, cur.id(), next, recordJson, at);
        else Revisions.write(c, cur.id(), next, recordJson, pdf, at);
        AuditTrail.append(c, event(who, action, cur.sheet(), "revision " + next.number() + " now " + next.state().label()), at);
        return null;
    }

    static StoredRevision current(Connection c, SheetRef ref) throws SQLException {
        return Revisions.current(c, ref).orElseGet(() -> StoredRevision.unsubmitted(ref));
    }

    static AuditEvent event(Caller who, String action, SheetRef ref, String detail) {
        return AuditEvent.of(who.actor().userId(), who.username(), action, ref.label(), detail, who.address());
    }
}
