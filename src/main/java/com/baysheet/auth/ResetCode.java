package com.baysheet.auth;

import java.security.SecureRandom;
import java.util.Locale;

/**
 * A one-time password reset code: 20 characters from an alphabet without look-alikes (no I, L, O, U, 0, 1), 98
 * random bits, shown in groups of four ({@code K7QD-…}) so it can be read out or copied. Only its SHA-256 is
 * stored. Typed back, case, spaces and dashes do not matter.
 */
public final class ResetCode {
    /** 30 symbols: 20 of them carry 98 bits, beyond guessing in the day a code lives. */
    private static final String ALPHABET = "23456789ABCDEFGHJKMNPQRSTVWXYZ";
    private static final SecureRandom RANDOM = new SecureRandom();
    static final int LENGTH = 20;

    private ResetCode() {}

    public static String random() {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < LENGTH; i++) {
            if (i > 0 && i % 4 == 0) b.append('-');
            b.append(ALPHABET.charAt(RANDOM.nextInt(ALPHABET.length())));
        }
        return b.toString();
    }

    /** The code as typed, in the one form that is hashed: upper case, no spaces or dashes. */
    public static String normal(String typed) {
        return typed == null ? "" : typed.replaceAll("[\\s-]", "").toUpperCase(Locale.ROOT);
    }

    public static String hash(String typed) {
        return Tokens.sha256(normal(typed));
    }
}
