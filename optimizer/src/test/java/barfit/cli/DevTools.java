package barfit.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.net.http.WebSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionStage;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Headless Chromium driven over its DevTools protocol (a WebSocket, JDK client): navigate, evaluate script in
 * the page, type into it, record the page's network requests and take a screenshot. For the browser tests.
 */
final class DevTools implements AutoCloseable {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final long WAIT_SECONDS = 60;

    private final Process chromium;
    private final WebSocket socket;
    private final AtomicInteger ids = new AtomicInteger();
    private final Map<Integer, CompletableFuture<JsonNode>> waiting = new ConcurrentHashMap<>();
    private final List<JsonNode> requests = Collections.synchronizedList(new ArrayList<>());

    private DevTools(Process chromium, WebSocket socket) {
        this.chromium = chromium;
        this.socket = socket;
    }

    /** Starts Chromium on a blank page and attaches to that page. */
    static DevTools start(Path chromium, Path dir) throws Exception {
        Files.createDirectories(dir);
        Path err = dir.resolve("chromium.log");
        List<String> cmd = Chromium.command(chromium, dir.resolve("profile"));
        cmd.addAll(List.of("--hide-scrollbars", "--remote-debugging-port=0", "about:blank"));
        ProcessBuilder pb = new ProcessBuilder(cmd);
        pb.redirectOutput(dir.resolve("chromium.out").toFile());
        pb.redirectError(err.toFile());
        Process p = pb.start();
        Pattern listening = Pattern.compile("DevTools listening on ws://127\\.0\\.0\\.1:(\\d+)/");
        long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(WAIT_SECONDS);
        String port = null;
        while (port == null && System.nanoTime() < until && p.isAlive()) {
            Matcher m = listening.matcher(Files.readString(err, StandardCharsets.UTF_8));
            if (m.find()) {
                port = m.group(1);
            } else {
                Thread.sleep(100);
            }
        }
        if (port == null) {
            p.descendants().forEach(ProcessHandle::destroyForcibly);
            p.destroyForcibly();
            throw new IOException("chromium did not open its DevTools port: "
                    + Files.readString(err, StandardCharsets.UTF_8)
                            .lines()
                            .limit(5)
                            .toList());
        }
        HttpClient http = HttpClient.newHttpClient();
        JsonNode targets = JSON.readTree(http.send(
                        HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + "/json/list"))
                                .build(),
                        HttpResponse.BodyHandlers.ofString())
                .body());
        String page = null;
        for (JsonNode t : targets) {
            if (t.get("type").asText().equals("page")) {
                page = t.get("webSocketDebuggerUrl").asText();
            }
        }
        if (page == null) {
            throw new IOException("chromium has no page to attach to: " + targets);
        }
        DevTools[] self = new DevTools[1];
        WebSocket ws = http.newWebSocketBuilder()
                .buildAsync(URI.create(page), new WebSocket.Listener() {
                    private final StringBuilder frame = new StringBuilder();

                    @Override
                    public CompletionStage<?> onText(WebSocket w, CharSequence data, boolean last) {
                        frame.append(data);
                        if (last) {
                            String text = frame.toString();
                            frame.setLength(0);
                            if (self[0] != null) {
                                self[0].received(text);
                            }
                        }
                        w.request(1);
                        return null;
                    }
                })
                .get(WAIT_SECONDS, TimeUnit.SECONDS);
        self[0] = new DevTools(p, ws);
        self[0].call("Network.enable", JSON.createObjectNode());
        self[0].call("Page.enable", JSON.createObjectNode());
        return self[0];
    }

    private void received(String text) {
        try {
            JsonNode m = JSON.readTree(text);
            if (m.has("id")) {
                CompletableFuture<JsonNode> f = waiting.remove(m.get("id").asInt());
                if (f != null) {
                    f.complete(m);
                }
            } else if ("Network.requestWillBeSent".equals(m.path("method").asText())) {
                requests.add(m.get("params"));
            }
        } catch (IOException e) {
            // a frame that is not JSON: not ours to read
        }
    }

    JsonNode call(String method, ObjectNode params) throws Exception {
        int id = ids.incrementAndGet();
        CompletableFuture<JsonNode> f = new CompletableFuture<>();
        waiting.put(id, f);
        ObjectNode m = JSON.createObjectNode();
        m.put("id", id);
        m.put("method", method);
        m.set("params", params);
        socket.sendText(JSON.writeValueAsString(m), true).get(WAIT_SECONDS, TimeUnit.SECONDS);
        JsonNode r = f.get(WAIT_SECONDS, TimeUnit.SECONDS);
        if (r.has("error")) {
            throw new IOException(method + ": " + r.get("error"));
        }
        return r.get("result");
    }

    void navigate(String url) throws Exception {
        ObjectNode p = JSON.createObjectNode();
        p.put("url", url);
        call("Page.navigate", p);
    }

    /** The value of a script expression in the page (awaited if a promise), as JSON. */
    JsonNode eval(String expression) throws Exception {
        ObjectNode p = JSON.createObjectNode();
        p.put("expression", expression);
        p.put("returnByValue", true);
        p.put("awaitPromise", true);
        JsonNode r = call("Runtime.evaluate", p);
        if (r.has("exceptionDetails")) {
            throw new IOException("the page's script failed: " + r.get("exceptionDetails"));
        }
        return r.get("result").get("value");
    }

    /** Waits until the expression is true in the page. */
    void waitFor(String expression) throws Exception {
        long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(WAIT_SECONDS);
        while (System.nanoTime() < until) {
            // a page still loading may have no body yet: false until the expression can be read
            JsonNode v = eval("(() => { try { return Boolean(" + expression + "); } catch (e) { return false; } })()");
            if (v != null && v.asBoolean()) {
                return;
            }
            Thread.sleep(100);
        }
        throw new IOException("the page did not reach " + expression + " within " + WAIT_SECONDS + " s");
    }

    /** Types text into the focused element as a keyboard would (input events from the browser). */
    void type(String text) throws Exception {
        ObjectNode p = JSON.createObjectNode();
        p.put("text", text);
        call("Input.insertText", p);
    }

    /** The URLs of every request the page has made. */
    List<String> requestedUrls() {
        synchronized (requests) {
            return requests.stream()
                    .map(r -> r.get("request").get("url").asText())
                    .toList();
        }
    }

    void screenshot(Path png, int width, int height) throws Exception {
        ObjectNode size = JSON.createObjectNode();
        size.put("width", width);
        size.put("height", height);
        size.put("deviceScaleFactor", 1);
        size.put("mobile", false);
        call("Emulation.setDeviceMetricsOverride", size);
        JsonNode shot = call("Page.captureScreenshot", JSON.createObjectNode().put("format", "png"));
        Files.write(png, java.util.Base64.getDecoder().decode(shot.get("data").asText()));
    }

    @Override
    public void close() {
        socket.abort();
        chromium.descendants().forEach(ProcessHandle::destroyForcibly);
        chromium.destroyForcibly();
        try {
            chromium.waitFor(10, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
