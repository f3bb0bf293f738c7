package com.baysheet.store;

import com.baysheet.framing.Derived;
import com.baysheet.framing.model.Building;

import javax.sql.DataSource;
import java.time.Clock;
import java.util.function.Function;

/** All of the store over one database, wired once. */
public record Store(ProjectStore projects, GridStore grids, LevelStore levels, BayStore bays,
                    OccupancyStore occupancies, Results results, LineLoadStore lineLoads,
                    com.baysheet.store.review.MarkBook marks, PointLoadStore pointLoads, SelfWeightStore selfWeights,
                    TypicalLevels typicals, ModelExport exports, ModelImport imports,
                    UnitConversion conversions, LayoutImport layouts, DeletedItems deleted,
                    ProjectVersions versions) {

    /**
     * @param derive the framing derivation, run to validate each model change, to supersede what it changes
     *               and to compute results
     * @param clock  the time every row the store writes is stamped with
     */
    public static Store on(DataSource ds, Function<Building, Derived> derive, Clock clock) {
        Sql sql = new Sql(ds, clock);
        Results results = new Results(sql, derive);
        ModelWrites writes = new ModelWrites(sql, derive, results);
        OccupancyStore occupancies = new OccupancyStore(sql);
        return new Store(new ProjectStore(writes), new GridStore(writes), new LevelStore(writes),
                new BayStore(writes, occupancies), occupancies, results,
                new LineLoadStore(writes), new com.baysheet.store.review.MarkBook(sql),
                new PointLoadStore(writes), new SelfWeightStore(writes), new TypicalLevels(writes), new ModelExport(sql),
                new ModelImport(writes), new UnitConversion(writes), new LayoutImport(writes), new DeletedItems(writes),
                new ProjectVersions(sql, results));
    }
}
