package com.baysheet.store;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.DatabaseMetaData;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Copies tables between two databases by what their metadata says (tables, columns, keys, foreign keys), not by a
 * list of our own, so that a table a later migration adds is carried too. Values go across typed: bytes as bytes,
 * text as text, times with their zone as {@link OffsetDateTime}, doubles (NaN among them) as doubles, NULL as NULL.
 * <p>
 * The rows themselves are copied with plain JDBC, on purpose: the statement is built from the columns the source's
 * result set reports, each value is read by the JDBC type that metadata gives and a NULL is bound with the target
 * column's own type. There is no fixed list of names to bind and no row to map to a value of ours, which is what Jdbi
 * would add; its argument factories would pick a type from the Java value instead, and lose the target's type for
 * NULL. The fixed-SQL reads of the catalogue go through Jdbi like the rest of the store.
 */
final class TableCopy {
    /** Flyway's own bookkeeping: each database keeps the one its migrations wrote. */
    static final String HISTORY = "flyway_schema_history";
    private static final int BATCH = 500;

    private TableCopy() {}

    /** The base tables of the connection's schema, Flyway's history aside, parents before the tables that refer to them. */
    static List<String> ordered(Connection c) throws SQLException {
        Map<String, Set<String>> parents = new LinkedHashMap<>();
        for (String t : names(c)) parents.put(t, new LinkedHashSet<>());
        DatabaseMetaData md = c.getMetaData();
        for (String t : parents.keySet())
            try (ResultSet fk = md.getImportedKeys(c.getCatalog(), c.getSchema(), t)) {
                while (fk.next()) {
                    String parent = fk.getString("PKTABLE_NAME");
                    if (!parent.equals(t) && parents.containsKey(parent)) parents.get(t).add(parent);
                }
            }
        List<String> out = new ArrayList<>();
        while (out.size() < parents.size()) {
            int before = out.size();
            for (var e : parents.entrySet())
                if (!out.contains(e.getKey()) && out.containsAll(e.getValue())) out.add(e.getKey());
            if (out.size() == before) throw new IllegalStateException("the foreign keys among these tables form a cycle: "
                    + parents.keySet().stream().filter(t -> !out.contains(t)).toList());
        }
        return out;
    }

    private static List<String> names(Connection c) throws SQLException {
        String schema = c.getSchema();
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT table_name FROM information_schema.tables "
                            + "WHERE table_schema = :schema AND table_type = 'BASE TABLE' ORDER BY table_name")
                    .bind("schema", schema).mapTo(String.class).stream().filter(t -> !t.equalsIgnoreCase(HISTORY)).toList();
        }
    }

    static long count(Connection c, String table) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM " + quote(table))) {
            rs.next();
            return rs.getLong(1);
        }
    }

    /**
     * Copies every row of one table, in primary key order, in batches; returns how many. A nullable column that refers to
     * its own table (a level typical of another) is written in a second pass, once every row it may point at is there.
     */
    static long copy(Connection from, Connection to, String table) throws SQLException {
        List<String> key = primaryKey(from, table), late = selfReferences(from, table);
        Map<String, Integer> targetTypes = columnTypes(to, table);
        List<Object[]> deferred = new ArrayList<>();
        long rows = 0;
        try (Statement s = from.createStatement(); ResultSet rs = s.executeQuery("SELECT * FROM " + quote(table)
                + (key.isEmpty() ? "" : " ORDER BY " + String.join(", ", key.stream().map(TableCopy::quote).toList())))) {
            ResultSetMetaData md = rs.getMetaData();
            List<String> cols = new ArrayList<>();
            for (int i = 1; i <= md.getColumnCount(); i++) {
                String col = md.getColumnName(i).toLowerCase();
                if (!targetTypes.containsKey(col)) throw new IllegalStateException(table + "." + col + " is not on the target");
                cols.add(col);
            }
            if (!late.isEmpty() && key.isEmpty()) late = List.of(); // no key to find the row again: one pass, in the source's order
            try (PreparedStatement ins = to.prepareStatement("INSERT INTO " + quote(table) + " (" + String.join(", ",
                    cols.stream().map(TableCopy::quote).toList()) + ") VALUES (" + "?, ".repeat(cols.size() - 1) + "?)")) {
                while (rs.next()) {
                    Object[] later = new Object[late.size() + key.size()];
                    for (int i = 1; i <= cols.size(); i++) {
                        Object v = read(rs, i, md.getColumnType(i));
                        int l = late.indexOf(cols.get(i - 1));
                        if (l >= 0) later[l] = v;
                        write(ins, i, l >= 0 ? null : v, targetTypes.get(cols.get(i - 1)));
                    }
                    for (int k = 0; k < key.size() && !late.isEmpty(); k++) later[late.size() + k] = rs.getObject(key.get(k));
                    if (!late.isEmpty()) deferred.add(later);
                    ins.addBatch();
                    if (++rows % BATCH == 0) ins.executeBatch();
                }
                ins.executeBatch();
            }
        }
        if (!deferred.isEmpty()) fillIn(to, table, late, key, deferred);
        return rows;
    }

    private static void fillIn(Connection to, String table, List<String> late, List<String> key, List<Object[]> rows) throws SQLException {
        String set = String.join(", ", late.stream().map(c -> quote(c) + " = ?").toList());
        String where = String.join(" AND ", key.stream().map(c -> quote(c) + " = ?").toList());
        try (PreparedStatement up = to.prepareStatement("UPDATE " + quote(table) + " SET " + set + " WHERE " + where)) {
            int n = 0;
            for (Object[] r : rows) {
                for (int i = 0; i < r.length; i++) up.setObject(i + 1, r[i]);
                up.addBatch();
                if (++n % BATCH == 0) up.executeBatch();
            }
            up.executeBatch();
        }
    }

    private static List<String> primaryKey(Connection c, String table) throws SQLException {
        Map<Integer, String> bySeq = new java.util.TreeMap<>();
        try (ResultSet rs = c.getMetaData().getPrimaryKeys(c.getCatalog(), c.getSchema(), table)) {
            while (rs.next()) bySeq.put(rs.getInt("KEY_SEQ"), rs.getString("COLUMN_NAME").toLowerCase());
        }
        return List.copyOf(bySeq.values());
    }

    /** The nullable columns of this table whose foreign key points back at it. */
    private static List<String> selfReferences(Connection c, String table) throws SQLException {
        Set<String> out = new LinkedHashSet<>();
        try (ResultSet fk = c.getMetaData().getImportedKeys(c.getCatalog(), c.getSchema(), table)) {
            while (fk.next()) if (fk.getString("PKTABLE_NAME").equals(table)) out.add(fk.getString("FKCOLUMN_NAME").toLowerCase());
        }
        Map<String, Boolean> nullable = new HashMap<>();
        try (ResultSet rs = c.getMetaData().getColumns(c.getCatalog(), c.getSchema(), table, "%")) {
            while (rs.next()) nullable.put(rs.getString("COLUMN_NAME").toLowerCase(), rs.getInt("NULLABLE") == DatabaseMetaData.columnNullable);
        }
        return out.stream().filter(col -> nullable.getOrDefault(col, false)).toList();
    }

    private static Map<String, Integer> columnTypes(Connection c, String table) throws SQLException {
        Map<String, Integer> out = new HashMap<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT * FROM " + quote(table) + " WHERE 1 = 0")) {
            ResultSetMetaData md = rs.getMetaData();
            for (int i = 1; i <= md.getColumnCount(); i++) out.put(md.getColumnName(i).toLowerCase(), md.getColumnType(i));
        }
        return out;
    }

    private static Object read(ResultSet rs, int i, int type) throws SQLException {
        Object v = switch (type) {
            case Types.BINARY, Types.VARBINARY, Types.LONGVARBINARY, Types.BLOB -> rs.getBytes(i);
            case Types.CHAR, Types.VARCHAR, Types.LONGVARCHAR, Types.CLOB, Types.NCHAR, Types.NVARCHAR, Types.LONGNVARCHAR,
                    Types.NCLOB -> rs.getString(i);
            case Types.TIMESTAMP_WITH_TIMEZONE -> rs.getObject(i, OffsetDateTime.class);
            case Types.TIMESTAMP -> rs.getObject(i, LocalDateTime.class);
            case Types.DATE -> rs.getObject(i, LocalDate.class);
            case Types.TIME -> rs.getObject(i, LocalTime.class);
            case Types.DOUBLE, Types.FLOAT -> rs.getDouble(i); // NaN and infinities as they are
            case Types.REAL -> rs.getFloat(i);
            default -> rs.getObject(i);
        };
        return rs.wasNull() ? null : v;
    }

    private static void write(PreparedStatement ps, int i, Object v, int targetType) throws SQLException {
        if (v == null) ps.setNull(i, targetType);
        else if (v instanceof byte[] b) ps.setBytes(i, b);
        else if (v instanceof String s) ps.setString(i, s);
        else if (v instanceof Double d) ps.setDouble(i, d);
        else ps.setObject(i, v);
    }

    /** Our names are lower-case words on both databases (H2 runs with DATABASE_TO_LOWER); quoted, no name is a keyword. */
    static String quote(String name) {
        return "\"" + name.replace("\"", "\"\"") + "\"";
    }
}
