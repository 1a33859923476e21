package org.nullpath.report;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.net.http.WebSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionStage;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * Test helper: Debian's Chromium in headless mode, driven over its DevTools protocol (a WebSocket on
 * the loopback interface, opened with the JDK's own HTTP client). It records what a page reports while
 * it loads: console errors and assertions, uncaught exceptions, error-level log entries (failed
 * resource loads among them), failed loads, and every URL the page requests.
 */
final class HeadlessChromium implements AutoCloseable {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Pattern LISTENING = Pattern.compile("DevTools listening on (ws://[^\\s]+)");

    private final Process process;
    private final Path profile;
    private final WebSocket socket;
    private final AtomicInteger ids = new AtomicInteger();
    private final Map<Integer, CompletableFuture<JsonNode>> pending = new ConcurrentHashMap<>();
    private final List<JsonNode> events = new ArrayList<>();

    /** The Chromium executable on PATH or at /usr/bin/chromium; null when there is none. */
    static Path find() {
        String path = System.getenv("PATH");
        List<Path> candidates = new ArrayList<>();
        if (path != null) {
            for (String dir : path.split(java.io.File.pathSeparator)) {
                if (!dir.isEmpty()) {
                    candidates.add(Path.of(dir, "chromium"));
                }
            }
        }
        candidates.add(Path.of("/usr/bin/chromium"));
        for (Path p : candidates) {
            if (Files.isRegularFile(p) && Files.isExecutable(p)) {
                return p;
            }
        }
        return null;
    }

    private HeadlessChromium(Process process, Path profile, WebSocket socket) {
        this.process = process;
        this.profile = profile;
        this.socket = socket;
    }

    /** Starts Chromium with a new empty profile and connects to its first page. */
    static HeadlessChromium start(Path executable, int width, int height) throws IOException, InterruptedException {
        Path profile = Files.createTempDirectory("nullpath-chromium-");
        ProcessBuilder pb = new ProcessBuilder(executable.toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + profile, "--remote-debugging-address=127.0.0.1",
                "--remote-debugging-port=0", "--hide-scrollbars", "--window-size=" + width + "," + height,
                "about:blank");
        pb.redirectOutput(ProcessBuilder.Redirect.DISCARD);
        Process p = pb.start();
        try {
            BufferedReader err = new BufferedReader(new InputStreamReader(p.getErrorStream(), StandardCharsets.UTF_8));
            CompletableFuture<String> browserUrl = new CompletableFuture<>();
            Thread drain = new Thread(() -> {
                try {
                    String line;
                    while ((line = err.readLine()) != null) {
                        Matcher m = LISTENING.matcher(line);
                        if (m.find()) {
                            browserUrl.complete(m.group(1));
                        }
                    }
                } catch (IOException e) {
                    // the process ended
                }
                browserUrl.complete(null);
            }, "chromium-stderr");
            drain.setDaemon(true);
            drain.start();
            String ws = browserUrl.get(90, TimeUnit.SECONDS);
            if (ws == null) {
                throw new IOException("chromium exited before it opened its DevTools endpoint");
            }
            URI browser = URI.create(ws);
            HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(20)).build();
            HttpResponse<String> list = http.send(HttpRequest.newBuilder(
                            URI.create("http://" + browser.getHost() + ":" + browser.getPort() + "/json/list")).build(),
                    HttpResponse.BodyHandlers.ofString());
            String pageUrl = null;
            for (JsonNode t : JSON.readTree(list.body())) {
                if ("page".equals(t.path("type").asText())) {
                    pageUrl = t.path("webSocketDebuggerUrl").asText();
                    break;
                }
            }
            if (pageUrl == null) {
                throw new IOException("chromium shows no page target: " + list.body());
            }
            HeadlessChromium[] self = new HeadlessChromium[1];
            Listener listener = new Listener(self);
            WebSocket socket = http.newWebSocketBuilder().connectTimeout(Duration.ofSeconds(20))
                    .buildAsync(URI.create(pageUrl), listener).get(30, TimeUnit.SECONDS);
            self[0] = new HeadlessChromium(p, profile, socket);
            listener.ready.complete(null);
            return self[0];
        } catch (Exception e) {
            p.destroyForcibly();
            p.waitFor(20, TimeUnit.SECONDS);
            deleteTree(profile);
            if (e instanceof IOException io) {
                throw io;
            }
            throw new IOException("cannot drive chromium: " + e, e);
        }
    }

    private static final class Listener implements WebSocket.Listener {
        private final HeadlessChromium[] owner;
        private final CompletableFuture<Void> ready = new CompletableFuture<>();
        private final StringBuilder text = new StringBuilder();

        Listener(HeadlessChromium[] owner) {
            this.owner = owner;
        }

        @Override
        public CompletionStage<?> onText(WebSocket ws, CharSequence data, boolean last) {
            text.append(data);
            if (last) {
                String message = text.toString();
                text.setLength(0);
                ready.join();
                owner[0].receive(message);
            }
            ws.request(1);
            return null;
        }
    }

    private void receive(String message) {
        try {
            JsonNode n = JSON.readTree(message);
            if (n.has("id")) {
                CompletableFuture<JsonNode> f = pending.remove(n.get("id").asInt());
                if (f != null) {
                    f.complete(n);
                }
            } else {
                synchronized (events) {
                    events.add(n);
                }
            }
        } catch (IOException e) {
            throw new IllegalStateException("unreadable DevTools message", e);
        }
    }

    /** Sends one DevTools command and waits for its result; fails on a protocol error. */
    JsonNode call(String method, Map<String, Object> params) throws Exception {
        int id = ids.incrementAndGet();
        ObjectNode msg = JSON.createObjectNode();
        msg.put("id", id);
        msg.put("method", method);
        msg.set("params", JSON.valueToTree(params));
        CompletableFuture<JsonNode> f = new CompletableFuture<>();
        pending.put(id, f);
        socket.sendText(JSON.writeValueAsString(msg), true).get(30, TimeUnit.SECONDS);
        JsonNode reply = f.get(120, TimeUnit.SECONDS);
        if (reply.has("error")) {
            throw new IllegalStateException(method + " failed: " + reply.get("error"));
        }
        return reply.get("result");
    }

    /** What a page load came to. */
    record Load(List<String> problems, List<String> requested) {
    }

    /** Loads {@code url}, waits for its load event and a short settling time, and reports what happened. */
    Load load(String url) throws Exception {
        call("Runtime.enable", Map.of());
        call("Log.enable", Map.of());
        call("Network.enable", Map.of());
        call("Page.enable", Map.of());
        synchronized (events) {
            events.clear();
        }
        call("Page.navigate", Map.of("url", url));
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(90);
        while (!seen("Page.loadEventFired")) {
            if (System.nanoTime() > deadline) {
                throw new IllegalStateException("the page did not finish loading in 90 s");
            }
            Thread.sleep(50);
        }
        Thread.sleep(700);
        List<String> problems = new ArrayList<>();
        List<String> requested = new ArrayList<>();
        synchronized (events) {
            for (JsonNode e : events) {
                String method = e.path("method").asText();
                JsonNode p = e.path("params");
                switch (method) {
                    case "Runtime.consoleAPICalled" -> {
                        String type = p.path("type").asText();
                        if (type.equals("error") || type.equals("assert")) {
                            problems.add("console." + type + ": " + p.path("args"));
                        }
                    }
                    case "Runtime.exceptionThrown" -> problems.add("exception: " + p.path("exceptionDetails"));
                    case "Log.entryAdded" -> {
                        if (p.path("entry").path("level").asText().equals("error")) {
                            problems.add("log error: " + p.path("entry").path("text").asText() + " "
                                    + p.path("entry").path("url").asText());
                        }
                    }
                    case "Network.loadingFailed" -> problems.add("load failed: " + p.path("errorText").asText());
                    case "Network.requestWillBeSent" -> requested.add(p.path("request").path("url").asText());
                    default -> {
                    }
                }
            }
        }
        return new Load(problems, requested);
    }

    private boolean seen(String method) {
        synchronized (events) {
            return events.stream().anyMatch(e -> method.equals(e.path("method").asText()));
        }
    }

    /** Evaluates a JavaScript expression in the page (for inspection by the test only) and returns its value. */
    JsonNode evaluate(String expression) throws Exception {
        JsonNode r = call("Runtime.evaluate", Map.of("expression", expression, "returnByValue", true));
        if (r.has("exceptionDetails")) {
            throw new IllegalStateException("evaluation failed: " + r.get("exceptionDetails"));
        }
        return r.path("result").path("value");
    }

    /** A PNG of the page from the top, {@code width} by at most {@code maxHeight} CSS pixels. */
    byte[] screenshot(int width, int maxHeight) throws Exception {
        JsonNode metrics = call("Page.getLayoutMetrics", Map.of());
        double height = metrics.path("cssContentSize").path("height").asDouble(maxHeight);
        Map<String, Object> clip = Map.of("x", 0, "y", 0, "width", width, "height", Math.min(height, maxHeight),
                "scale", 1);
        JsonNode shot = call("Page.captureScreenshot", Map.of("format", "png", "captureBeyondViewport", true,
                "clip", clip));
        return Base64.getDecoder().decode(shot.path("data").asText());
    }

    @Override
    public void close() throws IOException, InterruptedException {
        try {
            socket.sendClose(WebSocket.NORMAL_CLOSURE, "done").get(5, TimeUnit.SECONDS);
        } catch (Exception e) {
            // the browser is stopped below either way
        }
        List<ProcessHandle> children = process.descendants().toList();
        process.destroy();
        children.forEach(ProcessHandle::destroy);
        if (!process.waitFor(20, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            process.waitFor(20, TimeUnit.SECONDS);
        }
        deleteTree(profile);
    }

    private static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                Files.deleteIfExists(p);
            }
        } catch (IOException e) {
            // a file Chromium was still writing as it stopped: leave the temporary profile to the system
        }
    }
}
