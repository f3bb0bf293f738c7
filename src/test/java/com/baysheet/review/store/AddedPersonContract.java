package com.baysheet.review.store;

import com.baysheet.auth.LoginRefused;
import com.baysheet.auth.LoginThrottle;
import com.baysheet.auth.NewUser;
import com.baysheet.auth.Passwords;
import com.baysheet.auth.ResetCode;
import com.baysheet.auth.Role;
import com.baysheet.auth.SessionPolicy;
import com.baysheet.engine.InputError;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Database;
import com.baysheet.store.Sql;
import com.baysheet.store.auth.Accounts;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.auth.ResetCodes;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.store.review.AuditTrail;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * A person the administrator adds has no password until they use their one-time set-up code, so the administrator
 * cannot log in as them; over the real migrations, on H2 and on PostgreSQL.
 */
abstract class AddedPersonContract {
    static final String PASSWORD = "long enough secret";
    static final String OWN = "eve's own chosen words";
    final TestClock clock = new TestClock(Instant.parse("2026-03-02T08:00:00Z"));
    Database db;
    Sql sql;
    AuditTrail audit;
    Accounts accounts;
    SignedIn admin;
    final NewUser eve = new NewUser("eve", "Eve Engineer", "EE", Role.ENGINEER);

    abstract Database open();

    @BeforeEach
    void setUp() {
        db = open();
        sql = new Sql(db.dataSource());
        audit = new AuditTrail(sql);
        accounts = Accounts.on(sql, audit, new Logins.Policy(new Passwords(4), new SessionPolicy(Duration.ofHours(2),
                Duration.ofHours(12)), new LoginThrottle(100, 100, Duration.ofMinutes(1), Duration.ofMinutes(15), Duration.ofHours(24)), clock));
        admin = accounts.logins().setUp(new NewUser("ada", "Ada Admin", "AA", Role.ADMINISTRATOR), PASSWORD, PASSWORD, "10.0.0.1")
                .orElseThrow();
    }

    @AfterEach
    void tearDown() {
        if (db != null) db.close();
    }

    @Test
    void addingMakesACodeOfWhichOnlyTheHashIsStoredAndTheTrailHoldsNoSecret() {
        ResetCodes.Issued issued = accounts.admin().add(admin.user(), eve, "10.0.0.1");
        assertThat(issued.forUser().username()).isEqualTo("eve");
        assertThat(issued.code()).matches("[2-9A-HJKMNP-TV-Z]{4}(-[2-9A-HJKMNP-TV-Z]{4}){4}");
        assertThat(issued.expiresAt()).isEqualTo(clock.instant().truncatedTo(java.time.temporal.ChronoUnit.MILLIS)
                .plus(ResetCodes.LIFETIME));
        assertThat(rows("SELECT code_hash FROM password_reset WHERE user_id = " + issued.forUser().id()))
                .containsExactly(ResetCode.hash(issued.code()));
        assertThat(rows("SELECT password_hash FROM app_user WHERE username = 'eve'")).singleElement().asString()
                .doesNotContain(issued.code()).startsWith("$2");

        List<AuditEvent> trail = audit.all();
        assertThat(trail).extracting(AuditEvent::action).containsSubsequence("user added", "reset code made");
        assertThat(trail.get(trail.size() - 2).detail()).contains("engineer", "no password");
        for (AuditEvent e : trail)
            assertThat(e.detail() + " " + e.subject()).as(e.action()).doesNotContain(issued.code())
                    .doesNotContain(ResetCode.normal(issued.code())).doesNotContain(ResetCode.hash(issued.code()));
    }

    @Test
    void noPasswordLogsInUntilThePersonUsesTheCodeThenTheirOwnDoes() {
        ResetCodes.Issued issued = accounts.admin().add(admin.user(), eve, "x");
        for (String guess : new String[] {PASSWORD, issued.code(), "", "eve", OWN, null})
            assertThatThrownBy(() -> accounts.logins().login("eve", guess, "x", null)).as(String.valueOf(guess))
                    .isInstanceOf(LoginRefused.class);

        for (String bad : new String[] {"short", "qwerty1234", "EVE", "Our structural office"})
            assertThatThrownBy(() -> accounts.resets().use("eve", issued.code(), bad, bad, "x")).as(bad)
                    .isInstanceOf(InputError.class).hasMessageStartingWith("newPassword:");
        accounts.resets().use("eve", issued.code(), OWN, OWN, "10.0.0.7");
        SignedIn in = accounts.logins().login("eve", OWN, "x", null);
        assertThat(in.user().role()).isEqualTo(Role.ENGINEER);
        assertThat(in.mustChangePassword()).as("chosen by the person: no forced change").isFalse();
        assertThat(audit.all()).extracting(AuditEvent::action).containsSubsequence("user added", "reset code made", "password reset");
        assertThatThrownBy(() -> accounts.resets().use("eve", issued.code(), "a second use of it", "a second use of it", "x"))
                .as("single use").isInstanceOf(InputError.class).hasMessageStartingWith("code:");
    }

    @Test
    void aSecondCodeVoidsTheFirstAndALapsedOneSendsThePersonBackToTheAdministrator() {
        ResetCodes.Issued first = accounts.admin().add(admin.user(), eve, "x");
        String second = accounts.resets().make(admin.user(), first.forUser().id(), "x").code();
        assertThatThrownBy(() -> accounts.resets().use("eve", first.code(), OWN, OWN, "x"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("code:");
        clock.advance(ResetCodes.LIFETIME.plusSeconds(1));
        assertThatThrownBy(() -> accounts.resets().use("eve", second, OWN, OWN, "x"))
                .isInstanceOf(InputError.class).hasMessageContaining("lapsed").hasMessageContaining("ask your administrator for a new one");
        assertThatThrownBy(() -> accounts.logins().login("eve", OWN, "x", null)).isInstanceOf(LoginRefused.class);
        String third = accounts.resets().make(admin.user(), first.forUser().id(), "x").code();
        accounts.resets().use("eve", third, OWN, OWN, "x");
        assertThat(accounts.logins().login("eve", OWN, "x", null).user().username()).isEqualTo("eve");
    }

    @Test
    void aRefusedAddStoresNobodyAndMakesNoCode() {
        assertThatThrownBy(() -> accounts.admin().add(admin.user(), new NewUser("ada", "Twin", "TW", Role.ENGINEER), "x"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("username:");
        assertThat(accounts.users().count()).isEqualTo(1);
        assertThat(rows("SELECT code_hash FROM password_reset")).isEmpty();
    }

    private List<String> rows(String query) {
        return sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement(query); ResultSet rs = ps.executeQuery()) {
                List<String> out = new ArrayList<>();
                while (rs.next()) out.add(rs.getString(1));
                return out;
            }
        });
    }
}
