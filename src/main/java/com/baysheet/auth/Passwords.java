package com.baysheet.auth;

import com.baysheet.engine.InputError;
import org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder;

import java.nio.charset.StandardCharsets;

/**
 * Password hashing with bcrypt. The policy is length, not character classes: at least 10 characters, and
 * at most 72 bytes in UTF-8 because bcrypt ignores anything after the 72nd byte (a longer password would
 * silently match any password sharing its first 72 bytes).
 */
public final class Passwords {
    /** The office default: about a quarter of a second per hash on the machines we run on. */
    public static final int DEFAULT_STRENGTH = 12;
    public static final int MIN_LENGTH = 10;
    public static final int MAX_BYTES = 72;

    private final BCryptPasswordEncoder encoder;
    /** Checked against when the username is unknown, so that a miss costs as long as a wrong password. */
    private final String decoy;

    /** @param strength bcrypt log rounds, 4 to 31; tests use 4 */
    public Passwords(int strength) {
        this.encoder = new BCryptPasswordEncoder(strength);
        this.decoy = encoder.encode("decoy password never issued");
    }

    /** Refuses a password the policy does not accept, naming the field. */
    public static String acceptable(String field, String password) {
        if (password == null || password.isEmpty()) throw new InputError(field, "nothing", "is required");
        if (password.codePointCount(0, password.length()) < MIN_LENGTH)
            throw new InputError(field, "a shorter one", "must be at least " + MIN_LENGTH + " characters");
        if (password.getBytes(StandardCharsets.UTF_8).length > MAX_BYTES)
            throw new InputError(field, "a longer one", "must be at most " + MAX_BYTES + " bytes (about 72 letters)");
        if (password.isBlank()) throw new InputError(field, "only spaces", "must not be only spaces");
        return password;
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
