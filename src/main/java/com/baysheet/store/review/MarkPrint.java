package com.baysheet.store.review;

import com.baysheet.review.Mark;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;

/** SHA-256 of stored marks, every field length-prefixed so that no two lists of marks print the same bytes. */
final class MarkPrint {
    private MarkPrint() {}

    static String of(List<Mark> marks) {
        MessageDigest d = sha256();
        for (Mark m : marks) {
            field(d, Long.toString(m.id()));
            field(d, m.prefix());
            field(d, Integer.toString(m.seq()));
            field(d, m.text());
            field(d, String.valueOf(m.calc()));
            field(d, String.valueOf(m.originId()));
            field(d, Boolean.toString(m.active()));
        }
        return HexFormat.of().formatHex(d.digest());
    }

    private static void field(MessageDigest d, String s) {
        byte[] b = s.getBytes(StandardCharsets.UTF_8);
        d.update((b.length + ":").getBytes(StandardCharsets.US_ASCII));
        d.update(b);
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
