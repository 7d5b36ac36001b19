package dev.positioner.session;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.api.Contract;
import dev.positioner.storage.PackagedService;
import io.restassured.http.ContentType;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

/**
 * kill -9 of the packaged service on its embedded database while four clients are writing, then a
 * restart on the same files. Every event the service acknowledged (201) must be there, at the seq it
 * was acknowledged with; requests cut off by the kill are retried with their Idempotency-Key and
 * must end up stored exactly once. Each note's text is its key, so a duplicate would show.
 */
class CrashIT {

    static final String[] TAGS = {"PV-2041", "FV-3107", "TV-1520", "LV-0812"};
    static final int KILL_AFTER = Integer.getInteger("crash.kill-after", 200);

    record Ack(String session, int seq) {
    }

    record Pending(String session, String key, boolean open) {
    }

    private final Map<String, Ack> acked = new ConcurrentHashMap<>();
    private final Map<String, String> sessionsByOpenKey = new ConcurrentHashMap<>();
    private final List<Pending> cutOff = Collections.synchronizedList(new ArrayList<>());
    private final AtomicInteger count = new AtomicInteger();

    @Test
    void everyAcknowledgedEventSurvivesKillMinusNineAndNoneIsStoredTwice() throws Exception {
        Path dir = Files.createDirectories(Path.of("target", "crash-test")).resolve("run-" + System.nanoTime());
        Map<String, String> props = new HashMap<>(Map.of("positioner.data-dir", dir.resolve("data").toAbsolutePath().toString(),
                "positioner.demo-data", "true"));
        String url = System.getProperty("crash.h2-url");
        if (url != null) {
            // Lets the same test be run by hand against other H2 settings, e.g. the default write delay.
            props.put("quarkus.datasource.embedded.jdbc.url", url.replace("DATA", dir.resolve("data").toAbsolutePath().toString()));
        }
        PackagedService first = PackagedService.start("first", props, dir);
        List<Thread> writers = new ArrayList<>();
        for (int w = 0; w < 4; w++) {
            int writer = w;
            Thread t = new Thread(() -> write(first.baseUri(), writer));
            writers.add(t);
            t.start();
        }
        long deadline = System.currentTimeMillis() + 120_000;
        while (count.get() < KILL_AFTER && System.currentTimeMillis() < deadline) {
            Thread.sleep(5);
        }
        first.kill9();
        for (Thread t : writers) {
            t.join(30_000);
        }
        int ackedAtKill = acked.size();
        assertTrue(ackedAtKill >= KILL_AFTER, "writers made too little progress: " + ackedAtKill + "\n" + first.logTail());

        try (PackagedService second = PackagedService.start("second", props, dir)) {
            String base = second.baseUri();
            Map<String, List<String>> before = notesBySession(base);
            acked.forEach((key, ack) -> {
                List<String> notes = before.get(ack.session());
                assertTrue(notes != null && notes.contains(key), "acknowledged event " + key + " lost after kill -9");
            });
            for (Pending p : List.copyOf(cutOff)) {
                if (p.open()) {
                    // The same request as before the kill, body and all: a cut-off open may have been
                    // stored, and a key sent again with a different body is refused (422) by design.
                    String id = openSession(base, p.key(), writerOf(p.key())).then().statusCode(201).extract().path("id");
                    sessionsByOpenKey.put(p.key(), id);
                } else {
                    note(base, p.session(), p.key()).then().statusCode(201);
                }
            }
            Map<String, List<String>> after = notesBySession(base);
            int notes = 0;
            for (List<String> texts : after.values()) {
                assertEquals(texts.size(), texts.stream().distinct().count(), "a note was stored twice: " + texts);
                notes += texts.size();
            }
            for (String key : sessionsByOpenKey.keySet()) {
                JsonPath found = api(base).queryParam("tag", tagOf(key)).queryParam("limit", 1000).get("/api/v1/sessions")
                        .then().statusCode(200).extract().jsonPath();
                assertEquals(1, found.getList("sessions.findAll { it.workOrder == '" + key + "' }").size(), "session opened twice: " + key);
            }
            acked.forEach((key, ack) -> {
                JsonPath s = api(base).get("/api/v1/sessions/" + ack.session()).then().statusCode(200).extract().jsonPath();
                assertEquals(key, s.getString("events.find { it.seq == " + ack.seq() + " }.data.text"), "event moved: " + key);
            });
            System.out.printf("crash test: %d events acknowledged before kill -9, %d requests cut off and retried "
                    + "(%d of them session opens), %d notes after restart, none lost or doubled%n", ackedAtKill, cutOff.size(),
                    cutOff.stream().filter(Pending::open).count(), notes);
        }
    }

    /** Opens sessions one after another and adds notes to each until the service dies. */
    private void write(String base, int writer) {
        for (int s = 0; ; s++) {
            String openKey = "w" + writer + "-s" + s;
            String session;
            try {
                session = openSession(base, openKey, writer).then().statusCode(201).extract().path("id");
                sessionsByOpenKey.put(openKey, session);
            } catch (Exception | AssertionError dead) {
                cutOff.add(new Pending(null, openKey, true));
                return;
            }
            for (int e = 0; e < 25; e++) {
                String key = openKey + "-e" + e;
                try {
                    Response r = note(base, session, key);
                    r.then().statusCode(201);
                    acked.put(key, new Ack(session, r.path("event.seq")));
                    count.incrementAndGet();
                } catch (Exception | AssertionError dead) {
                    cutOff.add(new Pending(session, key, false));
                    return;
                }
            }
        }
    }

    private static Response openSession(String base, String key, int writer) {
        return api(base).header("Idempotency-Key", key)
                .body("{\"tag\": \"" + tagOf(key) + "\", \"workOrder\": \"" + key + "\", \"author\": \"writer " + writer
                        + "\", \"symptoms\": [\"creep_at_zero_signal\"]}")
                .post("/api/v1/sessions");
    }

    private static Response note(String base, String session, String key) {
        return api(base).header("Idempotency-Key", key).body("{\"text\": \"" + key + "\", \"author\": \"writer\"}")
                .post("/api/v1/sessions/" + session + "/notes");
    }

    private Map<String, List<String>> notesBySession(String base) {
        Map<String, List<String>> out = new HashMap<>();
        for (String session : sessionsByOpenKey.values()) {
            Response r = api(base).get("/api/v1/sessions/" + session);
            assertEquals(200, r.statusCode(), "acknowledged session " + session + " lost after kill -9");
            JsonPath s = r.jsonPath();
            out.put(session, s.getList("events.findAll { it.type == 'note' }.data.text", String.class));
        }
        return out;
    }

    private static String tagOf(String key) {
        return TAGS[writerOf(key) % TAGS.length];
    }

    /** Keys are "w{writer}-s{session}[-e{event}]". */
    private static int writerOf(String key) {
        return Character.getNumericValue(key.charAt(1));
    }

    private static RequestSpecification api(String base) {
        return given().baseUri(base).filter(Contract.VALIDATED).contentType(ContentType.JSON);
    }
}
