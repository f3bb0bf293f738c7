package com.baysheet.web;

import com.baysheet.engine.InputError;

/**
 * Every delete is confirmed on its own page, whose form carries {@code confirm=yes}; a post without it (a stray
 * click, a script) is refused with 400 naming the field, before anything is read or changed.
 */
final class Confirmed {
    private Confirmed() {}

    static void require(Form form) {
        if (!"yes".equals(form.text("confirm")))
            throw new InputError("confirm", form.text("confirm"), "must be yes: a delete is confirmed on its confirmation page first");
    }
}
