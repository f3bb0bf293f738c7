package com.baysheet.review;

import java.time.Instant;

/**
 * One line of the audit trail: who did what, to what, when and from where. {@code actorId} is null for an
 * attempt by nobody logged in (a failed login names the username typed). {@code hash} is the entry's link in the
 * audit chain ({@link AuditChain}), empty before it is stored.
 */
public record AuditEvent(long id, Instant at, Long actorId, String actorUsername, String action, String subject,
                         String detail, String address, String hash) {
    public AuditEvent {
        hash = hash == null ? "" : hash;
        actorUsername = clip(actorUsername, 40);
        action = clip(action, 40);
        subject = clip(subject, 300);
        detail = detail == null ? "" : detail;
        address = clip(address, 64);
    }

    public AuditEvent(long id, Instant at, Long actorId, String actorUsername, String action, String subject,
                      String detail, String address) {
        this(id, at, actorId, actorUsername, action, subject, detail, address, "");
    }

    /** The same entry as stored: its id, time (at the chain's precision) and hash assigned. */
    public AuditEvent stored(long newId, Instant newAt, String newHash) {
        return new AuditEvent(newId, newAt, actorId, actorUsername, action, subject, detail, address, newHash);
    }

    /** An event to append (the store assigns id and time). */
    public static AuditEvent of(Long actorId, String actorUsername, String action, String subject, String detail,
                                String address) {
        return new AuditEvent(0, null, actorId, actorUsername, action, subject, detail, address);
    }

    private static String clip(String s, int max) {
        String t = s == null ? "" : s;
        return t.length() > max ? t.substring(0, max) : t;
    }
}
