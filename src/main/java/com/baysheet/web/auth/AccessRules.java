package com.baysheet.web.auth;

import com.baysheet.auth.Role;

/**
 * Who may reach which route, by method and path, before any handler runs. Review actions are checked again,
 * in detail (the four-eyes rule, the sheet's state), by the review rules themselves; this table only keeps
 * each role inside its part of the office:
 * <ul>
 *   <li>anyone: the health check, static files, login, choosing a password with a reset code, and set-up while no
 *   administrator exists;</li>
 *   <li>any logged-in user: every page and API read, the review pages, verification, their own password, logout;</li>
 *   <li>engineers and checkers (who prepare): changes to projects, firm occupancies and the JSON API, and review actions;</li>
 *   <li>administrators: users, firm settings and the audit trail under /admin.</li>
 * </ul>
 */
public final class AccessRules {
    public enum Decision { ALLOW, LOGIN, FORBIDDEN, SET_UP }

    private AccessRules() {}

    /** @param role null when nobody is logged in */
    public static Decision decide(String method, String path, Role role, boolean setupDone) {
        if (isOpen(path)) return Decision.ALLOW;
        if (path.equals("/setup")) return setupDone ? Decision.LOGIN : Decision.ALLOW;
        if (path.equals("/login") || path.equals(AuthRoutes.RESET_PAGE)) return setupDone ? Decision.ALLOW : Decision.SET_UP;
        if (!setupDone) return Decision.SET_UP;
        if (role == null) return Decision.LOGIN;
        if (path.equals("/admin") || path.startsWith("/admin/"))
            return role.mayAdminister() ? Decision.ALLOW : Decision.FORBIDDEN;
        if (reads(method) || isPersonal(path)) return Decision.ALLOW;
        return role.mayPrepare() ? Decision.ALLOW : Decision.FORBIDDEN;
    }

    static boolean isOpen(String path) {
        return path.equals("/health") || path.startsWith("/static/") || path.equals("/favicon.ico");
    }

    /** What every logged-in user may post: logging out, their own password, and verifying a PDF. */
    private static boolean isPersonal(String path) {
        return path.equals("/logout") || path.equals("/account/password") || path.equals("/verify");
    }

    private static boolean reads(String method) {
        return method.equals("GET") || method.equals("HEAD") || method.equals("OPTIONS");
    }
}
