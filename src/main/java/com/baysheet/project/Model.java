package com.baysheet.project;

import com.baysheet.framing.model.Building;

import java.util.List;

/**
 * A project's framing model as read in one go: the project (with the version it was read at), the
 * building for derivation, the levels in order with their ids, and the names of levels left out of the
 * building because they have no floor yet (no bays, or only openings), and the version of the firm's settings
 * read with it (their self weights load the building).
 */
public record Model(Project project, long catalogueVersion, Building building, List<StoredLevel> levels,
                    List<String> unframed, long firmVersion) {
    public Model {
        levels = List.copyOf(levels);
        unframed = List.copyOf(unframed);
    }
}
