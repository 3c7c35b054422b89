package barfit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import barfit.design.SolverOptions;
import barfit.serve.PageServer;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryMXBean;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * 200 design requests from 8 clients at once, each with its own cap, width and rate: every one answered
 * 200, each answer the same as the same request made alone, and the heap after the run within
 * {@link #GROWTH_BOUND_MB} of the heap before it (nothing kept per request).
 */
class ServeLoadTest {
    static final int REQUESTS = 200;
    static final int CLIENTS = 8;
    static final long GROWTH_BOUND_MB = 48;

    @Test
    void twoHundredRequestsFromEightClients(@TempDir Path dir) throws Exception {
        try (PageServer server = PageServer.start(
                new PageExplorer(ServeHttpTest.EXAMPLE, new SolverOptions(60, 1, 1), dir.resolve("kept")), 0, 2)) {
            HttpClient client = HttpClient.newHttpClient();
            String[] beams = {"F1-01", "F1-02", "F1-03"};
            List<String> bodies = new ArrayList<>();
            for (int i = 0; i < REQUESTS; i++) {
                bodies.add("{\"beam\": \"" + beams[i % 3] + "\", \"max_depth\": " + (500 + 25 * (i % 13))
                        + ", \"costs\": {\"main_bars_per_kg\": " + (1.2 + 0.1 * (i % 7)) + "}}");
            }
            // warm up, then measure the heap the server holds with nothing in flight
            send(client, server, bodies.get(0));
            long before = usedAfterGc();
            Map<String, String> answers = new ConcurrentHashMap<>();
            ExecutorService pool = Executors.newFixedThreadPool(CLIENTS);
            List<Future<Integer>> done = new ArrayList<>();
            for (String body : bodies) {
                done.add(pool.submit(() -> {
                    HttpResponse<String> r = send(client, server, body);
                    String earlier = answers.putIfAbsent(body, r.body());
                    assertTrue(earlier == null || earlier.equals(r.body()), "the same request, the same answer");
                    return r.statusCode();
                }));
            }
            for (Future<Integer> f : done) {
                assertEquals(200, f.get());
            }
            pool.shutdown();
            long after = usedAfterGc();
            long growthMb = (after - before) / (1024 * 1024);
            System.out.printf(
                    "serve load: %d requests, %d clients; heap used %d MB before, %d MB after%n",
                    REQUESTS, CLIENTS, before / (1024 * 1024), after / (1024 * 1024));
            assertTrue(growthMb < GROWTH_BOUND_MB, "heap grew by " + growthMb + " MB");
            // a sample answered alone equals the answer under load
            String sample = bodies.get(17);
            assertEquals(answers.get(sample), send(client, server, sample).body());
        }
    }

    static HttpResponse<String> send(HttpClient client, PageServer server, String body) throws Exception {
        return client.send(
                HttpRequest.newBuilder(URI.create(server.address() + "api/design"))
                        .header("Content-Type", "application/json")
                        .POST(HttpRequest.BodyPublishers.ofString(body))
                        .build(),
                HttpResponse.BodyHandlers.ofString());
    }

    static long usedAfterGc() throws InterruptedException {
        MemoryMXBean m = ManagementFactory.getMemoryMXBean();
        for (int i = 0; i < 3; i++) {
            System.gc();
            Thread.sleep(50);
        }
        return m.getHeapMemoryUsage().getUsed();
    }
}
