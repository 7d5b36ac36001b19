package dev.positioner.trace;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.startsWith;

import dev.positioner.api.Contract;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.http.ContentType;
import java.util.Locale;
import org.junit.jupiter.api.Test;

/** Trace upload through HTTP, and a diagnosis that refers to the uploaded trace. */
@QuarkusTest
class TraceResourceTest {

    /** Hunting: steady 50 % input, position a 4 s sine of 3 % peak to peak, 10 samples per second, 120 s. */
    static String huntingCsv() {
        StringBuilder csv = new StringBuilder("time,input,position\n");
        SyntheticTraces.sine(0.1, 120, 50, 4, 1.5, 0, 1, s -> csv.append(String.format(Locale.ROOT, "%.1f,%.3f,%.3f%n",
                s.time(), s.input(), s.position())));
        return csv.toString();
    }

    /** Ramps through a 2 % backlash, as mA (4-20), 5 samples per second. */
    static String backlashCsvInMilliamps() {
        StringBuilder csv = new StringBuilder("t,input,position\n");
        SyntheticTraces.backlashRamps(0.2, 20, 80, 0.5, 2, 2.0, x -> x, 0, 2, s -> csv.append(String.format(Locale.ROOT,
                "%.1f,%.4f,%.4f%n", s.time(), 4 + s.input() * 0.16, s.position())));
        return csv.toString();
    }

    static String upload(String csv, String query) {
        return given().config(Contract.DOUBLES).filter(Contract.VALIDATED).contentType("text/csv").body(csv)
                .post("/api/v1/traces" + query)
                .then().statusCode(201).extract().path("id");
    }

    @Test
    void huntingTraceGivesPeriodAndAmplitude() {
        String id = upload(huntingCsv(), "?name=PV-2041%20night");
        given().config(Contract.DOUBLES).filter(Contract.VALIDATED).get("/api/v1/traces/" + id)
                .then().statusCode(200)
                .body("analysis.oscillation.detected", equalTo(true))
                // A pure 4 s sine of amplitude 1.5 %: period 4 s and 3 % peak to peak (sampling at 0.1 s: tolerance one sample).
                .body("analysis.oscillation.periodSeconds", closeTo(4.0, 0.1))
                .body("analysis.oscillation.peakToPeakPercent", closeTo(3.0, 0.15))
                .body("findings", hasItem(containsString("Hunting with a steady input")));
    }

    @Test
    void backlashRampsInMilliampsGiveTheDeadBand() {
        String id = upload(backlashCsvInMilliamps(), "?signalUnit=mA");
        given().config(Contract.DOUBLES).filter(Contract.VALIDATED).get("/api/v1/traces/" + id)
                .then().statusCode(200)
                // Backlash of total width 2 %: the dead band is exactly 2 % (tolerance: one sample of ramp, 0.1 %, plus onset detection).
                .body("analysis.deadBand.deadBandPercent", closeTo(2.0, 0.25));
    }

    @Test
    void thePictureIsAnSvg() {
        String id = upload(huntingCsv(), "");
        given().get("/api/v1/traces/" + id + "/picture")
                .then().statusCode(200).contentType("image/svg+xml").body(startsWith("<svg"));
    }

    @Test
    void aDiagnosisCanReferToTheTrace() {
        String id = upload(huntingCsv(), "");
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON)
                .body("{\"traces\": [\"" + id + "\"], \"asset\": {\"tag\": \"TV-1520\"}}")
                .post("/api/v1/diagnoses")
                .then().statusCode(200)
                // 3 % peak to peak is above the 0.5 % at which oscillation counts as hunting.
                .body("decision.rulesFired", hasItem("INT-OSC-01"))
                .body("findings.text", hasItem(containsString("Hunting with a steady input")));
    }

    @Test
    void aSessionCanTakeTheTraceAsEvidence() {
        String trace = upload(huntingCsv(), "");
        String session = given().filter(Contract.VALIDATED).contentType(ContentType.JSON)
                .body("{\"tag\": \"TV-1520\", \"author\": \"night shift\", \"workOrder\": \"WO-77120\"}")
                .post("/api/v1/sessions").then().statusCode(201).extract().path("id");
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON)
                .body("{\"traceId\": \"" + trace + "\", \"author\": \"night shift\"}")
                .post("/api/v1/sessions/" + session + "/traces")
                .then().statusCode(201)
                .body("diagnosis.decision.rulesFired", hasItem("INT-OSC-01"));
        // A reference to a trace that was never uploaded is the request's mistake, named as such.
        given().filter(Contract.RESPONSES).contentType(ContentType.JSON)
                .body("{\"traceId\": \"no-such-trace\", \"author\": \"night shift\"}")
                .post("/api/v1/sessions/" + session + "/traces")
                .then().statusCode(400).body("field", equalTo("traceId"));
        // ... and was not stored: the session goes on.
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON)
                .body("{\"text\": \"hunting also heard at the pump\", \"author\": \"night shift\"}")
                .post("/api/v1/sessions/" + session + "/notes")
                .then().statusCode(201);
    }

    @Test
    void jsonTracesAreAcceptedToo() {
        StringBuilder json = new StringBuilder("{\"samples\": [");
        for (int k = 0; k < 50; k++) {
            json.append(k == 0 ? "" : ",").append(String.format(Locale.ROOT, "{\"t\": %.1f, \"input\": 50, \"position\": 50.2}", k * 0.2));
        }
        json.append("]}");
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON).body(json.toString())
                .post("/api/v1/traces").then().statusCode(201).body("analysis.summary.sampleCount", equalTo(50));
    }

    @Test
    void aBadRowIsNamed() {
        String csv = "time,input,position\n0,50,50\n0.1,50,abc\n";
        given().filter(Contract.RESPONSES).contentType("text/csv").body(csv)
                .post("/api/v1/traces")
                .then().statusCode(400).body("field", equalTo("row 3, column position"));
    }

    @Test
    void timeGoingBackwardsIsNamed() {
        StringBuilder csv = new StringBuilder("time,input,position\n");
        for (int k = 0; k < 30; k++) {
            csv.append(k == 20 ? 1.0 : k * 0.1).append(",50,50\n");
        }
        given().filter(Contract.RESPONSES).contentType("text/csv").body(csv.toString())
                .post("/api/v1/traces")
                .then().statusCode(400).body("field", startsWith("row 22")).body("detail", containsString("does not increase"));
    }

    @Test
    void unknownTraceIs404() {
        given().filter(Contract.RESPONSES).get("/api/v1/traces/nope").then().statusCode(404).contentType("application/problem+json");
    }
}
