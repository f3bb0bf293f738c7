package com.baysheet.sheet;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.MemberLabel;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Framing plans from a derived model: one per level, with every member labelled by its mark or, without marks, by {@link MemberLabel}. */
public final class FramingPlans {
    private FramingPlans() {}

    /** The plans of the levels named, in the order given. */
    public static List<FramingPlan> of(Derived d, List<String> levels) { return of(d, levels, MemberLabels.PLACES); }

    /** The same with each member labelled as given (by its mark where the project has marks). */
    public static List<FramingPlan> of(Derived d, List<String> levels, MemberLabels labels) {
        List<FramingPlan> out = new ArrayList<>();
        for (String name : levels)
            d.building().levels().stream().filter(l -> l.name().equals(name)).findFirst().ifPresent(l -> out.add(of(d, l, labels)));
        return out;
    }

    static FramingPlan of(Derived d, Level level, MemberLabels labels) {
        Grid g = d.building().grid();
        UnitSystem sys = d.building().context().system();
        List<KeyPlan.GridLine> lines = new ArrayList<>();
        for (int i = 0; i < g.x().lines(); i++) lines.add(new KeyPlan.GridLine(g.x().name(i), true, g.x().position(i)));
        for (int j = 0; j < g.y().lines(); j++) lines.add(new KeyPlan.GridLine(g.y().name(j), false, g.y().position(j)));
        var catalogue = d.building().context().catalogue();
        List<FramingPlan.Bay> bays = new ArrayList<>();
        List<KeyPlan.Rect> openings = new ArrayList<>();
        List<FramingPlan.Cantilever> cants = new ArrayList<>();
        for (Bay b : level.bays()) {
            double x0 = g.x().position(b.col()), x1 = g.x().position(b.col() + 1), y0 = g.y().position(b.row()), y1 = g.y().position(b.row() + 1);
            KeyPlan.Rect r = new KeyPlan.Rect(x0, y0, x1, y1);
            if (b.opening()) { openings.add(r); continue; }
            bays.add(new FramingPlan.Bay(r, catalogue.contains(b.occupancy()) ? catalogue.get(b.occupancy()).name() : b.occupancy()));
            for (Map.Entry<Side, Double> c : b.cantilevers().entrySet()) {
                double len = c.getValue();
                KeyPlan.Rect slab = switch (c.getKey()) {
                    case SOUTH -> new KeyPlan.Rect(x0, y0 - len, x1, y0);
                    case NORTH -> new KeyPlan.Rect(x0, y1, x1, y1 + len);
                    case WEST -> new KeyPlan.Rect(x0 - len, y0, x0, y1);
                    case EAST -> new KeyPlan.Rect(x1, y0, x1 + len, y1);
                };
                cants.add(new FramingPlan.Cantilever(slab, len));
            }
        }
        List<FramingPlan.Member> members = new ArrayList<>();
        for (DerivedMember m : d.onLevel(level.name())) {
            var p = m.plan();
            members.add(new FramingPlan.Member(new KeyPlan.Line(p.x1(), p.y1(), p.x2(), p.y2()), m.role(), labels.of(m)));
        }
        List<FramingPlan.LoadLine> loads = new ArrayList<>();
        for (GridLineLoad l : d.building().lineLoads())
            if (l.level().equals(level.name())) loads.add(lineLoad(g, l, sys));
        return new FramingPlan(level.name(), sys, lines, bays, openings, cants, members, loads, List.of());
    }

    private static FramingPlan.LoadLine lineLoad(Grid g, GridLineLoad l, UnitSystem sys) {
        GridAxis own = l.onXLine() ? g.x() : g.y(), across = l.onXLine() ? g.y() : g.x();
        double at = own.position(l.line()), a = across.position(l.from()), b = across.position(l.to());
        KeyPlan.Line line = l.onXLine() ? new KeyPlan.Line(at, a, at, b) : new KeyPlan.Line(a, at, b, at);
        String unit = Quantity.LINE_LOAD.unit(sys).symbol();
        String text = l.label() + ": D " + Display.sig3(Quantity.LINE_LOAD.unit(sys).fromBase(l.dead())) + " " + unit
                + (l.live() > 0 ? ", L " + Display.sig3(Quantity.LINE_LOAD.unit(sys).fromBase(l.live())) + " " + unit : "");
        return new FramingPlan.LoadLine(line, text);
    }
}
