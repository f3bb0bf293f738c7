package db.migration;

import org.flywaydb.core.api.migration.BaseJavaMigration;
import org.flywaydb.core.api.migration.Context;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;

/**
 * A deleted line load or point load is kept in {@code deleted_item} like a level, so {@code kind} may also be
 * 'line load' or 'point load'. V119 declared the kind's CHECK without a name, which H2 and PostgreSQL name each in
 * their own way: this finds it in the information schema by its clause (the one naming 'project'), in the schema being migrated, and replaces it
 * with a named one. Plain JDBC, no application class.
 */
public class V123__Deleted_line_and_point_loads extends BaseJavaMigration {
    @Override
    public void migrate(Context context) throws Exception {
        Connection c = context.getConnection();
        List<String> names = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT tc.constraint_name, cc.check_clause FROM information_schema.table_constraints tc "
                + "JOIN information_schema.check_constraints cc ON cc.constraint_name = tc.constraint_name "
                + "AND cc.constraint_schema = tc.constraint_schema WHERE LOWER(tc.table_name) = 'deleted_item' "
                + "AND tc.table_schema = CURRENT_SCHEMA AND tc.constraint_type = 'CHECK'")) {
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) if (rs.getString(2).toLowerCase().contains("'project'")) names.add(rs.getString(1));
            }
        }
        if (names.size() != 1) throw new IllegalStateException("expected one CHECK on deleted_item.kind, found " + names);
        try (Statement s = c.createStatement()) {
            s.execute("ALTER TABLE deleted_item DROP CONSTRAINT \"" + names.get(0).replace("\"", "\"\"") + "\"");
            s.execute("ALTER TABLE deleted_item ADD CONSTRAINT ck_deleted_item_kind "
                    + "CHECK (kind IN ('level', 'bays', 'project', 'line load', 'point load'))");
        }
    }
}
