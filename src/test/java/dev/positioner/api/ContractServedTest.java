package dev.positioner.api;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import io.quarkus.test.junit.QuarkusTest;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

@QuarkusTest
class ContractServedTest {

    @Test
    void theContractIsServedByteForByte() throws Exception {
        byte[] served = given().get("/q/openapi").then().statusCode(200).extract().asByteArray();
        assertArrayEquals(Files.readAllBytes(Path.of("openapi/openapi.yaml")), served);
    }

    @Test
    void knowledgeBaseReportIsServed() {
        given().filter(Contract.VALIDATED).get("/api/v1/knowledge-base")
                .then().statusCode(200)
                .body("faults", equalTo(29))
                .body("checks", equalTo(33))
                .body("checkCodes", hasItems("watch_supply_during_stroke", "read_pump_inlet_vacuum"))
                .body("rules", greaterThan(30))
                .body("faultCodes", hasItem("pump_worn"));
    }

    @Test
    void healthIsUp() {
        given().get("/q/health/ready").then().statusCode(200).body("status", equalTo("UP"));
    }

    @Test
    void unknownPathsAnswerWithProblemDetails() {
        given().get("/api/v1/nothing-here").then().statusCode(404);
    }
}
