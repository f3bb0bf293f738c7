package com.baysheet.engine;

import com.baysheet.engine.reduction.FloorMethods;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.units.UnitSystem;

/**
 * The project-level setting of a calculation: edition, unit system, catalogue (with the firm's rows), options, and
 * the project's snow site (null where the project gives no ground snow load: then no member carries snow), and the
 * floor reduction method the project chose instead of its edition's own (a {@link FloorMethods} id; null for the
 * edition's own, the default).
 */
public record CalcContext(Edition edition, UnitSystem system, OccupancyCatalogue catalogue, DesignOptions options, SnowSite snow,
                          String floorMethod) {
    /** The edition's own floor reduction method. */
    public CalcContext(Edition edition, UnitSystem system, OccupancyCatalogue catalogue, DesignOptions options, SnowSite snow) {
        this(edition, system, catalogue, options, snow, null);
    }

    /** No snow site. */
    public CalcContext(Edition edition, UnitSystem system, OccupancyCatalogue catalogue, DesignOptions options) {
        this(edition, system, catalogue, options, null);
    }

    public CalcContext {
        com.baysheet.engine.Check.present("edition", edition);
        com.baysheet.engine.Check.present("units", system);
        com.baysheet.engine.Check.present("catalogue", catalogue);
        com.baysheet.engine.Check.present("options", options);
        floorMethod = FloorMethods.builtIn().validate(floorMethod, system);
    }

    /** ASCE 7-16, the built-in catalogue, default options. */
    public static CalcContext of(UnitSystem system) {
        return new CalcContext(Editions.builtIn().byDefault(), system, OccupancyCatalogue.builtIn(), DesignOptions.DEFAULT);
    }

    public CalcContext withOptions(DesignOptions o) { return new CalcContext(edition, system, catalogue, o, snow, floorMethod); }

    public CalcContext withEdition(Edition e) { return new CalcContext(e, system, catalogue, options, snow, floorMethod); }

    public CalcContext withCatalogue(OccupancyCatalogue c) { return new CalcContext(edition, system, c, options, snow, floorMethod); }

    public CalcContext withSnow(SnowSite s) { return new CalcContext(edition, system, catalogue, options, s, floorMethod); }

    /** The same project with another floor reduction method (a {@link FloorMethods} id, or null for the edition's own). */
    public CalcContext withFloorMethod(String id) { return new CalcContext(edition, system, catalogue, options, snow, id); }

    /** An edition constant for this unit system: key.us or key.si. */
    public double constant(String key) {
        return edition.constant(key, system);
    }
}
