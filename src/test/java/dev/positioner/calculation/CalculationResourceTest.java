package dev.positioner.calculation;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;

import dev.positioner.api.Contract;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.http.ContentType;
import org.junit.jupiter.api.Test;

/** The calculation endpoints, against values worked by hand or published; the source beside each. */
@QuarkusTest
class CalculationResourceTest {

    static io.restassured.response.ValidatableResponse post(String name, String body) {
        return given().config(Contract.DOUBLES).filter(Contract.VALIDATED).contentType(ContentType.JSON).body(body)
                .post("/api/v1/calculations/" + name).then();
    }

    @Test
    void viscosityAtFortyDegreesIsTheGradeMidpoint() {
        // ISO 3448: VG46 is 46 mm2/s at 40 degC (104 degF) by definition of the grade's midpoint.
        post("viscosity", "{\"oilGrade\": \"VG46\", \"inputs\": [{\"quantity\": \"oil_temperature\", \"value\": 104, \"unit\": \"degF\"}]}")
                .statusCode(200)
                .body("results[0].values[0].value", closeTo(46.0, 0.5f))
                .body("results[0].values[0].unit", equalTo("cSt"));
    }

    @Test
    void laminarDrainLineDropByHand() {
        // Hagen-Poiseuille: dp = 128 mu L Q / (pi d^4). VG46 at 40 degC: nu = 46 mm2/s; rho(40) =
        // 870 / (1 + 6.5e-4 * 25) = 856.1 kg/m3; mu = 0.03938 Pa s. Q = 10 L/min = 1.667e-4 m3/s,
        // L = 5 m, d = 12 mm: dp = 128 * 0.03938 * 5 * 1.667e-4 / (pi * 2.0736e-8) = 64.5 kPa (9.36 psi).
        // Re = 4Q / (pi d nu) = 4 * 1.667e-4 / (pi * 0.012 * 46e-6) = 384: laminar.
        post("drain-line-drop", """
                {"oilGrade": "VG46", "inputs": [
                  {"quantity": "oil_temperature", "value": 40, "unit": "degC"},
                  {"quantity": "drain_line_bore", "value": 12, "unit": "mm"},
                  {"quantity": "drain_line_length", "value": 5, "unit": "m"},
                  {"quantity": "pump_flow", "value": 10, "unit": "L_per_min"}]}""")
                .statusCode(200)
                .body("method", containsString("Hagen-Poiseuille"))
                .body("results[0].values.find { it.unit == 'kPa' }.value", closeTo(64.5, 0.7))
                .body("results[1].values[0].value", closeTo(384.0, 4.0));
    }

    @Test
    void thrustOfAnEightInchPistonAt250Psi() {
        // F = p A: A = pi/4 * 8^2 = 50.27 in2; 250 psi * 50.27 in2 = 12566 lbf extending (drain 0).
        post("thrust", """
                {"inputs": [{"quantity": "supply_pressure", "value": 250, "unit": "psi"},
                            {"quantity": "piston_bore", "value": 8, "unit": "in"},
                            {"quantity": "rod_diameter", "value": 2, "unit": "in"},
                            {"quantity": "required_thrust", "value": 9000, "unit": "lbf"}]}""")
                .statusCode(200)
                .body("results[0].values.find { it.unit == 'lbf' }.value", closeTo(12566.0, 2.0))
                // Annulus: 50.27 - 3.14 = 47.12 in2 -> 11781 lbf; margin 11781 / 9000 = 1.309.
                .body("results[1].values.find { it.unit == 'lbf' }.value", closeTo(11781.0, 2.0))
                .body("results[2].values[0].value", closeTo(1.309, 0.002));
    }

    @Test
    void strokeTimeFromSweptVolumeAndPumpFlow() {
        // V = 50.27 in2 * 4 in = 201.1 in3 = 0.8705 US gal; at 2 gpm: 0.4353 min = 26.1 s.
        post("stroke-time", """
                {"inputs": [{"quantity": "piston_bore", "value": 8, "unit": "in"},
                            {"quantity": "stroke_length", "value": 4, "unit": "in"},
                            {"quantity": "pump_rated_flow", "value": 2, "unit": "gpm"}]}""")
                .statusCode(200)
                .body("results[0].values[0].value", closeTo(26.1, 0.1));
    }

    @Test
    void aSmallPilotPortLimitsTheStroke() {
        // Sharp-edged orifice, Q = Cd A sqrt(2 dp / rho): a 1.5 mm port (A = 1.767e-6 m2) with half
        // of 250 psi across each land (861.8 kPa) and rho(40 degC) = 856.1 kg/m3 gives
        // Q = 0.61 * 1.767e-6 * sqrt(2 * 861845 / 856.1) = 4.837e-5 m3/s = 2.90 L/min, less than the
        // 2 gpm (7.57 L/min) pump; the 3.295 L swept volume then takes 3.295e-3 / 4.837e-5 = 68.1 s.
        post("stroke-time", """
                {"inputs": [{"quantity": "piston_bore", "value": 8, "unit": "in"},
                            {"quantity": "stroke_length", "value": 4, "unit": "in"},
                            {"quantity": "pump_rated_flow", "value": 2, "unit": "gpm"},
                            {"quantity": "pilot_port_diameter", "value": 1.5, "unit": "mm"},
                            {"quantity": "supply_pressure_nominal", "value": 250, "unit": "psi"}]}""")
                .statusCode(200)
                .body("results[0].values[0].value", closeTo(68.1, 0.2))
                .body("results[0].text", containsString("pilot spool"))
                .body("results[2].values.find { it.unit == 'L_per_min' }.value", closeTo(2.90, 0.01));
    }

    @Test
    void iso4406CodeAtTheTableBoundaries() {
        // ISO 4406:2021 Table 1: >1300 to 2500 is 18, >320 to 640 is 16, >40 to 80 is 13 ("up to and including").
        post("iso4406", """
                {"cleanlinessTarget": "16/14/11", "inputs": [
                  {"quantity": "particle_count_4um", "value": 2500, "unit": "per_mL"},
                  {"quantity": "particle_count_6um", "value": 640, "unit": "per_mL"},
                  {"quantity": "particle_count_14um", "value": 80, "unit": "per_mL"}]}""")
                .statusCode(200)
                .body("results[0].text", containsString("18/16/13"))
                .body("results[0].text", containsString("over target"));
    }

    @Test
    void missingInputIsNamed() {
        given().filter(Contract.RESPONSES).contentType(ContentType.JSON)
                .body("{\"inputs\": [{\"quantity\": \"piston_bore\", \"value\": 8, \"unit\": \"in\"}]}")
                .post("/api/v1/calculations/thrust")
                .then().statusCode(400).body("detail", containsString("needs one of supply_pressure, supply_pressure_nominal"));
    }

    @Test
    void unknownCalculationIs404() {
        given().filter(Contract.RESPONSES).contentType(ContentType.JSON).body("{}")
                .post("/api/v1/calculations/horoscope")
                .then().statusCode(404).contentType("application/problem+json");
    }
}
