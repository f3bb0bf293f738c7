package com.baysheet.store.review;

import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetState;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Supersedes, on the caller's connection, the issued sheets and packages whose calculation the project's
 * new state changes: run by the model write itself, so a change and the supersession it causes commit
 * together or not at all.
 */
public final class Supersession {
    /** Who the supersession entries name: the author of the change that caused them. */
    public record By(Long userId, String username, String address) {}

    private Supersession() {}

    /** The sheets superseded, by label. */
    public static List<String> apply(Connection c, long projectId, Derived derived, By who, Instant at) throws SQLException {
        List<String> out = new ArrayList<>();
        for (StoredRevision r : Revisions.latestOf(c, projectId)) {
            // a row with no fingerprint (written by hand or by an old version) cannot be compared: left as it is
            if (r.revision().state() != SheetState.ISSUED || r.revision().fingerprint() == null) continue;
            Optional<CalcRecord> now = current(derived, r.sheet());
            if (now.isPresent() && supersede(c, r, now.get(), who, at)) out.add(r.sheet().label());
        }
        return out;
    }

    /** Marks this issued revision superseded and opens the next when its fingerprint is not the current one's. */
    static boolean supersede(Connection c, StoredRevision cur, CalcRecord current, By who, Instant at) throws SQLException {
        String fp = CalcFingerprint.of(current);
        if (!cur.revision().outdatedBy(fp) || !Revisions.claim(c, cur.id(), cur.version())) return false;
        SheetRevision gone = cur.revision().supersede(fp);
        Revisions.write(c, cur.id(), gone, cur.recordJson(), null, at);
        Revisions.insertNext(c, cur.id(), gone.next(), at);
        AuditTrail.append(c, AuditEvent.of(who.userId(), who.username(), "supersede", cur.sheet().label(), "revision "
                + gone.number() + " superseded; revision " + (gone.number() + 1) + " opened because the member's inputs changed",
                who.address()), at);
        return true;
    }

    /** What the sheet's check is about now: the member's record or the package's manifest; empty if gone. */
    private static Optional<CalcRecord> current(Derived d, SheetRef ref) {
        if (ref.isPackage()) return PackageScope.ofSubject(d, ref.subject()).map(s -> PackageManifest.of(s, d));
        return d.member(ref.subject()).map(DerivedMember::result).map(MemberResult::record);
    }
}
