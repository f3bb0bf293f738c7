package com.baysheet.issue;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;
import java.time.Instant;
import java.util.Comparator;
import java.util.stream.Stream;

/**
 * One server's folder for packages while they render, under a parent shared by every server of the machine
 * ({@code <temp>/baysheet-packages} unless given). The server holds a lock on the folder's {@value #LOCK} file for as
 * long as it runs; the operating system lets go of it when the process ends, however it ends. So, at start, a folder
 * whose lock can be taken is one a server killed mid-render left behind, and is emptied and removed; a folder still
 * locked belongs to a server that runs, and is left alone. Rendering to a file keeps a package of thousands of sheets
 * out of the heap (docs/benchmarks.md: the 500-member package is never held whole). A folder changed within the last
 * {@link #GRACE} is kept, locked or not, so that two servers starting together never remove each other's.
 */
final class RenderFolder implements AutoCloseable {
    static final String LOCK = ".in-use";
    /**
     * A folder touched this recently is left alone even unlocked: another server may be between making it and locking
     * it. A killed server's folder goes at the next start after that.
     */
    static final Duration GRACE = Duration.ofMinutes(1);
    private static final Logger LOG = LoggerFactory.getLogger(RenderFolder.class);

    private final Path dir;
    private final FileChannel channel;
    private final FileLock lock;

    private RenderFolder(Path dir, FileChannel channel, FileLock lock) {
        this.dir = dir;
        this.channel = channel;
        this.lock = lock;
    }

    /** The default parent: {@code baysheet-packages} in the JVM's temporary folder. */
    static Path defaultParent() { return Path.of(System.getProperty("java.io.tmpdir"), "baysheet-packages"); }

    /** Removes the folders of servers no longer running under {@code parent}, then makes and locks this server's own. */
    static RenderFolder open(Path parent, String owner) {
        try {
            Files.createDirectories(parent);
            sweep(parent);
            Path dir = Files.createTempDirectory(parent, owner.replaceAll("[^A-Za-z0-9._-]", "_") + "-");
            FileChannel ch = FileChannel.open(dir.resolve(LOCK), StandardOpenOption.CREATE, StandardOpenOption.WRITE);
            return new RenderFolder(dir, ch, ch.lock());
        } catch (IOException e) {
            throw new UncheckedIOException("the folder for rendering packages could not be made under " + parent, e);
        }
    }

    Path dir() { return dir; }

    /** A new empty file in this server's folder for one package. */
    Path newFile() throws IOException { return Files.createTempFile(dir, "package-", ".pdf"); }

    /** Lets go of the lock and removes the folder with anything left in it. */
    @Override
    public void close() {
        if (!channel.isOpen()) return;
        try {
            lock.release();
            channel.close();
        } catch (IOException e) {
            LOG.warn("the lock of {} could not be released: {}", dir, e.toString());
        }
        remove(dir);
    }

    private static void sweep(Path parent) throws IOException {
        try (DirectoryStream<Path> dirs = Files.newDirectoryStream(parent, Files::isDirectory)) {
            Instant before = Instant.now().minus(GRACE);
            for (Path d : dirs) if (Files.getLastModifiedTime(d).toInstant().isBefore(before) && abandoned(d)) remove(d);
        }
    }

    /** Whether no running server holds the folder's lock (a folder without a lock file was never finished: abandoned). */
    private static boolean abandoned(Path d) {
        Path lockFile = d.resolve(LOCK);
        if (!Files.exists(lockFile)) return true;
        try (FileChannel ch = FileChannel.open(lockFile, StandardOpenOption.WRITE)) {
            FileLock l = ch.tryLock();
            if (l == null) return false;
            l.release();
            return true;
        } catch (OverlappingFileLockException e) {
            return false; // held by another worker of this same process
        } catch (IOException e) {
            LOG.warn("could not tell whether {} is in use ({}); left alone", d, e.toString());
            return false;
        }
    }

    private static void remove(Path d) {
        try (Stream<Path> all = Files.walk(d)) {
            all.sorted(Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    LOG.warn("a rendered package's temporary file was left at {}: {}", p, e.toString());
                }
            });
        } catch (IOException e) {
            LOG.warn("could not remove {}: {}", d, e.toString());
        }
    }
}
