package com.baysheet.engine.record;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class RecordJsonTest {
    static CalcRecord officeBeam() { return Fixtures.calc(Fixtures.US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 30, "office", 10, 15)); }

    @Test
    void sameInputGivesIdenticalText() {
        assertThat(RecordJson.write(officeBeam())).isEqualTo(RecordJson.write(officeBeam()));
    }

    @Test
    void componentsAppearInDeclarationOrder() throws Exception {
        JsonNode root = RecordJson.mapper().readTree(RecordJson.write(officeBeam()));
        List<String> names = new ArrayList<>();
        root.fieldNames().forEachRemaining(names::add);
        assertThat(names).startsWith("subject", "edition", "units", "inputs", "steps", "results", "governing", "notes", "sketch");
    }

    @Test
    void resultsKeepFullPrecisionBesideTheShownText() throws Exception {
        CalcRecord r = officeBeam();
        JsonNode root = RecordJson.mapper().readTree(RecordJson.write(r));
        JsonNode m = null;
        for (JsonNode e : root.get("results")) if (e.get("key").asText().equals("L.M+")) m = e;
        assertThat(m).isNotNull();
        assertThat(m.get("value").asDouble()).isEqualTo(r.result("L.M+"));
        assertThat(m.get("unit").asText()).isEqualTo("lb·ft"); // the unit of value, the US base unit
        assertThat(m.get("shown").asText()).endsWith(" kip·ft");
        assertThat(m.get("shownUnit").asText()).isEqualTo("kip·ft");
        // 1 kip·ft = 1000 lb·ft: the shown number is the value over 1000 to three significant figures
        double shown = Double.parseDouble(m.get("shown").asText().replace(" kip·ft", ""));
        assertThat(m.get("value").asDouble() / 1000).isCloseTo(shown, within(0.05));
    }

    @Test
    void textResultsWithoutANumberStayValidJson() throws Exception {
        String json = RecordJson.write(officeBeam());
        JsonNode root = RecordJson.mapper().readTree(json);
        boolean textual = false;
        for (JsonNode e : root.get("results")) if (e.get("key").asText().startsWith("gov.")) textual = e.get("value").isTextual();
        assertThat(textual).as("NaN is written as a quoted string").isTrue();
    }

    @Test
    void stepsCarryTheirClause() {
        CalcRecord r = officeBeam();
        Step f = r.step("f_eq");
        assertThat(f.clause().label()).isEqualTo("ASCE 7-16 4.7.2, Eq. 4.7-1");
        assertThat(f.formula()).isEqualTo("f = 0.25 + 15/√(K_LL·A_T)");
    }
}
