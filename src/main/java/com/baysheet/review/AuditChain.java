package com.baysheet.review;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;

/**
 * The audit trail's hash chain: each entry's hash is SHA-256 of the previous entry's hash (64 lower-case hex
 * digits; 64 zeros before the first) followed by the entry's canonical form. The canonical form depends on
 * nothing a database chooses: the fields in a fixed order (format version, id, UTC instant to the microsecond
 * written {@code 2026-01-31T08:15:00.000000Z}, actor id or empty, username, action, subject, detail, address),
 * each as its UTF-8 byte length, a colon, the bytes and a semicolon. A copy moved to another database (SCRIPT,
 * pg_dump) verifies the same. Changing any field of any entry changes its hash and every hash after it.
 */
public final class AuditChain {
    public static final String GENESIS = "0".repeat(64);
    /** What every database here keeps of an instant exactly: an entry is stamped and hashed at this precision. */
    public static final ChronoUnit PRECISION = ChronoUnit.MICROS;
    private static final DateTimeFormatter AT = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSSSSS'Z'");

    private AuditChain() {}

    /** The hash of {@code e} (with its id and time assigned) after an entry whose hash is {@code prev}. */
    public static String link(String prev, AuditEvent e) {
        if (prev == null || prev.length() != 64) throw new IllegalArgumentException("prev must be 64 hex digits, was " + prev);
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes(prev.getBytes(StandardCharsets.US_ASCII));
        b.writeBytes(canonical(e));
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b.toByteArray()));
        } catch (NoSuchAlgorithmException x) {
            throw new IllegalStateException("every Java runtime has SHA-256", x);
        }
    }

    /** The entry's fields in their fixed order, length-prefixed so that no two entries share a form. */
    public static byte[] canonical(AuditEvent e) {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        field(b, "v1");
        field(b, Long.toString(e.id()));
        field(b, instant(e.at()));
        field(b, e.actorId() == null ? "" : e.actorId().toString());
        field(b, e.actorUsername());
        field(b, e.action());
        field(b, e.subject());
        field(b, e.detail());
        field(b, e.address());
        return b.toByteArray();
    }

    public static String instant(Instant at) {
        return AT.format(at.truncatedTo(PRECISION).atOffset(ZoneOffset.UTC));
    }

    private static void field(ByteArrayOutputStream b, String s) {
        byte[] v = (s == null ? "" : s).getBytes(StandardCharsets.UTF_8);
        b.writeBytes((v.length + ":").getBytes(StandardCharsets.US_ASCII));
        b.writeBytes(v);
        b.write(';');
    }
}
