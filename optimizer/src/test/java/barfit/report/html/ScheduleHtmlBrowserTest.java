package barfit.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import barfit.design.span.SpanLayout;
import barfit.design.span.SpanProblem;
import barfit.schedule.ScheduleResult;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Renders the schedule report in headless Chromium and checks what a browser makes of it: every beam
 * block, every section drawing with its bar circles, a non-zero rendered size for every SVG, and no
 * script error. The checking script is added here, in the test; the report itself has none. Without
 * Chromium on the PATH the test is skipped, except on CI (environment variable CI set), where it fails.
 */
class ScheduleHtmlBrowserTest {
    private static final long TIMEOUT_SECONDS = 60;

    /** Counts what the browser rendered and writes it, as JSON, into the page for --dump-dom to show. */
    private static final String CHECKER = """
            <script>
            window.renderErrors = [];
            window.onerror = function (message) { window.renderErrors.push(String(message)); };
            window.addEventListener('load', function () {
              var out = { beams: [], svgs: 0, emptySvgs: [], emptyBars: 0, errors: window.renderErrors };
              try {
                document.querySelectorAll('svg').forEach(function (svg) {
                  var box = svg.getBoundingClientRect();
                  out.svgs++;
                  if (!(box.width > 0 && box.height > 0)) { out.emptySvgs.push(svg.getAttribute('class')); }
                });
                document.querySelectorAll('section.beam').forEach(function (beam) {
                  var b = { id: beam.id, drawings: [] };
                  beam.querySelectorAll('figure.section-pair').forEach(function (fig) {
                    var drawing = fig.querySelector('svg.section-drawing');
                    var bars = drawing ? drawing.querySelectorAll('circle.bar') : [];
                    bars.forEach(function (c) {
                      var bb = c.getBBox();
                      if (!(bb.width > 0 && bb.height > 0)) { out.emptyBars++; }
                    });
                    b.drawings.push({ place: fig.getAttribute('data-place'), bars: bars.length,
                      diagram: fig.querySelectorAll('svg.strain-stress').length });
                  });
                  out.beams.push(b);
                });
              } catch (e) {
                out.errors.push(String(e));
              }
              var pre = document.createElement('pre');
              pre.id = 'render-check';
              pre.textContent = JSON.stringify(out);
              document.body.appendChild(pre);
            });
            </script>
            """;

    @Test
    void chromiumRendersEveryBeamAndDrawing(@TempDir Path dir) throws Exception {
        Path chromium = barfit.cli.Chromium.required("the report");
        ScheduleResult r = ScheduleFixtures.withRenderingFixtures(ScheduleFixtures.designed(ScheduleHtmlTest.EXAMPLE));
        String html = ScheduleHtml.render(r);
        int body = html.indexOf("<body>") + "<body>".length();
        Path page = dir.resolve("report.html");
        Files.writeString(
                page, html.substring(0, body) + "\n" + CHECKER + html.substring(body), StandardCharsets.UTF_8);

        JsonNode out = new ObjectMapper().readTree(dump(chromium, dir, page));
        assertEquals(0, out.get("errors").size(), "no script error: " + out.get("errors"));
        assertEquals(0, out.get("emptySvgs").size(), "every SVG has a rendered size: " + out.get("emptySvgs"));
        assertEquals(0, out.get("emptyBars").asInt(), "every bar circle has a rendered size");
        int sections = 0;
        JsonNode beams = out.get("beams");
        assertEquals(r.beams().size(), beams.size(), "one block per beam");
        for (int i = 0; i < r.beams().size(); i++) {
            ScheduleResult.Beam b = r.beams().get(i);
            JsonNode rendered = beams.get(i);
            assertEquals("beam-" + b.beam().id(), rendered.get("id").asText());
            SpanProblem p = b.outcome().problem();
            SpanLayout l = b.outcome().best().layout();
            List<SpanProblem.Place> places =
                    new ArrayList<>(b.outcome().best().report().sections().keySet());
            assertEquals(
                    places.size(), rendered.get("drawings").size(), b.beam().id() + ": one drawing per section");
            for (int k = 0; k < places.size(); k++) {
                JsonNode d = rendered.get("drawings").get(k);
                assertEquals(places.get(k).name(), d.get("place").asText());
                assertEquals(
                        SpanLayout.sum(l.topAt(p, places.get(k))) + l.bottomCount(),
                        d.get("bars").asInt(),
                        b.beam().id() + " " + places.get(k) + ": every bar rendered");
                assertEquals(1, d.get("diagram").asInt());
                sections++;
            }
        }
        // each section has its drawing and its diagram, and the page has the price-of-standardisation plot
        assertEquals(2 * sections + 1, out.get("svgs").asInt());
    }

    /** Runs headless Chromium on the page and returns the checker's JSON from the dumped DOM. */
    private static String dump(Path chromium, Path dir, Path page) throws Exception {
        Path stdout = dir.resolve("dom.html");
        Path stderr = dir.resolve("chromium.log");
        List<String> cmd = barfit.cli.Chromium.command(chromium, dir.resolve("profile"));
        cmd.addAll(
                List.of("--virtual-time-budget=5000", "--dump-dom", page.toUri().toString()));
        ProcessBuilder pb = new ProcessBuilder(cmd);
        pb.redirectOutput(stdout.toFile());
        pb.redirectError(stderr.toFile());
        Process proc = pb.start();
        if (!proc.waitFor(TIMEOUT_SECONDS, TimeUnit.SECONDS)) {
            proc.descendants().forEach(ProcessHandle::destroyForcibly);
            proc.destroyForcibly();
            fail("chromium did not finish within " + TIMEOUT_SECONDS + " s");
        }
        String dom = Files.readString(stdout, StandardCharsets.UTF_8);
        Matcher m = Pattern.compile("<pre id=\"render-check\">(.*?)</pre>", Pattern.DOTALL)
                .matcher(dom);
        assertTrue(
                m.find(),
                "the checker wrote its result (exit " + proc.exitValue() + "): "
                        + Files.readString(stderr, StandardCharsets.UTF_8)
                                .lines()
                                .limit(5)
                                .toList());
        return m.group(1)
                .replace("&lt;", "<")
                .replace("&gt;", ">")
                .replace("&quot;", "\"")
                .replace("&amp;", "&");
    }
}
