package com.baysheet.web.review;

import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.Caller;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;
import com.baysheet.review.SheetState;
import com.baysheet.store.Store;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.store.review.StoredRevision;
import io.javalin.http.Context;

import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The after-filter that follows the project pages and the API without touching them: every successful change
 * goes to the audit trail, and a change to a project supersedes at once the issued sheets whose member's
 * inputs it changed, and the issued packages holding one of them (the sheet page also checks whenever it is opened).
 */
final class EditTrail {
    private static final Pattern PROJECT = Pattern.compile("^/(?:api/)?projects/(\\d+)(?:/.*)?$");
    private static final String[] OWN = {"/review/", "/admin/", "/login", "/logout", "/setup", "/account/", "/verify"};

    private final Store store;
    private final ReviewStore review;

    EditTrail(Store store, ReviewStore review) {
        this.store = store;
        this.review = review;
    }

    void after(Context ctx) {
        String m = ctx.method().name();
        SignedIn s = ctx.attribute("signedIn");
        if (s == null || m.equals("GET") || m.equals("HEAD") || m.equals("OPTIONS") || ctx.statusCode() >= 400 || own(ctx.path()))
            return;
        Caller who = Caller.of(s.user(), ctx.ip());
        review.audit().append(AuditEvent.of(s.user().id(), s.user().username(), "edit", ctx.path(), m, ctx.ip()));
        Matcher p = PROJECT.matcher(ctx.path());
        if (p.matches()) supersedeChanged(Long.parseLong(p.group(1)), who);
    }

    private void supersedeChanged(long projectId, Caller who) {
        Derived derived = store.results().of(projectId).derived();
        for (StoredRevision r : review.reviews().latestOf(projectId)) {
            if (r.revision().state() != SheetState.ISSUED) continue;
            current(derived, r.sheet()).ifPresent(x -> review.reviews().supersedeIfChanged(r.sheet(), x, who));
        }
    }

    /** What the sheet's check is about now: the member's record or the package's manifest; empty if gone. */
    private static Optional<CalcRecord> current(Derived d, SheetRef ref) {
        if (ref.isPackage()) return PackageScope.ofSubject(d, ref.subject()).map(s -> PackageManifest.of(s, d));
        return d.member(ref.subject()).map(DerivedMember::result).map(MemberResult::record);
    }

    private static boolean own(String path) {
        for (String p : OWN) if (path.startsWith(p)) return true;
        return false;
    }
}
