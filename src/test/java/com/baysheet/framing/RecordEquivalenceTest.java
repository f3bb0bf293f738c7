package com.baysheet.framing;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.LineLoad;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.engine.record.Step;
import com.baysheet.framing.model.Building;
import com.baysheet.project.Project;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.store.Store;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.UUID;
import java.util.zip.GZIPInputStream;
import java.util.zip.GZIPOutputStream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

/**
 * The engine's records and numbers stay what they were when the engine's numbers pass was made leaner: for the demo
 * projects, for random models (the generators of the derivation properties, at fixed seeds, so that every run
 * draws the same models) and for random members straight through the engine (overhangs among them, which the framing
 * model never makes), each member's full record as text, byte for byte, and its numbers (every value in the
 * record, the numbers-only results read through {@code value}, {@code label} and {@code stepValue}, the end shares
 * handed down) and every take-down row, within 1e-12 relative where a scan of positions was replaced by statics.
 *
 * <p>The reference, {@code src/test/resources/equivalence/records.txt.gz}, was written by the engine before that
 * change (run with {@code -Dequivalence.write=PATH} to write a new one, only after a deliberate change of results).
 */
class RecordEquivalenceTest {
    static final String REFERENCE = "equivalence/records.txt.gz";
    static final double REL = 1e-12;
    static final int RANDOM_MODELS = 40;

    @Test
    void recordsAndNumbersOfTheDemoAndOfRandomModelsAreThoseOfTheReference() throws IOException {
        Map<String, Capture> now = captureAll();
        String target = System.getProperty("equivalence.write");
        if (target != null) { write(Path.of(target), now); return; }
        Map<String, Capture> was = read();
        assertThat(now.keySet()).as("members captured").containsExactlyElementsOf(was.keySet());
        List<String> faults = new ArrayList<>();
        for (var e : was.entrySet()) {
            Capture a = e.getValue(), b = now.get(e.getKey());
            if (!a.text.equals(b.text)) faults.add(e.getKey() + ": record text differs");
            if (a.numbers.length != b.numbers.length) { faults.add(e.getKey() + ": " + b.numbers.length + " numbers, was " + a.numbers.length); continue; }
            for (int i = 0; i < a.numbers.length; i++)
                if (!close(a.numbers[i], b.numbers[i])) { faults.add(e.getKey() + ": number " + i + " is " + b.numbers[i] + ", was " + a.numbers[i]); break; }
        }
        if (!faults.isEmpty()) fail(faults.size() + " of " + was.size() + " differ, first: " + faults.subList(0, Math.min(10, faults.size())));
    }

    /** Equal, both NaN, or within {@link #REL} of the larger magnitude (never less than an absolute 1e-12 · 1). */
    static boolean close(double a, double b) {
        if (Double.isNaN(a) || Double.isNaN(b)) return Double.isNaN(a) && Double.isNaN(b);
        if (a == b) return true;
        return Math.abs(a - b) <= REL * Math.max(1, Math.max(Math.abs(a), Math.abs(b)));
    }

    /** One member's (or take-down's) text digest and numbers, in a fixed order. */
    record Capture(String text, double[] numbers) {}

    static Map<String, Capture> captureAll() {
        Map<String, Capture> out = new LinkedHashMap<>();
        Database db = Database.open("jdbc:h2:mem:eq" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1");
        try {
            Store store = Store.on(db.dataSource(), Derivation::derive, Clock.systemUTC());
            for (Project p : Demo.loadIfEmpty(store)) capture("demo " + p.info().name(), store.results().of(p.id()).derived(), out);
        } finally {
            db.close();
        }
        engineMembers(out);
        Random seeds = new Random(20261203);
        for (int i = 0; i < RANDOM_MODELS; i++) {
            long seed = seeds.nextLong();
            capture("random " + seed, Buildings.random(seed), out);
            // snow, lower roofs, point and line loads, self weights
            capture("rich " + seed, RederivationProperties.model(new Random(seed), seed), out);
        }
        return out;
    }

    static final String[] FLOORS = {"office", "office-corridor", "retail-upper", "hospital-operating", "stairs", "assembly-other",
            "storage-heavy", "garage-passenger", "library-stacks", "balcony-residential", "school-classroom"};

    /**
     * Members the framing model never makes, straight through the engine: overhanging beams (the framing has none),
     * cantilevers and simple spans with part-length strips, roof strips, point and line loads and stiffness, and columns,
     * in US and SI units (the generators of the engine's member properties and of the engine benchmark's batch).
     */
    static void engineMembers(Map<String, Capture> out) {
        Random rnd = new Random(20261204);
        for (int i = 0; i < 600; i++) {
            CalcContext ctx = rnd.nextInt(4) == 0 ? CalcContext.of(UnitSystem.SI) : CalcContext.of(UnitSystem.US);
            double unit = ctx.system() == UnitSystem.SI ? 0.3048 : 1;
            int kind = rnd.nextInt(5);
            double span = (3 + rnd.nextInt(150) / 4.0) * unit;
            String occ = rnd.nextInt(5) == 0 ? "roof-ordinary" : FLOORS[rnd.nextInt(FLOORS.length)];
            double dead = (10 + rnd.nextInt(90)) * (unit == 1 ? 1 : 0.04788);
            double width = (0.5 + rnd.nextInt(30) / 2.0) * unit;
            MemberInput in;
            if (kind == 4) {
                in = MemberInput.column("C" + i, MemberKind.INTERIOR_COLUMN, 1 + rnd.nextInt(6),
                        List.of(new AreaLoad(occ, (50 + rnd.nextInt(2000)) * unit * unit, dead)));
            } else {
                Support s = switch (kind) {
                    case 0 -> new Support.Simple(span);
                    case 1, 2 -> new Support.Overhang(span, span * (0.05 + rnd.nextInt(30) / 20.0)); // overhang up to 1.5 ℓ
                    default -> new Support.Cantilever(span);
                };
                double len = s.length();
                List<AreaStrip> strips = new ArrayList<>();
                strips.add(new AreaStrip(occ, width, 0, len, dead));
                if (rnd.nextBoolean()) {
                    double a = len * rnd.nextInt(8) / 8, b = a + (len - a) * (1 + rnd.nextInt(4)) / 4;
                    String other = occ.startsWith("roof") ? occ : FLOORS[rnd.nextInt(FLOORS.length)];
                    strips.add(new AreaStrip(other, width / 2, a, b, dead));
                }
                List<PointLoad> points = rnd.nextInt(3) == 0 && !occ.startsWith("roof")
                        ? List.of(PointLoad.applied("unit", len * rnd.nextInt(9) / 8, 500 * unit, 300 * unit, occ)) : List.of();
                double slope = occ.startsWith("roof") ? rnd.nextInt(13) / 2.0 : Double.NaN;
                double ei = rnd.nextBoolean() ? Double.NaN : (1e5 + rnd.nextInt(1000) * 1e4) * (unit == 1 ? 1 : 0.004214);
                MemberKind mk = kind == 3 ? MemberKind.CANTILEVER_BEAM : kind == 0 ? MemberKind.INTERIOR_BEAM : MemberKind.EDGE_BEAM;
                in = new MemberInput("B" + i, mk, s, 1, strips, List.of(), points, 0, slope, ei, false);
                if (rnd.nextInt(4) == 0) in = in.withLineLoads(List.of(new LineLoad("wall", 0, len / 2, 200 * unit, 0, "", false)));
            }
            capture("engine " + i, in, ctx, out);
        }
    }

    static void capture(String key, MemberInput in, CalcContext ctx, Map<String, Capture> out) {
        MemberResult m;
        CalcRecord r;
        try {
            m = MemberCalculation.calculate(ctx, in);
            r = m.record();
        } catch (RuntimeException e) {
            put(out, key + " refused", new StringBuilder(e.getClass().getName() + ": " + e.getMessage()), new Numbers());
            return;
        }
        capture(key, m, r, out);
    }

    /** A model the derivation refuses is captured by its message: a refusal must stay a refusal. */
    static void capture(String source, Building b, Map<String, Capture> out) {
        Derived d;
        try {
            d = Derivation.derive(b);
        } catch (RuntimeException e) {
            put(out, source + " refused", new StringBuilder(e.getClass().getName() + ": " + e.getMessage()), new Numbers());
            return;
        }
        capture(source, d, out);
    }

    static void capture(String source, Derived d, Map<String, Capture> out) {
        for (DerivedMember m : d.members()) capture(source + " " + m.id(), m.result(), m.result().record(), out);
        for (TakeDown t : d.takeDowns()) {
            Numbers n = new Numbers();
            StringBuilder text = new StringBuilder();
            walk(RecordJson.mapper().valueToTree(t.rows()), "rows", text, n);
            walk(RecordJson.mapper().valueToTree(t.record()), "", text, n);
            put(out, source + " take-down " + t.id(), text, n);
        }
    }

    static void capture(String key, MemberResult m, CalcRecord r, Map<String, Capture> out) {
        Numbers n = new Numbers();
        StringBuilder text = new StringBuilder();
        walk(RecordJson.mapper().valueToTree(r), "", text, n);
        // the numbers-only pass, read as the framing model reads it
        for (Entry e : r.results()) {
            n.add(m.value(e.key()));
            text.append("label ").append(m.label(e.key())).append('\n');
        }
        for (Step s : r.steps()) n.add(m.stepValue(s.symbol()));
        walk(RecordJson.mapper().valueToTree(m.left()), "left", text, n);
        if (m.right() != null) walk(RecordJson.mapper().valueToTree(m.right()), "right", text, n);
        put(out, key, text, n);
    }

    private static void put(Map<String, Capture> out, String key, StringBuilder text, Numbers n) {
        // -Dequivalence.show=KEY,KEY prints what a member's digest is taken over, to find what differs
        if (List.of(System.getProperty("equivalence.show", "").split(",")).contains(key))
            System.out.println("equivalence.show " + key + "\n" + text);
        if (out.put(key, new Capture(sha256(text.toString()), n.toArray())) != null) throw new IllegalStateException("captured twice: " + key);
    }

    /** Text nodes (with their paths) into {@code text}, number nodes into {@code n}, in document order. */
    static void walk(JsonNode node, String path, StringBuilder text, Numbers n) {
        if (node.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
                var f = it.next();
                walk(f.getValue(), path + "." + f.getKey(), text, n);
            }
        } else if (node.isArray()) {
            text.append(path).append(" [").append(node.size()).append("]\n");
            for (int i = 0; i < node.size(); i++) walk(node.get(i), path + "[" + i + "]", text, n);
        } else if (node.isNumber()) {
            text.append(path).append(" #\n");
            n.add(node.doubleValue());
        } else {
            // Jackson writes NaN and the infinities as text: they are numbers here
            String s = node.asText();
            if (node.isTextual() && (s.equals("NaN") || s.equals("Infinity") || s.equals("-Infinity"))) {
                text.append(path).append(" #\n");
                n.add(Double.parseDouble(s));
            } else text.append(path).append(' ').append(s).append('\n');
        }
    }

    static final class Numbers {
        private double[] v = new double[64];
        private int size;
        void add(double d) {
            if (size == v.length) v = java.util.Arrays.copyOf(v, size * 2);
            v[size++] = d;
        }
        double[] toArray() { return java.util.Arrays.copyOf(v, size); }
    }

    static String sha256(String s) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    static void write(Path file, Map<String, Capture> all) throws IOException {
        Files.createDirectories(file.toAbsolutePath().getParent());
        try (OutputStream os = new GZIPOutputStream(Files.newOutputStream(file));
             Writer w = new java.io.OutputStreamWriter(os, StandardCharsets.UTF_8)) {
            for (var e : all.entrySet()) {
                w.write(e.getKey() + "\n" + e.getValue().text + "\n");
                StringBuilder b = new StringBuilder();
                for (double d : e.getValue().numbers) b.append(d).append(' ');
                w.write(b.toString().trim() + "\n");
            }
        }
    }

    static Map<String, Capture> read() {
        Map<String, Capture> out = new LinkedHashMap<>();
        try (InputStream in = RecordEquivalenceTest.class.getClassLoader().getResourceAsStream(REFERENCE)) {
            if (in == null) throw new IllegalStateException("missing reference " + REFERENCE);
            BufferedReader r = new BufferedReader(new InputStreamReader(new GZIPInputStream(in), StandardCharsets.UTF_8));
            for (String key; (key = r.readLine()) != null; ) {
                String text = r.readLine(), nums = r.readLine();
                String[] parts = nums.isEmpty() ? new String[0] : nums.split(" ");
                double[] v = new double[parts.length];
                for (int i = 0; i < parts.length; i++) v[i] = Double.parseDouble(parts[i]);
                out.put(key, new Capture(text, v));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }
}
