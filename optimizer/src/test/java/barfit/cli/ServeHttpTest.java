package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.SolverOptions;
import barfit.serve.PageServer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every address of the page server over real HTTP on a free loopback port: valid, invalid, oversized, wrong
 * Host, wrong origin, missing token. A design request must answer exactly what {@code design --format json}
 * prints for the file so changed (the file is changed as text here, independently of the server's own edit).
 */
class ServeHttpTest {
    static final Path EXAMPLE = Path.of("../examples/design/clinic-beams-si.yaml");
    static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;

    static PageServer server;
    static HttpClient client;

    @BeforeAll
    static void start() throws IOException {
        server = PageServer.start(new PageExplorer(EXAMPLE, new SolverOptions(60, 1, 1), dir.resolve("kept")), 0, 2);
        client = HttpClient.newHttpClient();
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    static HttpResponse<String> post(String path, String body) throws Exception {
        return client.send(
                HttpRequest.newBuilder(URI.create(server.address() + path.substring(1)))
                        .header("Content-Type", "application/json")
                        .POST(HttpRequest.BodyPublishers.ofString(body))
                        .build(),
                HttpResponse.BodyHandlers.ofString());
    }

    static HttpResponse<String> get(String path) throws Exception {
        return client.send(
                HttpRequest.newBuilder(URI.create(server.address() + path.substring(1)))
                        .GET()
                        .build(),
                HttpResponse.BodyHandlers.ofString());
    }

    /** What {@code design --format json --beam ID} prints for a copy of the example with {@code from} replaced. */
    static String designOfCopy(String id, String from, String to) throws IOException {
        String text = Files.readString(EXAMPLE, StandardCharsets.UTF_8);
        assertTrue(from.isEmpty() || text.contains(from), "the example has " + from);
        Path copy = dir.resolve("copy-" + Math.abs((from + to).hashCode()) + ".yaml");
        Files.writeString(copy, from.isEmpty() ? text : text.replace(from, to), StandardCharsets.UTF_8);
        Cli r = Cli.run("design", copy.toString(), "--format", "json", "--beam", id);
        assertTrue(r.exit() == 0 || r.exit() == 1, r.err());
        return r.out();
    }

    @Test
    void thePageCarriesItsTokenAndNothingFromElsewhere() throws Exception {
        HttpResponse<String> page = get("/");
        assertEquals(200, page.statusCode());
        assertTrue(page.body().contains("content=\"" + server.token() + "\""), "the page gets the token");
        assertTrue(
                page.headers().firstValue("Content-Security-Policy").orElse("").contains("default-src 'none'"));
        for (String asset : List.of("/", "/page.js", "/page.css")) {
            String body = get(asset).body();
            // no absolute address: every request the page makes goes to the server that sent it
            assertFalse(
                    Pattern.compile("(https?:)?//[a-z0-9]", Pattern.CASE_INSENSITIVE)
                            .matcher(body.replaceAll("(?m)^\\s*//.*$", ""))
                            .find(),
                    asset + " names no other address");
        }
        JsonNode items = JSON.readTree(get("/api/items").body());
        assertEquals(3, items.get("items").size());
        assertEquals("F1-02", items.get("items").get(1).get("id").asText());
        assertEquals(500.0, items.get("items").get(1).get("max_depth").asDouble());
    }

    @Test
    void aDesignRequestAnswersWhatDesignPrintsForTheFileSoChanged() throws Exception {
        HttpResponse<String> plain = post("/api/design", "{\"beam\": \"F1-02\"}");
        assertEquals(200, plain.statusCode());
        assertEquals(designOfCopy("F1-02", "", ""), plain.body());

        HttpResponse<String> capped = post("/api/design", "{\"beam\": \"F1-02\", \"max_depth\": 600}");
        assertEquals(designOfCopy("F1-02", "max_depth: 500", "max_depth: 600"), capped.body());
        assertNotEquals(plain.body(), capped.body(), "the cap changes the design");

        HttpResponse<String> edited = post(
                "/api/design",
                "{\"beam\": \"F1-01\", \"widths\": [300, 350], \"fc\": 35, \"bar_sizes\": [\"19\", \"22\", \"25\"],"
                        + " \"costs\": {\"main_bars_per_kg\": 2.5}}");
        String expected =
                designOfCopy("F1-01", "concrete: {fc: 28, aggregate: 20}", "concrete: {fc: 35, aggregate: 20}");
        assertNotEquals(expected, edited.body(), "widths, bar sizes and rates changed too");
        Path copy = dir.resolve("all-edits.yaml");
        Files.writeString(
                copy,
                Files.readString(EXAMPLE, StandardCharsets.UTF_8)
                        .replace("concrete: {fc: 28, aggregate: 20}", "concrete: {fc: 35, aggregate: 20}")
                        .replace("widths: [250, 300, 350, 400]", "widths: [300, 350]")
                        .replace(
                                "bar_sizes: [\"16\", \"19\", \"22\", \"25\", \"29\", \"32\", \"36\"]",
                                "bar_sizes: [\"19\", \"22\", \"25\"]")
                        .replace("main_bars_per_kg: 1.5", "main_bars_per_kg: 2.5"),
                StandardCharsets.UTF_8);
        Cli r = Cli.run("design", copy.toString(), "--format", "json", "--beam", "F1-01");
        assertEquals(0, r.exit(), r.err());
        assertEquals(r.out(), edited.body());

        // removing the cap: the beam designed as if the file gave none
        HttpResponse<String> uncapped = post("/api/design", "{\"beam\": \"F1-02\", \"max_depth\": null}");
        assertEquals(designOfCopy("F1-02", "    max_depth: 500\n", ""), uncapped.body());
    }

    @Test
    void exploreAndStudyCarryTheDrawingTheCurveAndTheComparison() throws Exception {
        HttpResponse<String> r = post("/api/explore", "{\"beam\": \"F1-02\", \"max_depth\": 600}");
        assertEquals(200, r.statusCode());
        JsonNode o = JSON.readTree(r.body());
        JsonNode beam = o.get("design").get("beams").get(0);
        assertEquals(3, beam.get("alternatives").size(), "the page lists three next-cheapest designs");
        String svg = o.get("drawings").get(0).get("svg").asText();
        assertTrue(
                svg.startsWith("<svg")
                        && svg.contains("h = " + (int) beam.get("height").asDouble() + " mm"),
                svg);

        JsonNode s = JSON.readTree(
                post("/api/study", "{\"beam\": \"F1-02\", \"max_depth\": 600}").body());
        String curve = s.get("plots").get(0).get("svg").asText();
        assertTrue(curve.contains("headroom cap 600 mm"), "the cap is marked on the curve");
        assertTrue(s.get("compare").get("beams").get(0).get("options").size() >= 3);
        assertEquals(600.0, s.get("compare").get("beams").get(0).get("cap").asDouble(), "compare at the cap asked");
    }

    @Test
    void badValuesAreAnsweredBesideTheirControl() throws Exception {
        expectError("{\"beam\": \"F1-02\", \"fc\": 2}", "fc", "f'c between 17 and 140 MPa");
        expectError("{\"beam\": \"F1-02\", \"fc\": \"high\"}", "fc", "expected a number");
        expectError("{\"beam\": \"F1-02\", \"widths\": [1]}", "widths", "web width from 100 to 3000 mm");
        expectError("{\"beam\": \"F1-02\", \"widths\": []}", "widths", "expected a list of 1 to 40");
        expectError("{\"beam\": \"F1-02\", \"bar_sizes\": [\"99\"]}", "bar_sizes", "99");
        expectError("{\"beam\": \"F1-02\", \"costs\": {\"gold_per_kg\": 1}}", "costs", "gold_per_kg");
        expectError("{\"beam\": \"F1-02\", \"costs\": {\"main_bars_per_kg\": -1}}", "costs", "main_bars_per_kg");
        expectError("{\"beam\": \"F1-02\", \"max_depth\": 5}", "max_depth", "max_depth");
        expectError("{\"beam\": \"Z9\"}", "request", "no beam \"Z9\"");
        expectError("{\"beam\": \"F1-02\", \"line\": \"L1\"}", "request", "exactly one of");
        expectError("{\"beam\": \"F1-02\", \"colour\": 1}", "request", "unknown key \"colour\"");
        expectError("[1, 2]", "request", "JSON object");
        HttpResponse<String> notJson = post("/api/design", "{beam: F1-02");
        assertEquals(400, notJson.statusCode());
        assertTrue(notJson.body().contains("not JSON"), notJson.body());
        assertFalse(notJson.body().contains("Exception"), "no stack trace, no exception names");
    }

    static void expectError(String body, String control, String words) throws Exception {
        HttpResponse<String> r = post("/api/design", body);
        assertEquals(400, r.statusCode(), body + " -> " + r.body());
        JsonNode e = JSON.readTree(r.body()).get("errors").get(0);
        assertEquals(control, e.get("control").asText(), r.body());
        assertTrue(e.get("message").asText().contains(words), r.body());
        assertEquals(1, e.get("message").asText().lines().count(), "one line");
    }

    @Test
    void oversizedWrongMethodUnknownAddressAndWrongTypeAreRefused() throws Exception {
        String big = "{\"beam\": \"F1-02\", \"pad\": \"" + "x".repeat(PageServer.MOST_BODY_BYTES) + "\"}";
        assertEquals(413, post("/api/design", big).statusCode());
        assertEquals(405, get("/api/design").statusCode());
        assertEquals(404, get("/nothing-here").statusCode());
        HttpResponse<String> plain = client.send(
                HttpRequest.newBuilder(URI.create(server.address() + "api/design"))
                        .header("Content-Type", "text/plain")
                        .POST(HttpRequest.BodyPublishers.ofString("{\"beam\": \"F1-02\"}"))
                        .build(),
                HttpResponse.BodyHandlers.ofString());
        assertEquals(415, plain.statusCode(), "a form or plain-text post from another page is refused");
    }

    @Test
    void anotherHostOrOriginIsRefused() throws Exception {
        assertTrue(raw("GET / HTTP/1.1\r\nHost: example.test:" + server.port() + "\r\n\r\n")
                .startsWith("HTTP/1.1 403"));
        assertTrue(raw("GET / HTTP/1.1\r\nHost: 127.0.0.1.example.test\r\n\r\n").startsWith("HTTP/1.1 403"));
        assertTrue(raw("GET / HTTP/1.1\r\nHost: localhost:" + server.port() + "\r\n\r\n")
                .startsWith("HTTP/1.1 200"));
        String body = "{\"beam\": \"F1-02\"}";
        String fromElsewhere = raw("POST /api/design HTTP/1.1\r\nHost: 127.0.0.1:" + server.port()
                + "\r\nOrigin: http://example.test\r\nContent-Type: application/json\r\nContent-Length: "
                + body.length() + "\r\n\r\n" + body);
        assertTrue(fromElsewhere.startsWith("HTTP/1.1 403"), fromElsewhere);
    }

    /** One request over a plain socket (the HTTP client will not send another Host), the response's text. */
    static String raw(String request) throws IOException {
        try (Socket s = new Socket(InetAddress.getLoopbackAddress(), server.port())) {
            s.setSoTimeout(20_000);
            OutputStream out = s.getOutputStream();
            out.write((request.replace("HTTP/1.1\r\n", "HTTP/1.1\r\nConnection: close\r\n"))
                    .getBytes(StandardCharsets.UTF_8));
            out.flush();
            InputStream in = s.getInputStream();
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void keepNeedsTheTokenAndNeverWritesOverAFile() throws Exception {
        byte[] input = Files.readAllBytes(EXAMPLE);
        String body = "{\"beam\": \"F1-02\", \"max_depth\": 600}";
        assertEquals(403, post("/api/keep", body).statusCode(), "no token");
        HttpRequest.Builder keep = HttpRequest.newBuilder(URI.create(server.address() + "api/keep"))
                .header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString(body));
        assertEquals(
                403,
                client.send(
                                keep.copy()
                                        .header("X-Barfit-Token", "0".repeat(48))
                                        .build(),
                                HttpResponse.BodyHandlers.ofString())
                        .statusCode());
        HttpResponse<String> first = client.send(
                keep.copy().header("X-Barfit-Token", server.token()).build(), HttpResponse.BodyHandlers.ofString());
        HttpResponse<String> second = client.send(
                keep.copy().header("X-Barfit-Token", server.token()).build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(200, first.statusCode(), first.body());
        Path a = Path.of(JSON.readTree(first.body()).get("written").asText());
        Path b = Path.of(JSON.readTree(second.body()).get("written").asText());
        assertNotEquals(a, b, "a second keep writes a second file");
        assertEquals(dir.resolve("kept"), a.getParent());
        // the kept file is what design reads, and designs as the page did
        Cli r = Cli.run("design", a.toString(), "--format", "json");
        assertEquals(0, r.exit(), r.err());
        assertEquals(post("/api/design", body).body(), r.out());
        assertTrue(Files.readString(a).startsWith("# F1-02 as changed"), "says where it came from");
        assertEquals(
                new String(input, StandardCharsets.ISO_8859_1),
                new String(Files.readAllBytes(EXAMPLE), StandardCharsets.ISO_8859_1));
    }

    @Test
    void anOlderRequestFromTheSameTabIsSuperseded() throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(server.address() + "api/design"))
                .header("Content-Type", "application/json")
                .header("X-Barfit-Tab", "tab-a")
                .POST(HttpRequest.BodyPublishers.ofString("{\"beam\": \"F1-01\"}"));
        assertEquals(
                200,
                client.send(b.copy().header("X-Barfit-Seq", "5").build(), HttpResponse.BodyHandlers.ofString())
                        .statusCode());
        assertEquals(
                409,
                client.send(b.copy().header("X-Barfit-Seq", "3").build(), HttpResponse.BodyHandlers.ofString())
                        .statusCode());
        assertEquals(
                200,
                client.send(b.copy().header("X-Barfit-Seq", "6").build(), HttpResponse.BodyHandlers.ofString())
                        .statusCode());
    }

    @Test
    void theCommandRefusesBadInputAndABadPortInOneLine() {
        Cli badPort = Cli.run("serve", EXAMPLE.toString(), "--port", "70000");
        assertEquals(2, badPort.exit());
        assertTrue(badPort.err().contains("--port"), badPort.err());
        Cli missing = Cli.run("serve", "no-such-file.yaml", "--port", "0");
        assertEquals(2, missing.exit());
        assertEquals(1, missing.err().strip().lines().count(), missing.err());
        Matcher m = Pattern.compile("no-such-file\\.yaml").matcher(missing.err());
        assertTrue(m.find(), missing.err());
    }
}
