package dev.positioner.session;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.positioner.api.Contract;
import dev.positioner.storage.PackagedService;
import dev.positioner.storage.PostgresServer;
import io.restassured.http.ContentType;
import io.restassured.path.json.JsonPath;
import io.restassured.specification.RequestSpecification;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/**
 * Two packaged instances on one PostgreSQL database, switched there with the documented profile
 * (quarkus.profile=prod,pg). They start together (both run the migrations), and one job moves
 * between them the way requests do behind a load balancer.
 */
class TwoInstancesIT {

    @Test
    void aSessionOpenedThroughOneInstanceContinuesThroughTheOther() throws Exception {
        String database = PostgresServer.createDatabase("two");
        Map<String, String> props = Map.of("quarkus.profile", "prod,pg", "positioner.demo-data", "true",
                "quarkus.datasource.pg.jdbc.url", PostgresServer.url(database),
                "quarkus.datasource.pg.username", PostgresServer.user(),
                "quarkus.datasource.pg.password", PostgresServer.password());
        Path logs = Path.of("target", "two-instances");
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            Future<PackagedService> startA = pool.submit(() -> PackagedService.start("a", props, logs));
            Future<PackagedService> startB = pool.submit(() -> PackagedService.start("b", props, logs));
            try (PackagedService a = startA.get(); PackagedService b = startB.get()) {
                String id = api(a).body("{\"tag\": \"PV-2041\", \"workOrder\": \"WO-77\", \"author\": \"tech\", \"symptoms\": [\"slow_stroke\"]}")
                        .post("/api/v1/sessions").then().statusCode(201).extract().path("id");
                api(b).body("{\"check\": \"read_filter_dp\", \"outcome\": \"normal\", \"author\": \"tech\"}")
                        .post("/api/v1/sessions/" + id + "/checks").then().statusCode(201).body("event.seq", equalTo(3));
                api(a).body("{\"quantity\": \"supply_pressure\", \"value\": 14, \"unit\": \"bar\", \"author\": \"tech\"}")
                        .post("/api/v1/sessions/" + id + "/readings").then().statusCode(201).body("event.seq", equalTo(4));

                // A retry that lands on the other instance is still recognised.
                String note = "{\"text\": \"retried across instances\", \"author\": \"tech\"}";
                api(a).header("Idempotency-Key", "x-1").body(note).post("/api/v1/sessions/" + id + "/notes").then().statusCode(201);
                api(b).header("Idempotency-Key", "x-1").body(note).post("/api/v1/sessions/" + id + "/notes").then().statusCode(201)
                        .header("Idempotent-Replayed", "true").body("event.seq", equalTo(5));

                // Both instances appending to one session at once: the row lock orders them.
                List<Future<Integer>> appends = new ArrayList<>();
                for (int i = 0; i < 20; i++) {
                    PackagedService via = i % 2 == 0 ? a : b;
                    String text = "{\"text\": \"n" + i + "\", \"author\": \"tech\"}";
                    appends.add(pool.submit(() -> api(via).body(text).post("/api/v1/sessions/" + id + "/notes")
                            .then().statusCode(201).extract().<Integer>path("event.seq")));
                }
                List<Integer> seqs = new ArrayList<>();
                for (Future<Integer> f : appends) {
                    seqs.add(f.get());
                }
                seqs.sort(null);
                assertEquals(IntStream.rangeClosed(6, 25).boxed().toList(), seqs);

                api(b).body("{\"confirmedFault\": \"pump_worn\", \"action\": \"Pump overhauled\", \"minutes\": 200, \"author\": \"tech\"}")
                        .post("/api/v1/sessions/" + id + "/closure").then().statusCode(201).body("closure.failureMode", equalTo("LOO"));
                JsonPath seen = api(a).get("/api/v1/sessions/" + id).then().statusCode(200).extract().jsonPath();
                assertEquals("closed", seen.getString("status"));
                assertEquals(IntStream.rangeClosed(1, 26).boxed().toList(), seen.getList("events.seq", Integer.class));
                api(a).body("{\"confirmedFault\": \"pump_worn\", \"action\": \"again\", \"minutes\": 1, \"author\": \"tech\"}")
                        .post("/api/v1/sessions/" + id + "/closure").then().statusCode(409);
                api(b).queryParam("tag", "PV-2041").get("/api/v1/closures").then().statusCode(200).body("closures.size()", equalTo(1));
            }
        } finally {
            pool.shutdownNow();
            PostgresServer.dropDatabase(database);
        }
    }

    private static RequestSpecification api(PackagedService s) {
        return given().baseUri(s.baseUri()).filter(Contract.VALIDATED).contentType(ContentType.JSON);
    }
}
