package com.baysheet.engine;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** One reader for JSON input: every refusal names the field by its path, absent and null mean the same. */
class JsonFieldsTest {
    private static JsonNode json(String s) throws Exception { return new ObjectMapper().readTree(s); }

    private static InputError refusal(Runnable r) {
        try {
            r.run();
        } catch (InputError e) {
            return e;
        }
        throw new AssertionError("not refused");
    }

    @Test
    void aMissingOrMistypedValueIsRefusedNamingItsPath() throws Exception {
        JsonFields s = JsonFields.strict(json("{\"span\": \"ten\", \"type\": null}"), "support", Set.of("span", "type"));
        assertThat(refusal(() -> s.number("span")).field()).isEqualTo("support.span");
        assertThat(refusal(() -> s.number("span")).problem()).startsWith("must be a number");
        assertThat(refusal(() -> s.text("type")).problem()).startsWith("is required");
        assertThat(s.text("type", "simple")).isEqualTo("simple");
    }

    @Test
    void aStrictObjectRefusesAnUnknownFieldAndAPlainOneIgnoresIt() throws Exception {
        JsonNode n = json("{\"span\": 10, \"colour\": \"red\"}");
        InputError e = refusal(() -> JsonFields.strict(n, "support", Set.of("span")));
        assertThat(e.field()).isEqualTo("support.colour");
        assertThat(JsonFields.of(n).number("span")).isEqualTo(10.0);
    }

    @Test
    void aWholeNumberIsAnIntegerThatFitsAnInt() throws Exception {
        JsonFields f = JsonFields.of(json("{\"a\": 2, \"b\": 2.0, \"c\": 1.5, \"d\": 1099511627776, \"e\": \"2\"}"));
        assertThat(f.integer("a")).isEqualTo(2);
        for (String bad : new String[]{"b", "c", "d", "e"})
            assertThat(refusal(() -> f.integer(bad)).problem()).as(bad).startsWith("must be a whole number");
        assertThat(f.integer("z", 7)).isEqualTo(7);
    }

    @Test
    void requiredTextRefusesBlankAndOptionalTextKeepsIt() throws Exception {
        JsonFields f = JsonFields.of(json("{\"name\": \"  \", \"flag\": \"yes\"}"));
        assertThat(refusal(() -> f.text("name")).problem()).startsWith("is required");
        assertThat(f.text("name", "x")).isEqualTo("  ");
        assertThat(refusal(() -> f.flag("flag", false)).problem()).startsWith("must be true or false");
        assertThat(f.flag("absent", true)).isTrue();
    }

    @Test
    void aNestedObjectNamesItsFieldsBelowItsOwn() throws Exception {
        JsonFields f = JsonFields.of(json("{\"cantilevers\": {\"north\": \"far\"}, \"list\": 3}"));
        assertThat(refusal(() -> f.object("cantilevers").number("north")).field()).isEqualTo("cantilevers.north");
        assertThat(refusal(() -> f.array("list")).field()).isEqualTo("list");
        assertThatThrownBy(() -> JsonFields.of(json("[1]"))).isInstanceOf(InputError.class).hasMessageStartingWith("input:");
    }

    @Test
    void anEngineRefusalIsRenamedToItsPathInTheInput() {
        InputError e = refusal(() -> JsonFields.at("strips[0]", () -> { throw new InputError("width", -1, "must be positive"); }));
        assertThat(e.field()).isEqualTo("strips[0].width");
        assertThat(e.problem()).isEqualTo("must be positive (got -1)");
    }
}
