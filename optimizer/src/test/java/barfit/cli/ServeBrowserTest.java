package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.SolverOptions;
import barfit.serve.PageServer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The page in headless Chromium (driven over its DevTools protocol) against a running server: loaded, it shows
 * the design {@code design} gives at the file's cap; a new cap typed into the cap box changes the section,
 * the cost and the drawing on the page to what {@code design} gives at that cap; every request the page made
 * went to the server. Without Chromium on the PATH the test is skipped, except on CI, where it fails. With
 * {@code -Dserve.screenshot=FILE.png} it also writes the README's screenshot.
 */
class ServeBrowserTest {
    record Rendered(String state, double width, double height, double cost, String drawing, boolean drawn, int plots) {}

    private static final String READ = """
            (() => {
              const b = document.querySelector('.beam[data-id="F1-02"]');
              const img = document.querySelector('#drawings img');
              return {
                state: document.body.dataset.state,
                width: Number(b.dataset.width), height: Number(b.dataset.height), cost: Number(b.dataset.cost),
                drawing: decodeURIComponent(img.src.slice(img.src.indexOf(',') + 1)).slice(0, 4000),
                drawn: img.complete && img.naturalWidth > 0,
                plots: [...document.querySelectorAll('#curve img')].filter((i) => i.naturalWidth > 0).length
              };
            })()""";

    @Test
    void typingACapMovesTheDesignOnThePage(@TempDir Path dir) throws Exception {
        Path chromium = Chromium.required("the page");
        try (PageServer server = PageServer.start(
                        new PageExplorer(ServeHttpTest.EXAMPLE, new SolverOptions(60, 1, 1), dir.resolve("kept")),
                        0,
                        2);
                DevTools browser = DevTools.start(chromium, dir.resolve("chromium"))) {
            String origin = "http://127.0.0.1:" + server.port();
            browser.navigate(server.address() + "#beam=%22F1-02%22");
            browser.waitFor("document.body.dataset.state === 'ready'");
            Rendered atFile = read(browser);
            expect(design(dir, "max_depth: 500"), atFile);

            // the user selects the cap box and types 600, as on a keyboard
            browser.eval("(() => { const b = document.getElementById('max_depth'); b.focus(); b.select();"
                    + " document.body.dataset.state = 'typing'; return true; })()");
            browser.type("600");
            browser.waitFor("document.body.dataset.state === 'ready'");
            Rendered at600 = read(browser);
            expect(design(dir, "max_depth: 600"), at600);
            assertNotEquals(atFile.height(), at600.height(), "the cap changes the section on the page");
            assertNotEquals(atFile.drawing(), at600.drawing(), "and its drawing");
            assertEquals(
                    "600",
                    browser.eval("document.getElementById('cap-slider').value").asText());

            List<String> asked = browser.requestedUrls();
            for (String u : asked) {
                assertTrue(
                        u.startsWith(origin + "/") || u.startsWith("data:"),
                        "the page asked " + u + " (only " + origin + " expected)");
            }
            assertTrue(asked.contains(origin + "/api/explore") && asked.contains(origin + "/api/study"), "" + asked);

            String shot = System.getProperty("serve.screenshot");
            if (shot != null && !shot.isBlank()) {
                browser.eval("(() => { document.activeElement.blur(); window.scrollTo(0, 0); return true; })()");
                browser.screenshot(Path.of(shot), 1400, 1500);
                assertTrue(Files.size(Path.of(shot)) > 10_000, "a screenshot was written");
            }
        }
    }

    static Rendered read(DevTools browser) throws Exception {
        JsonNode v = browser.eval(READ);
        return new Rendered(
                v.get("state").asText(),
                v.get("width").asDouble(),
                v.get("height").asDouble(),
                v.get("cost").asDouble(),
                v.get("drawing").asText(),
                v.get("drawn").asBoolean(),
                v.get("plots").asInt());
    }

    static void expect(JsonNode design, Rendered r) {
        JsonNode b = design.get("beams").get(0);
        assertEquals("ready", r.state(), "the page finished: design, drawing, curve and comparison");
        assertEquals(b.get("width").asDouble(), r.width(), 1e-9);
        assertEquals(b.get("height").asDouble(), r.height(), 1e-9);
        assertEquals(b.get("cost").get("total").asDouble(), r.cost(), 1e-9);
        String size =
                (int) b.get("width").asDouble() + " × " + (int) b.get("height").asDouble();
        assertTrue(r.drawing().contains(size), "the drawing is of " + size + ": " + r.drawing());
        assertTrue(r.drawn(), "the browser drew the section");
        assertEquals(1, r.plots(), "the cost–depth curve is drawn on the page");
    }

    static JsonNode design(Path dir, String cap) throws Exception {
        Path copy = dir.resolve("copy-" + cap.replaceAll("\\W", "") + ".yaml");
        Files.writeString(
                copy,
                Files.readString(ServeHttpTest.EXAMPLE, StandardCharsets.UTF_8).replace("max_depth: 500", cap),
                StandardCharsets.UTF_8);
        Cli r = Cli.run("design", copy.toString(), "--format", "json", "--beam", "F1-02");
        assertEquals(0, r.exit(), r.err());
        return new ObjectMapper().readTree(r.out());
    }
}
