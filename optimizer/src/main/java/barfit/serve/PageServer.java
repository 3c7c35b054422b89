package barfit.serve;

import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.SecureRandom;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

/**
 * The page's server: loopback only, one page and its two assets, and the JSON addresses. Requests whose
 * Host is not the loopback address served are refused (a page elsewhere cannot reach it by a name that
 * resolves here), POSTs from another origin are refused, and keeping a file needs the run's token, which
 * only the page served here receives. Solving is limited to a few requests at a time; a request from a tab
 * that has since sent a newer one is answered "superseded" without solving.
 */
public final class PageServer implements AutoCloseable {
    /** The largest request body accepted, bytes: a request is a handful of controls. */
    public static final int MOST_BODY_BYTES = 16 * 1024;

    /** How long a request waits for a free solving slot before it is told the server is busy, s. */
    static final int WAIT_FOR_SLOT_SECONDS = 60;

    private static final int THREADS = 8;
    private static final int MOST_TABS = 1000;

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final SecureRandom RANDOM = new SecureRandom();

    static {
        JSON.getFactory()
                .setStreamReadConstraints(StreamReadConstraints.builder()
                        .maxNestingDepth(8)
                        .maxStringLength(MOST_BODY_BYTES)
                        .maxNumberLength(40)
                        .build());
    }

    private final Explorer explorer;
    private final HttpServer http;
    private final ExecutorService threads;
    private final Semaphore slots;
    private final String token;
    private final Page page;
    private final Map<String, Long> latestPerTab = new ConcurrentHashMap<>();
    private final AtomicLong served = new AtomicLong();

    private PageServer(Explorer explorer, HttpServer http, ExecutorService threads, int slots, String token) {
        this.explorer = explorer;
        this.http = http;
        this.threads = threads;
        this.slots = new Semaphore(slots, true);
        this.token = token;
        this.page = new Page(explorer.fileName(), token, explorer.caution());
    }

    /**
     * Starts serving on 127.0.0.1 at {@code port} (0: a free port chosen by the system).
     *
     * @param solving how many requests may solve at once (the cores to use)
     */
    public static PageServer start(Explorer explorer, int port, int solving) throws IOException {
        HttpServer http = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), port), 64);
        AtomicInteger n = new AtomicInteger();
        ExecutorService threads = Executors.newFixedThreadPool(THREADS, r -> {
            Thread t = new Thread(r, "barfit-page-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        byte[] raw = new byte[24];
        RANDOM.nextBytes(raw);
        PageServer s =
                new PageServer(explorer, http, threads, solving, HexFormat.of().formatHex(raw));
        http.createContext("/", s::handle);
        http.setExecutor(threads);
        http.start();
        return s;
    }

    public int port() {
        return http.getAddress().getPort();
    }

    /** The address to open in a browser. */
    public String address() {
        return "http://127.0.0.1:" + port() + "/";
    }

    /** The run's token for state-changing requests (the page gets it when it loads). */
    public String token() {
        return token;
    }

    /** Requests answered so far. */
    public long served() {
        return served.get();
    }

    @Override
    public void close() {
        http.stop(1);
        threads.shutdownNow();
        try {
            threads.awaitTermination(5, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private void handle(HttpExchange ex) throws IOException {
        try (ex) {
            served.incrementAndGet();
            if (!hostServed(ex.getRequestHeaders().getFirst("Host"))) {
                error(ex, 403, "this server answers only requests addressed to " + address());
                return;
            }
            String path = ex.getRequestURI().getRawPath();
            String method = ex.getRequestMethod();
            switch (path) {
                case "/" -> get(ex, method, () -> send(ex, 200, "text/html; charset=utf-8", page.html()));
                case "/page.js" ->
                    get(ex, method, () -> send(ex, 200, "text/javascript; charset=utf-8", Page.script()));
                case "/page.css" -> get(ex, method, () -> send(ex, 200, "text/css; charset=utf-8", Page.style()));
                case "/api/items" -> get(ex, method, () -> json(ex, 200, JSON.writeValueAsString(explorer.items())));
                case "/api/design" -> post(ex, method, false, c -> explorer.design(c));
                case "/api/explore" -> post(ex, method, false, c -> JSON.writeValueAsString(explorer.explore(c)));
                case "/api/study" -> post(ex, method, false, c -> JSON.writeValueAsString(explorer.study(c)));
                case "/api/keep" ->
                    post(ex, method, true, c -> {
                        ObjectNode o = JSON.createObjectNode();
                        o.put("written", explorer.keep(c));
                        return JSON.writeValueAsString(o);
                    });
                default -> error(ex, 404, "no such address; the page is at " + address());
            }
        } catch (RuntimeException e) {
            // the request is answered, whatever went wrong; the server goes on
            try {
                error(ex, 500, "the request failed: " + e.getClass().getSimpleName());
            } catch (IOException | RuntimeException ignored) {
                // the client has gone
            }
        }
    }

    private boolean hostServed(String host) {
        if (host == null) {
            return false;
        }
        String h = host.trim().toLowerCase(Locale.ROOT);
        return h.equals("127.0.0.1:" + port()) || h.equals("localhost:" + port());
    }

    private boolean originServed(String origin) {
        if (origin == null) {
            return true; // not a browser's cross-site request
        }
        String o = origin.trim().toLowerCase(Locale.ROOT);
        return o.equals("http://127.0.0.1:" + port()) || o.equals("http://localhost:" + port());
    }

    private interface Body {
        void send() throws IOException;
    }

    private interface Answer {
        String of(Controls c) throws IOException;
    }

    private void get(HttpExchange ex, String method, Body body) throws IOException {
        if (!method.equals("GET") && !method.equals("HEAD")) {
            ex.getResponseHeaders().set("Allow", "GET");
            error(ex, 405, "expected GET");
            return;
        }
        body.send();
    }

    private void post(HttpExchange ex, String method, boolean changesState, Answer answer) throws IOException {
        if (!method.equals("POST")) {
            ex.getResponseHeaders().set("Allow", "POST");
            error(ex, 405, "expected POST with a JSON body");
            return;
        }
        var h = ex.getRequestHeaders();
        if (!originServed(h.getFirst("Origin"))) {
            error(ex, 403, "requests from another site are refused");
            return;
        }
        String type = h.getFirst("Content-Type");
        if (type == null || !type.toLowerCase(Locale.ROOT).startsWith("application/json")) {
            error(ex, 415, "expected Content-Type: application/json");
            return;
        }
        if (changesState && !tokenMatches(h.getFirst("X-Barfit-Token"))) {
            error(ex, 403, "expected the page's token in the X-Barfit-Token header; reload the page");
            return;
        }
        byte[] raw = body(ex);
        if (raw == null) {
            error(ex, 413, "the request is larger than " + MOST_BODY_BYTES + " bytes");
            return;
        }
        Controls controls;
        try {
            JsonNode node = JSON.readTree(raw);
            controls = Controls.parse(node);
        } catch (ControlError e) {
            controlError(ex, e);
            return;
        } catch (IOException e) {
            error(ex, 400, "the body is not JSON; expected an object such as {\"beam\": \"B1\"}");
            return;
        }
        String tab = h.getFirst("X-Barfit-Tab");
        long seq = sequence(h.getFirst("X-Barfit-Seq"));
        if (tab != null && tab.length() <= 64 && seq >= 0) {
            if (latestPerTab.size() > MOST_TABS) {
                latestPerTab.clear();
            }
            latestPerTab.merge(tab, seq, Math::max);
        } else {
            tab = null;
        }
        boolean got;
        try {
            got = slots.tryAcquire(WAIT_FOR_SLOT_SECONDS, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            error(ex, 503, "the server is stopping");
            return;
        }
        if (!got) {
            error(ex, 503, "the server is busy; try again");
            return;
        }
        try {
            if (tab != null && latestPerTab.getOrDefault(tab, seq) > seq) {
                error(ex, 409, "superseded by a newer request from the same page");
                return;
            }
            String out = answer.of(controls);
            json(ex, 200, out);
        } catch (ControlError e) {
            controlError(ex, e);
        } finally {
            slots.release();
        }
    }

    private boolean tokenMatches(String given) {
        return given != null
                && MessageDigest.isEqual(
                        given.getBytes(StandardCharsets.UTF_8), token.getBytes(StandardCharsets.UTF_8));
    }

    private static long sequence(String s) {
        if (s == null || s.length() > 18) {
            return -1;
        }
        try {
            return Long.parseLong(s);
        } catch (NumberFormatException e) {
            return -1;
        }
    }

    /** The body, or null when it is larger than allowed. */
    private static byte[] body(HttpExchange ex) throws IOException {
        String length = ex.getRequestHeaders().getFirst("Content-Length");
        if (length != null) {
            try {
                if (Long.parseLong(length.trim()) > MOST_BODY_BYTES) {
                    return null;
                }
            } catch (NumberFormatException e) {
                return null;
            }
        }
        try (InputStream in = ex.getRequestBody()) {
            byte[] raw = in.readNBytes(MOST_BODY_BYTES + 1);
            return raw.length > MOST_BODY_BYTES ? null : raw;
        }
    }

    private void controlError(HttpExchange ex, ControlError e) throws IOException {
        ObjectNode o = JSON.createObjectNode();
        ObjectNode err = o.putArray("errors").addObject();
        err.put("control", e.control());
        err.put("message", e.getMessage());
        json(ex, 400, JSON.writeValueAsString(o));
    }

    private void error(HttpExchange ex, int status, String message) throws IOException {
        ObjectNode o = JSON.createObjectNode();
        o.put("error", message);
        json(ex, status, JSON.writeValueAsString(o));
    }

    private void json(HttpExchange ex, int status, String body) throws IOException {
        send(ex, status, "application/json; charset=utf-8", body);
    }

    private void send(HttpExchange ex, int status, String type, String body) throws IOException {
        byte[] raw = body.getBytes(StandardCharsets.UTF_8);
        var h = ex.getResponseHeaders();
        h.set("Content-Type", type);
        h.set("Cache-Control", "no-store");
        h.set("X-Content-Type-Options", "nosniff");
        h.set("Referrer-Policy", "no-referrer");
        h.set("X-Frame-Options", "DENY");
        h.set(
                "Content-Security-Policy",
                "default-src 'none'; script-src 'self'; style-src 'self'; img-src 'self' data:; connect-src 'self'; "
                        + "base-uri 'none'; form-action 'none'; frame-ancestors 'none'");
        boolean head = ex.getRequestMethod().equals("HEAD");
        ex.sendResponseHeaders(status, head ? -1 : raw.length);
        if (!head) {
            try (OutputStream out = ex.getResponseBody()) {
                out.write(raw);
            }
        }
    }
}
