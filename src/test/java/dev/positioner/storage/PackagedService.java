package dev.positioner.storage;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * The packaged service (target/quarkus-app/quarkus-run.jar) as a child process, for tests that must
 * kill it or run two of it. Needs only the JDK, so the benchmark can use it from a plain classpath.
 */
public final class PackagedService implements AutoCloseable {

    private final Process process;
    private final int port;
    private final Path log;

    private PackagedService(Process process, int port, Path log) {
        this.process = process;
        this.port = port;
        this.log = log;
    }

    /** Starts the jar with the given system properties and waits until it reports ready. */
    public static PackagedService start(String name, Map<String, String> properties, Path logDir) throws IOException, InterruptedException {
        Path jar = Path.of(System.getProperty("positioner.jar", "target/quarkus-app/quarkus-run.jar")).toAbsolutePath();
        if (!Files.exists(jar)) {
            throw new IllegalStateException(jar + " does not exist: run ./mvnw package first");
        }
        int port = freePort();
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx384m", "-Dquarkus.http.port=" + port,
                "-Dpositioner.rules-dir=" + System.getProperty("positioner.rules-dir", "rules")));
        properties.forEach((k, v) -> cmd.add("-D" + k + "=" + v));
        cmd.add("-jar");
        cmd.add(jar.toString());
        Files.createDirectories(logDir);
        Path log = logDir.resolve(name + ".log");
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.appendTo(log.toFile())).start();
        PackagedService s = new PackagedService(p, port, log);
        s.awaitReady(Duration.ofSeconds(120));
        return s;
    }

    public String baseUri() {
        return "http://127.0.0.1:" + port;
    }

    public int port() {
        return port;
    }

    public long pid() {
        return process.pid();
    }

    /** SIGKILL: no shutdown hook runs, nothing is flushed or closed. */
    public void kill9() throws IOException, InterruptedException {
        new ProcessBuilder("kill", "-9", Long.toString(process.pid())).inheritIO().start().waitFor();
        process.waitFor(30, TimeUnit.SECONDS);
    }

    /** SIGTERM: the ordinary shutdown, which closes the database. */
    public void stop() throws InterruptedException {
        process.destroy();
        if (!process.waitFor(60, TimeUnit.SECONDS)) {
            process.destroyForcibly().waitFor();
        }
    }

    @Override
    public void close() throws InterruptedException {
        if (process.isAlive()) {
            stop();
        }
    }

    public String logTail() {
        try {
            List<String> lines = Files.readAllLines(log);
            return String.join("\n", lines.subList(Math.max(0, lines.size() - 40), lines.size()));
        } catch (IOException e) {
            return "(no log: " + e.getMessage() + ")";
        }
    }

    private void awaitReady(Duration timeout) throws InterruptedException {
        HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(2)).build();
        long deadline = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < deadline) {
            if (!process.isAlive()) {
                throw new IllegalStateException("service exited with " + process.exitValue() + ":\n" + logTail());
            }
            try {
                HttpResponse<Void> r = http.send(HttpRequest.newBuilder(URI.create(baseUri() + "/q/health/ready")).build(),
                        HttpResponse.BodyHandlers.discarding());
                if (r.statusCode() == 200) {
                    return;
                }
            } catch (IOException notYet) {
                // not listening yet
            }
            Thread.sleep(250);
        }
        process.destroyForcibly();
        throw new IllegalStateException("service not ready after " + timeout + ":\n" + logTail());
    }

    private static int freePort() throws IOException {
        try (ServerSocket s = new ServerSocket(0)) {
            return s.getLocalPort();
        }
    }
}
