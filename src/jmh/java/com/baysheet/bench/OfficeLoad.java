package com.baysheet.bench;

import com.baysheet.bench.OfficeLoadStats.Kind;

import java.io.IOException;
import java.net.http.HttpClient;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Office load on a running Baysheet with the demo loaded (a benchmark, not a test): sets up the office
 * (an administrator, engineer accounts), logs each simulated user in, gives each its own small project to
 * save to, then runs rounds of a bounded number of requests from a fixed pool of user threads, mixing member
 * pages of the demo project, other pages, bay form saves and checking-copy PDF downloads. Prints per kind
 * p50/p90/p99/max and errors, the throughput, and the server's resident memory after each round.
 *
 * <pre>java -cp CLASSES com.baysheet.bench.OfficeLoad --base http://127.0.0.1:7070 [--users 32] [--requests 20000]
 *     [--rounds 3] [--warmup 3000] [--rate 0] [--mix 80:10:8:2] [--pid SERVER_PID]</pre>
 * {@code --rate} paces the whole office to that many requests per second (0: as fast as the server answers);
 * {@code --mix} is member pages : other pages : form saves : PDFs.
 */
public final class OfficeLoad {
    private static final String PASSWORD = "office load password";
    private static final Pattern ID = Pattern.compile("\"id\" ?: ?\"?([A-Za-z0-9_.-]+)\"?");
    private static final Pattern VERSION = Pattern.compile("\"version\" ?: ?(\\d+)");

    private final Map<String, String> opt;
    private final HttpClient http;
    private final String base;
    private final int users;
    private final int[] mix;
    private long project;
    private List<String> members;
    /** The mark sheet of each member's sheet address, read once at set-up: checking copies are printed per mark. */
    private final Map<String, String> markSheets = new java.util.concurrent.ConcurrentHashMap<>();

    private OfficeLoad(Map<String, String> opt) {
        this.opt = opt;
        this.base = opt.getOrDefault("base", "http://127.0.0.1:7070");
        this.users = Integer.parseInt(opt.getOrDefault("users", "32"));
        this.mix = java.util.Arrays.stream(opt.getOrDefault("mix", "80:10:8:2").split(":")).mapToInt(Integer::parseInt).toArray();
        this.http = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).connectTimeout(Duration.ofSeconds(10))
                .followRedirects(HttpClient.Redirect.NEVER).executor(Executors.newFixedThreadPool(4)).build();
    }

    public static void main(String[] args) throws Exception {
        Map<String, String> opt = new LinkedHashMap<>();
        for (int i = 0; i + 1 < args.length; i += 2) opt.put(args[i].replaceFirst("^--", ""), args[i + 1]);
        new OfficeLoad(opt).run();
    }

    /** One simulated person: a login, an own project and level to save bays to, and its version. */
    private static final class User {
        final OfficeLoadSession session;
        final long ownProject;
        final long ownLevel;
        long version;
        boolean heavier;

        User(OfficeLoadSession session, long ownProject, long ownLevel, long version) {
            this.session = session;
            this.ownProject = ownProject;
            this.ownLevel = ownLevel;
            this.version = version;
        }
    }

    private void run() throws Exception {
        OfficeLoadSession admin = OfficeLoadSession.setUp(http, base, PASSWORD, opt.get("setup-code"));
        if (opt.containsKey("print-session")) {
            // for a side-by-side run with another load tool: one member page address and the cookie to fetch it with
            String projects = admin.get("/api/projects").body();
            String p = first(ID, projects);
            String m = first(ID, admin.get("/api/projects/" + p + "/members").body());
            System.out.println("page=/projects/" + p + "/members/" + m);
            System.out.println("cookie=" + admin.cookieHeader());
            System.exit(0);
        }
        int accounts = Math.max(1, users / 4);
        for (int a = 0; a < accounts; a++) admin.addUser("load" + a, PASSWORD);
        String projects = admin.get("/api/projects").body();
        project = Long.parseLong(first(ID, projects));
        members = all(ID, admin.get("/api/projects/" + project + "/members").body());
        for (String m : members) {
            HttpResponse<String> r = admin.get("/review/projects/" + project + "/members/" + m);
            r.headers().firstValue("Location").ifPresent(sheet -> markSheets.put(m, sheet));
        }
        System.out.printf("office: %d users on %d accounts; demo project %d with %d members; mix %s (member:other:save:pdf)%n",
                users, accounts, project, members.size(), opt.getOrDefault("mix", "80:10:8:2"));
        ExecutorService pool = Executors.newFixedThreadPool(users);
        // people log in one after another, as they arrive: the throttle counts a login from the moment it is
        // sent until its password proves right, so dozens in the same instant from one address would be slowed
        List<Future<User>> logins = new ArrayList<>();
        for (int u = 0; u < users; u++) {
            int n = u;
            OfficeLoadSession s = OfficeLoadSession.logIn(http, base, "load" + (n % accounts), PASSWORD);
            logins.add(pool.submit(() -> newUser(n, s)));
        }
        List<User> office = new ArrayList<>();
        for (Future<User> f : logins) office.add(f.get());
        System.out.println("after log-in: " + memory());
        int rounds = Integer.parseInt(opt.getOrDefault("rounds", "3"));
        int requests = Integer.parseInt(opt.getOrDefault("requests", "20000"));
        round(pool, office, Integer.parseInt(opt.getOrDefault("warmup", "3000")), "warm-up");
        for (int r = 1; r <= rounds; r++) round(pool, office, requests, "round " + r);
        pool.shutdown();
        System.exit(0);
    }

    private User newUser(int n, OfficeLoadSession s) throws IOException, InterruptedException {
        String p = s.expect(s.json("POST", "/api/projects", "{\"jobNumber\": \"LOAD-" + n + "\", \"name\": \"Load project " + n
                + "\", \"units\": \"US\"}"), 201).body();
        long id = Long.parseLong(first(ID, p));
        String l = s.expect(s.json("POST", "/api/projects/" + id + "/levels", "{\"version\": " + first(VERSION, p)
                + ", \"name\": \"Level 2\", \"elevation\": 12}"), 201).body();
        return new User(s, id, Long.parseLong(first(ID, l.substring(l.indexOf("saved")))), Long.parseLong(first(VERSION, l)));
    }

    private void round(ExecutorService pool, List<User> office, int requests, String name) throws Exception {
        OfficeLoadStats stats = new OfficeLoadStats(requests);
        AtomicInteger issued = new AtomicInteger();
        double rate = Double.parseDouble(opt.getOrDefault("rate", "0"));
        long intervalNanos = rate > 0 ? (long) (office.size() / rate * 1e9) : 0;
        long start = System.nanoTime();
        List<Future<?>> running = new ArrayList<>();
        for (User u : office) running.add(pool.submit(() -> {
            long next = System.nanoTime() + ThreadLocalRandom.current().nextLong(Math.max(1, intervalNanos));
            while (issued.getAndIncrement() < requests) {
                if (intervalNanos > 0) {
                    long wait = next - System.nanoTime();
                    if (wait > 0) TimeUnit.NANOSECONDS.sleep(wait);
                    next += intervalNanos;
                }
                one(u, stats);
            }
            return null;
        }));
        for (Future<?> f : running) f.get();
        double seconds = (System.nanoTime() - start) / 1e9;
        System.out.printf("%n%s: %d requests in %.1f s = %.0f requests/s, %d errors; %s; load average %s%n%s",
                name, stats.total(), seconds, stats.total() / seconds, stats.totalErrors(), memory(), loadAverage(), stats.table());
    }

    private void one(User u, OfficeLoadStats stats) throws InterruptedException {
        int pick = ThreadLocalRandom.current().nextInt(mix[0] + mix[1] + mix[2] + mix[3]);
        Kind kind = pick < mix[0] ? Kind.MEMBER_PAGE : pick < mix[0] + mix[1] ? Kind.OTHER_PAGE
                : pick < mix[0] + mix[1] + mix[2] ? Kind.FORM_SAVE : Kind.PDF;
        String member = members.get(ThreadLocalRandom.current().nextInt(members.size()));
        long t0 = System.nanoTime();
        boolean ok;
        try {
            ok = switch (kind) {
                case MEMBER_PAGE -> u.session.get("/projects/" + project + "/members/" + member).statusCode() == 200;
                case OTHER_PAGE -> u.session.get(List.of("/projects/" + project, "/projects/" + project + "/members",
                        "/projects/" + project + "/plan", "/projects/" + project + "/takedowns")
                        .get(ThreadLocalRandom.current().nextInt(4))).statusCode() == 200;
                case FORM_SAVE -> save(u);
                case PDF -> pdf(u, member);
            };
        } catch (IOException e) {
            ok = false;
        }
        stats.record(kind, System.nanoTime() - t0, ok);
    }

    /** The bay editor's form on the user's own project, alternating the dead load so every save changes something. */
    private static boolean save(User u) throws IOException, InterruptedException {
        u.heavier = !u.heavier;
        Map<String, String> f = new LinkedHashMap<>();
        f.put("version", String.valueOf(u.version));
        f.put("cells", "0,0");
        f.put("action", "assign");
        f.put("occupancy", "office");
        f.put("deadLoad", u.heavier ? "65" : "60");
        f.put("beams", "Y");
        f.put("infillBeams", "2");
        HttpResponse<String> r = u.session.form("/projects/" + u.ownProject + "/levels/" + u.ownLevel + "/bays", f);
        if (r.statusCode() != 303) return false;
        u.version++;
        return true;
    }

    private boolean pdf(User u, String member) throws IOException, InterruptedException {
        String sheet = markSheets.get(member);
        if (sheet == null) return false;
        HttpResponse<byte[]> r = u.session.getBytes(sheet + "/checking.pdf");
        return r.statusCode() == 200 && r.body().length > 4 && r.body()[0] == '%' && r.body()[1] == 'P';
    }

    private String memory() { return serverMemory(opt.get("pid")); }

    /** The server's resident memory from /proc, for the process {@code pid} (null: not known). */
    static String serverMemory(String pid) {
        if (pid == null) return "server RSS unknown (no --pid)";
        try {
            for (String line : Files.readAllLines(Path.of("/proc", pid, "status")))
                if (line.startsWith("VmRSS:")) return "server RSS " + line.substring(6).strip();
        } catch (IOException e) {
            return "server RSS unreadable: " + e.getMessage();
        }
        return "server RSS not reported";
    }

    private static String loadAverage() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).strip();
        } catch (IOException e) {
            return "unknown";
        }
    }

    private static String first(Pattern p, String text) {
        Matcher m = p.matcher(text);
        if (!m.find()) throw new IllegalStateException("no " + p + " in " + text.substring(0, Math.min(200, text.length())));
        return m.group(1);
    }

    private static List<String> all(Pattern p, String text) {
        List<String> out = new ArrayList<>();
        Matcher m = p.matcher(text);
        while (m.find()) out.add(m.group(1));
        return out;
    }
}
