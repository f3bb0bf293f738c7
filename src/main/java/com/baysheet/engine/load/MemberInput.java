package com.baysheet.engine.load;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.MemberKind;

import java.util.List;

/**
 * What the engine needs to calculate one member, in the project's unit system base units.
 *
 * @param floorsSupported number of floors the member supports (1 for beams and girders)
 * @param strips          floor area tributary to a beam, giving line loads (beams only)
 * @param areas           area tributary to an axial member (columns only)
 * @param pointLoads      concentrated loads (beam reactions on a girder, loads from above on a column)
 * @param selfWeight      dead line load of the member itself, plf or kN/m (0 for columns)
 * @param roofSlope       roof slope, in/ft (US) or percent (SI); NaN where no roof live load acts
 * @param stiffness       EI, lb·ft² (US) or kN·m² (SI); NaN for no deflection
 * @param onRoof          the member is at a roof level (occupiable roof rules, 4.8.3)
 * @param floors          columns only, optional: each floor supported with the column's kind there and its floor areas,
 *                        adding up, occupancy by occupancy, to the floor areas carried; empty for one K_LL throughout
 * @param snow            the roof whose snow load the member's strips carry (with the project's snow site of the
 *                        context), or null: no snow on the strips (snow in point loads is carried either way)
 */
public record MemberInput(String subject, MemberKind kind, Support support, int floorsSupported,
                          List<AreaStrip> strips, List<AreaLoad> areas, List<PointLoad> pointLoads,
                          double selfWeight, double roofSlope, double stiffness, boolean onRoof,
                          List<SupportedFloor> floors, SnowOnRoof snow) {
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
            if (strips.get(i).to() > length * (1 + 1e-9))
                throw new InputError("strips[" + i + "].to", strips.get(i).to(), "lies past the end of the member (" + length + ")");
        if (!axial)
            for (int i = 0; i < pointLoads.size(); i++)
                if (pointLoads.get(i).x() > length * (1 + 1e-9))
                    throw new InputError("pointLoads[" + i + "].x", pointLoads.get(i).x(), "lies off the member (length " + length + ")");
        if (strips.isEmpty() && areas.isEmpty() && pointLoads.isEmpty())
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
    }

    /** No snow on the strips. */
    public MemberInput(String subject, MemberKind kind, Support support, int floorsSupported, List<AreaStrip> strips,
                       List<AreaLoad> areas, List<PointLoad> pointLoads, double selfWeight, double roofSlope,
                       double stiffness, boolean onRoof, List<SupportedFloor> floors) {
        this(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors, null);
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
        return new MemberInput(s, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors, snow);
    }

    public MemberInput withRoofSlope(double slope) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, slope, stiffness, onRoof, floors, snow);
    }

    public MemberInput withFloors(List<SupportedFloor> f) {
        return new MemberInput(subject, kind, support, f.isEmpty() ? floorsSupported : f.size(), strips, areas, pointLoads,
                selfWeight, roofSlope, stiffness, onRoof, f, snow);
    }

    public MemberInput withSnow(SnowOnRoof s) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, pointLoads, selfWeight, roofSlope, stiffness, onRoof, floors, s);
    }

    public MemberInput withPointLoads(List<PointLoad> loads) {
        return new MemberInput(subject, kind, support, floorsSupported, strips, areas, loads, selfWeight, roofSlope, stiffness, onRoof, floors, snow);
    }
}
