package com.baysheet.auth;

import com.baysheet.engine.InputError;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/**
 * Password hashing with bcrypt. The policy is length, not character classes: at least 10 characters, and
 * at most 72 bytes in UTF-8 because bcrypt ignores anything after the 72nd byte (a longer password would
 * silently match any password sharing its first 72 bytes). Beyond length, a password on the shipped list of
 * the commonest ones ({@code auth/common-passwords.txt}, compared without regard to case) is refused, and so
 * is one equal to the username or the firm's name: those are the first guesses anyone makes.
 */
public final class Passwords {
    /** The office default: about a quarter of a second per hash on the machines we run on. */
    public static final int DEFAULT_STRENGTH = 12;
    public static final int MIN_LENGTH = 10;
    public static final int MAX_BYTES = 72;

    private final BCryptPasswordEncoder encoder;
    /** Checked against when the username is unknown, so that a miss costs as long as a wrong password. */
    private final String decoy;
    static final String DECOY_PASSWORD = "decoy password never issued";
    /**
     * {@link #DECOY_PASSWORD} hashed once at {@link #DEFAULT_STRENGTH} (its cost is in the hash: "$2a$12$"), so that
     * the office's start does not spend a quarter of a second making it; it is never matched by a login, only checked
     * against for the time it takes.
     */
    static final String DECOY_AT_DEFAULT = "$2a$12$kgDo/34rmnt.K.h5pDJkiuuH0AD76n.PUOXlBOQ2TQqleMU0jTXwO";

    /** @param strength bcrypt log rounds, 4 to 31; tests use 4 */
    public Passwords(int strength) {
        this.encoder = new BCryptPasswordEncoder(strength);
        this.decoy = strength == DEFAULT_STRENGTH ? DECOY_AT_DEFAULT : encoder.encode(DECOY_PASSWORD);
    }

    /** The decoy's bcrypt cost as its hash records it, which is what a check against it costs. */
    int decoyStrength() { return Integer.parseInt(decoy.substring(4, 6)); }

    /** Refuses a password the policy does not accept, naming the field. */
    public static String acceptable(String field, String password) {
        if (password == null || password.isEmpty()) throw new InputError(field, "nothing", "is required");
        if (password.codePointCount(0, password.length()) < MIN_LENGTH)
            throw new InputError(field, "a shorter one", "must be at least " + MIN_LENGTH + " characters");
        if (password.getBytes(StandardCharsets.UTF_8).length > MAX_BYTES)
            throw new InputError(field, "a longer one", "must be at most " + MAX_BYTES + " bytes (about 72 letters)");
        if (password.isBlank()) throw new InputError(field, "only spaces", "must not be only spaces");
        if (Common.LIST.contains(password.strip().toLowerCase(Locale.ROOT)))
            throw new InputError(field, "a common one", "is one of the most common passwords; choose another");
        return password;
    }

    /** As {@link #acceptable(String, String)}, and refused when it is the username or the firm's name. */
    public static String acceptable(String field, String password, String username, String firmName) {
        acceptable(field, password);
        String p = plain(password);
        if (!p.isEmpty() && p.equals(plain(username)))
            throw new InputError(field, "the username", "must not be the username; choose another");
        if (!p.isEmpty() && p.equals(plain(firmName)))
            throw new InputError(field, "the firm's name", "must not be the firm's name; choose another");
        return password;
    }

    /** Letters and digits only, in lower case: "Our Office" and "ouroffice" are one guess. */
    private static String plain(String s) {
        return s == null ? "" : s.toLowerCase(Locale.ROOT).replaceAll("[^\\p{L}\\p{N}]", "");
    }

    /** The shipped list, read once on first use. */
    private static final class Common {
        static final Set<String> LIST = load("/auth/common-passwords.txt");

        private static Set<String> load(String resource) {
            try (InputStream in = Passwords.class.getResourceAsStream(resource)) {
                if (in == null) throw new IllegalStateException("missing resource " + resource);
                Set<String> out = new HashSet<>();
                try (BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
                    for (String line; (line = r.readLine()) != null; ) {
                        String w = line.strip().toLowerCase(Locale.ROOT);
                        if (!w.isEmpty() && !w.startsWith("#")) out.add(w);
                    }
                }
                return Set.copyOf(out);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    public String hash(String password) {
        return encoder.encode(acceptable("password", password));
    }

    /** Whether a typed password matches a stored hash; a null hash (unknown user) costs the same and fails. */
    public boolean matches(String typed, String hash) {
        if (typed == null || typed.getBytes(StandardCharsets.UTF_8).length > MAX_BYTES) {
            encoder.matches("", decoy);
            return false;
        }
        if (hash == null) {
            encoder.matches(typed, decoy);
            return false;
        }
        return encoder.matches(typed, hash);
    }
}
