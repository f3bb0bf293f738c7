package com.baysheet.project;

import com.baysheet.engine.Check;
import com.fasterxml.jackson.annotation.JsonAnyGetter;
import com.fasterxml.jackson.annotation.JsonIgnore;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.reduction.FloorMethods;
import com.baysheet.engine.units.UnitSystem;

/**
 * What a project is: the job and its people, the code edition, the unit system its numbers are in (fixed
 * once levels exist, since every stored length and load is in that system), the design options, the snow site
 * (null: no ground snow load given, so no member carries snow) and the floor reduction method chosen instead of the
 * edition's own (null: the edition's own).
 */
public record ProjectInfo(String jobNumber, String name, String address, String client, String edition,
                          UnitSystem units, boolean partitionAllowance, boolean reducePartitions,
                          boolean upliftReducedDead, @JsonIgnore SnowSite snow, String floorMethod) {
    /** The edition's own floor reduction method. */
    public ProjectInfo(String jobNumber, String name, String address, String client, String edition,
                       UnitSystem units, boolean partitionAllowance, boolean reducePartitions, boolean upliftReducedDead,
                       SnowSite snow) {
        this(jobNumber, name, address, client, edition, units, partitionAllowance, reducePartitions, upliftReducedDead, snow, null);
    }

    /** No snow site. */
    public ProjectInfo(String jobNumber, String name, String address, String client, String edition,
                       UnitSystem units, boolean partitionAllowance, boolean reducePartitions, boolean upliftReducedDead) {
        this(jobNumber, name, address, client, edition, units, partitionAllowance, reducePartitions, upliftReducedDead, null);
    }

    public ProjectInfo {
        jobNumber = limited("jobNumber", Check.text("jobNumber", jobNumber).strip(), 40);
        name = limited("name", Check.text("name", name).strip(), 200);
        address = limited("address", address == null ? "" : address.strip(), 400);
        client = limited("client", client == null ? "" : client.strip(), 200);
        Check.text("edition", edition);
        Edition ed = Editions.builtIn().get(edition);
        Check.present("units", units);
        // the engine has no roof snow for some editions (ASCE 7-22): refused here, beside the ground snow load
        if (snow != null) SnowInput.check(ed, units, snow);
        // EN 1991-1-1 and NBC are written for SI only: refused beside the field on a US project
        floorMethod = FloorMethods.builtIn().validate(floorMethod, units);
    }

    /** The same project with another floor reduction method (null for the edition's own). */
    public ProjectInfo withFloorMethod(String id) {
        return new ProjectInfo(jobNumber, name, address, client, edition, units, partitionAllowance, reducePartitions,
                upliftReducedDead, snow, id);
    }

    /** A project with the uplift option off (0.9D + 1.6L not taken for minimum reactions). */
    public ProjectInfo(String jobNumber, String name, String address, String client, String edition,
                       UnitSystem units, boolean partitionAllowance, boolean reducePartitions) {
        this(jobNumber, name, address, client, edition, units, partitionAllowance, reducePartitions, false);
    }

    /** The snow inputs in the API's flat shape (the fields it reads, {@link SnowInput}); none without a snow site. */
    @JsonAnyGetter
    public java.util.Map<String, Object> snowFields() { return SnowInput.fields(snow); }

    public DesignOptions options() { return new DesignOptions(partitionAllowance, reducePartitions, upliftReducedDead); }

    private static String limited(String field, String v, int max) {
        if (v.length() > max) throw new InputError(field, v.length() + " characters", "must be at most " + max + " characters");
        return v;
    }
}
