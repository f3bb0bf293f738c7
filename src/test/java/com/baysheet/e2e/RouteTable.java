package com.baysheet.e2e;

import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Store;
import com.baysheet.web.Office;
import io.javalin.Javalin;
import io.javalin.http.HandlerType;
import io.javalin.router.Endpoint;
import io.javalin.security.RouteRole;
import io.javalin.security.Roles;

import java.util.Comparator;
import java.util.List;
import java.util.Set;
import java.util.UUID;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Every route the office server declares, read from the server's own router as the production wiring
 * builds it ({@link Office}), not from a list kept by hand:
 * a route added to the server is requested by the tests that walk this table without anyone editing them.
 */
final class RouteTable {
    /** The methods a client sends; before- and after-filters are not routes. */
    private static final Set<HandlerType> METHODS = Set.of(HandlerType.GET, HandlerType.POST, HandlerType.PUT,
            HandlerType.PATCH, HandlerType.DELETE);
    private static final Pattern PARAM = Pattern.compile("\\{([^}/]+)}|<([^>/]+)>");

    /** One declared route: its method, its path with {@code {name}} parameters, and the roles it declares. */
    record Route(String method, String path, Set<RouteRole> roles) {
        List<String> parameters() {
            return parameters(path);
        }

        static List<String> parameters(String path) {
            Matcher m = PARAM.matcher(path);
            List<String> names = new java.util.ArrayList<>();
            while (m.find()) names.add(m.group(1) != null ? m.group(1) : m.group(2));
            return names;
        }

        boolean reads() { return method.equals("GET"); }

        @Override
        public String toString() { return method + " " + path; }
    }

    private RouteTable() {}

    /** The routes, sorted by path then method, of a server built over an empty in-memory database (not started). */
    static List<Route> all() {
        try (Database db = Database.open("jdbc:h2:mem:routes" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1")) {
            Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
            Javalin app = Office.on(store, db.dataSource(), java.time.Clock.systemUTC(), com.baysheet.TestKeys.signer()).server(null, false);
            return app.unsafe.internalRouter.allHttpHandlers().stream().map(p -> p.endpoint)
                    .filter(e -> METHODS.contains(e.method)).map(RouteTable::route).distinct()
                    .sorted(Comparator.comparing(Route::path).thenComparing(Route::method)).toList();
        }
    }

    private static Route route(Endpoint e) {
        Roles roles = e.metadata(Roles.class);
        return new Route(e.method.name(), e.path, roles == null ? Set.of() : Set.copyOf(roles.getRoles()));
    }
}
