package com.baysheet.bench;

import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The varied plan of {@code FramingBenchmark.varied} entered through the JSON API (plain JDK: this side of the
 * benchmark has no project classes, so the plan's rules are written out again here and must follow that method):
 * 24 × 24 bays on unequal spacings (28 to 35 ft along x, 24 to 29 ft along y), a retail ground floor, a parking
 * level, office floors with light storage where (col + row + level) is a multiple of 11, an office corridor on row
 * 12, dead loads 55, 60 or 65 psf by column (25 psf at the roof), two infill beams a bay spanning X and Y in a
 * checkerboard, a 6 ft south cantilever on every floor's first row, a 2 × 2-bay opening through every floor and a
 * roof sloped 1/2 in/ft. Bays that get the same are sent as one assignment, which is as few as the API allows.
 */
final class EditPagePlan {
    static final int BAYS = 24;
    private static final Pattern VERSION = Pattern.compile("\"version\" ?: ?(\\d+)");
    private static final Pattern ID = Pattern.compile("\"id\" ?: ?(\\d+)");
    private static final Pattern IDS = Pattern.compile("\"ids\" ?: ?\\[([^\\]]*)]");
    private static final Pattern LEVEL = Pattern.compile("\"id\"\\s*:\\s*(\\d+)\\s*,\\s*\"name\"\\s*:\\s*\"([^\"]+)\"");
    private static final String PROJECT = "{\"jobNumber\": \"EDIT-PAGE\", \"name\": \"Varied plan\", \"units\": \"US\"}";

    /** A project as entered: its id and version, its levels' ids from the lowest, the grid lines' ids, the requests sent. */
    record Entered(long project, long version, List<Long> levels, List<Integer> xLines, List<Integer> yLines, int requests) {}

    private final OfficeLoadSession s;
    private long project, version;
    private int requests;

    private EditPagePlan(OfficeLoadSession s) {
        this.s = s;
    }

    /**
     * Enters the plan: with {@code import} as one model file ({@code POST /api/projects/import}, one request); with
     * {@code bays} as the bay editor's user would, level by level, one assignment per group of bays that get the same.
     */
    static Entered enter(OfficeLoadSession s, int levels, String how) throws IOException, InterruptedException {
        EditPagePlan p = new EditPagePlan(s);
        if (how.equals("import")) p.importFile(levels);
        else if (how.equals("bays")) p.assignBays(levels);
        else throw new IllegalArgumentException("--enter " + how + ": give import or bays");
        return p.entered(levels);
    }

    private void importFile(int levels) throws IOException, InterruptedException {
        List<String> ls = new ArrayList<>();
        for (int k = 1; k <= levels; k++) {
            List<String> bays = new ArrayList<>();
            for (Map.Entry<String, List<String>> g : assignments(k, levels).entrySet())
                bays.add("{\"cells\": [" + String.join(", ", g.getValue()) + "], " + g.getKey() + "}");
            ls.add(level(k, levels) + ", \"bays\": [" + String.join(", ", bays) + "], \"lineLoads\": []}");
        }
        String file = "{\"format\": 1, \"project\": " + PROJECT + ", \"grid\": {\"x\": " + axis("", 28, 7) + ", \"y\": "
                + axis("Y", 24, 5) + "}, \"levels\": [" + String.join(", ", ls) + "]}";
        long t0 = System.nanoTime();
        project = Long.parseLong(first(ID, send("POST", "/api/projects/import", "{\"model\": " + file + "}", 201)));
        System.out.printf("imported: %,d characters in %.1f s%n", file.length(), (System.nanoTime() - t0) / 1e9);
    }

    private void assignBays(int levels) throws IOException, InterruptedException {
        project = Long.parseLong(first(ID, send("POST", "/api/projects", PROJECT, 201)));
        String base = "/api/projects/" + project;
        send("PUT", base + "/grid", "{\"version\": " + version + ", \"x\": " + axis("", 28, 7) + ", \"y\": " + axis("Y", 24, 5) + "}", 200);
        List<Long> ids = new ArrayList<>();
        for (int k = 1; k <= levels; k++) {
            String l = send("POST", base + "/levels", "{\"version\": " + version + ", " + level(k, levels).substring(1) + "}", 201);
            ids.add(Long.parseLong(first(ID, l.substring(l.indexOf("saved")))));
        }
        for (int k = 1; k <= levels; k++) {
            long t0 = System.nanoTime(), slowest = 0;
            Map<String, List<String>> groups = assignments(k, levels);
            for (Map.Entry<String, List<String>> g : groups.entrySet()) {
                long a = System.nanoTime();
                send("POST", base + "/levels/" + ids.get(k - 1) + "/bays", "{\"version\": " + version + ", \"cells\": ["
                        + String.join(", ", g.getValue()) + "], " + g.getKey() + "}", 200);
                slowest = Math.max(slowest, System.nanoTime() - a);
            }
            System.out.printf("level %d: %d assignments in %.1f s, the slowest %.0f ms%n", k, groups.size(),
                    (System.nanoTime() - t0) / 1e9, slowest / 1e6);
        }
    }

    /** The project as entered, read back: its version, its levels' ids from the lowest and its grid lines' ids. */
    private Entered entered(int levels) throws IOException, InterruptedException {
        String base = "/api/projects/" + project;
        String shown = send("GET", base, null, 200);
        version = Long.parseLong(first(VERSION, shown.substring(shown.indexOf("\"project\""))));
        Matcher m = IDS.matcher(shown);
        List<Integer> x = m.find() ? numbers(m.group(1)) : List.of(), y = m.find() ? numbers(m.group(1)) : List.of();
        if (x.size() != BAYS + 1 || y.size() != BAYS + 1) throw new IllegalStateException("grid ids not read from " + shown);
        Map<String, Long> byName = new LinkedHashMap<>();
        Matcher l = LEVEL.matcher(send("GET", base + "/levels", null, 200));
        while (l.find()) byName.put(l.group(2), Long.parseLong(l.group(1)));
        List<Long> ids = new ArrayList<>();
        for (int k = 1; k <= levels; k++) ids.add(byName.get(k == levels ? "R" : "F" + k));
        if (ids.contains(null)) throw new IllegalStateException("levels not all read back: " + byName);
        return new Entered(project, version, ids, x, y, requests);
    }

    /** Level {@code k} (1 the lowest) as the level fields of a model file or a new level, 13 ft a storey. */
    private static String level(int k, int levels) {
        boolean roof = k == levels;
        return "{\"name\": \"" + (roof ? "R" : "F" + k) + "\", \"elevation\": " + 13 * k
                + (roof ? ", \"roof\": true, \"roofSlope\": 0.5" : ", \"roof\": false");
    }

    /** The cells of level {@code k} (1 the lowest) grouped by what they get, each group's fields as JSON. */
    static Map<String, List<String>> assignments(int k, int levels) {
        Map<String, List<String>> groups = new LinkedHashMap<>();
        for (int c = 0; c < BAYS; c++)
            for (int r = 0; r < BAYS; r++) groups.computeIfAbsent(fields(k, levels, c, r, 0), w -> new ArrayList<>()).add("[" + c + ", " + r + "]");
        return groups;
    }

    /** What the bay at (col, row) of level {@code k} gets, as the fields of an assignment, its dead load raised by {@code extraDead} psf. */
    static String fields(int k, int levels, int c, int r, int extraDead) {
        boolean roof = k == levels, parking = k == 2, ground = k == 1;
        if (!roof && c >= 10 && c <= 11 && r >= 10 && r <= 11) return "\"opening\": true";
        String use = roof ? "roof-ordinary" : parking ? "garage-passenger" : ground ? "retail-first"
                : r == 12 ? "office-corridor" : (c + r + k) % 11 == 0 ? "storage-light" : "office";
        return "\"occupancy\": \"" + use + "\", \"deadLoad\": " + ((roof ? 25 : 55 + (c % 3) * 5) + extraDead) + ", \"beams\": \""
                + ((c + r) % 2 == 0 ? "X" : "Y") + "\", \"infillBeams\": 2" + (r == 0 && !roof ? ", \"cantilevers\": {\"south\": 6}" : "");
    }

    /** 25 lines named {@code prefix}1, 2, ... spaced {@code base} ft plus up to {@code spread} ft, as the framing benchmark's. */
    private static String axis(String prefix, int base, int spread) {
        List<String> names = new ArrayList<>(), spacings = new ArrayList<>();
        for (int i = 0; i <= BAYS; i++) names.add("\"" + prefix + (i + 1) + "\"");
        for (int i = 0; i < BAYS; i++) spacings.add(String.valueOf(base + i * 5 % (spread + 1)));
        return "{\"names\": [" + String.join(", ", names) + "], \"spacings\": [" + String.join(", ", spacings) + "]}";
    }

    /** Sends one request, expecting {@code status}; a change's answer gives the project's next version. */
    private String send(String method, String path, String body, int status) throws IOException, InterruptedException {
        requests++;
        var r = body == null ? s.get(path) : s.json(method, path, body);
        String answer = r.body();
        if (r.statusCode() != status) throw new IllegalStateException(method + " " + path + " answered " + r.statusCode()
                + ", expected " + status + ": " + answer.substring(0, Math.min(500, answer.length())));
        if (body != null) version = Long.parseLong(first(VERSION, answer));
        return answer;
    }

    static String first(Pattern p, String text) {
        Matcher m = p.matcher(text);
        if (!m.find()) throw new IllegalStateException("no " + p + " in " + text.substring(0, Math.min(300, text.length())));
        return m.group(1);
    }

    private static List<Integer> numbers(String list) {
        List<Integer> out = new ArrayList<>();
        for (String n : list.split(",")) out.add(Integer.parseInt(n.strip()));
        return out;
    }
}
