package com.baysheet.store.review;

import com.baysheet.store.Sql;

/** The review side of the store, wired once. */
public record ReviewStore(Reviews reviews, ReviewMarkups markups, AuditTrail audit, FirmStore firm, MailStore mail) {
    public static ReviewStore on(Sql sql) {
        return new ReviewStore(new Reviews(sql), new ReviewMarkups(sql), new AuditTrail(sql), new FirmStore(sql), new MailStore(sql));
    }
}
