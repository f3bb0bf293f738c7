package com.baysheet.web;

import com.baysheet.auth.LoginThrottle;
import com.baysheet.auth.NewUser;
import com.baysheet.auth.Passwords;
import com.baysheet.auth.Role;
import com.baysheet.auth.SessionPolicy;
import com.baysheet.auth.SetupCode;
import com.baysheet.auth.User;
import com.baysheet.store.Database;
import com.baysheet.store.Store;
import com.baysheet.store.auth.Accounts;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.auth.SignedIn;
import io.javalin.Javalin;

import java.io.IOException;
import java.net.CookieManager;
import java.net.HttpCookie;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * Logging in from HTTP tests: the office's own wiring with a cheap password hash, users made directly in the
 * store, and clients that carry a session cookie and add the form token to every post (as a browser does
 * with the hidden field of every form).
 */
public final class TestLogin {
    public static final String PASSWORD = "test password 123";
    /** The set-up code of the test wiring (the server's is random and printed in its console). */
    public static final String SETUP_CODE = "TEST2345";

    private TestLogin() {}

    /** The whole office over this database (the same wiring as the server's), with bcrypt at its cheapest and the given clock. */
    public static Office office(Store store, Database db, Clock clock) {
        Logins.Policy policy = new Logins.Policy(new Passwords(4), SessionPolicy.OFFICE, LoginThrottle.OFFICE, clock);
        return Office.on(store, db.dataSource(), clock, policy, new SetupCode(() -> SETUP_CODE), com.baysheet.TestKeys.signer());
    }

    /** A user of this role (set-up done first if nobody exists), logged in: a client with their session. */
    public static Client as(Javalin app, Office s, String username, Role role) {
        User u = user(s, username, role);
        SignedIn in = s.accounts().logins().login(u.username(), PASSWORD, "127.0.0.1", null);
        Client c = anonymous(app);
        c.cookies.getCookieStore().add(URI.create(c.base), cookie("bs_session", in.token()));
        c.csrf = in.csrfToken();
        c.user = u;
        return c;
    }

    public static User user(Office s, String username, Role role) {
        Accounts a = s.accounts();
        String hash = new Passwords(4).hash(PASSWORD);
        if (!a.users().setupDone())
            a.users().createFirstAdministrator(new NewUser("admin", "The Administrator", "ADM", Role.ADMINISTRATOR), hash);
        return a.users().findByUsername(username).map(w -> w.user())
                .orElseGet(() -> a.users().create(new NewUser(username, "Name of " + username,
                        initials(username), role), hash));
    }

    /** Nobody logged in: a client with an empty cookie jar. */
    public static Client anonymous(Javalin app) {
        return new Client("http://127.0.0.1:" + app.port());
    }

    private static String initials(String username) {
        String letters = username.replaceAll("[^a-zA-Z]", "").toUpperCase();
        return (letters + "XX").substring(0, Math.min(4, Math.max(2, letters.length())));
    }

    private static HttpCookie cookie(String name, String value) {
        HttpCookie c = new HttpCookie(name, value);
        c.setPath("/");
        c.setVersion(0);
        return c;
    }

    /** A browser-like client: cookies kept, redirects not followed, the form token added to posts. */
    public static final class Client {
        public final String base;
        final CookieManager cookies = new CookieManager();
        private final HttpClient http;
        public String csrf;
        public User user;

        Client(String base) {
            this.base = base;
            this.http = HttpClient.newBuilder().cookieHandler(cookies).followRedirects(HttpClient.Redirect.NEVER)
                    .connectTimeout(Duration.ofSeconds(10)).build();
        }

        public HttpResponse<String> get(String path) {
            return send(HttpRequest.newBuilder(uri(path)).GET().build());
        }

        /** A GET with these request headers, name and value in turn ("If-None-Match", tag). */
        public HttpResponse<String> get(String path, String... headers) {
            return send(HttpRequest.newBuilder(uri(path)).headers(headers).GET().build());
        }

        public HttpResponse<byte[]> getBytes(String path) {
            try {
                return http.send(HttpRequest.newBuilder(uri(path)).GET().build(), HttpResponse.BodyHandlers.ofByteArray());
            } catch (IOException | InterruptedException e) {
                throw new IllegalStateException(e);
            }
        }

        /** Posts a form with the session's token added as {@code _csrf}. */
        public HttpResponse<String> post(String path, List<Map.Entry<String, String>> fields) {
            List<Map.Entry<String, String>> all = new ArrayList<>(fields);
            if (csrf != null) all.add(Map.entry("_csrf", csrf));
            return postRaw(path, all);
        }

        /** Posts exactly these fields (no token added). */
        public HttpResponse<String> postRaw(String path, List<Map.Entry<String, String>> fields) {
            String body = fields.stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
            return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/x-www-form-urlencoded")
                    .POST(HttpRequest.BodyPublishers.ofString(body)).build());
        }

        /** A JSON request, with the session's token in the X-CSRF-Token header. */
        public HttpResponse<String> json(String method, String path, String json) {
            HttpRequest.Builder b = HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/json")
                    .method(method, json == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(json));
            if (csrf != null) b.header("X-CSRF-Token", csrf);
            return send(b.build());
        }

        /** Uploads one PDF as multipart/form-data field {@code field}, with the token. */
        public HttpResponse<String> upload(String path, String field, String filename, byte[] content) {
            return upload(path, java.util.Map.of(), field, filename, "application/pdf", content);
        }

        /** Uploads one file as multipart/form-data field {@code field} beside the text fields given, with the token. */
        public HttpResponse<String> upload(String path, java.util.Map<String, String> fields, String field, String filename,
                                           String contentType, byte[] content) {
            String boundary = "----baysheet-test-boundary";
            StringBuilder text = new StringBuilder("--" + boundary + "\r\nContent-Disposition: form-data; name=\"_csrf\"\r\n\r\n" + csrf + "\r\n");
            fields.forEach((k, v) -> text.append("--").append(boundary).append("\r\nContent-Disposition: form-data; name=\"").append(k)
                    .append("\"\r\n\r\n").append(v).append("\r\n"));
            byte[] head = (text + "--" + boundary + "\r\nContent-Disposition: form-data; name=\"" + field + "\"; filename=\"" + filename
                    + "\"\r\nContent-Type: " + contentType + "\r\n\r\n").getBytes(StandardCharsets.UTF_8);
            byte[] tail = ("\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8);
            byte[] body = new byte[head.length + content.length + tail.length];
            System.arraycopy(head, 0, body, 0, head.length);
            System.arraycopy(content, 0, body, head.length, content.length);
            System.arraycopy(tail, 0, body, head.length + content.length, tail.length);
            return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "multipart/form-data; boundary=" + boundary)
                    .POST(HttpRequest.BodyPublishers.ofByteArray(body)).build());
        }

        public String cookie(String name) {
            return cookies.getCookieStore().get(URI.create(base)).stream().filter(c -> c.getName().equals(name))
                    .map(HttpCookie::getValue).findFirst().orElse(null);
        }

        private URI uri(String path) { return URI.create(base + path); }

        private HttpResponse<String> send(HttpRequest r) {
            try {
                try {
                    return http.send(r, HttpResponse.BodyHandlers.ofString());
                } catch (IOException e) {
                    // a kept-alive connection the server had already closed: nothing was read, so send once more
                    if (!String.valueOf(e.getMessage()).contains("received no bytes")) throw e;
                    return http.send(r, HttpResponse.BodyHandlers.ofString());
                }
            } catch (IOException e) {
                throw new IllegalStateException(e);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException(e);
            }
        }

        private static String enc(String s) { return URLEncoder.encode(s, StandardCharsets.UTF_8); }
    }
}
