package com.baysheet.web;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;
import com.baysheet.framing.model.Bay;
import com.baysheet.project.StoredLevel;
import com.baysheet.project.StoredLineLoad;
import com.baysheet.store.StoredPointLoad;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/** The shapes the API answers with, where a stored or derived record does not serialise as the API reads it back. */
final class ApiViews {
    private ApiViews() {}

    /** roofShape, slippery and eaveToRidge (null where not given) only on a roof. */
    record LevelJson(long id, String name, double elevation, boolean roof, Double roofSlope, String roofShape, Boolean slippery,
                     Double eaveToRidge, Long typicalOf) {
        static LevelJson of(StoredLevel l) {
            var i = l.info();
            var s = i.surface();
            return new LevelJson(l.id(), l.name(), i.elevation(), i.roof(), i.roof() ? i.roofSlope() : null,
                    i.roof() ? s.shape().name() : null, i.roof() ? s.slippery() : null,
                    i.roof() && !Double.isNaN(s.eaveToRidge()) ? s.eaveToRidge() : null, l.typicalOf());
        }
    }

    /** A bay in the same shape the bay assignment takes; cantileverOccupancy null for the default balcony. */
    record BayJson(int col, int row, boolean opening, String occupancy, Double deadLoad, String beams, Integer infillBeams,
                   Map<String, Double> cantilevers, String cantileverOccupancy) {
        static BayJson of(Bay b) {
            if (b.opening()) return new BayJson(b.col(), b.row(), true, null, null, null, null, Map.of(), null);
            Map<String, Double> c = new TreeMap<>();
            b.cantilevers().forEach((s, v) -> c.put(s.name().toLowerCase(), v));
            return new BayJson(b.col(), b.row(), false, b.occupancy(), b.deadLoad(), b.framing().beams().name(),
                    b.framing().infillBeams(), c, b.cantileverOccupancy());
        }
    }

    /** A line load by its grid line names; deadPressure and height null unless the dead load was entered as cladding. */
    record LineLoadJson(long id, String axis, String line, String from, String to, String label, double dead,
                        Double deadPressure, Double height, double live, String liveOccupancy, boolean partitionWall) {
        static LineLoadJson of(StoredLineLoad l) {
            return new LineLoadJson(l.id(), l.axis(), l.line(), l.from(), l.to(), l.label(), l.dead(),
                    l.cladding() ? l.deadPressure() : null, l.cladding() ? l.height() : null, l.live(), l.liveOccupancy(),
                    l.partitionWall());
        }
    }

    /** A point load: where ("bay A-B/1-2" or "line 2, from A toward C"), x and y in a bay or distance on a member (else null). */
    record PointLoadJson(long id, String label, boolean inBay, String where, Double x, Double y, Double distance, double dead,
                         double live, String liveOccupancy) {
        static PointLoadJson of(StoredPointLoad p) {
            return new PointLoadJson(p.id(), p.label(), p.inBay(), p.where(), p.inBay() ? p.x() : null, p.inBay() ? p.y() : null,
                    p.inBay() ? null : p.distance(), p.dead(), p.live(), p.liveOccupancy());
        }
    }

    record MemberJson(String id, String name, String level, String role, String kind, double span, double tributaryWidth,
                      double tributaryArea, Map<String, Double> areas, List<String> bays, List<Entry> governing) {
        static MemberJson of(DerivedMember m) {
            return new MemberJson(m.id(), m.name(), m.level(), m.role().name(), m.kind().name(), m.span(),
                    m.tributaryWidth(), m.tributaryArea(), new TreeMap<>(m.areas()), m.bays(),
                    MemberRow.governing(m.result().record()));
        }
    }

    /** A member, its record, and its floor live load under each reduction method its project could choose (own first). */
    /** @param mark the typical member's mark the member is calculated under (its sheet's name) */
    record MemberDetail(MemberJson member, String mark, CalcRecord record,
                        java.util.List<com.baysheet.engine.member.MethodComparison.Row> methods) {}

    record TakeDownJson(String id, String gridPoint, List<TakeDown.Row> rows, CalcRecord record) {
        static TakeDownJson of(TakeDown t) { return new TakeDownJson(t.id(), t.gridPoint(), t.rows(), t.record()); }
    }

    record Saved(long version, Object saved) {}
}
