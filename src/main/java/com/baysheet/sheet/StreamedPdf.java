package com.baysheet.sheet;

/** What is known of a PDF written to a stream: its SHA-256 (lower-case hex), length in bytes and page count. */
public record StreamedPdf(String sha256, long length, int pages) {}
