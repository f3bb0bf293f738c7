package com.baysheet.bench;

import java.io.IOException;
import java.net.http.HttpClient;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * A one-bay edit followed by its member page, end to end over HTTP on a running server (a benchmark, not a test;
 * docs/benchmarks.md, One-bay edit). Sets up the office (the first administrator, one engineer), enters the varied
 * plan of the framing benchmark through the JSON API ({@link EditPagePlan}), then in turns raises the dead load of
 * bay (5, 7) on the middle floor by 5 psf and puts it back, so every edit is a change, and after each edit fetches
 * the member page of that bay's first infill beam, as the engineer would look at it, and then once more (now kept).
 * The edit goes by the JDK HTTP client; the pages by curl unless {@code --client jdk}. Prints, for the timed edits,
 * the median, min and max of the edit request, the page request, their sum and the kept page, and the load average around them.
 *
 * <pre>java -cp CLASSES com.baysheet.bench.EditPage --base http://127.0.0.1:7093 --setup-code CODE
 *     [--levels 24] [--warmup 2] [--edits 20] [--enter import|bays] [--client curl|jdk] [--pid SERVER_PID]</pre>
 * {@code --enter}: the plan as one model file (the default), or bay assignments level by level (slow: see docs/benchmarks.md).
 */
public final class EditPage {
    private static final String PASSWORD = "edit page password";
    private static final Pattern VERSION = Pattern.compile("\"version\" ?: ?(\\d+)");
    private static final int COL = 5, ROW = 7;

    private EditPage() {}

    public static void main(String[] args) throws Exception {
        Map<String, String> opt = new LinkedHashMap<>();
        for (int i = 0; i + 1 < args.length; i += 2) opt.put(args[i].replaceFirst("^--", ""), args[i + 1]);
        String base = opt.getOrDefault("base", "http://127.0.0.1:7093");
        int levels = Integer.parseInt(opt.getOrDefault("levels", "24")), warmup = Integer.parseInt(opt.getOrDefault("warmup", "2")),
                edits = Integer.parseInt(opt.getOrDefault("edits", "20"));
        HttpClient http = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).connectTimeout(Duration.ofSeconds(10))
                .followRedirects(HttpClient.Redirect.NEVER).build();
        OfficeLoadSession admin = OfficeLoadSession.setUp(http, base, PASSWORD, opt.get("setup-code"));
        admin.addUser("engineer", PASSWORD);
        OfficeLoadSession s = OfficeLoadSession.logIn(http, base, "engineer", PASSWORD);

        long t0 = System.nanoTime();
        EditPagePlan.Entered e = EditPagePlan.enter(s, levels, opt.getOrDefault("enter", "import"));
        int floor = levels / 2;
        long level = e.levels().get(floor - 1);
        String member = "L" + level + "-bay" + e.xLines().get(COL) + "x" + e.yLines().get(ROW) + "-b1";
        String page = "/projects/" + e.project() + "/members/" + member;
        double entry = (System.nanoTime() - t0) / 1e9;
        // the members the server derived, to set beside the framing benchmark's own derivation of the plan
        int all = count(s.expect(s.get("/api/projects/" + e.project() + "/members"), 200).body());
        int onFloor = count(s.expect(s.get("/api/projects/" + e.project() + "/members?level=F" + floor), 200).body());
        System.out.printf("entered: project %d, %d levels, %d requests in %.1f s; %,d members, %,d on F%d; %s; page %s%n",
                e.project(), levels, e.requests(), entry, all, onFloor, floor, OfficeLoad.serverMemory(opt.get("pid")), page);

        String edit = "/api/projects/" + e.project() + "/levels/" + level + "/bays";
        long version = e.version();
        double[] editMs = new double[edits], pageMs = new double[edits], sumMs = new double[edits], againMs = new double[edits];
        String before = loadAverage(), previous = null;
        int bytes = 0;
        boolean byCurl = !"jdk".equals(opt.getOrDefault("client", "curl"));
        Path body = Files.createTempFile("edit-page", ".html");
        for (int k = -warmup; k < edits; k++) {
            // the first edit raises the dead load, the next puts it back: each is a change
            int extra = ((k + warmup) & 1) == 0 ? 5 : 0;
            String json = "{\"version\": " + version + ", \"cells\": [[" + COL + ", " + ROW + "]], "
                    + EditPagePlan.fields(floor, levels, COL, ROW, extra) + "}";
            long a = System.nanoTime();
            HttpResponse<String> saved = s.expect(s.json("POST", edit, json), 200);
            long b = System.nanoTime();
            String shown;
            double pageTook, againTook;
            if (byCurl) {
                pageTook = curl(base + page, s.cookieHeader(), body);
                shown = Files.readString(body);
                againTook = curl(base + page, s.cookieHeader(), body);
            } else {
                shown = s.expect(s.get(page), 200).body();
                long c = System.nanoTime();
                // the same page asked again, now kept: the transfer and the access check without the rendering
                s.expect(s.get(page), 200);
                pageTook = (c - b) / 1e6;
                againTook = (System.nanoTime() - c) / 1e6;
            }
            version = Long.parseLong(EditPagePlan.first(VERSION, saved.body()));
            // a page that did not change with the edit would be a stale one
            if (shown.equals(previous)) throw new IllegalStateException("the member page did not change with edit " + k);
            previous = shown;
            bytes = shown.length();
            if (k < 0) continue;
            editMs[k] = (b - a) / 1e6;
            pageMs[k] = pageTook;
            sumMs[k] = editMs[k] + pageTook;
            againMs[k] = againTook;
        }
        Files.deleteIfExists(body);
        String after = loadAverage();
        System.out.printf("%d edits after %d warm-up; member page %,d characters; %s%n", edits, warmup, bytes, OfficeLoad.serverMemory(opt.get("pid")));
        report("edit (POST bays)", editMs);
        report("member page (GET)", pageMs);
        report("edit + page", sumMs);
        report("page again (kept)", againMs);
        System.out.println("pages fetched by " + (byCurl ? "curl (time_total)" : "the JDK HTTP client"));
        System.out.println("load average before: " + before + "; after: " + after);
        System.exit(0);
    }

    /**
     * The page fetched by curl into {@code into}, in milliseconds as curl times it (request to last byte): a C
     * client, as near a browser's reading of a large page as the machine has. The JDK client's reading of a large
     * body takes some 20 ms of its own on an 800 kB page (docs/benchmarks.md, One-bay edit); {@code --client jdk} uses it.
     */
    private static double curl(String url, String cookies, Path into) throws IOException, InterruptedException {
        Process p = new ProcessBuilder("curl", "-s", "-o", into.toString(), "-w", "%{http_code} %{time_total}",
                "-H", "Cookie: " + cookies, url).redirectErrorStream(true).start();
        String[] out = new String(p.getInputStream().readAllBytes()).trim().split(" ");
        if (p.waitFor() != 0 || !out[0].equals("200")) throw new IllegalStateException("curl: " + String.join(" ", out));
        return Double.parseDouble(out[1]) * 1e3;
    }

    private static void report(String what, double[] ms) {
        double[] s = ms.clone();
        Arrays.sort(s);
        double median = s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
        System.out.printf("%-20s median %7.1f ms, min %7.1f ms, max %7.1f ms%n", what, median, s[0], s[s.length - 1]);
    }

    private static int count(String members) {
        int n = 0;
        for (int i = members.indexOf("\"id\""); i >= 0; i = members.indexOf("\"id\"", i + 1)) n++;
        return n;
    }

    private static String loadAverage() throws IOException {
        String[] f = Files.readString(Path.of("/proc/loadavg")).split(" ");
        return f[0] + " " + f[1] + " " + f[2];
    }
}
