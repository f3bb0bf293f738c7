package com.baysheet.store;

import com.baysheet.auth.Tokens;
import org.h2.tools.Server;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.SQLException;
import java.util.List;
import java.util.Optional;

/**
 * How {@code baysheet backup} reaches the embedded database while the server holds its file: the server opens an
 * H2 TCP listener for this machine only (H2 refuses other hosts unless told to allow them), on a free port, that
 * opens nothing but this database, and only to a client naming a random key (any other name is refused as a
 * wrong login; {@code -ifExists}: no database is ever created through it). Port and key are written to
 * {@link #FILE} in the data directory, readable by the owner alone: whoever can read it can read the database
 * file itself. Closing the server stops the listener and removes the file.
 */
public final class BackupPort implements AutoCloseable {
    static final String FILE = "baysheet.backup-port";

    private final Server server;
    private final Path file;

    private BackupPort(Server server, Path file) {
        this.server = server;
        this.file = file;
    }

    public static BackupPort open(Path dataDir) throws IOException {
        String key = Tokens.random();
        Server s;
        try {
            s = Server.createTcpServer("-tcpPort", "0", "-ifExists", "-tcpDaemon", "-key", key, Backups.databasePath(dataDir)).start();
        } catch (SQLException e) {
            throw new StoreFailure(e);
        }
        Path f = dataDir.resolve(FILE);
        Files.deleteIfExists(f);
        if (FileSystems.getDefault().supportedFileAttributeViews().contains("posix"))
            Files.createFile(f, PosixFilePermissions.asFileAttribute(PosixFilePermissions.fromString("rw-------")));
        Files.writeString(f, s.getPort() + "\n" + key + "\n", StandardCharsets.US_ASCII);
        return new BackupPort(s, f);
    }

    /** The JDBC URL a running server's listener answers on, if the data directory says one is running. */
    static Optional<String> url(Path dataDir) throws IOException {
        Path f = dataDir.resolve(FILE);
        if (!Files.isRegularFile(f)) return Optional.empty();
        List<String> lines = Files.readAllLines(f, StandardCharsets.US_ASCII);
        if (lines.size() < 2 || !lines.get(0).matches("\\d{1,5}")) return Optional.empty();
        return Optional.of("jdbc:h2:tcp://127.0.0.1:" + lines.get(0) + "/" + lines.get(1).strip());
    }

    @Override
    public void close() {
        server.stop();
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            // a stale file only makes the next backup try the port first, then the file
        }
    }
}
