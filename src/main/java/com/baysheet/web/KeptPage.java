package com.baysheet.web;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Base64;
import java.util.HexFormat;
import java.util.List;

/**
 * A rendered page as {@link PageCache} keeps it: its bytes cut at the places that belong to the request (the
 * header's firm and user, the confirmation after a save, the form token of every POST form), so that filling
 * it in per request is a copy, with no template run over the page and no scan of it.
 */
final class KeptPage {
    /** What goes into a place: the header's who, the notice, the form token, or nothing (segments joined as they are). */
    enum Part { WHO, NOTICE, TOKEN, NONE }

    /**
     * The markers a page is rendered with where its per-request parts go: a random prefix per server, so that no
     * text on a page (all of it escaped, but a marker need not rely on that) can stand for one.
     */
    record Places(String who, String notice, String token) {
        static Places random() {
            byte[] b = new byte[16];
            new SecureRandom().nextBytes(b);
            String nonce = "kept" + HexFormat.of().formatHex(b);
            return new Places(nonce + "w", nonce + "n", nonce + "t");
        }

        String prefix() { return who.substring(0, who.length() - 1); }

        /** The marker of the {@code i}th drawing put in after rendering ({@link #of(String, Places, List)}). */
        String drawing(int i) { return prefix() + "d" + i + ";"; }
    }

    /** One request's parts, as bytes. */
    record Parts(byte[] who, byte[] notice, byte[] token) {
        private static final byte[] NOTHING = new byte[0];

        static Parts of(String who, String notice, String token) {
            return new Parts(utf8(who), utf8(notice), utf8(token == null ? "" : token));
        }

        byte[] of(Part p) {
            return switch (p) {
                case WHO -> who;
                case NOTICE -> notice;
                case TOKEN -> token;
                case NONE -> NOTHING;
            };
        }
    }

    private final byte[][] segments;
    private final Part[] parts;
    private final byte[] digest;
    private final int size;

    private KeptPage(byte[][] segments, Part[] parts) {
        this.segments = segments;
        this.parts = parts;
        MessageDigest d = sha256();
        int n = 0;
        for (int i = 0; i < segments.length; i++) {
            n += segments[i].length;
            lengthPrefixed(d, segments[i]);
            if (i < parts.length) d.update((byte) parts[i].ordinal());
        }
        this.digest = d.digest();
        this.size = n;
    }

    /** The page rendered with {@code places} for its parts, cut at them. */
    static KeptPage of(String html, Places places) {
        return of(html, places, List.of());
    }

    /**
     * The page rendered with {@code places} for its parts, cut at them, with each of {@code drawings} put in at its
     * marker ({@link Places#drawing}): markup made apart from the template, none of it a form.
     */
    static KeptPage of(String html, Places places, List<String> drawings) {
        String prefix = places.prefix();
        List<byte[]> segments = new ArrayList<>();
        List<Part> parts = new ArrayList<>();
        int from = 0;
        for (int at = html.indexOf(prefix); at >= 0; at = html.indexOf(prefix, from)) {
            int end = at + prefix.length();
            char kind = end < html.length() ? html.charAt(end) : ' ';
            segments.add(utf8(html.substring(from, at)));
            if (kind == 'd') {
                int stop = html.indexOf(';', end);
                int i = stop < 0 ? -1 : index(html.substring(end + 1, stop), drawings.size());
                if (i < 0) throw new IllegalStateException("a drawing marker with no drawing");
                // the drawing is a segment of its own, joined to those either side by nothing
                parts.add(Part.NONE);
                segments.add(utf8(drawings.get(i)));
                parts.add(Part.NONE);
                from = stop + 1;
                continue;
            }
            Part p = kind == 'w' ? Part.WHO : kind == 'n' ? Part.NOTICE : kind == 't' ? Part.TOKEN : null;
            if (p == null) throw new IllegalStateException("a page place marker with no part: " + kind);
            parts.add(p);
            from = end + 1;
        }
        segments.add(utf8(html.substring(from)));
        return new KeptPage(segments.toArray(byte[][]::new), parts.toArray(Part[]::new));
    }

    /** {@code digits} as an index below {@code n}, or -1. */
    private static int index(String digits, int n) {
        if (digits.isEmpty() || digits.length() > 6 || !digits.chars().allMatch(Character::isDigit)) return -1;
        int i = Integer.parseInt(digits);
        return i < n ? i : -1;
    }

    /** The bytes the page holds, its parts aside: what it costs to keep. */
    int size() { return size; }

    /** The page with these parts in their places, as sent. */
    byte[] filled(Parts p) {
        int n = size;
        for (Part part : parts) n += p.of(part).length;
        byte[] out = new byte[n];
        int at = 0;
        for (int i = 0; i < segments.length; i++) {
            System.arraycopy(segments[i], 0, out, at, segments[i].length);
            at += segments[i].length;
            if (i < parts.length) {
                byte[] x = p.of(parts[i]);
                System.arraycopy(x, 0, out, at, x.length);
                at += x.length;
            }
        }
        return out;
    }

    /** A strong entity tag of exactly the bytes {@link #filled} sends: the page's digest and this request's parts. */
    String etag(Parts p) {
        MessageDigest d = sha256();
        d.update(digest);
        lengthPrefixed(d, p.who());
        lengthPrefixed(d, p.notice());
        lengthPrefixed(d, p.token());
        byte[] h = d.digest();
        return "\"" + Base64.getUrlEncoder().withoutPadding().encodeToString(java.util.Arrays.copyOf(h, 18)) + "\"";
    }

    private static void lengthPrefixed(MessageDigest d, byte[] b) {
        d.update((b.length + ":").getBytes(StandardCharsets.US_ASCII));
        d.update(b);
    }

    private static byte[] utf8(String s) { return s.getBytes(StandardCharsets.UTF_8); }

    private static MessageDigest sha256() {
        // a copy of one made at start: every request for a kept page hashes its tag, and a look-up of the provider
        // costs more than the hash of a few hundred bytes
        try {
            return (MessageDigest) SHA256.clone();
        } catch (CloneNotSupportedException e) {
            return newSha256();
        }
    }

    private static final MessageDigest SHA256 = newSha256();

    private static MessageDigest newSha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
