package dev.positioner.web;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItems;

import dev.positioner.api.Contract;
import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

/** The page's word list comes from the loaded knowledge base and keeps to the contract. */
@QuarkusTest
class VocabularyResourceTest {

    @Test
    void listsTheCodesWithTheirWords() {
        given().filter(Contract.VALIDATED)
                .get("/api/v1/vocabulary")
                .then().statusCode(200)
                .body("symptoms.code", hasItems("creep_at_zero_signal", "slow_stroke", "oil_foaming_or_milky"))
                .body("symptoms.find { it.code == 'slow_stroke' }.text",
                        equalTo("The valve takes clearly longer than usual to travel between positions"))
                .body("measurements.find { it.code == 'supply_pressure' }.units", hasItems("psi", "bar", "kPa"))
                .body("measurements.find { it.code == 'pump_flow' }.units", hasItems("gpm", "L_per_min"))
                .body("measurements.find { it.code == 'oil_temperature' }.kind", equalTo("temperature"))
                .body("checks.find { it.code == 'read_filter_dp' }.outcomes", equalTo(java.util.List.of("normal", "high")))
                .body("checks.find { it.code == 'read_filter_dp' }.bypassRequired", equalTo(false))
                .body("checks.find { it.code == 'pilot_null_alignment' }.bypassRequired", equalTo(true))
                .body("faults.code", hasItems("pump_worn", "not_in_catalogue"))
                .body("faults.find { it.code == 'pump_worn' }.failureMode", equalTo("LOO"));
    }

    /** The test profile loads the invented demonstration plant, so its tags must be offered. */
    @Test
    void offersTheRegisteredTags() {
        given().filter(Contract.VALIDATED)
                .get("/api/v1/vocabulary")
                .then().statusCode(200)
                .body("tags.tag", hasItems("PV-2041", "FV-3107", "TV-1520", "LV-0812"))
                .body("tags.find { it.tag == 'PV-2041' }.description", containsString("steam"));
    }
}
