package com.baysheet.e2e;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;

/** Values nobody should type, and some they will: extremes, non-numbers, scripts, SQL, unicode, very long text. */
final class Hostile {
    private static final ObjectMapper JSON = new ObjectMapper();

    private Hostile() {}

    /** As typed into a form field or a URL. */
    static Arbitrary<String> text() {
        return Arbitraries.frequencyOf(
                net.jqwik.api.Tuple.of(6, Arbitraries.of("-1", "-0", "0", "-0.0", "NaN", "-NaN", "nan", "Infinity", "-Infinity",
                        "1e308", "1e309", "-1e308", "4.9e-324", "2147483648", "-9223372036854775809", "99999999999999999999",
                        "", " ", "\t", "1,5", "1 000", "0x10", "12abc", "1e", ".", "+", "--1", "½", "٣",
                        "<script>alert(1)</script>", "\"><img src=x onerror=alert(1)>", "'; DROP TABLE project; --",
                        "' OR '1'='1", "1; DELETE FROM bay", "\u0000", "\u202e", "🏗️🧱", "Ωμέγα", "北京", "null", "true",
                        "[]", "{}", "%00", "%", "../../etc/passwd", "X", "Y", "Z", "office", "roof-ordinary", "0,0", "9,9",
                        "-1,-1", "1,2,3", "a,b", "US", "SI", "ORDINARY", "checker", "administrator")),
                net.jqwik.api.Tuple.of(3, Arbitraries.strings().all().ofMaxLength(40)),
                net.jqwik.api.Tuple.of(2, Arbitraries.doubles().map(String::valueOf)),
                net.jqwik.api.Tuple.of(1, Arbitraries.integers().between(1_000, 300_000).map(n -> "9".repeat(n))),
                net.jqwik.api.Tuple.of(1, Arbitraries.integers().between(1_000, 300_000).map(n -> "<b>é'\";".repeat(n / 8))));
    }

    /** As a JSON value: a raw literal (some not valid JSON at all) or any hostile text as a string. */
    static Arbitrary<String> jsonValue() {
        return Arbitraries.frequencyOf(
                net.jqwik.api.Tuple.of(3, Arbitraries.of("-1", "0", "NaN", "Infinity", "-Infinity", "1e308", "1e999", "-1e999",
                        "4.9e-324", "null", "true", "false", "[]", "{}", "[[0,0]]", "[[-1,5]]", "[[99999999999,0]]", "{\"a\":1}",
                        "\"\"", "1.5.5", "01", "'x'", "undefined", "[1e308]", "[\"A\",\"A\"]")),
                net.jqwik.api.Tuple.of(1, Arbitraries.doubles().map(String::valueOf)),
                net.jqwik.api.Tuple.of(3, text().map(Hostile::quoted)));
    }

    static String quoted(String s) {
        try {
            return JSON.writeValueAsString(s);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
