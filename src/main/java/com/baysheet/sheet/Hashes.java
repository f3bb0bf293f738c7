package com.baysheet.sheet;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;

/** SHA-256 for file hashes and for the content digest that fixes a PDF's ID and font subset names. */
final class Hashes {
    private Hashes() {}

    static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    /** A digest of the model's text; records print all their components, so equal inputs give equal digests. */
    static byte[] of(Object... parts) {
        MessageDigest d = sha256();
        for (Object p : parts) {
            d.update(String.valueOf(p).getBytes(StandardCharsets.UTF_8));
            d.update((byte) 0);
        }
        return d.digest();
    }

    static long seed(byte[] digest) { return ByteBuffer.wrap(digest).getLong(); }
}
