package dev.positioner.asset;

import static io.restassured.RestAssured.given;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.not;

import dev.positioner.api.Contract;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.http.ContentType;
import io.restassured.specification.RequestSpecification;
import java.util.List;
import java.util.UUID;
import org.junit.jupiter.api.Test;

@QuarkusTest
class AssetResourceTest {

    static RequestSpecification api() {
        return given().filter(Contract.VALIDATED).contentType(ContentType.JSON);
    }

    static String tag() {
        return "A-" + UUID.randomUUID().toString().substring(0, 8).toUpperCase();
    }

    @Test
    void aValveIsStoredAsTheDiagnosisWillReadIt() {
        String tag = tag();
        String body = """
                {"tag": "%s", "area": "Unit 3 boiler house", "oilGrade": "ISO VG 32", "cleanlinessTarget": " 17 / 15 / 12 ",
                 "design": [{"quantity": "piston_bore", "value": 160, "unit": "mm"},
                            {"quantity": "design_stroke_time", "value": 12, "unit": "s"}]}""".formatted(tag);
        api().body(body).post("/api/v1/assets").then().statusCode(201)
                .header("Location", containsString("/api/v1/assets/" + tag))
                .body("oilGrade", equalTo("VG32"), "cleanlinessTarget", equalTo("17/15/12"), "design.quantity",
                        equalTo(List.of("piston_bore", "design_stroke_time")));
        // The same create again is a harmless retry; other data under the same tag is a conflict.
        api().body(body).post("/api/v1/assets").then().statusCode(200);
        api().body(body.replace("160", "170")).post("/api/v1/assets").then().statusCode(409)
                .contentType("application/problem+json");
        api().get("/api/v1/assets/" + tag).then().statusCode(200).body("area", equalTo("Unit 3 boiler house"));

        api().body("{\"description\": \"renamed\", \"oilGrade\": \"VG46\"}").put("/api/v1/assets/" + tag)
                .then().statusCode(200).body("tag", equalTo(tag), "description", equalTo("renamed"), "design", equalTo(List.of()));
        String fresh = tag();
        api().body("{\"oilGrade\": \"VG46\"}").put("/api/v1/assets/" + fresh).then().statusCode(201);
        api().body("{\"tag\": \"OTHER-1\"}").put("/api/v1/assets/" + fresh).then().statusCode(400).body("field", equalTo("tag"));
    }

    @Test
    void designDataIsCheckedWithTheDiagnosisQuantitiesAndUnits() {
        api().body("""
                {"tag": "%s", "oilGrade": "SAE 30", "cleanlinessTarget": "16/14",
                 "design": [{"quantity": "piston_bore", "value": 8, "unit": "psi"},
                            {"quantity": "stroke_length", "value": 400, "unit": "in"},
                            {"quantity": "flux_capacitance", "value": 1, "unit": "F"},
                            {"quantity": "piston_bore", "value": 8, "unit": "in"}]}""".formatted(tag()))
                .post("/api/v1/assets").then().statusCode(400).contentType("application/problem+json")
                .body("errors.field", equalTo(List.of("oilGrade", "cleanlinessTarget", "design[0].unit", "design[1].value",
                        "design[2].quantity", "design[3].quantity")));
        api().body("{\"tag\": \"has space\"}").post("/api/v1/assets").then().statusCode(400).body("field", equalTo("tag"));
        api().get("/api/v1/assets/NO-SUCH-TAG").then().statusCode(404).contentType("application/problem+json");
    }

    @Test
    void searchByTagOrArea() {
        api().queryParam("area", "BOILER HOUSE").get("/api/v1/assets").then().statusCode(200)
                .body("assets.tag", hasItem("PV-2041"), "assets.tag", not(hasItem("FV-3107")));
        api().queryParam("tag", "v-").queryParam("site", "brennmoor").get("/api/v1/assets").then().statusCode(200)
                .body("assets.tag", hasItems("PV-2041", "FV-3107", "TV-1520", "LV-0812"));
    }

    @Test
    void csvImportStoresGoodRowsAndReportsEachRejectedRow() {
        String a = tag();
        String b = tag();
        String c = tag();
        String csv = """
                tag,area,oilGrade,piston_bore[in],stroke_length,pump_rated_flow[gpm]
                %s,Hall 1,VG46,8,4 in,2
                ,Hall 1,VG46,8,4 in,2
                %s,Hall 2,VG46,8 inches,4 in,two
                %s,Hall 2,VG99,8,4 in,2
                %s,Hall 1,VG46,8,4 in,2
                PV-2041,"Unit 2 boiler house, level +12 m",VG46,8,4 in,2
                """.formatted(a, b, c, a);
        given().filter(Contract.VALIDATED).contentType("text/csv").body(csv).post("/api/v1/assets/import")
                .then().statusCode(200)
                .body("rows", equalTo(6), "created", equalTo(1), "updated", equalTo(0),
                        "rejected.row", equalTo(List.of(3, 4, 5, 6, 7)),
                        "rejected[0].errors[0].field", equalTo("tag"),
                        "rejected[1].errors.field", equalTo(List.of("piston_bore[in]", "pump_rated_flow[gpm]")),
                        "rejected[2].errors.field", equalTo(List.of("oilGrade")),
                        "rejected[3].errors[0].message", containsString("also in row 2"),
                        "rejected[4].errors[0].message", containsString("update=true"));
        api().get("/api/v1/assets/" + a).then().statusCode(200)
                .body("design.unit", equalTo(List.of("in", "in", "gpm")));
        given().filter(Contract.VALIDATED).contentType("text/csv").queryParam("update", true)
                .body("tag,area\n" + a + ",Hall 9\n").post("/api/v1/assets/import")
                .then().statusCode(200).body("updated", equalTo(1), "rejected", equalTo(List.of()));
        given().filter(Contract.VALIDATED).contentType("text/csv").body("tag,colour\nX-1,red\n").post("/api/v1/assets/import")
                .then().statusCode(400).body("field", equalTo("header[1]"));
    }

    @Test
    void aDiagnosisNamingATagGetsItsDesignDataFromTheRegistry() {
        String bare = tag();
        api().body("{\"tag\": \"" + bare + "\"}").post("/api/v1/assets").then().statusCode(201);
        String withTime = tag();
        api().body("{\"tag\": \"" + withTime + "\", \"design\": [{\"quantity\": \"design_stroke_time\", \"value\": 40, \"unit\": \"s\"}]}")
                .post("/api/v1/assets").then().statusCode(201);
        String request = "{\"symptoms\": [\"slow_stroke\"], \"asset\": {\"tag\": \"%s\"}}";
        api().body(request.formatted(bare)).post("/api/v1/diagnoses").then().statusCode(200)
                .body("assumptions", hasItem(containsString("No design stroke time")));
        api().body(request.formatted(withTime)).post("/api/v1/diagnoses").then().statusCode(200)
                .body("assumptions", not(hasItem(containsString("No design stroke time"))));
        api().body("{\"description\": \"stroke time removed\"}").put("/api/v1/assets/" + withTime).then().statusCode(200);
        api().body(request.formatted(withTime)).post("/api/v1/diagnoses").then().statusCode(200)
                .body("assumptions", hasItem(containsString("No design stroke time")));
    }
}
