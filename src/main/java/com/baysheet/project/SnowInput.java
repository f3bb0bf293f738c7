package com.baysheet.project;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.Choices;
import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.RoofSnow;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.Thermal;
import com.baysheet.engine.units.UnitSystem;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A project's snow inputs as the form and the API give them (field names {@code groundSnow}, {@code snowTerrain},
 * {@code snowExposure}, {@code exposureFactor}, {@code thermalCondition}, {@code thermalFactor}, {@code riskCategory}),
 * read into a {@link SnowSite} and tried on the engine, so that whatever it would refuse later is refused at once,
 * beside the field.
 */
public final class SnowInput {
    private SnowInput() {}

    /**
     * @param groundSnow p_g in psf or kN/m², NaN where left blank: then no snow site (null) and the other fields are ignored
     * @param exposureFactor C_e given directly, or NaN to take it from terrain and exposure; likewise thermalFactor
     */
    public static SnowSite of(double groundSnow, String terrain, String exposure, double exposureFactor,
                              String thermal, double thermalFactor, String riskCategory) {
        if (Double.isNaN(groundSnow)) return null;
        if (!Double.isFinite(groundSnow) || groundSnow < 0)
            throw new InputError("groundSnow", groundSnow, "must be a finite number, 0 or more");
        Exposure e = Double.isNaN(exposureFactor)
                ? Exposure.of(Choices.parse(Exposure.Terrain.class, "snowTerrain", terrain), Choices.parse(Exposure.Shelter.class, "snowExposure", exposure))
                : Exposure.given(exposureFactor);
        Thermal t = Double.isNaN(thermalFactor) ? Thermal.of(Choices.parse(Thermal.Condition.class, "thermalCondition", thermal))
                : Thermal.given(thermalFactor);
        return new SnowSite(groundSnow, e, t, Importance.of(Choices.parse(Importance.RiskCategory.class, "riskCategory", riskCategory)));
    }

    /** The fields of a site as the form and the API name them, only those given (empty for no site). */
    public static Map<String, Object> fields(SnowSite s) {
        Map<String, Object> m = new LinkedHashMap<>();
        if (s == null) return m;
        m.put("groundSnow", s.groundLoad());
        if (s.exposure().fromTable()) {
            m.put("snowTerrain", s.exposure().terrain().name());
            m.put("snowExposure", s.exposure().shelter().name());
        } else m.put("exposureFactor", s.exposure().given());
        if (s.thermal().fromTable()) m.put("thermalCondition", s.thermal().condition().name());
        else m.put("thermalFactor", s.thermal().given());
        m.put("riskCategory", s.importance().category().name());
        return m;
    }

    /**
     * Works a roof level's snow out with the project's site, so that a W missing where rain-on-snow needs it is
     * refused when the level or the project is saved rather than when the members are derived.
     *
     * @param field the field the refusal is shown beside: "eaveToRidge" on the level form, "groundSnow" on the project's
     */
    public static void checkRoof(ProjectInfo p, LevelInfo level, String field) {
        if (p.snow() == null || !level.roof()) return;
        Edition ed = com.baysheet.engine.code.Editions.builtIn().get(p.edition());
        try {
            RoofSnow.calculate(CalcContext.of(p.units()).withEdition(ed), p.snow(), level.surface().roof(level.roofSlope()),
                    RecordBuilder.numbersOnly("snow", ed.id(), p.units()));
        } catch (InputError e) {
            throw new InputError(field, e.value(), "roof level " + level.name() + ": " + e.getMessage());
        }
    }

    /** Works the site out on a flat roof: an edition without snow (ASCE 7-22) or an impossible table cell is refused now. */
    public static void check(Edition edition, UnitSystem units, SnowSite site) {
        try {
            RoofSnow.calculate(CalcContext.of(units).withEdition(edition), site, SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 0, false, Double.NaN),
                    RecordBuilder.numbersOnly("snow", edition.id(), units));
        } catch (InputError e) {
            String f = switch (e.field()) {
                case "exposure", "terrain" -> "snowExposure";
                case "exposureFactor", "thermalFactor", "thermalCondition", "riskCategory" -> e.field();
                default -> "groundSnow";
            };
            String p = e.problem();
            int k = p.lastIndexOf(" (got ");
            if (k >= 0) p = p.substring(0, k);
            throw new InputError(f, e.value(), e.field().equals("edition") ? "cannot be used with " + edition.id() + ": " + p : p);
        }
    }
}
