package dev.positioner.diagnosis;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;

import dev.positioner.api.Contract;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.http.ContentType;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Bad input gets a 400 problem+json naming the field, never a 500. */
@QuarkusTest
class DiagnosisValidationTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "unknown symptom        | {\"symptoms\": [\"squeaks\"]}                                                              | symptoms[0]",
        "unknown quantity       | {\"measurements\": [{\"quantity\": \"vibes\", \"value\": 1, \"unit\": \"psi\"}]}           | measurements[0].quantity",
        "unit of wrong kind     | {\"measurements\": [{\"quantity\": \"supply_pressure\", \"value\": 1, \"unit\": \"degC\"}]}| measurements[0].unit",
        "impossible pressure    | {\"measurements\": [{\"quantity\": \"supply_pressure\", \"value\": -40, \"unit\": \"psi\"}]}| measurements[0].value",
        "missing value          | {\"measurements\": [{\"quantity\": \"supply_pressure\", \"unit\": \"psi\"}]}               | measurements[0].value",
        "infinite value         | {\"measurements\": [{\"quantity\": \"supply_pressure\", \"value\": 1e999, \"unit\": \"psi\"}]}| measurements[0].value",
        "unknown check          | {\"checks\": [{\"check\": \"kick_it\", \"outcome\": \"normal\"}]}                          | checks[0].check",
        "unknown outcome        | {\"checks\": [{\"check\": \"read_filter_dp\", \"outcome\": \"low\"}]}                      | checks[0].outcome",
        "unknown unavailable    | {\"unavailableChecks\": [\"teleport\"]}                                                    | unavailableChecks[0]",
        "bad oil grade          | {\"asset\": {\"oilGrade\": \"SAE30\"}}                                                     | asset.oilGrade",
        "bad cleanliness code   | {\"asset\": {\"cleanlinessTarget\": \"16-14-11\"}}                                          | asset.cleanlinessTarget",
        "bad design unit        | {\"asset\": {\"design\": [{\"quantity\": \"piston_bore\", \"value\": 8, \"unit\": \"psi\"}]}}| asset.design[0].unit",
        "string for a number    | {\"measurements\": [{\"quantity\": \"supply_pressure\", \"value\": \"high\", \"unit\": \"psi\"}]}| measurements[0].value",
        "symptoms not a list    | {\"symptoms\": \"slow_stroke\"}                                                             | symptoms",
        "present and absent     | {\"symptoms\": [\"hunting\"], \"absentSymptoms\": [\"hunting\"]}                             | absentSymptoms[0]",
    })
    void badInputNamesTheField(String name, String body, String field) {
        given().filter(Contract.RESPONSES).contentType(ContentType.JSON).body(body)
                .post("/api/v1/diagnoses")
                .then().statusCode(400)
                .contentType("application/problem+json")
                .body("status", equalTo(400))
                .body("field", equalTo(field));
    }

    @Test
    void everyErrorIsListedNotJustTheFirst() {
        given().filter(Contract.RESPONSES).contentType(ContentType.JSON)
                .body("{\"symptoms\": [\"squeaks\"], \"checks\": [{\"check\": \"read_filter_dp\", \"outcome\": \"low\"}]}")
                .post("/api/v1/diagnoses")
                .then().statusCode(400)
                .body("errors.field", hasItems("symptoms[0]", "checks[0].outcome"))
                .body("errors[1].message", containsString("[normal, high]"));
    }

    @Test
    void malformedJsonIs400() {
        given().filter(Contract.RESPONSES).contentType(ContentType.JSON).body("{\"symptoms\": [")
                .post("/api/v1/diagnoses")
                .then().statusCode(400).contentType("application/problem+json");
    }

    @Test
    void malformedEncodingIs400() {
        byte[] body = {'{', '"', 's', 'y', 'm', 'p', 't', 'o', 'm', 's', '"', ':', '[', '"', (byte) 0xC3, (byte) 0x28, '"', ']', '}'};
        given().filter(Contract.RESPONSES).contentType("application/json; charset=UTF-8").body(body)
                .post("/api/v1/diagnoses")
                .then().statusCode(400).contentType("application/problem+json");
    }

    @Test
    void emptyBodyIs400() {
        given().filter(Contract.RESPONSES).contentType(ContentType.JSON).body("")
                .post("/api/v1/diagnoses")
                .then().statusCode(400).contentType("application/problem+json");
    }
}
