package com.baysheet.web.review;

import com.baysheet.sheet.signing.SignatureCheck;

import java.util.List;

/**
 * What /verify concludes from the two checks of an upload: whether its SHA-256 is that of an issued revision stored
 * here, and whether its signature is intact and this office's. Only both together say the file is as issued: a
 * stored hash alone could have been written into the database with the file, and a signature alone says the office
 * signed it, not that the revision is on record. A file as issued may no longer stand: the headline then says it was
 * superseded (and which revision is current) or withdrawn, since a superseded sheet must not be built from.
 *
 * @param verified both checks pass
 * @param inForce every matching revision is its sheet's revision in force
 */
public record Verdict(String headline, boolean verified, boolean inForce, SignatureCheck signature) {
    static Verdict of(List<IssuedMatch> matches, SignatureCheck sig) {
        boolean stored = !matches.isEmpty(), ours = sig.status() == SignatureCheck.Status.OFFICE;
        String headline = stored && ours ? "Matches an issued revision, signed by this office"
                : stored ? "Not verified: the file matches a stored revision, but its signature is not this office's"
                : ours ? "Signed by this office, but no issued revision here is this file"
                : "No match";
        List<String> standing = matches.stream().map(IssuedMatch::standing).filter(s -> !s.isEmpty()).distinct().toList();
        if (!standing.isEmpty()) headline += "; " + String.join("; ", standing);
        return new Verdict(headline, stored && ours, matches.stream().allMatch(IssuedMatch::inForce), sig);
    }

    /** The signature's state in a few words. */
    public String signatureState() {
        return switch (signature.status()) {
            case OFFICE -> "intact, made with this office's key";
            case OTHER_KEY -> "intact, but made with a key that is not this office's";
            case BROKEN -> "broken: " + signature.why();
            case UNSIGNED -> "none: " + signature.why();
        };
    }
}
