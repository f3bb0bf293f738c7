package com.baysheet.cli;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.JsonFields;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.load.LiveShare;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;

/**
 * The member description of the command line, as JSON, read into the engine's context and input. Values are
 * in the project's base units (ft, ft², psf, plf, lb for US; m, m², kN/m², kN/m, kN for SI) except EI, given
 * as a section designer states it: kip·in² (US) or kN·m² (SI). See docs/engine.md for every field.
 */
final class MemberJson {
    private MemberJson() {}

    /** What a parsed description gives the engine. */
    record Parsed(CalcContext context, MemberInput input) {}

    static final Set<String> TOP = Set.of("edition", "units", "subject", "kind", "support", "floorsSupported", "strips",
            "areas", "pointLoads", "selfWeight", "roofSlope", "EI", "onRoof", "options", "customOccupancies", "floors", "snow", "floorMethod");

    static Parsed parse(JsonNode root) {
        JsonFields f = JsonFields.strict(root, "", TOP);
        UnitSystem units = UnitSystem.parse("units", f.text("units"));
        String edition = f.text("edition", Editions.builtIn().byDefault().id());
        OccupancyCatalogue catalogue = OccupancyCatalogue.builtIn();
        int i = 0;
        for (JsonNode c : f.array("customOccupancies")) catalogue = catalogue.with(custom(c, "customOccupancies[" + i++ + "]", units));
        CalcContext plain = new CalcContext(Editions.builtIn().get(edition), units, catalogue, options(f), null,
                f.text("floorMethod", ""));
        String subject = f.text("subject");
        MemberKind kind = MemberKind.parse("kind", f.text("kind"));
        Support support = support(JsonFields.strict(f.node("support"), "support", Set.of("type", "span", "overhang", "length")));
        // EI as a section designer states it: kip·in² (US) or kN·m² (SI), into lb·ft² or kN·m²
        double ei = f.has("EI") ? Quantity.STIFFNESS.unit(units).toBase(Check.positive("EI", f.number("EI"))) : Double.NaN;
        List<AreaStrip> strips = list(f, "strips", (n, p) -> strip(JsonFields.strict(n, p, Set.of("occupancy", "width", "from", "to", "deadLoad")), p));
        List<AreaLoad> areas = list(f, "areas", (n, p) -> area(JsonFields.strict(n, p, Set.of("occupancy", "area", "deadLoad")), p));
        List<PointLoad> points = list(f, "pointLoads", (n, p) -> point(JsonFields.strict(n, p, Set.of("x", "dead", "live", "areas")), p, kind.isColumn()));
        List<SupportedFloor> floors = list(f, "floors", (n, p) -> floor(JsonFields.strict(n, p, Set.of("name", "kind", "areas")), p));
        int floorsSupported = f.integer("floorsSupported", floors.isEmpty() ? 1 : floors.size());
        MemberInput in = JsonFields.at("", () -> new MemberInput(subject, kind, support, floorsSupported, strips, areas, points,
                f.number("selfWeight", 0), f.number("roofSlope", Double.NaN), ei, f.flag("onRoof", false), floors));
        SnowJson.Parsed snow = SnowJson.parse(f, f.number("roofSlope", Double.NaN));
        if (snow == null) return new Parsed(plain, in);
        if (kind.isColumn()) throw new InputError("snow", "column", "snow is given to the beams and girders of a roof; a column carries it in its loads");
        return new Parsed(plain.withSnow(snow.site()), in.withSnow(snow.roof()));
    }

    private static DesignOptions options(JsonFields top) {
        if (!top.has("options")) return DesignOptions.DEFAULT;
        JsonFields o = JsonFields.strict(top.node("options"), "options", Set.of("partitionAllowance", "reducePartitions", "upliftReducedDead"));
        return new DesignOptions(o.flag("partitionAllowance", false), o.flag("reducePartitions", false),
                o.flag("upliftReducedDead", false));
    }

    private static Support support(JsonFields s) {
        String type = s.text("type");
        return JsonFields.at("support", () -> switch (type) {
            case "simple" -> new Support.Simple(s.number("span"));
            case "overhang" -> new Support.Overhang(s.number("span"), s.number("overhang"));
            case "cantilever" -> new Support.Cantilever(s.number("length"));
            case "axial" -> new Support.Axial();
            default -> throw new InputError("support.type", type, "must be simple, overhang, cantilever or axial");
        });
    }

    private static AreaStrip strip(JsonFields s, String p) {
        double dead = Check.nonNegative(s.child("deadLoad"), s.number("deadLoad", 0));
        return JsonFields.at(p, () -> new AreaStrip(s.text("occupancy"), s.number("width"), s.number("from"), s.number("to"), dead));
    }

    private static AreaLoad area(JsonFields a, String p) {
        double dead = Check.nonNegative(a.child("deadLoad"), a.number("deadLoad", 0));
        return JsonFields.at(p, () -> new AreaLoad(a.text("occupancy"), a.number("area"), dead));
    }

    /** A column's floor supported: its name, the column's kind on it (so its K_LL) and its floor areas. */
    private static SupportedFloor floor(JsonFields fl, String p) {
        MemberKind kind = MemberKind.parse(fl.child("kind"), fl.text("kind"));
        List<AreaShare> areas = list(fl, "areas", (n, q) -> {
            JsonFields a = JsonFields.strict(n, q, Set.of("occupancy", "area"));
            return JsonFields.at(q, () -> new AreaShare(a.text("occupancy"), a.number("area")));
        });
        return JsonFields.at(p, () -> new SupportedFloor(fl.text("name"), kind, areas));
    }

    /** A beam's point load needs its position; a column's loads are axial, so x may be left out. */
    private static PointLoad point(JsonFields pl, String p, boolean column) {
        List<LiveShare> live = list(pl, "live", (n, q) -> {
            JsonFields l = JsonFields.strict(n, q, Set.of("occupancy", "load", "partition"));
            double load = Check.nonNegative(l.child("load"), l.number("load"));
            return JsonFields.at(q, () -> new LiveShare(l.text("occupancy"), l.flag("partition", false), load));
        });
        List<AreaShare> areas = list(pl, "areas", (n, q) -> {
            JsonFields a = JsonFields.strict(n, q, Set.of("occupancy", "area"));
            return JsonFields.at(q, () -> new AreaShare(a.text("occupancy"), a.number("area")));
        });
        double x = column ? pl.number("x", 0) : pl.number("x");
        return JsonFields.at(p, () -> new PointLoad(x, pl.number("dead", 0), live, areas));
    }

    private static com.baysheet.engine.code.Occupancy custom(JsonNode n, String p, UnitSystem units) {
        JsonFields c = JsonFields.strict(n, p, Set.of("id", "name", "uniform", "concentrated", "contactSide", "rule", "assembly"));
        ReductionRule rule = ReductionRule.parse(c.child("rule"), c.text("rule"));
        double side = c.number("contactSide", units == UnitSystem.US ? 30 : 762);
        return JsonFields.at(p, () -> OccupancyCatalogue.custom(c.text("id"), c.text("name"), units, c.number("uniform"),
                c.number("concentrated", 0), side, rule, c.flag("assembly", false)));
    }

    private interface Reader<T> { T read(JsonNode n, String path); }

    private static <T> List<T> list(JsonFields f, String field, Reader<T> r) {
        List<T> out = new ArrayList<>();
        int i = 0;
        for (JsonNode n : f.array(field)) out.add(r.read(n, f.child(field) + "[" + i++ + "]"));
        return out;
    }
}
