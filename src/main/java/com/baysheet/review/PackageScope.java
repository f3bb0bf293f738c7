package com.baysheet.review;

import com.baysheet.auth.Tokens;
import com.baysheet.framing.Derived;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.TakeDown;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Which calculation package: the whole project's, or one level's ({@code level} blank for the project).
 * A package is checked and issued like a member sheet, under the subject {@link #subject()}:
 * "package-project", or "package-level-" and the level's name made URL-safe.
 */
public record PackageScope(String level) {
    public static final PackageScope PROJECT = new PackageScope("");
    /** review_sheet.subject is VARCHAR(120): longer keys keep a readable start and a hash of the name. */
    private static final int MAX_KEY = 100;

    public PackageScope {
        level = level == null ? "" : level.strip();
    }

    public static PackageScope ofLevel(String level) {
        if (level == null || level.isBlank()) throw new IllegalArgumentException("level: a level package names its level");
        return new PackageScope(level);
    }

    public boolean isProject() { return level.isEmpty(); }

    /** As the package's title block and cover print it (the same words the package renderer uses). */
    public String title() { return isProject() ? "Project package" : level + " package"; }

    /** The part of the sheet's address after /packages/. */
    public String key() { return isProject() ? "project" : "level-" + urlSafe(level); }

    public String subject() { return SheetRef.PACKAGE_PREFIX + key(); }

    /** The mark sheets of the package: every mark with a location in its scope, in reading order. */
    public List<MarkSheets.MarkSheet> marks(Derived d, MarkSheets marks) {
        java.util.Set<String> in = new java.util.HashSet<>();
        for (DerivedMember m : members(d)) in.add(m.id());
        return marks.all().stream().filter(s -> s.group().memberIds().stream().anyMatch(in::contains)).toList();
    }

    /** The project's package, then one per level that has members, top down as derived. */
    public static List<PackageScope> all(Derived d) {
        List<PackageScope> out = new ArrayList<>();
        out.add(PROJECT);
        d.members().stream().map(DerivedMember::level).distinct().forEach(l -> out.add(ofLevel(l)));
        return out;
    }

    /** The package of this model with this key, if the model still has it. */
    public static Optional<PackageScope> find(Derived d, String key) {
        return all(d).stream().filter(s -> s.key().equals(key)).findFirst();
    }

    /** The package a stored sheet subject names, if it is a package of this model. */
    public static Optional<PackageScope> ofSubject(Derived d, String subject) {
        if (!subject.startsWith(SheetRef.PACKAGE_PREFIX)) return Optional.empty();
        return find(d, subject.substring(SheetRef.PACKAGE_PREFIX.length()));
    }

    public List<DerivedMember> members(Derived d) {
        return isProject() ? d.members() : d.onLevel(level);
    }

    /** The column take-downs the package prints: all of them, or those with a row at the level. */
    public List<TakeDown> takeDowns(Derived d) {
        if (isProject()) return d.takeDowns();
        return d.takeDowns().stream().filter(t -> t.rows().stream().anyMatch(r -> r.level().equals(level))).toList();
    }

    /**
     * Letters and digits as they are, a space as "-", every other byte of UTF-8 as "_" and two hex digits:
     * one name, one key, and no two names share one. A key too long for the store keeps its start and adds
     * "_x" and a SHA-256 of the name ("_x" never occurs otherwise, since x is not a hex digit).
     */
    static String urlSafe(String name) {
        StringBuilder b = new StringBuilder();
        for (byte c : name.getBytes(StandardCharsets.UTF_8)) {
            char ch = (char) (c & 0xff);
            if ((ch >= 'A' && ch <= 'Z') || (ch >= 'a' && ch <= 'z') || (ch >= '0' && ch <= '9')) b.append(ch);
            else if (ch == ' ') b.append('-');
            else b.append('_').append(String.format("%02x", c & 0xff));
        }
        if (b.length() <= MAX_KEY) return b.toString();
        return b.substring(0, MAX_KEY - 42) + "_x" + Tokens.sha256(name).substring(0, 40);
    }
}
