package com.baysheet.web.auth;

import com.baysheet.auth.Role;
import io.javalin.security.RouteRole;

/**
 * Who a route admits, declared where the route is declared ({@code r.get(path, handler, Admit.OFFICE)}) and
 * enforced by {@link Access#check} before its handler runs. A route admits whoever any one of its roles
 * admits; a route that declares none admits nobody. Review actions are checked again, in detail (the
 * four-eyes rule, the sheet's state), by the review rules themselves: these roles keep each person inside
 * their part of the office.
 */
public enum Admit implements RouteRole {
    /** Anyone at any time, asking nothing of the database: the health check and static files (reads only). */
    OPEN,
    /** Anyone, signed in or not, once the office has its administrator: the login form. */
    ANYONE,
    /** Anyone while the office has no administrator yet: the first start's set-up. */
    FIRST_START,
    /** Any signed-in user, even one who must first replace a password someone else set: their own password, logout. */
    ACCOUNT,
    /** Any signed-in member of the office: every page and API read, the review pages, verifying a PDF. */
    OFFICE,
    /** Those who prepare sheets, engineers and checkers: changes to projects, firm occupancies, review actions. */
    PREPARER,
    /** The administrator: users, firm settings and the audit trail. */
    ADMINISTRATOR;

    /** Whether this role lets a signed-in user of {@code role} in (the roles that need no sign-in say yes). */
    boolean lets(Role role) {
        return switch (this) {
            case OPEN, ANYONE, ACCOUNT, OFFICE -> true;
            case FIRST_START -> false;
            case PREPARER -> role.mayPrepare();
            case ADMINISTRATOR -> role.mayAdminister();
        };
    }
}
