package com.baysheet.engine.load;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.Tolerances;
import com.baysheet.engine.code.MemberKind;

import java.util.List;

/**
 * What the engine needs to calculate one member, in the project's unit system base units.
 *
 * @param floorsSupported number of floors the member supports (1 for beams and girders)
 * @param strips          floor area tributary to a beam, giving line loads (beams only)
 * @param areas           area tributary to an axial member (columns only)
 * @param pointLoads      concentrated loads (beam reactions on a girder, loads from above on a column)
 * @param selfWeight      dead load of the member itself per length, plf or kN/m; for a column, of the column below the
 *                        level, whose weight is selfWeight × columnHeight
 * @param roofSlope       roof slope, in/ft (US) or percent (SI); NaN where no roof live load acts
 * @param stiffness       EI, lb·ft² (US) or kN·m² (SI); NaN for no deflection
 * @param onRoof          the member is at a roof level (occupiable roof rules, 4.8.3)
 * @param floors          columns only, optional: each floor supported with the column's kind there and its floor areas,
 *                        adding up, occupancy by occupancy, to the floor areas carried; empty for one K_LL throughout
 * @param selfWeightSource where the self weight comes from, printed beside it ("firm default for girders"); empty: not stated
 * @param columnHeight    columns only: the length of column whose self weight this member adds, ft or m; 0 for beams
 * @param lineLoads       beams only: uniform line loads along part of the span (cladding, walls), not areas
 * @param snow            the roof whose snow load the member's strips carry (with the project's snow site of the
 *                        context), or null: no snow on the strips (snow in point loads is carried either way)
 * @param openToSky       where the member (a beam or girder of a floor level, not a roof, or a column below one) carries
 *                        floor bays that no higher level covers, open to the sky yet with no roof live load and no
 *                        snow: each level's open bays as the record names them ("every bay of F2"); empty where none
 */
public record MemberInput(String subject, MemberKind kind, Support support, int floorsSupported,
                          List<AreaStrip> strips, List<AreaLoad> areas, List<PointLoad> pointLoads,
                          double selfWeight, double roofSlope, double stiffness, boolean onRoof,
                          List<SupportedFloor> floors, String selfWeightSource, double columnHeight,
                          List<LineLoad> lineLoads, SnowOnRoof snow, List<String> openToSky) {
    public MemberInput {
        Check.text("subject", subject);
        Check.present("kind", kind);
        Check.present("support", support);
        Check.atLeast("floorsSupported", floorsSupported, 1);
        strips = List.copyOf(strips);
        areas = List.copyOf(areas);
        pointLoads = List.copyOf(pointLoads);
        Check.nonNegative("selfWeight", selfWeight);
        if (!Double.isNaN(roofSlope)) Check.nonNegative("roofSlope", roofSlope);
        if (!Double.isNaN(stiffness)) Check.positive("stiffness", stiffness);
        boolean axial = support instanceof Support.Axial;
        if (axial != kind.isColumn())
            throw new InputError("support", support.getClass().getSimpleName(),
                    kind.isColumn() ? "a column takes axial support" : "a beam needs a simple, overhang or cantilever support");
        if (axial && !strips.isEmpty()) throw new InputError("strips", strips.size(), "a column takes areas, not strips");
        if (!axial && !areas.isEmpty()) throw new InputError("areas", areas.size(), "a beam takes strips, not areas");
        if (!axial && floorsSupported != 1) throw new InputError("floorsSupported", floorsSupported, "a beam supports one floor");
        double length = support.length();
        for (int i = 0; i < strips.size(); i++)
            if (strips.get(i).to() > length * (1 + Tolerances.WITHIN_LENGTH))
                throw new InputError("strips[" + i + "].to", strips.get(i).to(), "lies past the end of the member (" + length + ")");
        if (!axial)
            for (int i = 0; i < pointLoads.size(); i++)
                if (pointLoads.get(i).x() > length * (1 + Tolerances.WITHIN_LENGTH))
                    throw new InputError("pointLoads[" + i + "].x", pointLoads.get(i).x(), "lies off the member (length " + length + ")");
        selfWeightSource = selfWeightSource == null ? "" : selfWeightSource.strip();
        Check.nonNegative("columnHeight", columnHeight);
        if (!axial && columnHeight != 0) throw new InputError("columnHeight", columnHeight, "only a column has a column height");
        lineLoads = List.copyOf(Check.present("lineLoads", lineLoads));
        if (axial && !lineLoads.isEmpty()) throw new InputError("lineLoads", lineLoads.size(), "a column takes point loads, not line loads");
        for (int i = 0; i < lineLoads.size(); i++)
            if (lineLoads.get(i).to() > length * (1 + Tolerances.WITHIN_LENGTH))
                throw new InputError("lineLoads[" + i + "].to", lineLoads.get(i).to(), "lies past the end of the member (" + length + ")");
        if (strips.isEmpty() && areas.isEmpty() && pointLoads.isEmpty() && lineLoads.isEmpty())
            throw new InputError("loads", "none", "a member needs at least one strip, area or point load");
        floors = List.copyOf(Check.present("floors", floors));
        if (!floors.isEmpty()) {
            if (!axial) throw new InputError("floors", floors.size(), "only a column lists the floors it supports");
            if (floorsSupported != floors.size())
                throw new InputError("floorsSupported", floorsSupported, "must equal the number of floors listed (" + floors.size() + ")");
            java.util.Set<String> names = new java.util.HashSet<>();
            for (int i = 0; i < floors.size(); i++)
                if (!names.add(floors.get(i).name())) throw new InputError("floors[" + i + "].name", floors.get(i).name(), "two floors have this name");
        }
        openToSky = List.copyOf(openToSky == null ? List.of() : openToSky);
    }

    /** No bay open to the sky. */
    public MemberInput(String subject, MemberKind kind, Support support, int floorsSupported, List<AreaStrip> strips,
                       List<AreaLoad> areas, List<PointLoad> pointLoads, double selfWeight, double roofSlope,
                       double stiffness, boolean onRoof, List<SupportedFloor> floors, String selfWeightSource,
                       double columnHeight, List<LineLoad> lineLoads, SnowOnRoof snow) {
        this(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors,
                selfWeightSource, columnHeight, lineLoads, snow, List.of());
    }

    /** No self weight source stated, no column height, no line loads, no snow on the strips. */
    public MemberInput(String subject, MemberKind kind, Support support, int floorsSupported, List<AreaStrip> strips,
                       List<AreaLoad> areas, List<PointLoad> pointLoads, double selfWeight, double roofSlope,
                       double stiffness, boolean onRoof, List<SupportedFloor> floors) {
        this(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors,
                "", 0, List.of(), null);
    }

    /** No snow on the strips. */
    public MemberInput(String subject, MemberKind kind, Support support, int floorsSupported, List<AreaStrip> strips,
                       List<AreaLoad> areas, List<PointLoad> pointLoads, double selfWeight, double roofSlope,
                       double stiffness, boolean onRoof, List<SupportedFloor> floors, String selfWeightSource,
                       double columnHeight, List<LineLoad> lineLoads) {
        this(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors,
                selfWeightSource, columnHeight, lineLoads, null);
    }

    /** No self weight source stated, no column height, no line loads. */
    public MemberInput(String subject, MemberKind kind, Support support, int floorsSupported, List<AreaStrip> strips,
                       List<AreaLoad> areas, List<PointLoad> pointLoads, double selfWeight, double roofSlope,
                       double stiffness, boolean onRoof, List<SupportedFloor> floors, SnowOnRoof snow) {
        this(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors,
                "", 0, List.of(), snow);
    }

    /** One K_LL throughout: the member's own. */
    public MemberInput(String subject, MemberKind kind, Support support, int floorsSupported, List<AreaStrip> strips,
                       List<AreaLoad> areas, List<PointLoad> pointLoads, double selfWeight, double roofSlope,
                       double stiffness, boolean onRoof) {
        this(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, List.of());
    }

    /** A beam on simple supports carrying strips, with no point loads. */
    public static MemberInput beam(String subject, MemberKind kind, Support support, List<AreaStrip> strips) {
        return new MemberInput(subject, kind, support, 1, strips, List.of(), List.of(), 0, Double.NaN, Double.NaN, false);
    }

    /** A column carrying tributary areas over {@code floors} floors. */
    public static MemberInput column(String subject, MemberKind kind, int floors, List<AreaLoad> areas) {
        return new MemberInput(subject, kind, new Support.Axial(), floors, List.of(), areas, List.of(), 0, Double.NaN, Double.NaN, false);
    }

    public MemberInput withSubject(String s) {
        return new MemberInput(s, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors,
                selfWeightSource, columnHeight, lineLoads, snow, openToSky);
    }

    public MemberInput withRoofSlope(double slope) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, slope, stiffness, onRoof, floors,
                selfWeightSource, columnHeight, lineLoads, snow, openToSky);
    }

    public MemberInput withFloors(List<SupportedFloor> f) {
        return new MemberInput(subject, kind, support, f.isEmpty() ? floorsSupported : f.size(), strips, areas, pointLoads,
                selfWeight, roofSlope, stiffness, onRoof, f, selfWeightSource, columnHeight, lineLoads, snow, openToSky);
    }

    /** The member's own weight per length and where that figure comes from; for a column, over {@code height}. */
    public MemberInput withSelfWeight(double perLength, String source, double height) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, pointLoads, perLength, roofSlope, stiffness,
                onRoof, floors, source, height, lineLoads, snow, openToSky);
    }

    public MemberInput withLineLoads(List<LineLoad> loads) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness,
                onRoof, floors, selfWeightSource, columnHeight, loads, snow, openToSky);
    }

    public MemberInput withSnow(SnowOnRoof s) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness,
                onRoof, floors, selfWeightSource, columnHeight, lineLoads, s, openToSky);
    }

    /** The floor bays open to the sky this member carries, as the record names them (see {@code openToSky}). */
    public MemberInput withOpenToSky(List<String> bays) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness,
                onRoof, floors, selfWeightSource, columnHeight, lineLoads, snow, bays);
    }

    public MemberInput withPointLoads(List<PointLoad> loads) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, loads, selfWeight, roofSlope, stiffness, onRoof, floors,
                selfWeightSource, columnHeight, lineLoads, snow, openToSky);
    }
}
