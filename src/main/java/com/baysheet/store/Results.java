package com.baysheet.store;

import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Building;
import com.baysheet.project.Model;
import com.baysheet.project.Project;
import com.baysheet.review.MarkSheets;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * Derived results, recomputed on read and cached by project id, project version and firm catalogue
 * version. Every change to a project bumps its version in the same transaction, so a key names exactly
 * one state of the model and an entry can never be stale; old entries simply age out.
 */
public final class Results {
    /** Enough for the projects a small office has open at once; each entry is one derived building. */
    private static final int CACHE_SIZE = 16;
    /** A model read races a concurrent save at most this often before we derive without caching. */
    private static final int READ_ATTEMPTS = 3;

    /** The firm's settings version is part of the key: the firm's self weights load every project. */
    private record Key(long project, long version, long catalogue, long firm) {}

    /** A project's model and what was derived from it. */
    public record Computed(Model model, Derived derived) {
        public Project project() { return model.project(); }
    }

    private final Sql sql;
    private final Function<Building, Derived> derive;
    private final Map<Key, Computed> cache = new LinkedHashMap<>(CACHE_SIZE, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Key, Computed> eldest) { return size() > CACHE_SIZE; }
    };

    /** The marks a model write gave the building it derived, at the count of mark renames then committed. */
    private record Marked(Computed computed, long renames, MarkSheets marks) {}

    /** The last write's marks of each project, held for as many projects as the cache. */
    private final Map<Long, Marked> marked = new LinkedHashMap<>(CACHE_SIZE, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<Long, Marked> eldest) { return size() > CACHE_SIZE; }
    };

    public Results(Sql sql, Function<Building, Derived> derive) {
        this.sql = sql;
        this.derive = derive;
    }

    public Computed of(long projectId) {
        for (int attempt = 1; ; attempt++) {
            Computed hit = cached(sql.tx(c -> key(c, projectId)));
            if (hit != null) return hit;
            Model m = sql.tx(c -> BuildingMapper.load(c, projectId));
            Key read = new Key(projectId, m.project().version(), m.catalogueVersion(), m.firmVersion());
            Computed computed = new Computed(m, derive(m.building()));
            if (read.equals(sql.tx(c -> key(c, projectId)))) {
                hold(read, computed);
                return computed;
            }
            if (attempt == READ_ATTEMPTS) return computed;
        }
    }

    /** Keeps a building derived from a committed model (by a model write), so that reading it does not derive it again. */
    void offer(Computed c) {
        Model m = c.model();
        hold(new Key(m.project().id(), m.project().version(), m.catalogueVersion(), m.firmVersion()), c);
    }

    /**
     * Holds a building under its key, and lets go of the project's buildings of earlier versions: versions only grow, so
     * no read asks for those again, and a run of saves to one project would otherwise fill the cache with its past
     * states (16 derived buildings of one large project, past a 1 GB heap at 7 levels of the varied benchmark plan).
     */
    private void hold(Key k, Computed c) {
        synchronized (cache) {
            cache.keySet().removeIf(o -> o.project() == k.project() && !o.equals(k)
                    && o.version() <= k.version() && o.catalogue() <= k.catalogue() && o.firm() <= k.firm());
            cache.put(k, c);
        }
    }

    /**
     * As {@link #offer(Computed)}, with the marks the write gave the building ({@code MarkWrites.reconcile}) and the count of
     * mark renames committed with it: a page of this building at that count has exactly these marks.
     */
    void offer(Computed c, MarkSheets marks, long renames) {
        offer(c);
        synchronized (cache) { marked.put(c.project().id(), new Marked(c, renames, marks)); }
    }

    /** The marks a model write gave this very building, if it was the project's last write and no mark was renamed since; else null. */
    MarkSheets marks(Computed c, long renames) {
        synchronized (cache) {
            Marked m = marked.get(c.project().id());
            return m != null && m.computed() == c && m.renames() == renames ? m.marks() : null;
        }
    }

    static long firmVersion(Connection c) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT version FROM firm_setting WHERE id = 1").mapTo(Long.class).findFirst().orElse(0L);
        }
    }

    /**
     * Whether this is the building held for its own versions: then it was read whole at them (a result read
     * while a save raced it is handed out but never held), so whatever is rendered from it is exactly of them.
     */
    public boolean kept(Computed c) {
        Model m = c.model();
        synchronized (cache) { return cache.get(new Key(m.project().id(), m.project().version(), m.catalogueVersion(), m.firmVersion())) == c; }
    }

    /** The model held for exactly these versions of its project, or null. */
    Model modelAt(ProjectVersions.Version v) {
        Computed c = cached(new Key(v.project(), v.model(), v.catalogue(), v.firm()));
        return c == null ? null : c.model();
    }

    /** How many derived buildings are held, for tests of the cache. */
    public int cachedCount() {
        synchronized (cache) { return cache.size(); }
    }

    private Derived derive(Building b) {
        return b.levels().isEmpty() ? new Derived(b, List.of(), List.of()) : derive.apply(b);
    }

    private Computed cached(Key k) {
        synchronized (cache) { return cache.get(k); }
    }

    private static Key key(Connection c, long projectId) {
        return new Key(projectId, modelVersion(c, projectId), OccupancyStore.catalogueVersion(c), firmVersion(c));
    }

    /** The project's version alone (every model write bumps it); not found when there is no such project. */
    static long modelVersion(Connection c, long projectId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT version FROM project WHERE id = :id").bind("id", projectId).mapTo(Long.class)
                    .findOne().orElseThrow(() -> new NotFound("project", projectId));
        }
    }
}
