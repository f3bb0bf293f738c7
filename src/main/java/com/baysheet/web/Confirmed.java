package com.baysheet.web;

import com.baysheet.engine.InputError;

/**
 * Every delete, and every issue of several sheets at once, is confirmed on its own page, whose form carries
 * {@code confirm=yes}; a post without it (a stray click, a script) is refused with 400 naming the field, before
 * anything is read or changed.
 */
public final class Confirmed {
    private Confirmed() {}

    static void require(Form form) {
        require(form, "a delete");
    }

    /** {@code what}: what the confirmation page confirms, as the refusal names it ("a batch issue"). */
    public static void require(Form form, String what) {
        if (!"yes".equals(form.text("confirm")))
            throw new InputError("confirm", form.text("confirm"), "must be yes: " + what + " is confirmed on its confirmation page first");
    }
}
