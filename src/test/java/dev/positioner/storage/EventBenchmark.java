package dev.positioner.storage;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Not a test: measures sustained event appends through HTTP on the packaged service and the database
 * size once 10,000 events are stored. Each session is opened with 3 events and gets 17 more (readings,
 * check results, notes, symptoms), every one answered with a full diagnosis, as in real use.
 *
 * <pre>
 * ./mvnw -B package -DskipTests &amp;&amp; ./mvnw -B test-compile
 * java -cp "target/test-classes:target/quarkus-app/lib/main/*" dev.positioner.storage.EventBenchmark [h2|pg] [events] [clients]
 * </pre>
 */
public final class EventBenchmark {

    private static final Pattern ID = Pattern.compile("\"id\":\"([^\"]+)\"");
    private static final String[] CHECKS = {"read_filter_dp:normal", "read_drain_pressure:normal", "listen_pump:quiet",
        "check_reservoir_level:normal", "read_oil_temperature:normal", "inspect_oil_sample:clear"};

    public static void main(String[] args) throws Exception {
        String db = args.length > 0 ? args[0] : "h2";
        int events = args.length > 1 ? Integer.parseInt(args[1]) : 10_000;
        int clients = args.length > 2 ? Integer.parseInt(args[2]) : 4;
        Path dir = Path.of("target", "benchmark", "run-" + System.currentTimeMillis()).toAbsolutePath();
        Path data = dir.resolve("data");
        Map<String, String> props = new HashMap<>(Map.of("positioner.data-dir", data.toString(), "positioner.demo-data", "true"));
        // Extra service settings for experiments, e.g. -Dbench.props=positioner.embedded.compact-interval-ms=200
        for (String kv : System.getProperty("bench.props", "").split(",")) {
            if (kv.contains("=")) {
                props.put(kv.substring(0, kv.indexOf('=')), kv.substring(kv.indexOf('=') + 1));
            }
        }
        String database = null;
        if (db.equals("pg")) {
            database = PostgresServer.createDatabase("bench");
            props.putAll(Map.of("quarkus.profile", "prod,pg", "quarkus.datasource.pg.jdbc.url", PostgresServer.url(database),
                    "quarkus.datasource.pg.username", PostgresServer.user(), "quarkus.datasource.pg.password", PostgresServer.password()));
        }
        try {
            run(db, events, clients, dir, data, props, database);
        } finally {
            if (database != null) {
                PostgresServer.dropDatabase(database);
            }
        }
    }

    private static void run(String db, int events, int clients, Path dir, Path data, Map<String, String> props, String database)
            throws Exception {
        PackagedService service = PackagedService.start("bench", props, dir);
        HttpClient http = HttpClient.newHttpClient();
        String base = service.baseUri();
        warmUp(http, base);
        int sessions = events / 20;
        AtomicInteger next = new AtomicInteger();
        List<Long> latencies = Collections.synchronizedList(new ArrayList<>());
        long start = System.nanoTime();
        List<Thread> threads = new ArrayList<>();
        for (int c = 0; c < clients; c++) {
            Thread t = new Thread(() -> {
                for (int s = next.getAndIncrement(); s < sessions; s = next.getAndIncrement()) {
                    job(http, base, s, latencies);
                }
            });
            threads.add(t);
            t.start();
        }
        Thread sampler = new Thread(() -> {
            try {
                while (true) {
                    Thread.sleep(5000);
                    System.out.printf(Locale.ROOT, "  %5.0f s: %6d POSTs answered, database %.1f MiB%n", (System.nanoTime() - start) / 1e9,
                            latencies.size(), size(db, data, database) / 1048576.0);
                }
            } catch (InterruptedException | IOException | SQLException stop) {
                // measurement over
            }
        });
        sampler.setDaemon(true);
        sampler.start();
        for (Thread t : threads) {
            t.join();
        }
        sampler.interrupt();
        double seconds = (System.nanoTime() - start) / 1e9;
        long running = size(db, data, database);
        service.stop();
        long stopped = size(db, data, database);
        List<Long> sorted = new ArrayList<>(latencies);
        sorted.sort(null);
        System.out.printf(Locale.ROOT, "%s, %d clients: %d events in %d sessions (%d POSTs) in %.1f s = %.0f events/s;"
                + " POST latency p50 %.1f ms, p95 %.1f ms%n", db, clients, sessions * 20, sessions, sorted.size(), seconds,
                sessions * 20 / seconds, sorted.get(sorted.size() / 2) / 1e6, sorted.get(sorted.size() * 95 / 100) / 1e6);
        System.out.printf(Locale.ROOT, "database size after %d events: %.1f MiB while running, %.1f MiB after a clean stop%n",
                sessions * 20, running / 1048576.0, stopped / 1048576.0);
    }

    /** One job: open with a symptom and a reading (3 events), then 17 additions. */
    private static void job(HttpClient http, String base, int s, List<Long> latencies) {
        String tag = new String[] {"PV-2041", "FV-3107", "TV-1520", "LV-0812"}[s % 4];
        String opened = post(http, base + "/api/v1/sessions", "{\"tag\": \"" + tag + "\", \"workOrder\": \"B-" + s
                + "\", \"author\": \"bench\", \"symptoms\": [\"slow_stroke\"], \"measurements\":"
                + " [{\"quantity\": \"supply_pressure\", \"value\": 230, \"unit\": \"psi\"}]}", latencies);
        Matcher m = ID.matcher(opened);
        if (!m.find()) {
            throw new IllegalStateException("no session id in " + opened);
        }
        String session = base + "/api/v1/sessions/" + m.group(1);
        for (int e = 0; e < 17; e++) {
            switch (e % 4) {
                case 0 -> post(http, session + "/readings", "{\"quantity\": \"oil_temperature\", \"value\": " + (40 + e)
                        + ", \"unit\": \"degC\", \"author\": \"bench\"}", latencies);
                case 1 -> {
                    String[] c = CHECKS[(e / 4) % CHECKS.length].split(":");
                    post(http, session + "/checks", "{\"check\": \"" + c[0] + "\", \"outcome\": \"" + c[1] + "\", \"author\": \"bench\"}", latencies);
                }
                case 2 -> post(http, session + "/notes", "{\"text\": \"step " + e + " of job " + s
                        + ": readings taken at the positioner, gauge 0-400 psi\", \"author\": \"bench\"}", latencies);
                default -> post(http, session + "/symptoms", "{\"symptom\": \"hunting\", \"present\": " + (e % 8 == 3)
                        + ", \"author\": \"bench\"}", latencies);
            }
        }
    }

    private static void warmUp(HttpClient http, String base) {
        List<Long> ignored = Collections.synchronizedList(new ArrayList<>());
        for (int i = 0; i < 200; i++) {
            post(http, base + "/api/v1/diagnoses", "{\"symptoms\": [\"slow_stroke\"], \"asset\": {\"tag\": \"PV-2041\"}}", ignored);
        }
    }

    private static String post(HttpClient http, String url, String json, List<Long> latencies) {
        long t0 = System.nanoTime();
        try {
            HttpResponse<String> r = http.send(HttpRequest.newBuilder(URI.create(url)).header("Content-Type", "application/json")
                    .POST(HttpRequest.BodyPublishers.ofString(json)).build(), HttpResponse.BodyHandlers.ofString());
            if (r.statusCode() / 100 != 2) {
                throw new IllegalStateException(r.statusCode() + " from " + url + ": " + r.body());
            }
            latencies.add(System.nanoTime() - t0);
            return r.body();
        } catch (IOException | InterruptedException e) {
            throw new IllegalStateException(e);
        }
    }

    private static long size(String db, Path data, String database) throws IOException, SQLException {
        if (db.equals("pg")) {
            try (Connection c = DriverManager.getConnection(PostgresServer.url(database), PostgresServer.user(), PostgresServer.password());
                    ResultSet rs = c.createStatement().executeQuery("SELECT pg_database_size(current_database())")) {
                rs.next();
                return rs.getLong(1);
            }
        }
        try (Stream<Path> files = Files.walk(data)) {
            return files.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
        }
    }
}
