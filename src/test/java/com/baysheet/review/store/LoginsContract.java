package com.baysheet.review.store;

import com.baysheet.auth.LoginRefused;
import com.baysheet.auth.LoginThrottle;
import com.baysheet.auth.NewUser;
import com.baysheet.auth.Passwords;
import com.baysheet.auth.Role;
import com.baysheet.auth.SessionPolicy;
import com.baysheet.engine.InputError;
import com.baysheet.store.Database;
import com.baysheet.store.Sql;
import com.baysheet.store.auth.Accounts;
import com.baysheet.store.auth.LoginFailures;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.store.review.AuditTrail;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Set-up, logins, sessions and the throttle over the real migrations; run on H2 and on PostgreSQL. */
abstract class LoginsContract {
    static final String PASSWORD = "long enough secret";
    final TestClock clock = new TestClock(Instant.parse("2026-03-02T08:00:00Z"));
    Database db;
    AuditTrail audit;
    Accounts accounts;

    abstract Database open();

    @BeforeEach
    void setUp() {
        db = open();
        Sql sql = new Sql(db.dataSource());
        audit = new AuditTrail(sql);
        accounts = Accounts.on(sql, audit, new Logins.Policy(new Passwords(4),
                new SessionPolicy(Duration.ofHours(2), Duration.ofHours(12)), new LoginThrottle(3, 10, Duration.ofMinutes(1), Duration.ofMinutes(15), Duration.ofHours(24)), clock));
    }

    @AfterEach
    void tearDown() {
        if (db != null) db.close();
    }

    Logins logins() { return accounts.logins(); }

    /** A person the administrator adds, who then chooses {@code password} with their set-up code. */
    com.baysheet.auth.User added(SignedIn admin, NewUser u, String password) {
        var issued = accounts.admin().add(admin.user(), u, "x");
        accounts.resets().use(u.username(), issued.code(), password, password, "x");
        return issued.forUser();
    }

    SignedIn admin() {
        return logins().setUp(new NewUser("ada", "Ada Admin", "AA", Role.ADMINISTRATOR), PASSWORD, PASSWORD, "10.0.0.1").orElseThrow();
    }

    @Test
    void setUpHappensOnceAndLogsTheAdministratorIn() {
        assertThat(logins().setupDone()).isFalse();
        SignedIn s = admin();
        assertThat(s.user().role()).isEqualTo(Role.ADMINISTRATOR);
        assertThat(logins().session(s.token())).isPresent();
        assertThat(logins().setupDone()).isTrue();
        assertThat(logins().setUp(new NewUser("mallory", "M", "M", Role.ADMINISTRATOR), PASSWORD, PASSWORD, "x")).isEmpty();
        assertThat(accounts.users().count()).isEqualTo(1);
    }

    @Test
    void setUpRefusesAMismatchedConfirmation() {
        assertThatThrownBy(() -> logins().setUp(new NewUser("ada", "Ada", "AA", Role.ADMINISTRATOR), PASSWORD, "other thing!", "x"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("confirmPassword:");
        assertThat(logins().setupDone()).isFalse();
    }

    @Test
    void aWrongPasswordIsRefusedAndRecordedWithoutSayingWhetherTheUserExists() {
        admin();
        String known = messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.2", null));
        String unknown = messageOf(() -> logins().login("nobody", "wrong password!", "10.0.0.2", null));
        assertThat(known).isEqualTo(unknown);
        assertThat(audit.all()).extracting(e -> e.action()).containsExactly("set-up", "login failed", "login failed");
    }

    @Test
    void repeatedFailuresThrottleEvenTheRightPasswordUntilTheWindowPasses() {
        admin();
        for (int i = 0; i < 3; i++) messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.2", null));
        assertThatThrownBy(() -> logins().login("ada", PASSWORD, "10.0.0.2", null)).isInstanceOf(LoginRefused.class)
                .hasMessageContaining("Too many").matches(e -> ((LoginRefused) e).retryAfter().isPresent());
        clock.advance(Duration.ofMinutes(16));
        assertThat(logins().login("ada", PASSWORD, "10.0.0.2", null).user().username()).isEqualTo("ada");
    }

    @Test
    void fortyConcurrentWrongGuessesAreFortyCountedAndNoneSlipsPast() throws Exception {
        admin();
        int n = 40;
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(8);
        java.util.List<java.util.concurrent.Future<String>> answers = new java.util.ArrayList<>();
        for (int i = 0; i < n; i++) answers.add(pool.submit(() -> messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.9", null))));
        int throttled = 0;
        for (var a : answers) if (a.get().startsWith("Too many")) throttled++;
        pool.shutdown();
        // the clock stands still: only the 3 free failures check a password, every other guess waits
        assertThat(n - throttled).isEqualTo(3);
        assertThat(audit.all().stream().filter(e -> e.action().equals("login failed"))).hasSize(3);
        clock.advance(Duration.ofMinutes(1));
        SignedIn in = logins().login("ada", PASSWORD, "10.0.0.9", null);
        assertThat(in.failedAttempts()).isEqualTo(n);
    }

    @Test
    void rightLoginsCheckedAtOnceFromOneAddressLeaveItNoWait() {
        // ten people behind one office address log in at the same moment: every attempt is counted before its
        // password is checked, so the tenth count starts the address's wait; once all ten prove right, none is left
        LoginFailures counts = new LoginFailures(new Sql(db.dataSource()));
        LoginThrottle t = new LoginThrottle(3, 10, Duration.ofMinutes(1), Duration.ofMinutes(15), Duration.ofHours(24));
        Instant now = clock.instant();
        for (int i = 0; i < 10; i++) assertThat(counts.claim("person" + i, "10.0.0.7", now, t).waitUntil()).isEmpty();
        assertThat(counts.claim("person10", "10.0.0.7", now, t).waitUntil()).as("ten in flight, the eleventh waits").isPresent();
        for (int i = 0; i < 10; i++) counts.succeeded("person" + i, "10.0.0.7", t);
        assertThat(counts.claim("person11", "10.0.0.7", now, t).waitUntil()).isEmpty();
    }

    @Test
    void failuresPastTheFreeOnesKeepTheAddressWaitingThoughARightLoginEndsAmongThem() {
        LoginFailures counts = new LoginFailures(new Sql(db.dataSource()));
        LoginThrottle t = new LoginThrottle(3, 10, Duration.ofMinutes(1), Duration.ofMinutes(15), Duration.ofHours(24));
        Instant now = clock.instant();
        for (int i = 0; i < 10; i++) counts.claim("guess" + i, "10.0.0.8", now, t);   // ten wrong names: the address waits
        Instant later = now.plus(Duration.ofMinutes(1));
        assertThat(counts.claim("guess10", "10.0.0.8", later, t).waitUntil()).isEmpty();  // its wait over, an eleventh
        counts.succeeded("guess10", "10.0.0.8", t);                                        // ... proves right
        assertThat(counts.claim("someone", "10.0.0.8", later, t).waitUntil()).as("ten failures remain: the wait holds").isPresent();
    }

    @Test
    void eachFurtherFailureDoublesTheWaitAndTheRightPasswordWaitsToo() {
        admin();
        for (int i = 0; i < 3; i++) messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.2", null));
        assertThat(messageOf(() -> logins().login("ada", PASSWORD, "10.0.0.2", null))).contains("try again in 60 s");
        clock.advance(Duration.ofSeconds(60));
        messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.2", null));
        assertThat(messageOf(() -> logins().login("ada", PASSWORD, "10.0.0.2", null))).contains("try again in 120 s");
        clock.advance(Duration.ofSeconds(119));
        assertThat(messageOf(() -> logins().login("ada", PASSWORD, "10.0.0.2", null))).contains("try again in 1 s");
        clock.advance(Duration.ofSeconds(1));
        assertThat(logins().login("ada", PASSWORD, "10.0.0.2", null).failedAttempts()).isEqualTo(7);
    }

    @Test
    void refusedAttemptsOfOneWaitWriteOneAuditRowWithTheirCount() {
        admin();
        for (int i = 0; i < 3; i++) messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.2", null));
        for (int i = 0; i < 7; i++) messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.2", null));
        assertThat(audit.all().stream().filter(e -> e.action().startsWith("login throttled"))).isEmpty();
        clock.advance(Duration.ofMinutes(1));
        logins().login("ada", PASSWORD, "10.0.0.2", null);
        assertThat(audit.all().stream().filter(e -> e.action().equals("login throttled")))
                .singleElement().satisfies(e -> assertThat(e.detail()).contains("7 attempts"));
    }

    @Test
    void theAdministratorUnlocksAWaitingUser() {
        SignedIn a = admin();
        for (int i = 0; i < 4; i++) messageOf(() -> logins().login("ada", "wrong password!", "10.0.0.2", null));
        assertThat(logins().waiting()).containsKey("ada");
        logins().unlock(a.user(), a.user(), "10.0.0.1");
        assertThat(logins().waiting()).isEmpty();
        assertThat(logins().login("ada", PASSWORD, "10.0.0.3", null).user().username()).isEqualTo("ada");
        assertThat(audit.all()).extracting(e -> e.action()).contains("login unlocked");
    }

    @Test
    void aLoginRenewsTheSessionAndEndsTheOneTheBrowserBrought() {
        SignedIn first = admin();
        SignedIn second = logins().login("ADA", PASSWORD, "10.0.0.2", first.token());
        assertThat(second.token()).isNotEqualTo(first.token());
        assertThat(second.csrfToken()).isNotEqualTo(first.csrfToken());
        assertThat(logins().session(first.token())).isEmpty();
        assertThat(logins().session(second.token())).isPresent();
    }

    @Test
    void sessionsLapseWhenIdleAndAtTheCap() {
        SignedIn s = admin();
        clock.advance(Duration.ofMinutes(119));
        assertThat(logins().session(s.token())).as("used within the idle time").isPresent();
        for (int i = 0; i < 5; i++) {
            clock.advance(Duration.ofMinutes(110));
            assertThat(logins().session(s.token())).isPresent();
        }
        clock.advance(Duration.ofMinutes(110));
        assertThat(logins().session(s.token())).as("past twelve hours").isEmpty();
        SignedIn t = logins().login("ada", PASSWORD, "x", null);
        clock.advance(Duration.ofHours(2));
        assertThat(logins().session(t.token())).as("idle two hours").isEmpty();
        assertThat(logins().session("made-up")).isEmpty();
    }

    @Test
    void logoutAndPasswordChangeEndSessions() {
        SignedIn a = admin();
        SignedIn b = logins().login("ada", PASSWORD, "x", null);
        logins().changePassword(a, PASSWORD, "a new long secret", "a new long secret", "x");
        assertThat(logins().session(b.token())).as("the other browser").isEmpty();
        assertThat(logins().session(a.token())).isPresent();
        assertThatThrownBy(() -> logins().login("ada", PASSWORD, "x", null)).isInstanceOf(LoginRefused.class);
        logins().logout(a, "x");
        assertThat(logins().session(a.token())).isEmpty();
        assertThatThrownBy(() -> logins().changePassword(b, "not it at all", "x".repeat(12), "x".repeat(12), "x"))
                .hasMessageStartingWith("currentPassword:");
    }

    @Test
    void anInactiveUserCannotLogInAndLosesTheirSessions() {
        SignedIn a = admin();
        var eve = added(a, new NewUser("eve", "Eve", "EP", Role.ENGINEER), PASSWORD);
        SignedIn e = logins().login("eve", PASSWORD, "x", null);
        accounts.admin().setActive(a.user(), eve.id(), false, "x");
        assertThat(logins().session(e.token())).isEmpty();
        assertThatThrownBy(() -> logins().login("eve", PASSWORD, "x", null)).isInstanceOf(LoginRefused.class);
        assertThatThrownBy(() -> accounts.admin().setActive(a.user(), a.user().id(), false, "x")).hasMessageStartingWith("active:");
    }

    @Test
    void sqlInTheUsernameChangesNothing() {
        admin();
        messageOf(() -> logins().login("ada' OR '1'='1", "' OR '1'='1", "x", null));
        assertThat(accounts.users().count()).isEqualTo(1);
        assertThatThrownBy(() -> accounts.admin().add(accounts.users().findAll().get(0),
                new NewUser("x'); DROP TABLE app_user; --", "X", "X", Role.ENGINEER), "x")).hasMessageStartingWith("username:");
        assertThat(accounts.users().count()).isEqualTo(1);
    }

    private static String messageOf(Runnable r) {
        try {
            r.run();
            return null;
        } catch (LoginRefused e) {
            return e.getMessage();
        }
    }

    @Test
    void aDemoPasswordPrintedInTheConsoleMustBeChangedAndARefusedOneStoresNothing() {
        SignedIn admin = admin();
        assertThat(admin.mustChangePassword()).as("the administrator chose their own at set-up").isFalse();
        NewUser eve = new NewUser("eve.engineer", "Eve Engineer", "EE", Role.ENGINEER);
        for (String bad : new String[] {"short", "qwerty1234", "EVE.ENGINEER", "Our structural office"}) {
            assertThatThrownBy(() -> accounts.admin().addDemo(eve, bad))
                    .as(bad).isInstanceOf(InputError.class).hasMessageStartingWith("password:");
        }
        assertThat(accounts.users().findByUsername("eve.engineer")).as("nothing stored").isEmpty();
        var made = accounts.admin().addDemo(eve, PASSWORD).orElseThrow();
        SignedIn in = logins().login("eve.engineer", PASSWORD, "x", null);
        assertThat(in.mustChangePassword()).isTrue();
        assertThat(logins().session(in.token()).orElseThrow().mustChangePassword()).isTrue();
        assertThatThrownBy(() -> logins().changePassword(in, PASSWORD, "Password123", "Password123", "x"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("newPassword: is one of the most common passwords; choose another");
        assertThatThrownBy(() -> logins().changePassword(in, PASSWORD, PASSWORD, PASSWORD, "x"))
                .isInstanceOf(InputError.class).hasMessageContaining("differ");
        assertThat(accounts.users().mustChangePassword(made.id())).as("still flagged after refusals").isTrue();
        logins().changePassword(in, PASSWORD, "eve's own chosen words", "eve's own chosen words", "x");
        assertThat(logins().session(in.token()).orElseThrow().mustChangePassword()).isFalse();
    }

    @Test
    void aResetCodeSetsThePersonsOwnPasswordOnceAndGivesTheAdministratorNothingToLogInWith() {
        SignedIn admin = admin();
        var eve = added(admin, new NewUser("eve", "Eve Engineer", "EE", Role.ENGINEER), "eve's own chosen words");
        logins().login("eve", "eve's own chosen words", "x", null).notices(); // told of her set-up code: marked told
        var issued = accounts.resets().make(admin.user(), eve.id(), "10.0.0.1");
        String code = issued.code();
        assertThat(code).matches("[2-9A-HJKMNP-TV-Z]{4}(-[2-9A-HJKMNP-TV-Z]{4}){4}");
        assertThat(audit.all().get(audit.all().size() - 1).detail()).as("the code is never recorded").doesNotContain(code);

        // what the administrator saw (the code) is no password, for the person or anyone
        assertThatThrownBy(() -> logins().login("eve", code, "10.0.0.1", null)).isInstanceOf(LoginRefused.class);
        assertThatThrownBy(() -> accounts.resets().use("ada", code, "ada takes over 1", "ada takes over 1", "10.0.0.1"))
                .as("the code is the person's only").isInstanceOf(InputError.class).hasMessageStartingWith("code:");

        SignedIn stillIn = logins().login("eve", "eve's own chosen words", "x", null);
        assertThat(stillIn.notices()).as("told at the next login").singleElement().asString()
                .contains("made for you by ada", "has not been used");
        accounts.resets().use(" Eve ", code.toLowerCase().replace("-", " "), "words only eve knows", "words only eve knows", "10.0.0.5");
        assertThat(logins().session(stillIn.token())).as("her sessions end").isEmpty();
        assertThatThrownBy(() -> logins().login("eve", "eve's own chosen words", "x", null)).isInstanceOf(LoginRefused.class);
        SignedIn after = logins().login("eve", "words only eve knows", "x", null);
        assertThat(after.mustChangePassword()).as("chosen by the person: no forced change").isFalse();
        assertThat(after.notices()).singleElement().asString().contains("used on", "from 10.0.0.5");
        assertThat(logins().login("eve", "words only eve knows", "x", null).notices()).as("told once").isEmpty();

        assertThatThrownBy(() -> accounts.resets().use("eve", code, "a second use of it", "a second use of it", "10.0.0.1"))
                .as("single use").isInstanceOf(InputError.class).hasMessageStartingWith("code:");
        assertThatThrownBy(() -> logins().login("eve", code, "10.0.0.1", null)).isInstanceOf(LoginRefused.class);
        assertThat(audit.all()).extracting(e -> e.action()).contains("reset code made", "password reset");
    }

    @Test
    void aResetCodeLapsesAndANewOneVoidsTheLast() {
        SignedIn admin = admin();
        var eve = added(admin, new NewUser("eve", "Eve Engineer", "EE", Role.ENGINEER), PASSWORD);
        String lapsing = accounts.resets().make(admin.user(), eve.id(), "x").code();
        clock.advance(com.baysheet.store.auth.ResetCodes.LIFETIME.plusSeconds(1));
        assertThatThrownBy(() -> accounts.resets().use("eve", lapsing, "too late for this", "too late for this", "x"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("code:");
        String voided = accounts.resets().make(admin.user(), eve.id(), "x").code();
        String live = accounts.resets().make(admin.user(), eve.id(), "x").code();
        assertThatThrownBy(() -> accounts.resets().use("eve", voided, "an earlier code here", "an earlier code here", "x"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("code:");
        assertThatThrownBy(() -> accounts.resets().use("eve", live, "short", "short", "x"))
                .as("a refused password spends no code").isInstanceOf(InputError.class).hasMessageStartingWith("newPassword:");
        accounts.resets().use("eve", live, "the latest code works", "the latest code works", "x");
        assertThat(logins().login("eve", "the latest code works", "x", null).user().username()).isEqualTo("eve");
    }
}
