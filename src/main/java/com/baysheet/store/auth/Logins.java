package com.baysheet.store.auth;

import com.baysheet.auth.LoginRefused;
import com.baysheet.auth.LoginThrottle;
import com.baysheet.auth.NewUser;
import com.baysheet.auth.Passwords;
import com.baysheet.auth.SessionPolicy;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.project.Firm;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.review.AuditTrail;
import com.baysheet.store.auth.SessionStore.StoredSession;

import java.time.Clock;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Logging in and out: passwords checked against their hashes, failed attempts throttled and recorded,
 * a fresh session for every login (any session the browser brought along is ended, so a planted cookie
 * never becomes a login), sessions that lapse when idle and at a fixed cap.
 */
public final class Logins {
    /** Ready-made pieces, so that tests can give a cheap hash strength and their own clock. */
    public record Policy(Passwords passwords, SessionPolicy sessions, LoginThrottle throttle, Clock clock) {
        /** The office's own: bcrypt at full strength, working-day sessions, the office throttle, on this clock. */
        public static Policy office(Clock clock) {
            return new Policy(new Passwords(Passwords.DEFAULT_STRENGTH), SessionPolicy.OFFICE, LoginThrottle.OFFICE, clock);
        }
    }

    private final UserStore users;
    private final SessionStore sessions;
    private final LoginFailures failures;
    private final AuditTrail audit;
    private final Policy policy;
    private final ResetCodes resets;

    public Logins(UserStore users, SessionStore sessions, LoginFailures failures, AuditTrail audit, Policy policy) {
        this(users, sessions, failures, audit, policy, null);
    }

    /** @param resets whose notices a login tells the person (null: none) */
    public Logins(UserStore users, SessionStore sessions, LoginFailures failures, AuditTrail audit, Policy policy,
                  ResetCodes resets) {
        this.resets = resets;
        this.users = users;
        this.sessions = sessions;
        this.failures = failures;
        this.audit = audit;
        this.policy = policy;
    }

    /**
     * Checks a password, counted by the throttle before the check (so concurrent guesses are each counted);
     * during a wait even the right password is refused with the time left. A login after failed attempts
     * says how many there were ({@link SignedIn#failedAttempts()}).
     */
    public SignedIn login(String typedUsername, String password, String address, String oldToken) {
        String name = typedUsername == null ? "" : typedUsername.strip().toLowerCase(Locale.ROOT);
        // to the millisecond, which every database keeps exactly: a wait ending "now" must not round past now
        Instant now = policy.clock().instant().truncatedTo(java.time.temporal.ChronoUnit.MILLIS);
        LoginFailures.Gate gate = failures.claim(name, address, now, policy.throttle());
        if (gate.endedEpisodeUser() > 0 || gate.endedEpisodeAddress() > 0)
            audit.append(AuditEvent.of(null, name, "login throttled", "user " + name, Math.max(gate.endedEpisodeUser(),
                    gate.endedEpisodeAddress()) + " attempts refused while waiting", address));
        if (gate.waitUntil().isPresent()) throw LoginRefused.throttled(gate.waitUntil().get(), now);
        Optional<UserStore.WithHash> found = users.findByUsername(name);
        boolean ok = policy.passwords().matches(password, found.map(UserStore.WithHash::passwordHash).orElse(null));
        if (!ok || !found.get().user().active()) {
            audit.append(AuditEvent.of(null, name, "login failed", "user " + name, "", address));
            throw LoginRefused.badCredentials();
        }
        if (oldToken != null) sessions.delete(Tokens.sha256(oldToken));
        int before = failures.succeeded(name, address, policy.throttle());
        failures.prune(now, policy.throttle());
        User u = found.get().user();
        audit.append(AuditEvent.of(u.id(), u.username(), "login", "user " + u.username(),
                before > 0 ? before + " failed attempts before this login" : "", address));
        return start(u, now).withFailedAttempts(before).withMustChangePassword(found.get().mustChangePassword())
                .withNotices(resets == null ? List.of() : resets.notices(u.id()));
    }

    /** The administrator lifts a user's wait at once; the audit trail notes it with the attempts it had. */
    public void unlock(User admin, User who, String address) {
        int n = failures.unlock(who.username(), policy.clock().instant().truncatedTo(java.time.temporal.ChronoUnit.MILLIS));
        audit.append(AuditEvent.of(admin.id(), admin.username(), "login unlocked", "user " + who.username(),
                n + " failed attempts", address));
    }

    /** Usernames that must wait now, with their attempts, for the users page. */
    public java.util.Map<String, LoginFailures.Waiting> waiting() {
        return failures.waiting(policy.clock().instant());
    }

    /** The smallest slide of a session's expiry worth writing. */
    static final java.time.Duration EXTEND_STEP = java.time.Duration.ofMinutes(1);

    /** The login a cookie value stands for, if it is live; each use slides its idle expiry. */
    public Optional<SignedIn> session(String token) {
        return arrive(token).map(Arrival::signedIn);
    }

    /** A signed-in request, and the firm's settings read with its session (null where their row is absent). */
    public record Arrival(SignedIn signedIn, Firm firm) {}

    /** As {@link #session}, with the firm's settings read by the same statement: every page asks for both. */
    public Optional<Arrival> arrive(String token) {
        if (token == null || token.isBlank()) return Optional.empty();
        String hash = Tokens.sha256(token);
        Optional<SessionStore.WithUser> found = sessions.findWithUser(hash);
        Instant now = policy.clock().instant();
        if (found.isEmpty()) return Optional.empty();
        StoredSession s = found.get().session();
        if (!s.expiresAt().isAfter(now)) {
            sessions.delete(hash);
            return Optional.empty();
        }
        UserStore.WithHash w = found.get().user();
        User u = w.user();
        if (!u.active()) {
            sessions.deleteAll(u.id());
            return Optional.empty();
        }
        Instant expires = policy.sessions().expiresAt(s.createdAt(), now);
        // slide the expiry at most once a minute: a page view should not cost a database write
        if (expires.isAfter(s.expiresAt().plus(EXTEND_STEP))) sessions.extend(hash, expires);
        else expires = s.expiresAt();
        return Optional.of(new Arrival(new SignedIn(u, token, s.csrfToken(), expires).withMustChangePassword(w.mustChangePassword()),
                found.get().firm()));
    }

    public void logout(SignedIn s, String address) {
        sessions.delete(Tokens.sha256(s.token()));
        audit.append(AuditEvent.of(s.user().id(), s.user().username(), "logout", "user " + s.user().username(), "", address));
    }

    /** Changes the password after checking the current one; the user's other sessions are ended. */
    public void changePassword(SignedIn s, String current, String replacement, String confirm, String address) {
        UserStore.WithHash w = users.findByUsername(s.user().username()).orElseThrow();
        if (!policy.passwords().matches(current, w.passwordHash()))
            throw new InputError("currentPassword", "(hidden)", "is not your current password");
        Passwords.acceptable("newPassword", confirmed(replacement, confirm), s.user().username(), users.firmName());
        // a password someone else set stays known to them: keeping it would defeat the forced change
        if (policy.passwords().matches(replacement, w.passwordHash()))
            throw new InputError("newPassword", "(hidden)", "must differ from the current password");
        String hash = policy.passwords().hash(replacement);
        users.setPassword(s.user().id(), hash, false); // chosen by the person themselves
        sessions.deleteOthers(s.user().id(), Tokens.sha256(s.token()));
        audit.append(AuditEvent.of(s.user().id(), s.user().username(), "password changed", "user " + s.user().username(), "", address));
    }

    /** The one-time set-up: creates the first administrator and logs them in; empty once set-up is done. */
    public Optional<SignedIn> setUp(NewUser admin, String password, String confirm, String address) {
        String hash = policy.passwords().hash(Passwords.acceptable("password", confirmed(password, confirm),
                admin.username(), users.firmName()));
        Optional<User> u = users.createFirstAdministrator(admin, hash);
        u.ifPresent(x -> audit.append(AuditEvent.of(x.id(), x.username(), "set-up", "user " + x.username(),
                "first administrator created", address)));
        return u.map(x -> start(x, policy.clock().instant()));
    }

    public boolean setupDone() { return users.setupDone(); }

    private SignedIn start(User u, Instant now) {
        String token = Tokens.random();
        String csrf = Tokens.random();
        Instant expires = policy.sessions().expiresAt(now, now);
        sessions.deleteExpired(now);
        sessions.create(new StoredSession(Tokens.sha256(token), u.id(), csrf, now, expires));
        return new SignedIn(u, token, csrf, expires);
    }

    private static String confirmed(String password, String confirm) {
        if (password != null && !password.equals(confirm))
            throw new InputError("confirmPassword", "(hidden)", "does not match the new password");
        return password;
    }
}
