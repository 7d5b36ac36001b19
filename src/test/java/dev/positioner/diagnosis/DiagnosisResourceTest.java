package dev.positioner.diagnosis;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.everyItem;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.notNullValue;
import static org.hamcrest.Matchers.nullValue;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.positioner.api.Contract;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.http.ContentType;
import io.restassured.response.Response;
import java.util.List;
import org.junit.jupiter.api.Test;

@QuarkusTest
class DiagnosisResourceTest {

    /** The example of the one-shot contract in DESIGN.md, sent as written. */
    static final String DESIGN_EXAMPLE = """
            {"symptoms": ["slow_stroke"],
             "measurements": [{"quantity": "supply_pressure", "value": 205, "unit": "psi"}],
             "checks": [{"check": "read_filter_dp", "outcome": "normal"}],
             "unavailableChecks": ["pump_flow_test"],
             "asset": {"tag": "PV-2041", "oilGrade": "VG46", "cleanlinessTarget": "16/14/11",
                       "design": [{"quantity": "piston_bore", "value": 8, "unit": "in"}]}}""";

    @Test
    void designExampleGetsRankedCausesAndANextCheck() {
        Response r = given().filter(Contract.VALIDATED).contentType(ContentType.JSON).body(DESIGN_EXAMPLE)
                .post("/api/v1/diagnoses")
                .then().statusCode(200)
                .body("hypotheses[0].fault", equalTo("pump_worn"))
                .body("hypotheses.fault", hasItem("not_in_catalogue"))
                .body("hypotheses.probability.sum()", closeTo(1.0, 1e-6))
                .body("nextCheck.check", not(equalTo("pump_flow_test")))
                .body("nextCheck.why", containsString("Separates"))
                .body("findings.code", hasItem("supply_pressure_low"))
                .body("cautions[0]", containsString("Site procedures"))
                .extract().response();
        List<Float> probabilities = r.path("hypotheses.probability");
        for (int i = 1; i < probabilities.size(); i++) {
            assertEquals(true, probabilities.get(i - 1) >= probabilities.get(i), "sorted most probable first");
        }
    }

    @Test
    void aTagFromTheRegistrySuppliesDesignData() {
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON)
                .body("""
                        {"measurements": [{"quantity": "stroke_time_open", "value": 95, "unit": "s"},
                                          {"quantity": "stroke_time_close", "value": 88, "unit": "s"}],
                         "asset": {"tag": "PV-2041"}}""")
                .post("/api/v1/diagnoses")
                .then().statusCode(200)
                // PV-2041 is designed for a 40 s stroke: 95 s is beyond the 25 % acceptance limit (50 s).
                .body("findings.code", hasItem("stroke_time_open_high"))
                .body("decision.rulesFired", hasItem("INT-MOT-01"))
                .body("assumptions", not(hasItem(containsString("No design stroke time"))));
    }

    @Test
    void stopsWhenTheLeaderIsClear() {
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON)
                .body("""
                        {"symptoms": ["wrong_direction", "recent_maintenance"],
                         "checks": [{"check": "check_port_connections", "outcome": "reversed"},
                                    {"check": "check_valve_lineup", "outcome": "as_required"},
                                    {"check": "inspect_cam_and_cable", "outcome": "secure"}]}""")
                .post("/api/v1/diagnoses")
                .then().statusCode(200)
                .body("hypotheses[0].fault", equalTo("ports_reversed"))
                .body("hypotheses[0].probability", greaterThanOrEqualTo(0.9f))
                .body("nextCheck", nullValue())
                .body("decision.stopReason", containsString("stopping threshold"));
    }

    @Test
    void emptyRequestStillAdvisesWhereToStart() {
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON).body("{}")
                .post("/api/v1/diagnoses")
                .then().statusCode(200)
                .body("nextCheck", notNullValue())
                .body("assumptions", hasItem(containsString("No asset data")));
    }

    @Test
    void everyHypothesisCarriesAFailureModeCode() {
        given().filter(Contract.VALIDATED).contentType(ContentType.JSON).body(DESIGN_EXAMPLE)
                .post("/api/v1/diagnoses")
                .then().statusCode(200)
                .body("hypotheses.failureMode", everyItem(notNullValue()));
    }
}
