package com.baysheet.store;

import com.baysheet.framing.Derivation;
import com.baysheet.project.Project;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.time.Clock;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Derived buildings are held by project and version, the building a save derived read without deriving it again. */
class ResultsTest {
    static Database db;
    static Store store;
    static List<Project> projects;

    @BeforeAll
    static void open() {
        db = Database.open(TestDatabases.h2());
        store = Store.on(db.dataSource(), Derivation::derive, Clock.systemUTC());
        projects = Demo.loadIfEmpty(store);
    }

    @AfterAll
    static void close() { db.close(); }

    @Test
    void aSaveHoldsItsBuildingForTheNextReadAndLetsGoOfTheProjectsEarlierOnes() {
        long a = projects.get(0).id(), b = projects.get(1).id();
        store.results().of(b);
        Results.Computed before = store.results().of(a);
        int held = store.results().cachedCount();
        for (int k = 0; k < 3; k++) {
            Project p = store.projects().find(a);
            store.projects().update(Editor.DEMO, a, p.version(), p.info());
        }
        Results.Computed after = store.results().of(a);
        assertThat(after.project().version()).isEqualTo(before.project().version() + 3);
        // the save's own building, not one derived again on read; the other project's still held
        assertThat(store.results().of(a)).isSameAs(after);
        assertThat(store.results().kept(before)).isFalse();
        assertThat(store.results().cachedCount()).isEqualTo(held);
        assertThat(store.results().kept(store.results().of(b))).isTrue();
    }
}
