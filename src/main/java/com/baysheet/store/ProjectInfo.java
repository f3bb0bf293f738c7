package com.baysheet.store;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.units.UnitSystem;

/**
 * What a project is: the job and its people, the code edition, the unit system its numbers are in (fixed
 * once levels exist, since every stored length and load is in that system) and the design options.
 */
public record ProjectInfo(String jobNumber, String name, String address, String client, String edition,
                          UnitSystem units, boolean partitionAllowance, boolean reducePartitions,
                          boolean upliftReducedDead) {
    public ProjectInfo {
        jobNumber = limited("jobNumber", Check.text("jobNumber", jobNumber).strip(), 40);
        name = limited("name", Check.text("name", name).strip(), 200);
        address = limited("address", address == null ? "" : address.strip(), 400);
        client = limited("client", client == null ? "" : client.strip(), 200);
        Check.text("edition", edition);
        Editions.builtIn().get(edition);
        Check.present("units", units);
    }

    /** A project with the uplift option off (0.9D + 1.6L not taken for minimum reactions). */
    public ProjectInfo(String jobNumber, String name, String address, String client, String edition,
                       UnitSystem units, boolean partitionAllowance, boolean reducePartitions) {
        this(jobNumber, name, address, client, edition, units, partitionAllowance, reducePartitions, false);
    }

    public DesignOptions options() { return new DesignOptions(partitionAllowance, reducePartitions, upliftReducedDead); }

    private static String limited(String field, String v, int max) {
        if (v.length() > max) throw new InputError(field, v.length() + " characters", "must be at most " + max + " characters");
        return v;
    }
}
