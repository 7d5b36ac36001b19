package dev.positioner.session;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.notNullValue;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.api.Contract;
import io.restassured.http.ContentType;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import io.restassured.specification.RequestSpecification;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import org.junit.jupiter.api.Test;

/**
 * A whole troubleshooting job through the HTTP API, run once on each database (see the subclasses).
 * Each test registers valves of its own on a site of its own, so closures made by one test cannot
 * move the priors another test looks at.
 */
abstract class SessionFlowContract {

    static final String JOB = """
            {"tag": "%s", "workOrder": "WO-%s", "author": "night shift",
             "symptoms": ["slow_stroke"],
             "measurements": [{"quantity": "supply_pressure", "value": 205, "unit": "psi"}]}""";

    static RequestSpecification api() {
        return given().filter(Contract.VALIDATED).contentType(ContentType.JSON);
    }

    /** A valve like the demo's PV-2041 under a new tag and site. */
    static String newValve() {
        return newValve(null);
    }

    /** A valve like the demo's PV-2041 under a new tag, on the given site or a new one. */
    static String newValve(String onSite) {
        String tag = "T-" + UUID.randomUUID().toString().substring(0, 8).toUpperCase();
        String site = onSite != null ? onSite : "site-" + tag;
        api().body("""
                {"tag": "%s", "description": "test valve", "area": "test bay", "site": "%s", "oilGrade": "VG46",
                 "cleanlinessTarget": "16/14/11",
                 "design": [{"quantity": "supply_pressure_nominal", "value": 250, "unit": "psi"},
                            {"quantity": "piston_bore", "value": 8, "unit": "in"},
                            {"quantity": "stroke_length", "value": 4, "unit": "in"},
                            {"quantity": "pump_rated_flow", "value": 2, "unit": "gpm"}]}""".formatted(tag, site))
                .post("/api/v1/assets").then().statusCode(201);
        return tag;
    }

    static String open(String tag) {
        return api().body(JOB.formatted(tag, tag)).post("/api/v1/sessions")
                .then().statusCode(201).extract().path("id");
    }

    static Response add(String id, String what, String body) {
        return api().body(body).post("/api/v1/sessions/" + id + "/" + what);
    }

    static void close(String id, String fault) {
        add(id, "closure", """
                {"confirmedFault": "%s", "action": "Overhauled the pump", "parts": ["pump cartridge kit"],
                 "minutes": 150, "author": "night shift"}""".formatted(fault)).then().statusCode(201);
    }

    @Test
    void aWholeJobEndsInAClosureRecordCodedForMaintenance() {
        String tag = newValve();
        api().queryParam("tag", tag.toLowerCase()).get("/api/v1/assets").then().statusCode(200)
                .body("assets.tag", equalTo(List.of(tag)));

        Response opened = api().body(JOB.formatted(tag, "1")).post("/api/v1/sessions");
        opened.then().statusCode(201).header("Location", containsString("/api/v1/sessions/"))
                .body("status", equalTo("open"), "lastSeq", equalTo(3), "events.type", equalTo(List.of("opened", "symptom", "reading")),
                        "diagnosis.hypotheses", notNullValue(), "diagnosis.nextCheck.check", notNullValue());
        String id = opened.path("id");

        add(id, "checks", "{\"check\": \"read_filter_dp\", \"outcome\": \"normal\", \"author\": \"tech A\"}")
                .then().statusCode(201).body("event.seq", equalTo(4), "event.type", equalTo("check"), "event.author", equalTo("tech A"),
                        "diagnosis.hypotheses[0].probability", notNullValue());
        add(id, "readings", "{\"quantity\": \"oil_temperature\", \"value\": 104, \"unit\": \"degF\", \"author\": \"tech A\"}")
                .then().statusCode(201).body("event.seq", equalTo(5));
        // A trace logged at the valve: a steady input with the position settled, uploaded first.
        StringBuilder csv = new StringBuilder("time,input,position\n");
        for (int k = 0; k < 40; k++) {
            csv.append(k * 0.5).append(",40,40.1\n");
        }
        String trace = given().contentType("text/csv").body(csv.toString()).post("/api/v1/traces")
                .then().statusCode(201).extract().path("id");
        add(id, "traces", "{\"traceId\": \"" + trace + "\", \"text\": \"steady at 40 %\", \"author\": \"tech A\"}")
                .then().statusCode(201).body("event.data.traceId", equalTo(trace));
        add(id, "notes", "{\"text\": \"pump case hot to the touch\", \"author\": \"tech A\"}").then().statusCode(201);
        add(id, "symptoms", "{\"symptom\": \"noisy_pump\", \"author\": \"tech A\"}").then().statusCode(201)
                .body("event.data.present", equalTo(true));

        // Undo: the wrong answer stays in the history, marked, and stops counting.
        add(id, "retractions", "{\"retracts\": 4, \"text\": \"read the wrong gauge\", \"author\": \"tech A\"}")
                .then().statusCode(201).body("event.type", equalTo("retraction"), "event.data.retracts", equalTo(4));
        api().get("/api/v1/sessions/" + id).then().statusCode(200)
                .body("events.find { it.seq == 4 }.retractedBy", equalTo(9), "lastSeq", equalTo(9));

        Response closed = add(id, "closure", """
                {"confirmedFault": "pump_worn", "action": "Replaced the pump cartridge and retested supply pressure",
                 "parts": ["pump cartridge kit", "coupling insert"], "minutes": 185, "remarks": "worn vanes", "author": "tech A"}""");
        closed.then().statusCode(201).body("status", equalTo("closed"),
                "closure.confirmedFault", equalTo("pump_worn"), "closure.failureMode", equalTo("LOO"),
                "closure.failureMechanism", equalTo("2.4 Wear"), "closure.failureCause", containsString("slip"),
                "closure.parts", equalTo(List.of("pump cartridge kit", "coupling insert")), "closure.minutes", equalTo(185.0f),
                "closure.workOrder", equalTo("WO-1"), "closure.tag", equalTo(tag), "closure.closedBy", equalTo("tech A"));

        add(id, "closure", "{\"confirmedFault\": \"pump_worn\", \"action\": \"again\", \"minutes\": 1, \"author\": \"x\"}")
                .then().statusCode(409).contentType("application/problem+json");
        add(id, "notes", "{\"text\": \"too late\", \"author\": \"x\"}").then().statusCode(409);

        add(id, "reopening", "{\"reason\": \"creeps again after a week\", \"author\": \"day shift\"}")
                .then().statusCode(201).body("status", equalTo("open"), "event.type", equalTo("reopened"));
        api().queryParam("tag", tag).get("/api/v1/closures").then().statusCode(200)
                .body("closures", hasSize(1), "closures[0].reopenedAt", notNullValue());
        add(id, "closure", "{\"confirmedFault\": \"not_found\", \"action\": \"Handed to the valve maker\", \"minutes\": 60, \"author\": \"day shift\"}")
                .then().statusCode(201).body("closure.failureMode", equalTo("UNK"), "closure.failureMechanism", equalTo("6.1 No cause found"));

        api().get("/api/v1/assets/" + tag + "/history").then().statusCode(200)
                .body("confirmedFaults.fault", equalTo(List.of("not_found")), "sessions.id", equalTo(List.of(id)),
                        "sessions[0].status", equalTo("closed"));
        api().queryParam("tag", tag).queryParam("fault", "not_found").get("/api/v1/sessions").then().statusCode(200)
                .body("sessions.id", equalTo(List.of(id)));
        api().get("/api/v1/faults/pump_worn/history").then().statusCode(200)
                .body("closures.findAll { it.tag == '" + tag + "' }.reopenedAt", everyItem(notNullValue()));
    }

    @Test
    void retriedPostsAreStoredOnceAndAnsweredAsTheFirstTime() {
        String tag = newValve();
        String key = UUID.randomUUID().toString();
        Response first = api().header("Idempotency-Key", key).body(JOB.formatted(tag, "9")).post("/api/v1/sessions");
        first.then().statusCode(201).header("Idempotent-Replayed", "false");
        String id = first.path("id");
        api().header("Idempotency-Key", key).body(JOB.formatted(tag, "9")).post("/api/v1/sessions")
                .then().statusCode(201).header("Idempotent-Replayed", "true").body("id", equalTo(id), "lastSeq", equalTo(3));

        String check = "{\"check\": \"read_filter_dp\", \"outcome\": \"high\", \"author\": \"tech B\"}";
        Response added = api().header("Idempotency-Key", "e-1").body(check).post("/api/v1/sessions/" + id + "/checks");
        added.then().statusCode(201).header("Idempotent-Replayed", "false");
        add(id, "notes", "{\"text\": \"after the check\", \"author\": \"tech B\"}").then().statusCode(201);
        Response again = api().header("Idempotency-Key", "e-1").body(check).post("/api/v1/sessions/" + id + "/checks");
        again.then().statusCode(201).header("Idempotent-Replayed", "true").body("event.seq", equalTo(4), "lastSeq", equalTo(4));
        // The replay is the answer as it was then, not as the session stands after the later note.
        assertEquals(added.jsonPath().getList("diagnosis.hypotheses.fault"), again.jsonPath().getList("diagnosis.hypotheses.fault"));

        String note = "{\"text\": \"body id\", \"author\": \"tech B\", \"clientEventId\": \"n-7\"}";
        add(id, "notes", note).then().statusCode(201).header("Idempotent-Replayed", "false");
        add(id, "notes", note).then().statusCode(201).header("Idempotent-Replayed", "true");

        api().header("Idempotency-Key", "e-1").body("{\"check\": \"read_filter_dp\", \"outcome\": \"normal\", \"author\": \"tech B\"}")
                .post("/api/v1/sessions/" + id + "/checks").then().statusCode(422).contentType("application/problem+json");

        String closing = "{\"confirmedFault\": \"supply_filter_clogged\", \"action\": \"Changed the element\", \"minutes\": 30, \"author\": \"tech B\"}";
        api().header("Idempotency-Key", "c-1").body(closing).post("/api/v1/sessions/" + id + "/closure").then().statusCode(201);
        api().header("Idempotency-Key", "c-1").body(closing).post("/api/v1/sessions/" + id + "/closure")
                .then().statusCode(201).header("Idempotent-Replayed", "true").body("closure.failureMode", equalTo("PLU"));

        JsonPath session = api().get("/api/v1/sessions/" + id).then().statusCode(200).extract().jsonPath();
        assertEquals(List.of("opened", "symptom", "reading", "check", "note", "note", "closed"), session.getList("events.type"));
        api().queryParam("tag", tag).get("/api/v1/sessions").then().body("sessions", hasSize(1));
    }

    @Test
    void aValveWithAHistoryOfOneFaultRanksItHigherAndSaysWhy() {
        String tag = newValve();
        String oneShot = "{\"symptoms\": [\"slow_stroke\"], \"asset\": {\"tag\": \"" + tag + "\"}}";
        JsonPath before = api().body(oneShot).post("/api/v1/diagnoses").then().statusCode(200).extract().jsonPath();
        assertTrue(before.getList("assumptions", String.class).stream().anyMatch(a -> a.contains("no confirmed closures yet on " + tag)));
        float p0 = before.getFloat("hypotheses.find { it.fault == 'pump_worn' }.probability");

        close(open(tag), "pump_worn");
        close(open(tag), "pump_worn");

        JsonPath after = api().body(oneShot).post("/api/v1/diagnoses").then().statusCode(200).extract().jsonPath();
        float p1 = after.getFloat("hypotheses.find { it.fault == 'pump_worn' }.probability");
        assertTrue(p1 > p0 * 1.3, "two closures should raise pump_worn clearly: " + p0 + " -> " + p1);
        assertTrue(p1 < 0.9, "two closures must not swamp the catalogue: " + p1);
        List<String> reasons = after.getList("hypotheses.find { it.fault == 'pump_worn' }.reasons", String.class);
        assertTrue(reasons.stream().anyMatch(r -> r.startsWith("Confirmed 2 times on " + tag) && r.contains("prior raised from 4.5 %")), reasons.toString());
        assertTrue(after.getList("assumptions", String.class).stream().anyMatch(a -> a.contains("2 confirmed closure(s) on " + tag)));

        // A new job on the same valve sees the same history.
        api().body(JOB.formatted(tag, "3")).post("/api/v1/sessions").then().statusCode(201)
                .body("diagnosis.hypotheses.find { it.fault == 'pump_worn' }.reasons", hasItem(containsString("Confirmed 2 times on " + tag)));

        // Another valve of the same site learns too, at half weight: (50 * 0.045 + 2 * 0.5) / 51.
        String neighbour = newValve("site-" + tag);
        JsonPath next = api().body(oneShot.replace(tag, neighbour)).post("/api/v1/diagnoses").then().statusCode(200).extract().jsonPath();
        assertTrue(next.getList("hypotheses.find { it.fault == 'pump_worn' }.reasons", String.class).contains(
                "Confirmed 2 times on other valves of site site-" + tag + " in past closures; prior raised from 4.5 % to 6.4 %."));
    }

    /**
     * Closed jobs teach the site's symptom likelihoods: what each job reported present or absent when
     * it was closed counts for its confirmed cause; a retracted report and a reopened job do not.
     */
    @Test
    void aSitesClosedJobsTeachItsSymptomLikelihoods() {
        String tag = newValve();
        String oneShot = "{\"symptoms\": [\"slow_stroke\"], \"asset\": {\"tag\": \"" + tag + "\"}}";
        JsonPath before = api().body(oneShot).post("/api/v1/diagnoses").then().statusCode(200).extract().jsonPath();
        assertTrue(before.getList("assumptions", String.class).stream().noneMatch(a -> a.startsWith("Symptom likelihoods")),
                before.getList("assumptions").toString());

        for (int i = 0; i < 3; i++) {
            String id = open(tag);
            add(id, "symptoms", "{\"symptom\": \"noisy_pump\", \"present\": false, \"author\": \"night shift\"}").then().statusCode(201);
            close(id, "supply_filter_clogged");
        }
        String reopened = open(tag);
        close(reopened, "supply_filter_clogged");
        add(reopened, "reopening", "{\"reason\": \"slow again the next day\", \"author\": \"day shift\"}").then().statusCode(201);

        JsonPath after = api().body(oneShot).post("/api/v1/diagnoses").then().statusCode(200).extract().jsonPath();
        assertTrue(after.getList("assumptions", String.class).contains("Symptom likelihoods: the catalogue's, each counted as 10 jobs,"
                + " revised by the symptoms reported in 3 closed job(s) on site site-" + tag + " (Beta posterior mean)."),
                after.getList("assumptions").toString());
        // Reported in every job: slow stroke now weighs more for a loaded filter than the catalogue's 0.7 alone,
        // (10 * 0.7 + 3) / 13 = 0.77, on top of the prior the same closures raised.
        float learnt = after.getFloat("hypotheses.find { it.fault == 'supply_filter_clogged' }.probability");
        float first = before.getFloat("hypotheses.find { it.fault == 'supply_filter_clogged' }.probability");
        assertTrue(learnt > first, first + " -> " + learnt);
    }

    @Test
    void aCheckThatNeedsABypassComesWithItsCautions() {
        // A valve that does not move at all leads, once the gauges cannot be read, to a check on the
        // amplifier, which needs the positioner bypassed.
        String id = api().body("{\"tag\": \"" + newValve() + "\", \"author\": \"tech\", \"symptoms\": [\"no_movement\"]}")
                .post("/api/v1/sessions").then().statusCode(201).extract().path("id");
        Map<String, Object> next = null;
        for (int step = 0; step < 25; step++) {
            JsonPath now = api().get("/api/v1/sessions/" + id).then().statusCode(200).extract().jsonPath();
            next = now.getMap("diagnosis.nextCheck");
            if (next == null || Boolean.TRUE.equals(next.get("bypassRequired"))) {
                break;
            }
            add(id, "unavailable-checks", "{\"check\": \"" + next.get("check") + "\", \"author\": \"tech\"}").then().statusCode(201);
        }
        assertTrue(next != null && Boolean.TRUE.equals(next.get("bypassRequired")), "no bypass check was proposed: " + next);
        @SuppressWarnings("unchecked")
        List<String> cautions = (List<String>) next.get("cautions");
        assertTrue(cautions.stream().anyMatch(c -> c.contains("operator's permission")), cautions.toString());
    }

    @Test
    void badInputIsA400NamingTheFieldAndUnknownThingsAre404() {
        String id = open(newValve());
        add(id, "readings", "{\"quantity\": \"supply_pressure\", \"value\": 200, \"unit\": \"furlongs\", \"author\": \"t\"}")
                .then().statusCode(400).contentType("application/problem+json").body("field", equalTo("unit"));
        add(id, "checks", "{\"check\": \"read_crystal_ball\", \"outcome\": \"normal\", \"author\": \"t\"}")
                .then().statusCode(400).body("field", equalTo("check"));
        add(id, "symptoms", "{\"symptom\": \"valve_sings\", \"author\": \"t\"}").then().statusCode(400).body("field", equalTo("symptom"));
        add(id, "retractions", "{\"retracts\": 1, \"author\": \"t\"}").then().statusCode(400).body("field", equalTo("retracts"));
        add(id, "retractions", "{\"retracts\": 99, \"author\": \"t\"}").then().statusCode(400).body("field", equalTo("retracts"));
        add(id, "notes", "{\"text\": \"\", \"author\": \"t\"}").then().statusCode(400).body("field", equalTo("text"));
        add(id, "closure", "{\"confirmedFault\": \"gremlins\", \"action\": \"x\", \"minutes\": -5, \"author\": \"t\"}")
                .then().statusCode(400).body("errors.field", equalTo(List.of("confirmedFault", "minutes")));
        api().body(JOB.formatted(id, "x").replace("\"slow_stroke\"", "\"slow_strok\"")).post("/api/v1/sessions")
                .then().statusCode(404);
        api().body(JOB.formatted("PV-2041", "x").replace("\"slow_stroke\"", "\"slow_strok\"")).post("/api/v1/sessions")
                .then().statusCode(400).body("field", equalTo("symptoms[0]"));
        add("no-such-session", "notes", "{\"text\": \"x\", \"author\": \"t\"}").then().statusCode(404)
                .contentType("application/problem+json");
        api().get("/api/v1/sessions/no-such-session").then().statusCode(404);
        api().get("/api/v1/assets/NO-SUCH-TAG/history").then().statusCode(404);
        api().get("/api/v1/faults/gremlins/history").then().statusCode(404);
        // Nothing of the refused requests was stored.
        api().get("/api/v1/sessions/" + id).then().body("lastSeq", equalTo(3), "closure", nullValue());
    }
}
