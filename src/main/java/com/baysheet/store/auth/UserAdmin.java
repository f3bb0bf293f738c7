package com.baysheet.store.auth;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Passwords;
import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.review.AuditTrail;

/**
 * What the administrator does to users: add one, change a role, make a user inactive or active again. An
 * administrator cannot demote or deactivate themselves (the office would be left with nobody to manage users).
 * Every change goes to the audit trail. The administrator never knows anyone's password, so cannot log in as
 * them: a person is added with no usable password and a one-time set-up code ({@link ResetCodes}) with which
 * they choose their own, as after a reset.
 */
public final class UserAdmin {
    private final UserStore users;
    private final SessionStore sessions;
    private final AuditTrail audit;
    private final Passwords passwords;
    private final ResetCodes codes;

    public UserAdmin(UserStore users, SessionStore sessions, AuditTrail audit, Passwords passwords, ResetCodes codes) {
        this.codes = codes;
        this.users = users;
        this.sessions = sessions;
        this.audit = audit;
        this.passwords = passwords;
    }

    /**
     * Adds a person and makes their one-time set-up code, to be shown to the administrator once. The stored hash
     * is of a random secret nobody keeps, so no password logs in (and a login costs the same as for anyone) until
     * the person uses the code. Should making the code fail after the user is stored, the users page's reset
     * button makes one: the person is never left with a password someone else knows.
     */
    public ResetCodes.Issued add(User admin, NewUser u, String address) {
        User made = users.create(u, passwords.hash(Tokens.random()), false);
        log(admin, "user added", made, made.role().label() + " (no password until they use a one-time set-up code)", address);
        return codes.make(admin, made.id(), address);
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
