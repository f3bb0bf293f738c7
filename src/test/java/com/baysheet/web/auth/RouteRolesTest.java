package com.baysheet.web.auth;

import com.baysheet.auth.Role;
import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Store;
import com.baysheet.web.Office;
import com.baysheet.web.auth.AccessRefused.Why;
import io.javalin.Javalin;
import io.javalin.http.HandlerType;
import io.javalin.router.Endpoint;
import io.javalin.security.RouteRole;
import io.javalin.security.Roles;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.UUID;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every route of the office, read from the router of the office's own wiring (not a list kept by hand), declares
 * who it admits, and the declarations keep to the office's rules; the one rule that turns roles into an answer
 * ({@link Access#decide}) is checked case by case. A route that declares no role admits nobody and fails here.
 */
class RouteRolesTest {
    private static final Set<HandlerType> METHODS = Set.of(HandlerType.GET, HandlerType.POST, HandlerType.PUT,
            HandlerType.PATCH, HandlerType.DELETE);
    /** The changes that are not a preparer's or the administrator's work: signing in and out, one's own password and API tokens, a PDF to verify. */
    private static final Set<String> PERSONAL = Set.of("POST /login", "POST /setup", "POST /logout", "POST /account/password", "POST /account/reset",
            "POST /account/tokens", "POST /account/tokens/revoke", "POST /verify");

    record Route(String method, String path, Set<RouteRole> roles) {
        @Override
        public String toString() { return method + " " + path + " " + roles; }
    }

    static List<Route> routes;

    @BeforeAll
    static void readTheRouter() {
        try (Database db = Database.open("jdbc:h2:mem:roles" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1")) {
            Store store = Store.on(db.dataSource(), Derivation::derive, Clock.systemUTC());
            routes = routesOf(Office.on(store, db.dataSource(), Clock.systemUTC(), com.baysheet.TestKeys.signer()).server(null, false));
        }
    }

    static List<Route> routesOf(Javalin app) {
        return app.unsafe.internalRouter.allHttpHandlers().stream().map(p -> p.endpoint)
                .filter(e -> METHODS.contains(e.method)).map(RouteRolesTest::route).toList();
    }

    private static Route route(Endpoint e) {
        Roles r = e.metadata(Roles.class);
        return new Route(e.method.name(), e.path, r == null ? Set.of() : Set.copyOf(r.getRoles()));
    }

    /** What is wrong with the routes' declarations, one line a route. */
    static List<String> misdeclared(List<Route> table) {
        List<String> wrong = new ArrayList<>();
        for (Route r : table) {
            String key = r.method() + " " + r.path();
            boolean admin = r.path().equals("/admin") || r.path().startsWith("/admin/");
            if (r.roles().isEmpty()) wrong.add(r + ": declares no role, so nobody is let in");
            else if (r.roles().stream().anyMatch(x -> !(x instanceof Admit))) wrong.add(r + ": a role that is not one of ours");
            else if (admin && !r.roles().equals(Set.of(Admit.ADMINISTRATOR))) wrong.add(r + ": /admin is the administrator's alone");
            else if (r.roles().contains(Admit.OPEN) && !r.method().equals("GET")) wrong.add(r + ": an open route skips the form token, so it may only read");
            else if (!r.method().equals("GET") && !PERSONAL.contains(key) && !admin && !r.roles().equals(Set.of(Admit.PREPARER)))
                wrong.add(r + ": a change to the office's work is a preparer's");
            else if (r.method().equals("GET") && !admin && r.roles().stream().noneMatch(x -> wide((Admit) x)))
                wrong.add(r + ": a read is open to the whole office");
        }
        return wrong;
    }

    private static boolean wide(Admit a) {
        return a == Admit.OFFICE || a == Admit.ACCOUNT || a == Admit.ANYONE || a == Admit.OPEN || a == Admit.FIRST_START;
    }

    @Test
    void everyRouteOfTheOfficeDeclaresWhoItAdmitsAndKeepsToTheRules() {
        assertThat(routes).as("the router's routes").hasSizeGreaterThan(50);
        assertThat(misdeclared(routes)).isEmpty();
        assertThat(routes).filteredOn(r -> r.path().startsWith("/admin/")).isNotEmpty();
        assertThat(routes).filteredOn(r -> r.roles().contains(Admit.PREPARER)).hasSizeGreaterThan(20);
    }

    @Test
    void aRouteDeclaringNoRoleFailsTheCheckAndAdmitsNobody() {
        Javalin planted = Javalin.create(cfg -> {
            cfg.routes.get("/projects", ctx -> ctx.result("ok"), Admit.OFFICE);
            cfg.routes.post("/projects/{project}/forgotten", ctx -> ctx.result("ok"));
            cfg.routes.post("/admin/users", ctx -> ctx.result("ok"), Admit.PREPARER);
        });
        assertThat(misdeclared(routesOf(planted))).hasSize(2)
                .anyMatch(l -> l.startsWith("POST /projects/{project}/forgotten") && l.contains("declares no role"))
                .anyMatch(l -> l.startsWith("POST /admin/users") && l.contains("administrator's alone"));
        for (Role r : Role.values()) assertThat(decide(Set.of(), r)).as(r.label()).contains(Why.FORBIDDEN);
        assertThat(decide(Set.of(), null)).contains(Why.FORBIDDEN);
    }

    @Test
    void eachRoleLetsInWhomItNames() {
        assertThat(decide(Set.of(Admit.OFFICE), Role.ENGINEER)).isEmpty();
        assertThat(decide(Set.of(Admit.OFFICE), Role.ADMINISTRATOR)).isEmpty();
        assertThat(decide(Set.of(Admit.OFFICE), null)).contains(Why.LOGIN);
        assertThat(decide(Set.of(Admit.PREPARER), Role.ENGINEER)).isEmpty();
        assertThat(decide(Set.of(Admit.PREPARER), Role.CHECKER)).isEmpty();
        assertThat(decide(Set.of(Admit.PREPARER), Role.ADMINISTRATOR)).contains(Why.FORBIDDEN);
        assertThat(decide(Set.of(Admit.PREPARER), null)).contains(Why.LOGIN);
        assertThat(decide(Set.of(Admit.ADMINISTRATOR), Role.ADMINISTRATOR)).isEmpty();
        assertThat(decide(Set.of(Admit.ADMINISTRATOR), Role.CHECKER)).contains(Why.FORBIDDEN);
        assertThat(decide(Set.of(Admit.ANYONE), null)).isEmpty();
        assertThat(decide(Set.of(Admit.OPEN), null)).isEmpty();
        // a route may admit several: whoever any one of them admits
        assertThat(decide(Set.of(Admit.PREPARER, Admit.ADMINISTRATOR), Role.ADMINISTRATOR)).isEmpty();
    }

    @Test
    void beforeSetUpOnlyTheSetUpAndTheOpenRoutesAnswer() {
        assertThat(Access.decide(Set.of(Admit.FIRST_START), null, false, false)).isEmpty();
        assertThat(Access.decide(Set.of(Admit.OPEN), null, false, false)).isEmpty();
        assertThat(Access.decide(Set.of(Admit.ANYONE), null, false, false)).contains(Why.SET_UP);
        assertThat(Access.decide(Set.of(Admit.OFFICE), null, false, false)).contains(Why.SET_UP);
        // once done, the set-up is gone: it sends to the login page, even someone signed in
        assertThat(decide(Set.of(Admit.FIRST_START), null)).contains(Why.LOGIN);
        assertThat(decide(Set.of(Admit.FIRST_START), Role.ADMINISTRATOR)).contains(Why.LOGIN);
    }

    @Test
    void aPasswordSetBySomeoneElseReachesOnlyItsOwnAccountUntilChanged() {
        assertThat(Access.decide(Set.of(Admit.ACCOUNT), Role.ENGINEER, true, true)).isEmpty();
        assertThat(Access.decide(Set.of(Admit.ANYONE), Role.ENGINEER, true, true)).isEmpty();
        assertThat(Access.decide(Set.of(Admit.OFFICE), Role.ENGINEER, true, true)).contains(Why.CHANGE_PASSWORD);
        assertThat(Access.decide(Set.of(Admit.PREPARER), Role.CHECKER, true, true)).contains(Why.CHANGE_PASSWORD);
        // a role kept out is told so first, as it would be with its own password
        assertThat(Access.decide(Set.of(Admit.ADMINISTRATOR), Role.ENGINEER, true, true)).contains(Why.FORBIDDEN);
    }

    private static Optional<Why> decide(Set<? extends RouteRole> admits, Role role) {
        return Access.decide(admits, role, false, true);
    }
}
