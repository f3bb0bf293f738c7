package com.baysheet.store.auth;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Passwords;
import com.baysheet.auth.Role;
import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.review.AuditTrail;

/**
 * What the administrator does to users: add one with a starting password, change a role, make a user
 * inactive or active again. An administrator cannot demote or deactivate themselves (the office would be
 * left with nobody to manage users). Every change goes to the audit trail. A starting password the administrator
 * sets must be changed by its owner at the first login; a reset never gives the administrator a password
 * ({@link ResetCodes}).
 */
public final class UserAdmin {
    private final UserStore users;
    private final SessionStore sessions;
    private final AuditTrail audit;
    private final Passwords passwords;

    public UserAdmin(UserStore users, SessionStore sessions, AuditTrail audit, Passwords passwords) {
        this.users = users;
        this.sessions = sessions;
        this.audit = audit;
        this.passwords = passwords;
    }

    public User add(User admin, NewUser u, String password, String address) {
        // the administrator knows this password: the person chooses their own at the first login
        User made = users.create(u, passwords.hash(Passwords.acceptable("password", password, u.username(), users.firmName())), true);
        log(admin, "user added", made, made.role().label(), address);
        return made;
    }

    public void setRole(User admin, long userId, Role role, String address) {
        User u = users.find(userId);
        if (u.id() == admin.id() && role != Role.ADMINISTRATOR)
            throw new InputError("role", role.label(), "you cannot take the administrator role from yourself");
        users.setRole(userId, role);
        sessions.deleteAll(userId);
        log(admin, "role changed", u, u.role().label() + " to " + role.label(), address);
    }

    public void setActive(User admin, long userId, boolean active, String address) {
        User u = users.find(userId);
        if (u.id() == admin.id() && !active) throw new InputError("active", "false", "you cannot make yourself inactive");
        users.setActive(userId, active);
        if (!active) sessions.deleteAll(userId);
        log(admin, active ? "user activated" : "user deactivated", u, "", address);
    }

    /**
     * For {@code --demo} only: a user with a password the server prints in its console, added unless the
     * username is taken (a second start with the demo keeps the first one's users); empty then.
     */
    public java.util.Optional<User> addDemo(NewUser u, String password) {
        if (users.findByUsername(u.username()).isPresent()) return java.util.Optional.empty();
        // printed in the console, so known to whoever reads it: changed at the first login
        User made = users.create(u, passwords.hash(Passwords.acceptable("password", password, u.username(), users.firmName())), true);
        audit.append(AuditEvent.of(null, "demo", "user added", "user " + made.username(), made.role().label()
                + " (demo account, password printed in the console)", "server"));
        return java.util.Optional.of(made);
    }

    private void log(User admin, String action, User u, String detail, String address) {
        audit.append(AuditEvent.of(admin.id(), admin.username(), action, "user " + u.username(), detail, address));
    }
}
