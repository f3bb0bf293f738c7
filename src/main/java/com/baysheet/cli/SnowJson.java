package com.baysheet.cli;

import com.baysheet.engine.JsonFields;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.snow.Choices;
import com.baysheet.engine.snow.DriftStrip;
import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.RoofStep;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.StepDrift;
import com.baysheet.engine.snow.Thermal;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * The {@code snow} block of a member description: the site (p_g, C_e, C_t, I_s by table choice or given directly) and
 * the roof the member's strips lie on (shape, surface, W, simple spans), with an optional roof step and the member's
 * strips that its drift loads. See docs/engine.md.
 */
final class SnowJson {
    private SnowJson() {}

    static final Set<String> FIELDS = Set.of("groundSnow", "terrain", "exposure", "exposureFactor", "thermalCondition",
            "thermalFactor", "riskCategory", "importanceFactor", "roofShape", "slippery", "eaveToRidge", "simpleSpans", "step", "drift");

    /** The site and the roof, or null where the description has no snow block. */
    record Parsed(SnowSite site, SnowOnRoof roof) {}

    static Parsed parse(JsonFields top, double roofSlope) {
        if (!top.has("snow")) return null;
        JsonFields s = JsonFields.strict(top.node("snow"), "snow", FIELDS);
        Exposure e = s.has("exposureFactor") ? JsonFields.at("snow.exposureFactor", () -> Exposure.given(s.number("exposureFactor")))
                : Exposure.of(Choices.parse(Exposure.Terrain.class, "snow.terrain", s.text("terrain")),
                        Choices.parse(Exposure.Shelter.class, "snow.exposure", s.text("exposure")));
        Thermal t = s.has("thermalFactor") ? JsonFields.at("snow.thermalFactor", () -> Thermal.given(s.number("thermalFactor")))
                : Thermal.of(Choices.parse(Thermal.Condition.class, "snow.thermalCondition", s.text("thermalCondition")));
        Importance i = s.has("importanceFactor") ? JsonFields.at("snow.importanceFactor", () -> Importance.given(s.number("importanceFactor")))
                : Importance.of(Choices.parse(Importance.RiskCategory.class, "snow.riskCategory", s.text("riskCategory")));
        SnowSite site = JsonFields.at("snow", () -> new SnowSite(s.number("groundSnow"), e, t, i));
        SnowRoof.Shape shape = Choices.parse(SnowRoof.Shape.class, "snow.roofShape", s.text("roofShape", "MONOSLOPE"));
        double slope = Double.isNaN(roofSlope) ? 0 : roofSlope;
        SnowRoof roof = JsonFields.at("snow", () -> new SnowRoof(shape, slope, s.flag("slippery", false), s.number("eaveToRidge", Double.NaN),
                s.flag("simpleSpans", false), null));
        List<StepDrift> drifts = new ArrayList<>();
        if (s.has("step")) {
            JsonFields st = JsonFields.strict(s.node("step"), "snow.step", Set.of("height", "upperLength", "lowerLength"));
            RoofStep step = JsonFields.at("snow.step", () -> new RoofStep(st.number("height"), st.number("upperLength"), st.number("lowerLength")));
            List<DriftStrip> strips = new ArrayList<>();
            int k = 0;
            for (var n : s.array("drift")) {
                String p = "snow.drift[" + k++ + "]";
                JsonFields d = JsonFields.strict(n, p, Set.of("parallel", "from", "to", "width", "nearFrom", "nearTo", "cutOff"));
                boolean parallel = d.flag("parallel", false);
                strips.add(JsonFields.at(p, () -> new DriftStrip(parallel, d.number("from"), d.number("to"), d.number("width"),
                        d.number("nearFrom"), parallel ? d.number("nearFrom") : d.number("nearTo"), d.number("cutOff", 0))));
            }
            drifts.add(new StepDrift(step, "roof step given in the input", strips));
        } else if (s.has("drift")) {
            throw new com.baysheet.engine.InputError("snow.drift", "strips", "a drift needs the roof step (snow.step)");
        }
        return new Parsed(site, new SnowOnRoof(roof, !drifts.isEmpty(), drifts));
    }
}
