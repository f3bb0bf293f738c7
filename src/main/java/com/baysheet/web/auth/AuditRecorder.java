package com.baysheet.web.auth;

import com.baysheet.auth.User;
import com.baysheet.review.ReviewRefused;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.store.review.AuditTrail;
import io.javalin.http.Context;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * What the access filter, the review refusals and the PDF downloads add to the audit trail: a refused privileged
 * attempt (a role that may not, the four-eyes rule: the 403s), a form without its token, and the download of an
 * issued PDF. Refusals are coalesced: one
 * entry per kind, user and address a minute at most, the next one counting those left out meanwhile, so a
 * script hammering a form cannot flood the trail. Each call is one line where it happens.
 */
public final class AuditRecorder {
    static final Duration COALESCE = Duration.ofMinutes(1);
    /** Past this many distinct (kind, user, address) keys the memory of recent ones starts again. */
    private static final int MAX_KEYS = 10_000;

    private final AuditTrail audit;
    private final Clock clock;
    private final Map<String, Episode> recent = new ConcurrentHashMap<>();

    private static final class Episode {
        Instant written;
        int leftOut;
    }

    public AuditRecorder(AuditTrail audit, Clock clock) {
        this.audit = audit;
        this.clock = clock;
    }

    /** Records a refusal worth keeping (forbidden by role, a missing or wrong form token, an API token refused); others pass. */
    public void refused(Context ctx, AccessRefused e) {
        String action = switch (e.why()) {
            case FORBIDDEN -> "access refused";
            case FORM_TOKEN -> "form token refused";
            case TOKEN -> "API token refused";
            default -> null;
        };
        if (action == null) return;
        SignedIn s = ctx.attribute(Access.SIGNED_IN);
        String who = s == null ? "" : s.user().username();
        int leftOut = admit(action + '\n' + who + '\n' + ctx.ip());
        if (leftOut < 0) return;
        String role = s == null ? "not logged in" : s.user().role().label();
        append(s == null ? null : s.user(), who, action, ctx.method().name() + " " + ctx.path(),
                role + (leftOut > 0 ? "; " + leftOut + " more like it in the minute before, not recorded one by one" : ""), ctx.ip());
    }

    /**
     * Records a review action refused for the person's rights (a role that may not, or the four-eyes rule: a
     * preparer approving their own sheet), coalesced like the filter's refusals.
     */
    public void refusedReview(Context ctx, ReviewRefused e) {
        if (!(e instanceof ReviewRefused.NotPermitted || e instanceof ReviewRefused.FourEyes)) return;
        SignedIn s = ctx.attribute(Access.SIGNED_IN);
        String who = s == null ? "" : s.user().username();
        int leftOut = admit("review refused\n" + who + '\n' + ctx.ip());
        if (leftOut < 0) return;
        append(s == null ? null : s.user(), who, "review action refused", ctx.method().name() + " " + ctx.path(),
                e.getMessage() + (leftOut > 0 ? "; " + leftOut + " more like it in the minute before, not recorded one by one" : ""), ctx.ip());
    }

    /** Records that the logged-in user downloaded an issued PDF ({@code what}: the sheet or package and revision). */
    public void downloaded(Context ctx, String what, String detail) {
        User u = Access.user(ctx);
        append(u, u.username(), "issued PDF downloaded", what, detail, ctx.ip());
    }

    /** How many were left out before this one, or -1 if this one is left out too. */
    private int admit(String key) {
        Instant now = clock.instant();
        if (recent.size() > MAX_KEYS) recent.clear();
        Episode ep = recent.computeIfAbsent(key, k -> new Episode());
        synchronized (ep) {
            if (ep.written != null && now.isBefore(ep.written.plus(COALESCE))) {
                ep.leftOut++;
                return -1;
            }
            int n = ep.leftOut;
            ep.written = now;
            ep.leftOut = 0;
            return n;
        }
    }

    private void append(User u, String who, String action, String subject, String detail, String address) {
        audit.append(AuditEvent.of(u == null ? null : u.id(), who.isEmpty() ? "(nobody)" : who, action, subject, detail, address));
    }
}
