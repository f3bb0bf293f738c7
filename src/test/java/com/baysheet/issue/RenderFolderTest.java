package com.baysheet.issue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The folders packages render into: a folder a killed server left (its lock let go) is removed at the next start,
 * with the half-written package in it; a running server's (locked) is kept, as is one made moments ago; each server
 * removes its own when it stops.
 */
class RenderFolderTest {
    @TempDir
    Path parent;

    @Test
    void aFolderAKilledServerLeftIsRemovedAtTheNextStart() throws IOException {
        Path left = Files.createDirectory(parent.resolve("host-1234-abcd-1"));
        Files.createFile(left.resolve(RenderFolder.LOCK)); // nobody holds it: its server has gone
        Files.write(left.resolve("package-1.pdf"), "%PDF-1.4 half a package".getBytes());
        old(left);

        try (RenderFolder mine = RenderFolder.open(parent, "host-5678-efgh")) {
            assertThat(left).doesNotExist();
            assertThat(mine.dir()).exists().hasParent(parent);
            assertThat(mine.newFile()).hasParent(mine.dir());
        }
    }

    @Test
    void aRunningServersFolderIsKeptAndEachRemovesItsOwnAtStop() throws IOException {
        RenderFolder other = RenderFolder.open(parent, "other");
        Path busy = Files.write(other.newFile(), "%PDF-1.4 rendering".getBytes());
        old(other.dir());
        try (RenderFolder mine = RenderFolder.open(parent, "mine")) {
            assertThat(busy).as("its lock is held").exists();
            Path mineDir = mine.dir();
            mine.close();
            assertThat(mineDir).doesNotExist();
            assertThat(busy).as("one server's stop leaves the other's be").exists();
        }
        other.close();
        assertThat(other.dir()).doesNotExist();
    }

    @Test
    void aFolderMadeMomentsAgoIsKeptEvenBeforeItIsLocked() throws IOException {
        Path starting = Files.createDirectory(parent.resolve("host-9-starting")); // its lock not made yet
        try (RenderFolder mine = RenderFolder.open(parent, "mine")) {
            assertThat(starting).exists();
        }
    }

    /** Last changed well before the grace period. */
    private static void old(Path dir) throws IOException {
        Files.setLastModifiedTime(dir, FileTime.from(Instant.now().minus(RenderFolder.GRACE.multipliedBy(2))));
    }
}
