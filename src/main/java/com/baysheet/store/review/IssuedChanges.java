package com.baysheet.store.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.Derived;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The issued sheets a change alters: each sheet with a revision in force (its latest issued one) whose fingerprint
 * as it would print differs between the model before the change and after it, or that the change removes. Such a
 * sheet is "changed since issue"; its issued revision stays current until the next is issued. Member sheets
 * checked before marks came in are history and are not counted.
 */
public final class IssuedChanges {
    /** How each sheet in force prints in one state of the model: by subject, its fingerprint (null: not in the model) and name. */
    public record Snapshot(Map<String, String> fingerprints, Map<String, String> names) {
        public static final Snapshot NONE = new Snapshot(Map.of(), Map.of());
    }

    private IssuedChanges() {}

    /** Whether the project has any mark sheet or package with an issued revision in force (if not, no change touches one). */
    public static boolean any(Connection c, long projectId) throws SQLException {
        return Revisions.inForce(c, projectId).stream().anyMatch(r -> counted(r.sheet()));
    }

    public static Snapshot snapshot(Connection c, long projectId, Derived d, MarkSheets marks) throws SQLException {
        Map<String, String> prints = new LinkedHashMap<>(), names = new LinkedHashMap<>();
        for (StoredRevision r : Revisions.inForce(c, projectId)) {
            // a row with no fingerprint (written by hand or by an old version) cannot be compared: left as it is
            if (!counted(r.sheet()) || r.revision().fingerprint() == null) continue;
            Optional<CalcRecord> now = current(d, marks, r.sheet());
            prints.put(r.sheet().subject(), now.map(CalcFingerprint::of).orElse(null));
            names.put(r.sheet().subject(), now.map(CalcRecord::subject).orElse(r.sheet().subject()));
        }
        return new Snapshot(prints, names);
    }

    /** The sheets in force as they were issued: comparing with it names every sheet changed since issue. */
    public static Snapshot asIssued(Connection c, long projectId) throws SQLException {
        Map<String, String> prints = new LinkedHashMap<>(), names = new LinkedHashMap<>();
        for (StoredRevision r : Revisions.inForce(c, projectId)) {
            if (!counted(r.sheet()) || r.revision().fingerprint() == null) continue;
            prints.put(r.sheet().subject(), r.revision().fingerprint());
            names.put(r.sheet().subject(), r.sheet().subject());
        }
        return new Snapshot(prints, names);
    }

    /** The names of the sheets in force whose print differs between the two states, as they print after (or before, if gone). */
    public static List<String> between(Snapshot before, Snapshot after) {
        List<String> out = new ArrayList<>();
        for (var e : after.fingerprints().entrySet())
            if (!before.fingerprints().containsKey(e.getKey()) || !Objects.equals(before.fingerprints().get(e.getKey()), e.getValue()))
                out.add(e.getValue() != null ? after.names().get(e.getKey()) : before.names().getOrDefault(e.getKey(), e.getKey()));
        return out;
    }

    /**
     * Withdraws the issued sheets the change removed (in force before, not in the model after): they are kept, no
     * longer in force, and stay withdrawn if their members come back. Returns their names as they printed.
     */
    public static List<String> withdrawGone(Connection c, long projectId, Snapshot before, Snapshot after, java.time.Instant at)
            throws SQLException {
        List<String> out = new ArrayList<>();
        for (var e : after.fingerprints().entrySet()) {
            if (e.getValue() != null || !before.fingerprints().containsKey(e.getKey())) continue;
            Revisions.withdraw(c, projectId, e.getKey(), at);
            out.add(before.names().getOrDefault(e.getKey(), e.getKey()));
        }
        return out;
    }

    /** The subjects of the project's sheets whose issued revision is withdrawn. */
    public static java.util.Set<String> withdrawn(Connection c, long projectId) throws SQLException {
        return Revisions.withdrawn(c, projectId);
    }

    /** Whether any sheet or package of the project was ever issued: such a project is not deleted. */
    public static boolean everIssued(Connection c, long projectId) throws SQLException {
        return Revisions.everIssued(c, projectId);
    }

    private static boolean counted(SheetRef ref) {
        return ref.isPackage() || MarkSheets.markId(ref.subject()).isPresent();
    }

    /** What the sheet prints now: a mark's record or a package's manifest; empty if the model no longer has it. */
    static Optional<CalcRecord> current(Derived d, MarkSheets marks, SheetRef ref) {
        if (ref.isPackage()) return PackageScope.ofSubject(d, ref.subject()).map(s -> PackageManifest.of(s, d, marks));
        return MarkSheets.markId(ref.subject()).flatMap(marks::byId).map(MarkSheets.MarkSheet::record);
    }
}
