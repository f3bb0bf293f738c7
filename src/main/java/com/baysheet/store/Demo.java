package com.baysheet.store;

import com.baysheet.project.Project;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * Loads the invented demo projects of demo-data/ (listed in demo-data/index.json) through the same store
 * calls and validation a user's entries go through. Bays are assigned in file order, so a file lists
 * cantilevers after the bays that make their edge an edge, and a level's line and point loads after its bays; a
 * project's own self weights by role, where the file gives them, are set first.
 */
public final class Demo {
    private static final ObjectMapper JSON = new ObjectMapper();

    private Demo() {}

    /** Loads the demo into an empty database; returns the new projects, or nothing when projects exist already. */
    public static List<Project> loadIfEmpty(Store store) {
        if (!store.projects().findAll().isEmpty()) return List.of();
        JsonNode index = read("demo-data/index.json");
        for (JsonNode o : index.path("firmOccupancies")) store.occupancies().add(Editor.DEMO, ModelJson.firmOccupancy(o));
        List<Project> out = new ArrayList<>();
        for (JsonNode file : index.path("projects")) out.add(loadProject(store, read("demo-data/" + file.asText())));
        return out;
    }

    static Project loadProject(Store store, JsonNode p) {
        Project made = store.projects().create(Editor.DEMO, ModelJson.project(p.path("project")));
        long id = made.id();
        JsonNode sub = p.path("submittal");
        if (!sub.isMissingNode())
            store.projects().submittals().save(Editor.DEMO, id, version(store, id), new com.baysheet.framing.model.Submittal(made.info().address(),
                    made.info().client(), sub.path("engineerOfRecord").asText(""), sub.path("licenceNumber").asText(""),
                    sub.path("licenceState").asText(""), sub.path("buildingCode").asText(""), sub.path("codeYear").asText("")));
        JsonNode own = p.path("selfWeights");
        if (own.isObject())
            store.selfWeights().set(Editor.DEMO, id, version(store, id), new ProjectSelfWeights(own.path("infillBeam").asDouble(),
                    own.path("gridBeam").asDouble(), own.path("girder").asDouble(), own.path("column").asDouble()));
        store.grids().save(Editor.DEMO, id, version(store, id), ModelJson.grid(p.path("grid")));
        for (JsonNode l : p.path("levels")) {
            long levelId = store.levels().add(Editor.DEMO, id, version(store, id), ModelJson.level(l)).id();
            for (JsonNode b : l.path("bays")) store.bays().assign(Editor.DEMO, id, version(store, id), levelId, ModelJson.bays(b, store.grids().find(id)));
            for (JsonNode w : l.path("lineLoads")) store.lineLoads().add(Editor.DEMO, id, version(store, id), levelId, ModelJson.lineLoad(w));
            for (JsonNode w : l.path("pointLoads")) store.pointLoads().add(Editor.DEMO, id, version(store, id), levelId, ModelJson.pointLoad(w));
        }
        return store.projects().find(id);
    }

    private static long version(Store store, long id) {
        return store.projects().find(id).version();
    }

    private static JsonNode read(String resource) {
        try (InputStream in = Demo.class.getClassLoader().getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("missing demo resource " + resource);
            return JSON.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
