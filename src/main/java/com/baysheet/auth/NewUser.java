package com.baysheet.auth;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

import java.util.Locale;
import java.util.regex.Pattern;

/**
 * A user as entered on the set-up or users form, checked field by field. The username is kept in lower
 * case so that "JSmith" and "jsmith" are one person; initials in upper case.
 */
public record NewUser(String username, String fullName, String initials, Role role) {
    private static final Pattern USERNAME = Pattern.compile("[a-z0-9][a-z0-9._-]{1,39}");
    private static final Pattern INITIALS = Pattern.compile("[A-Z]{1,4}");
    private static final int MAX_NAME = 100;

    public NewUser {
        username = username(username);
        fullName = Check.text("fullName", fullName).strip();
        if (fullName.length() > MAX_NAME)
            throw new InputError("fullName", fullName.length() + " characters", "must be at most " + MAX_NAME + " characters");
        initials = Check.text("initials", initials).strip().toUpperCase(Locale.ROOT);
        if (!INITIALS.matcher(initials).matches())
            throw new InputError("initials", "\"" + initials + "\"", "must be 1 to 4 letters");
        Check.present("role", role);
    }

    /** A username as typed at login or on a form, normalized; an input error when it cannot be one. */
    public static String username(String typed) {
        String u = Check.text("username", typed).strip().toLowerCase(Locale.ROOT);
        if (!USERNAME.matcher(u).matches())
            throw new InputError("username", "\"" + typed.strip() + "\"",
                    "must be 2 to 40 characters: letters, digits, dot, dash or underscore, starting with a letter or digit");
        return u;
    }
}
