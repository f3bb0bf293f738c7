package com.baysheet.sheet;

/**
 * A PDF held in memory with its SHA-256 (lower-case hex) and page count. The review workflow stores the
 * hash when a sheet is issued.
 */
public record RenderedPdf(byte[] bytes, String sha256, int pages) {}
