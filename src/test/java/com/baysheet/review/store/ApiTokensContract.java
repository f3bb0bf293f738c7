package com.baysheet.review.store;

import com.baysheet.auth.Role;
import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.store.Database;
import com.baysheet.store.NotFound;
import com.baysheet.store.Sql;
import com.baysheet.store.auth.ApiTokens;
import com.baysheet.store.auth.UserStore;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Personal API tokens over the real migrations, stamped by the store's clock; run on H2 and on PostgreSQL. */
abstract class ApiTokensContract {
    final TestClock clock = new TestClock(Instant.parse("2026-03-02T08:00:00Z"));
    Database db;
    ApiTokens tokens;
    UserStore users;
    User eng;
    User other;

    abstract Database open();

    @BeforeEach
    void setUp() {
        db = open();
        Sql sql = new Sql(db.dataSource(), clock);
        tokens = new ApiTokens(sql);
        users = new UserStore(sql);
        eng = ReviewDatabases.user(db, "eng", "EN", Role.ENGINEER);
        other = ReviewDatabases.user(db, "other", "OT", Role.CHECKER);
    }

    @AfterEach
    void tearDown() {
        if (db != null) db.close();
    }

    @Test
    void aTokenFindsItsOwnerAsTheOwnerStandsAndStampsItsUseAtMostOnceAMinute() {
        ApiTokens.Issued made = tokens.make(eng, "  script  ", "10.0.0.1");
        assertThat(made.name()).isEqualTo("script");
        assertThat(tokens.of(eng.id())).singleElement().satisfies(t -> assertThat(t.lastUsedAt()).isNull());

        assertThat(tokens.holder(made.token())).hasValueSatisfying(h -> assertThat(h.user().username()).isEqualTo("eng"));
        Instant first = tokens.of(eng.id()).get(0).lastUsedAt();
        assertThat(first).isNotNull();
        clock.advance(Duration.ofSeconds(30));
        tokens.holder(made.token());
        assertThat(tokens.of(eng.id()).get(0).lastUsedAt()).as("within the minute: not written again").isEqualTo(first);
        clock.advance(Duration.ofMinutes(2));
        tokens.holder(made.token());
        assertThat(tokens.of(eng.id()).get(0).lastUsedAt()).isAfter(first);

        users.setActive(eng.id(), false);
        assertThat(tokens.holder(made.token())).as("an inactive owner's token").isEmpty();
        users.setActive(eng.id(), true);
        assertThat(tokens.holder(made.token())).isPresent();
        assertThat(tokens.holder("bst_" + made.token().substring(5))).isEmpty();
        assertThat(tokens.holder(made.token().substring(4))).as("without the prefix").isEmpty();
        assertThat(tokens.holder(null)).isEmpty();
    }

    @Test
    void onlyTheOwnersTokenOfThatNumberIsRevokedAndEachIsAudited() {
        ApiTokens.Issued a = tokens.make(eng, "a", "10.0.0.1");
        ApiTokens.Issued b = tokens.make(other, "b", "10.0.0.1");
        long aId = tokens.of(eng.id()).get(0).id();
        assertThatThrownBy(() -> tokens.revoke(other, other.id(), aId, "10.0.0.2")).isInstanceOf(NotFound.class);
        assertThat(tokens.holder(a.token())).isPresent();
        tokens.revoke(eng, eng.id(), aId, "10.0.0.1");
        assertThat(tokens.holder(a.token())).isEmpty();
        assertThat(tokens.holder(b.token())).isPresent();
        assertThat(tokens.byUser()).containsOnlyKeys(other.id());
        assertThatThrownBy(() -> tokens.revoke(eng, eng.id(), aId, "10.0.0.1")).as("twice").isInstanceOf(NotFound.class);
    }

    @Test
    void namesAndTheNumberHeldAreBounded() {
        assertThatThrownBy(() -> tokens.make(eng, " ", "ip")).isInstanceOf(InputError.class).extracting("field").isEqualTo("name");
        assertThatThrownBy(() -> tokens.make(eng, "x".repeat(ApiTokens.MAX_NAME + 1), "ip")).isInstanceOf(InputError.class);
        for (int i = 0; i < ApiTokens.MAX_PER_USER; i++) tokens.make(eng, "t" + i, "ip");
        assertThatThrownBy(() -> tokens.make(eng, "one more", "ip")).isInstanceOf(InputError.class)
                .hasMessageContaining("revoke one first");
        assertThat(tokens.of(eng.id())).hasSize(ApiTokens.MAX_PER_USER);
        assertThat(tokens.of(other.id())).isEmpty();
    }
}
