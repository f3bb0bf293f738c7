package com.baysheet.store;

import org.junit.jupiter.api.Test;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The health check's probe bounds its own {@code SELECT 1} and leaves no bound behind: on H2 a statement's query timeout
 * becomes its session's, and a pooled connection that kept the probe's few seconds would cancel any longer statement
 * of whichever request took it next.
 */
class HealthProbeTest {
    @Test
    void aConnectionTheProbeUsedCarriesNoQueryTimeoutAfterIt() throws Exception {
        try (Database db = Database.open(TestDatabases.h2(), "")) {
            for (int i = 0; i < 20; i++) assertThat(Database.answers(db.dataSource(), 3)).isTrue();
            // every connection of the pool at once, so that the ones the probes had are among them
            List<Connection> all = new ArrayList<>();
            try {
                for (int i = 0; i < 8; i++) all.add(db.dataSource().getConnection());
                for (Connection c : all) assertThat(queryTimeoutMs(c)).isEqualTo("0");
            } finally {
                for (Connection c : all) c.close();
            }
        }
    }

    private static String queryTimeoutMs(Connection c) throws Exception {
        try (Statement s = c.createStatement();
             ResultSet r = s.executeQuery("SELECT SETTING_VALUE FROM INFORMATION_SCHEMA.SETTINGS WHERE SETTING_NAME = 'QUERY_TIMEOUT'")) {
            return r.next() ? r.getString(1) : "none";
        }
    }
}
