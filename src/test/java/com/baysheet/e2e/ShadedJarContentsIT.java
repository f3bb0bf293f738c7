package com.baysheet.e2e;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Everything the build put in target/classes (our classes, templates, static files, migrations, demo data)
 * is in the shipped jar, byte for byte: neither the jar plugin's default excludes (it leaves out files named
 * package.html unless told otherwise) nor the shade plugin's filters and merging (where a dependency's file
 * of the same path could win) may drop or replace a file of ours. Service files are merged by the shade
 * plugin, so for those every line of ours must be in the jar's.
 */
class ShadedJarContentsIT {
    private static final Path CLASSES = Path.of("target", "classes");

    @Test
    void everyFileOfOursIsInTheJarUnchanged() throws IOException {
        List<String> missing = new ArrayList<>();
        List<String> changed = new ArrayList<>();
        List<Path> files;
        try (Stream<Path> s = Files.walk(CLASSES)) {
            files = s.filter(Files::isRegularFile).toList();
        }
        assertThat(files).as("files under " + CLASSES).isNotEmpty();
        try (ZipFile jar = new ZipFile(ChildServer.jar().toFile())) {
            for (Path f : files) {
                String name = CLASSES.relativize(f).toString().replace('\\', '/');
                ZipEntry e = jar.getEntry(name);
                if (e == null) {
                    missing.add(name);
                    continue;
                }
                byte[] ours = Files.readAllBytes(f);
                byte[] shipped = jar.getInputStream(e).readAllBytes();
                boolean same = name.startsWith("META-INF/services/")
                        ? new String(shipped).lines().toList().containsAll(new String(ours).lines().toList())
                        : Arrays.equals(ours, shipped);
                if (!same) changed.add(name);
            }
        }
        System.out.printf("shaded jar: %d files of target/classes checked, %d missing, %d changed%n",
                files.size(), missing.size(), changed.size());
        assertThat(missing).as("files of target/classes missing from the jar").isEmpty();
        assertThat(changed).as("files of target/classes that the jar holds with other content").isEmpty();
        assertThat(files).as("the templates are among them").anyMatch(f -> f.endsWith(Path.of("templates", "review", "package.html")));
    }
}
