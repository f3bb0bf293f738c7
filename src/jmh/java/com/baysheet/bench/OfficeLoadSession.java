package com.baysheet.bench;

import java.io.IOException;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/** One office user's login on the server: its cookies and form token, over a client shared by all users. */
final class OfficeLoadSession {
    private static final Pattern TOKEN = Pattern.compile("name=\"_csrf\" value=\"([A-Za-z0-9_-]+)\"");
    private static final Pattern COOKIE = Pattern.compile("^([^=;\\s]+)=([^;]*)");

    private final HttpClient http;
    private final String base;
    private final Map<String, String> cookies = new LinkedHashMap<>();
    private String token;

    OfficeLoadSession(HttpClient http, String base) {
        this.http = http;
        this.base = base;
    }

    /** The first administrator of a new office, who then adds the users that will log in. */
    static OfficeLoadSession setUp(HttpClient http, String base, String password, String setupCode) throws IOException, InterruptedException {
        OfficeLoadSession s = new OfficeLoadSession(http, base);
        s.get("/setup");
        s.expect(s.form("/setup", Map.of("setupCode", setupCode, "username", "admin", "fullName", "Load Administrator",
                "initials", "LA", "password", password, "confirmPassword", password)), 303);
        s.get("/admin/users");
        return s;
    }

    private static final Pattern SETUP_CODE = Pattern.compile("id=\"setup-code\"[^>]*>\\s*<code>([^<]+)</code>");

    /** Adds a person, who sets their password with the one-time set-up code shown, then logs in once (told of the code). */
    void addUser(String username, String password) throws IOException, InterruptedException {
        get("/admin/users");
        HttpResponse<String> added = expect(form("/admin/users", Map.of("username", username, "fullName", "Load user " + username,
                "initials", "LU", "role", "engineer")), 200);
        java.util.regex.Matcher code = SETUP_CODE.matcher(added.body());
        if (!code.find()) throw new IllegalStateException("no set-up code shown for " + username);
        OfficeLoadSession person = new OfficeLoadSession(http, base);
        person.get("/account/reset");
        person.expect(person.form("/account/reset", Map.of("username", username, "code", code.group(1),
                "newPassword", password, "confirmPassword", password)), 303);
        person.get("/login");
        person.expect(person.form("/login", Map.of("username", username, "password", password, "next", "/projects")), 200);
    }

    /** The session's cookies as a {@code Cookie} header value, for another load tool to send. */
    String cookieHeader() {
        synchronized (cookies) {
            return cookies.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue()).collect(Collectors.joining("; "));
        }
    }

    static OfficeLoadSession logIn(HttpClient http, String base, String username, String password) throws IOException, InterruptedException {
        OfficeLoadSession s = new OfficeLoadSession(http, base);
        s.get("/login");
        s.expect(s.form("/login", Map.of("username", username, "password", password, "next", "/projects")), 303);
        s.get("/projects");
        return s;
    }

    HttpResponse<String> get(String path) throws IOException, InterruptedException {
        return send(request(path).GET(), HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<byte[]> getBytes(String path) throws IOException, InterruptedException {
        return send(request(path).GET(), HttpResponse.BodyHandlers.ofByteArray());
    }

    HttpResponse<String> form(String path, Map<String, String> fields) throws IOException, InterruptedException {
        Map<String, String> all = new LinkedHashMap<>(fields);
        if (token != null) all.put("_csrf", token);
        String body = all.entrySet().stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
        return send(request(path).header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(body)), HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<String> json(String method, String path, String body) throws IOException, InterruptedException {
        return send(request(path).header("Content-Type", "application/json").header("X-CSRF-Token", token)
                .method(method, HttpRequest.BodyPublishers.ofString(body)), HttpResponse.BodyHandlers.ofString());
    }

    HttpResponse<String> expect(HttpResponse<String> r, int status) {
        if (r.statusCode() != status) throw new IllegalStateException(r.request().method() + " " + r.uri() + " answered "
                + r.statusCode() + ", expected " + status);
        return r;
    }

    private HttpRequest.Builder request(String path) {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(base + path)).timeout(Duration.ofSeconds(60));
        synchronized (cookies) {
            if (!cookies.isEmpty())
                b.header("Cookie", cookies.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue()).collect(Collectors.joining("; ")));
        }
        return b;
    }

    private <T> HttpResponse<T> send(HttpRequest.Builder b, HttpResponse.BodyHandler<T> handler) throws IOException, InterruptedException {
        HttpResponse<T> r = http.send(b.build(), handler);
        synchronized (cookies) {
            for (String c : r.headers().allValues("Set-Cookie")) {
                Matcher m = COOKIE.matcher(c);
                if (m.find()) cookies.put(m.group(1), m.group(2));
            }
        }
        if (r.body() instanceof String s) {
            Matcher m = TOKEN.matcher(s);
            if (m.find()) token = m.group(1);
        }
        return r;
    }

    private static String enc(String s) { return URLEncoder.encode(s, StandardCharsets.UTF_8); }
}
