package com.baysheet.engine;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/** The engine stays pure: no web framework, database, PDF, template engine or outer Baysheet layer (STYLE.md). */
class EngineArchitectureTest {
    static final Path ENGINE = Path.of("src/main/java/com/baysheet/engine");

    /** A reference to a forbidden package, by import or by its fully qualified name. */
    static final Pattern FORBIDDEN = Pattern.compile(
            "\\b(io\\.javalin|java\\.sql|javax\\.sql|com\\.lowagie|org\\.thymeleaf|org\\.openpdf|org\\.apache\\.pdfbox"
                    + "|com\\.baysheet\\.(web|store|sheet|review|framing))\\b");

    @Test
    void engineSourcesReferNoOuterLayerOrInfrastructure() throws IOException {
        List<String> violations = new ArrayList<>();
        List<Path> files;
        try (Stream<Path> s = Files.walk(ENGINE)) {
            files = s.filter(p -> p.toString().endsWith(".java")).toList();
        }
        assertThat(files).as("engine sources found under " + ENGINE.toAbsolutePath()).hasSizeGreaterThan(20);
        for (Path f : files) {
            List<String> lines = Files.readAllLines(f);
            for (int i = 0; i < lines.size(); i++)
                if (violates(lines.get(i))) violations.add(f + ":" + (i + 1) + ": " + lines.get(i).trim());
        }
        assertThat(violations).isEmpty();
    }

    @Test
    void scannerCatchesImportsAndQualifiedNames() {
        assertThat(violates("import io.javalin.http.Context;")).isTrue();
        assertThat(violates("import java.sql.Connection;")).isTrue();
        assertThat(violates("import javax.sql.DataSource;")).isTrue();
        assertThat(violates("import com.lowagie.text.Document;")).isTrue();
        assertThat(violates("import org.thymeleaf.TemplateEngine;")).isTrue();
        assertThat(violates("import org.apache.pdfbox.Loader;")).isTrue();
        assertThat(violates("    var b = new com.baysheet.framing.model.Bay();")).isTrue();
        assertThat(violates("import static com.baysheet.store.Db.open;")).isTrue();
        assertThat(violates("import com.baysheet.engine.record.Step;")).isFalse();
        assertThat(violates("import java.util.List;")).isFalse();
    }

    /** Comments may name what the engine avoids; code may not. */
    static boolean violates(String line) {
        String t = line.trim();
        if (t.startsWith("//") || t.startsWith("*") || t.startsWith("/*")) return false;
        return FORBIDDEN.matcher(t).find();
    }
}
