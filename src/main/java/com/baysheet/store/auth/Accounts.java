package com.baysheet.store.auth;

import com.baysheet.store.Sql;
import com.baysheet.store.review.AuditTrail;

/** The user side of the store, wired once. */
public record Accounts(UserStore users, SessionStore sessions, Logins logins, UserAdmin admin, ResetCodes resets,
                       ApiTokens tokens) {
    public static Accounts on(Sql sql, AuditTrail audit, Logins.Policy policy) {
        UserStore users = new UserStore(sql);
        SessionStore sessions = new SessionStore(sql);
        ResetCodes resets = new ResetCodes(sql, users, policy.passwords(), policy.clock());
        Logins logins = new Logins(users, sessions, new LoginFailures(sql), audit, policy, resets);
        return new Accounts(users, sessions, logins, new UserAdmin(users, sessions, audit, policy.passwords(), resets), resets,
                new ApiTokens(sql));
    }
}
