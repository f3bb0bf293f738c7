package com.baysheet.e2e;

import java.io.IOException;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

/**
 * A browser's part in plain HTTP, for servers in another process: keeps its cookies, never follows a
 * redirect, and sends the form token it last saw on a page (the hidden {@code _csrf} field) with every
 * form post, and in the {@code X-CSRF-Token} header with every JSON change. Thread-safe once logged in.
 */
final class OfficeClient {
    private static final Pattern TOKEN = Pattern.compile("name=\"_csrf\" value=\"([A-Za-z0-9_-]+)\"");
    private static final Pattern COOKIE = Pattern.compile("^([^=;\\s]+)=([^;]*)");

    final String base;
    private final HttpClient http;
    private final Map<String, String> cookies = new ConcurrentHashMap<>();
    private volatile String token;

    OfficeClient(String base) {
        this.base = base;
        this.http = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER)
                .connectTimeout(Duration.ofSeconds(5)).build();
    }

    /** Sets up the first administrator (on a new office, with the code its console shows) and is logged in as them. */
    OfficeClient setUp(String username, String password, String setupCode) {
        get("/setup");
        expect(form("/setup", Map.of("setupCode", setupCode, "username", username, "fullName", "Administrator " + username, "initials", "AD",
                "password", password, "confirmPassword", password)), 303);
        get("/admin/users");
        return this;
    }

    private static final Pattern SETUP_CODE = Pattern.compile("id=\"setup-code\"[^>]*>\\s*<code>([^<]+)</code>");

    /**
     * As an administrator: adds a user of this role, who has no password until they use the one-time set-up code
     * the administrator is shown; the person then chooses {@code password} with it (never known to the administrator)
     * and logs in once, being told of the code.
     */
    void addUser(String username, String role, String password) {
        get("/admin/users");
        HttpResponse<String> added = expect(form("/admin/users", Map.of("username", username, "fullName", "User " + username,
                "initials", username.substring(0, 2).toUpperCase(), "role", role)), 200);
        Matcher code = SETUP_CODE.matcher(added.body());
        if (!code.find()) throw new IllegalStateException("no set-up code shown for " + username + ": " + added.body());
        OfficeClient person = new OfficeClient(base);
        person.get("/account/reset");
        expect(person.form("/account/reset", Map.of("username", username, "code", code.group(1),
                "newPassword", password, "confirmPassword", password)), 303);
        // the first login tells the person of the code they used; later logins go straight on
        person.get("/login");
        HttpResponse<String> told = expect(person.form("/login", Map.of("username", username, "password", password,
                "next", "/projects")), 200);
        if (!told.body().contains("made for you by"))
            throw new IllegalStateException("a first login was not told of the set-up code: " + told.body());
    }

    /** Logs in (a fresh cookie jar's worth), and reads the session's form token from a page. */
    OfficeClient logIn(String username, String password) {
        cookies.remove("bs_session");
        get("/login");
        HttpResponse<String> r = expect(form("/login", Map.of("username", username, "password", password, "next", "/projects")), 303);
        if (!cookies.containsKey("bs_session")) throw new IllegalStateException("no session after login: " + r.body());
        get("/projects");
        return this;
    }

    HttpResponse<String> get(String path) {
        return send(HttpRequest.newBuilder(uri(path)).GET());
    }

    HttpResponse<byte[]> getBytes(String path) {
        HttpRequest.Builder b = HttpRequest.newBuilder(uri(path)).GET();
        return sendBytes(b);
    }

    /** A form post with the form token added. */
    HttpResponse<String> form(String path, Map<String, String> fields) {
        Map<String, String> all = new LinkedHashMap<>(fields);
        if (token != null) all.putIfAbsent("_csrf", token);
        return formRaw(path, all.entrySet().stream().map(e -> Map.entry(e.getKey(), e.getValue())).toList());
    }

    /** A form post with the form token added, whose answer is a file. */
    HttpResponse<byte[]> formBytes(String path, Map<String, String> fields) {
        Map<String, String> all = new LinkedHashMap<>(fields);
        if (token != null) all.putIfAbsent("_csrf", token);
        String body = all.entrySet().stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
        return sendBytes(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(body)));
    }

    /** A form post of these pairs (names may repeat), with the form token added last. */
    HttpResponse<String> post(String path, List<Map.Entry<String, String>> fields) {
        List<Map.Entry<String, String>> all = new java.util.ArrayList<>(fields);
        if (token != null) all.add(Map.entry("_csrf", token));
        return formRaw(path, all);
    }

    /** A form post of exactly these pairs (names may repeat). */
    HttpResponse<String> formRaw(String path, List<Map.Entry<String, String>> fields) {
        String body = fields.stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
        return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(body)));
    }

    /** A JSON request with the form token in its header. */
    HttpResponse<String> json(String method, String path, String body) {
        HttpRequest.Builder b = HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/json")
                .method(method, body == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(body));
        if (token != null) b.header("X-CSRF-Token", token);
        return send(b);
    }

    /** Uploads one file as multipart/form-data field {@code field}, with the form token, as the verify page does. */
    HttpResponse<String> upload(String path, String field, String filename, byte[] content) {
        String boundary = "----baysheet-e2e-boundary";
        byte[] head = ("--" + boundary + "\r\nContent-Disposition: form-data; name=\"_csrf\"\r\n\r\n" + token + "\r\n--"
                + boundary + "\r\nContent-Disposition: form-data; name=\"" + field + "\"; filename=\"" + filename
                + "\"\r\nContent-Type: application/pdf\r\n\r\n").getBytes(StandardCharsets.UTF_8);
        byte[] tail = ("\r\n--" + boundary + "--\r\n").getBytes(StandardCharsets.UTF_8);
        return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "multipart/form-data; boundary=" + boundary)
                .POST(HttpRequest.BodyPublishers.ofByteArrays(List.of(head, content, tail))));
    }

    /** A request of any kind, with this session's cookies and token. */
    HttpResponse<String> raw(HttpRequest.Builder b) {
        if (token != null) b.header("X-CSRF-Token", token);
        return send(b);
    }

    static HttpResponse<String> expect(HttpResponse<String> r, int status) {
        if (r.statusCode() != status)
            throw new IllegalStateException(r.request().method() + " " + r.uri() + " answered " + r.statusCode()
                    + " (expected " + status + "): " + r.body().substring(0, Math.min(400, r.body().length())));
        return r;
    }

    private URI uri(String path) { return URI.create(base + path); }

    private HttpResponse<String> send(HttpRequest.Builder b) {
        HttpResponse<String> r = exchange(withCookies(b), HttpResponse.BodyHandlers.ofString());
        Matcher m = TOKEN.matcher(r.body());
        if (m.find()) token = m.group(1);
        return r;
    }

    private HttpResponse<byte[]> sendBytes(HttpRequest.Builder b) {
        return exchange(withCookies(b), HttpResponse.BodyHandlers.ofByteArray());
    }

    private HttpRequest withCookies(HttpRequest.Builder b) {
        b.timeout(Duration.ofSeconds(60));
        if (!cookies.isEmpty())
            b.header("Cookie", cookies.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue()).collect(Collectors.joining("; ")));
        return b.build();
    }

    private <T> HttpResponse<T> exchange(HttpRequest req, HttpResponse.BodyHandler<T> handler) {
        try {
            HttpResponse<T> r = http.send(req, handler);
            for (String c : r.headers().allValues("Set-Cookie")) {
                Matcher m = COOKIE.matcher(c);
                if (!m.find()) continue;
                if (m.group(2).isEmpty() || c.contains("Max-Age=0")) cookies.remove(m.group(1));
                else cookies.put(m.group(1), m.group(2));
            }
            return r;
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(req.method() + " " + req.uri(), e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }

    private static String enc(String s) { return URLEncoder.encode(s, StandardCharsets.UTF_8); }
}
