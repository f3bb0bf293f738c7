package com.baysheet.web;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The stylesheet and page scripts: every file of the project's static/ folder served as it is, with its type and a
 * tag a browser revalidates with (304), to anyone (no login), HEAD as GET without the body; names that are not a
 * plain file of a known type, or of no file, are a 404.
 */
class StaticFilesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    private static final HttpClient ANONYMOUS = HttpClient.newHttpClient();

    private static HttpResponse<byte[]> fetch(String method, String path, String ifNoneMatch) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(server.base() + path)).method(method, HttpRequest.BodyPublishers.noBody());
        if (ifNoneMatch != null) b.header("If-None-Match", ifNoneMatch);
        return ANONYMOUS.send(b.build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    private static List<Path> files() throws IOException {
        try (Stream<Path> s = Files.list(Path.of("static"))) {
            return s.filter(Files::isRegularFile).sorted().toList();
        }
    }

    @Test
    void everyFileOfTheStaticFolderIsServedAsItIsWithItsTypeToAnyone() throws Exception {
        assertThat(files()).isNotEmpty();
        for (Path f : files()) {
            HttpResponse<byte[]> r = fetch("GET", "/static/" + f.getFileName(), null);
            assertThat(r.statusCode()).as("%s", f).isEqualTo(200);
            assertThat(r.body()).as("%s", f).isEqualTo(Files.readAllBytes(f));
            String type = f.toString().endsWith(".css") ? "text/css" : "text/javascript";
            assertThat(r.headers().firstValue("Content-Type")).as("%s", f).hasValue(type + "; charset=utf-8");
            assertThat(r.headers().firstValue("ETag")).as("%s", f).hasValueSatisfying(t -> assertThat(t).matches("\"[0-9a-f]{24}\""));
        }
    }

    @Test
    void aBrowserWithTheFilesTagIsToldItIsUnchangedAndAnotherTagGetsTheFile() throws Exception {
        HttpResponse<byte[]> first = fetch("GET", "/static/baysheet.css", null);
        String tag = first.headers().firstValue("ETag").orElseThrow();
        HttpResponse<byte[]> again = fetch("GET", "/static/baysheet.css", tag);
        assertThat(again.statusCode()).isEqualTo(304);
        assertThat(again.body()).isEmpty();
        assertThat(fetch("GET", "/static/baysheet.css", "\"0123456789abcdef01234567\"").statusCode()).isEqualTo(200);
        // each file its own tag
        assertThat(fetch("GET", "/static/queue.js", null).headers().firstValue("ETag")).isNotEqualTo(first.headers().firstValue("ETag"));
    }

    @Test
    void headAnswersAsGetWithoutTheBody() throws Exception {
        HttpResponse<byte[]> r = fetch("HEAD", "/static/bays.js", null);
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Length")).hasValue(String.valueOf(Files.size(Path.of("static/bays.js"))));
        assertThat(r.body()).isEmpty();
    }

    @Test
    void namesOfNoFileOrNotAPlainFileOfAKnownTypeAreNotFound() throws Exception {
        for (String path : List.of("/static/no-such-file.css", "/static/..%2Fpom.xml", "/static/%2E%2E%2Fdb", "/static/baysheet.CSS",
                "/static/baysheet.css.bak", "/static/.hidden.css", "/static/"))
            assertThat(fetch("GET", path, null).statusCode()).as(path).isEqualTo(404);
    }
}
