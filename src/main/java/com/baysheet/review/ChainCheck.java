package com.baysheet.review;

/**
 * What verifying the audit chain found: the entries checked, the head they end at, and the first entry that
 * does not match (its id, or 0 when the break is at the end: the stored head names an entry that is gone).
 *
 * @param brokenAt 0 when the chain holds; otherwise the id of the first entry whose stored hash is not the one recomputed
 */
public record ChainCheck(long entries, long headId, String headHash, long brokenAt, String why) {
    public boolean holds() { return why == null; }

    public static ChainCheck holds(long entries, long headId, String headHash) {
        return new ChainCheck(entries, headId, headHash, 0, null);
    }

    public static ChainCheck broken(long entries, long headId, String headHash, long at, String why) {
        return new ChainCheck(entries, headId, headHash, at, why);
    }
}
