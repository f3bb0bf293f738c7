package com.baysheet.web;

import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Kept pages, least recently used first out, bounded by how many and by their bytes together; a page larger
 * than {@code maxPageBytes} is never kept (it is rendered each time rather than push out the others).
 */
final class PageLru<K> {
    private final int maxPages;
    private final long maxBytes;
    private final long maxPageBytes;
    private final LinkedHashMap<K, KeptPage> pages = new LinkedHashMap<>(16, 0.75f, true);
    private long bytes;

    PageLru(int maxPages, long maxBytes, long maxPageBytes) {
        if (maxPages < 1 || maxBytes < 1 || maxPageBytes < 1 || maxPageBytes > maxBytes)
            throw new IllegalArgumentException("page cache bounds: " + maxPages + " pages, " + maxBytes + " bytes, "
                    + maxPageBytes + " bytes a page");
        this.maxPages = maxPages;
        this.maxBytes = maxBytes;
        this.maxPageBytes = maxPageBytes;
    }

    synchronized KeptPage get(K key) {
        return pages.get(key);
    }

    /** Keeps the page (unless it is too large), putting out the least recently used until both bounds hold. */
    synchronized void put(K key, KeptPage page) {
        if (page.size() > maxPageBytes) return;
        KeptPage old = pages.put(key, page);
        if (old != null) bytes -= old.size();
        bytes += page.size();
        Iterator<Map.Entry<K, KeptPage>> eldest = pages.entrySet().iterator();
        while ((pages.size() > maxPages || bytes > maxBytes) && eldest.hasNext()) {
            bytes -= eldest.next().getValue().size();
            eldest.remove();
        }
    }

    synchronized int count() { return pages.size(); }

    synchronized long bytes() { return bytes; }
}
