package com.baysheet.auth;

import com.baysheet.engine.InputError;

import java.security.SecureRandom;
import java.util.Locale;
import java.util.function.Supplier;

/**
 * The one-time code that the first-start set-up asks for. The server prints it in its console only, so the
 * first administrator is whoever can read that console, not whoever reaches the set-up page first (on an
 * office network, anyone). Eight characters from an alphabet without look-alikes (no 0/O, 1/I/L): about
 * 40 bits, typed by hand once.
 */
public final class SetupCode {
    public static final String ALPHABET = "23456789ABCDEFGHJKMNPQRSTUVWXYZ";
    public static final int LENGTH = 8;
    private static final SecureRandom RANDOM = new SecureRandom();

    private final String code;

    /** A code from this generator (tests pass their own, to know it); it must be {@link #LENGTH} characters of the alphabet. */
    public SetupCode(Supplier<String> generator) {
        String c = generator.get();
        if (c == null || c.length() != LENGTH || !c.chars().allMatch(ch -> ALPHABET.indexOf(ch) >= 0))
            throw new IllegalArgumentException("a set-up code is " + LENGTH + " characters of " + ALPHABET);
        this.code = c;
    }

    /** A fresh random code, for the server. */
    public static SetupCode random() {
        return new SetupCode(SetupCode::draw);
    }

    static String draw() { return randomText(LENGTH); }

    /** Random characters of the unambiguous alphabet (also the demo accounts' one-time passwords). */
    public static String randomText(int length) {
        StringBuilder b = new StringBuilder(length);
        for (int i = 0; i < length; i++) b.append(ALPHABET.charAt(RANDOM.nextInt(ALPHABET.length())));
        return b.toString();
    }

    /** The code, to print in the console: never on a page. */
    public String code() { return code; }

    /**
     * Refuses a typed code that is not this one, naming the field. Case, spaces and dashes are forgiven
     * (people group characters as they copy them).
     */
    public void check(String field, String typed) {
        String t = typed == null ? "" : typed.replaceAll("[\\s-]", "").toUpperCase(Locale.ROOT);
        if (t.isEmpty()) throw new InputError(field, "(empty)", "is required: it is printed in the server's console at start");
        if (!Tokens.same(t, code))
            throw new InputError(field, "(hidden)", "is not the code printed in the server's console");
    }

    @Override
    public String toString() { return "SetupCode[(hidden)]"; }
}
