package dev.positioner.web;

import static io.restassured.RestAssured.given;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.api.Contract;
import io.quarkus.test.common.http.TestHTTPResource;
import io.restassured.path.json.JsonPath;
import io.quarkus.test.junit.QuarkusTest;
import java.io.IOException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chromium.ChromiumNetworkConditions;

/**
 * The technician's page in a real headless browser against the running service (demo plant on):
 * no part of the page or the API is stubbed. One browser serves the whole class, because starting
 * chromium costs more than the tests themselves.
 */
@QuarkusTest
class TabletPageTest {

    private static Tablet tablet;

    @TestHTTPResource("/")
    URL page;

    @BeforeAll
    static void startBrowser() {
        tablet = new Tablet();
    }

    @AfterAll
    static void stopBrowser() {
        if (tablet != null) {
            tablet.close();
        }
    }

    @BeforeEach
    void freshTablet() {
        tablet.openFresh(page.toString());
    }

    /**
     * A clogged supply filter on PV-2041: low supply read in bar, then the checks as the page asks
     * them, answering as that fault would (filter differential high, everything else normal), then
     * the job closed on the leading cause. The service's record of it is read back over the API.
     */
    @Test
    void guidedJobIsASessionThatStopsClosesAndLeavesARecord() throws IOException {
        tablet.startJob("PV-2041", "WO-77120", List.of("slow_stroke", "low_supply_pressure"), List.of("hunting"));
        tablet.reading("supply_pressure", "14", "bar");
        tablet.diagnose();

        assertTrue(tablet.visible("result"), "the diagnosis is shown");
        assertEquals("Valve PV-2041", tablet.byId("job-tag").getAttribute("textContent"));
        List<WebElement> causes = tablet.all("#cause-list > li");
        assertTrue(causes.size() >= 2 && causes.size() <= 5, "top causes only: " + causes.size());
        int previous = 101;
        for (WebElement cause : causes) {
            String pct = cause.findElement(By.className("cause-pct")).getText();
            assertTrue(pct.matches("\\d{1,3} %|<1 %"), "a percentage: " + pct);
            int value = pct.startsWith("<") ? 0 : Integer.parseInt(pct.replace(" %", ""));
            assertTrue(value <= previous, "most probable first");
            previous = value;
            assertTrue(cause.findElement(By.cssSelector(".cause-code b")).getText().matches("[A-Z]{3}"),
                    "ISO 14224 failure-mode code shown");
        }
        String firstBar = causes.get(0).findElement(By.cssSelector(".prob span")).getAttribute("style");
        assertTrue(firstBar.matches("width: ?[1-9][0-9.]*%;?"), "the leader's bar has its width: " + firstBar);
        // The reading was entered in bar, so the service's finding speaks of 14.0 bar, not psi.
        assertTrue(tablet.byId("finding-list").getAttribute("textContent").contains("14.0 bar"));
        assertCheckCardIsComplete();
        assertFalse(tablet.all("#caution-list li").isEmpty(), "cautions shown");
        tablet.js("window.scrollTo(0, 0);");
        Path shot = tablet.driver.getScreenshotAs(OutputType.FILE).toPath();
        Files.copy(shot, Path.of("target", "web-screenshot.png"), StandardCopyOption.REPLACE_EXISTING);

        int answers = 0;
        while (answers < 10 && tablet.visible("check-card")) {
            assertCheckCardIsComplete();
            String check = tablet.byId("check-card").getAttribute("data-check");
            if ("true".equals(tablet.byId("check-card").getAttribute("data-bypass"))) {
                tablet.tap("bypass-ack");
            }
            String outcome = "read_filter_dp".equals(check) ? "high"
                    : tablet.outcomeButtons().get(0).getAttribute("data-outcome");
            tablet.tap(tablet.byId("outcomes").findElement(By.cssSelector("[data-outcome='" + outcome + "']")));
            tablet.waitIdle();
            answers++;
            assertEquals(answers, tablet.answersShown(), "every answer is listed");
        }
        assertTrue(tablet.visible("stop-card"), "the planner stops within ten answers: " + answers);
        assertFalse(tablet.text("stop-reason").isBlank(), "the stop reason is shown");
        assertFalse(tablet.text("stop-action").isBlank(), "the leading cause's action is shown");
        String leader = tablet.all("#cause-list .cause-title").get(0).getText();
        String leaderCode = tablet.all("#cause-list > li").get(0).getAttribute("data-fault");
        assertTrue(tablet.text("stop-title").startsWith(leader), tablet.text("stop-title"));

        tablet.tap("stop-close");
        tablet.waitVisible("step-close");
        assertEquals(tablet.all("#cause-list > li").size() + 1, tablet.all("#close-causes input").size(),
                "the ranked causes and \"not found\" to choose from");
        tablet.tap(tablet.driver.findElement(By.cssSelector("label[for='cause-not_found']")));
        tablet.tap("close-send");
        assertTrue(tablet.text("notice").contains("What you did"), "a missing action is named: " + tablet.text("notice"));
        tablet.tap(tablet.driver.findElement(By.cssSelector("label[for='cause-" + leaderCode + "']")));
        tablet.byId("close-action").sendKeys("Replaced the supply filter element");
        tablet.byId("close-parts").sendKeys("Filter element 10 µm\nO-ring 38x3");
        tablet.byId("close-minutes").sendKeys("50");
        tablet.tap("close-send");
        tablet.waitIdle();

        tablet.waitVisible("step-closed");
        Files.copy(tablet.driver.getScreenshotAs(OutputType.FILE).toPath(), Path.of("target", "web-closure.png"),
                StandardCopyOption.REPLACE_EXISTING);
        assertEquals(leader, tablet.text("closure-fault"));
        assertTrue(tablet.text("closure-mode").matches("[A-Z]{3}"), tablet.text("closure-mode"));
        assertFalse(tablet.text("closure-mechanism").isBlank());
        assertFalse(tablet.text("closure-cause").isBlank());
        assertEquals("Filter element 10 µm; O-ring 38x3", tablet.text("closure-parts"));
        assertEquals("WO-77120", tablet.text("closure-work-order"));

        String id = tablet.sessionId();
        assertEquals(id, tablet.text("closure-session"));
        JsonPath session = given().filter(Contract.VALIDATED).get("/api/v1/sessions/" + id)
                .then().statusCode(200).extract().jsonPath();
        assertEquals("closed", session.getString("status"));
        assertEquals("PV-2041", session.getString("tag"));
        assertEquals("WO-77120", session.getString("workOrder"));
        assertEquals(Tablet.AUTHOR, session.getString("openedBy"));
        assertEquals(leaderCode, session.getString("closure.confirmedFault"));
        assertEquals(tablet.text("closure-mode"), session.getString("closure.failureMode"));
        Map<String, Long> types = session.<String>getList("events.type").stream()
                .collect(Collectors.groupingBy(t -> t, Collectors.counting()));
        assertEquals(Map.of("opened", 1L, "symptom", 3L, "reading", 1L, "check", (long) answers, "closed", 1L), types,
                "every answer stored once, nothing else");
        assertEquals(answers, session.getList("events.findAll { it.type == 'check' }.data.check").stream().distinct().count(),
                "no check stored twice");
    }

    @Test
    void bypassCheckCannotBeAnsweredUntilPermissionIsAcknowledged() {
        tablet.startJob("PV-2041", List.of("creep_at_zero_signal"), List.of());
        tablet.diagnose();
        // Quick readings come first; answering them normal leads to a check that needs a bypass.
        for (int i = 0; i < 8 && !"true".equals(tablet.byId("check-card").getAttribute("data-bypass")); i++) {
            tablet.tap(tablet.outcomeButtons().get(0));
            tablet.waitIdle();
        }
        WebElement card = tablet.byId("check-card");
        assertEquals("true", card.getAttribute("data-bypass"), "a bypass check was reached");
        String bypassCheck = card.getAttribute("data-check");
        String bypassTitle = tablet.text("check-title");
        int answered = tablet.answersShown();

        assertTrue(tablet.visible("bypass-ack-label"));
        assertTrue(tablet.byId("caution-panel").getAttribute("class").contains("bypass"));
        // Read as written: the heading is upper-cased by the style sheet only.
        assertTrue(tablet.byId("caution-heading").getAttribute("textContent").startsWith("Bypass needed"));
        assertTrue(Boolean.TRUE.equals(tablet.js("return !!(document.getElementById('caution-panel')"
                + ".compareDocumentPosition(document.getElementById('check-card')) & Node.DOCUMENT_POSITION_FOLLOWING);")),
                "the cautions come before the check");
        assertTrue(tablet.outcomeButtons().stream().noneMatch(WebElement::isEnabled), "answers locked");
        tablet.js("arguments[0].click();", tablet.outcomeButtons().get(0));
        assertEquals(answered, tablet.answersShown(), "a locked answer is not taken");

        tablet.tap("bypass-ack");
        assertTrue(tablet.outcomeButtons().stream().allMatch(WebElement::isEnabled), "answers unlocked");

        tablet.tap("cant-do");
        tablet.waitIdle();
        assertNotEquals(bypassCheck, tablet.byId("check-card").getAttribute("data-check"), "another check is asked");
        assertEquals(1, tablet.all("#set-aside-list li").size(), "the check is set aside");
        assertTrue(tablet.text("set-aside-list").contains(bypassTitle), tablet.text("set-aside-list"));
    }

    @Test
    void unknownTagAndImpossibleReadingAreExplainedInPlainWords() {
        tablet.startJob("TV-1250", List.of("slow_stroke"), List.of());
        tablet.diagnose();
        assertTrue(tablet.visible("step-tag"), "back to the tag to correct it");
        String unknown = tablet.text("notice");
        assertTrue(unknown.contains("Valve “TV-1250” is not on file"), unknown);
        assertTrue(unknown.contains("no valve tag 'TV-1250'"), "the service's words too: " + unknown);
        tablet.tap(tablet.driver.findElement(By.cssSelector("#notice [data-tag='TV-1520']")));
        assertEquals("TV-1520", tablet.byId("tag").getAttribute("value"), "a registered tag is offered");
        tablet.tap("to-symptoms");
        tablet.tap("to-readings");
        tablet.reading("supply_pressure", "-5", "bar");
        tablet.diagnose();

        assertTrue(tablet.visible("notice"));
        String notice = tablet.text("notice");
        assertTrue(notice.contains("Supply pressure at the positioner"), notice);
        assertTrue(notice.contains("not a possible supply pressure"), notice);
        assertTrue(notice.contains("measurements[0].value"), "the field as the service named it: " + notice);
        assertEquals("true", tablet.byId("reading-supply_pressure").getAttribute("aria-invalid"));
        assertTrue(tablet.visible("step-readings"), "stays on the readings to correct them");

        tablet.reading("supply_pressure", "12", "bar");
        tablet.diagnose();
        assertTrue(tablet.visible("result"));
        assertFalse(tablet.visible("notice"), "the problem is cleared once the reading is valid");

        // Changing the start of an open job sends only the changes: a new symptom, a reading taken back.
        tablet.tap("edit-start");
        tablet.waitVisible("step-symptoms");
        tablet.tap(tablet.driver.findElement(By.cssSelector("label[for='sym-hunting-present']")));
        tablet.tap("to-readings");
        tablet.byId("reading-supply_pressure").clear();
        tablet.diagnose();
        assertTrue(tablet.visible("result"));
        JsonPath session = given().filter(Contract.VALIDATED).get("/api/v1/sessions/" + tablet.sessionId())
                .then().statusCode(200).extract().jsonPath();
        assertEquals(List.of("opened", "symptom", "reading", "symptom", "retraction"), session.getList("events.type"));
        assertEquals("hunting", session.getString("events[3].data.symptom"));
        assertEquals(3, session.getInt("events[4].data.retracts"), "the reading is taken back");
    }

    @Test
    void reloadKeepsTheJobUndoTakesBackAndOfflineAnswersWaitForRetry() {
        tablet.startJob("LV-0812", List.of("hunting"), List.of());
        tablet.diagnose();
        String first = tablet.text("check-title");
        tablet.tap(tablet.outcomeButtons().get(0));
        tablet.waitIdle();
        String second = tablet.text("check-title");
        assertNotEquals(first, second);

        tablet.driver.navigate().refresh();
        tablet.waitVisible("result");
        tablet.waitIdle();
        assertEquals("Valve LV-0812", tablet.byId("job-tag").getAttribute("textContent"));
        assertEquals(1, tablet.answersShown(), "the answer survived the reload");
        assertEquals(second, tablet.text("check-title"));

        tablet.tap("undo");
        tablet.waitIdle();
        assertEquals(0, tablet.answersShown());
        assertEquals(first, tablet.text("check-title"), "undo asks the first check again");

        ChromiumNetworkConditions offline = new ChromiumNetworkConditions();
        offline.setOffline(true);
        tablet.driver.setNetworkConditions(offline);
        try {
            tablet.tap(tablet.outcomeButtons().get(0));
            tablet.waitIdle();
            assertTrue(tablet.text("notice").startsWith("Offline — answers kept, retry"), tablet.text("notice"));
            assertEquals(1, tablet.answersShown(), "the answer tapped offline is kept");
            assertTrue(tablet.outcomeButtons().stream().noneMatch(WebElement::isEnabled),
                    "the old question cannot be answered again while its answer is pending");
            assertEquals("1 answer waiting to be sent", tablet.text("waiting"));
            // Back on a slow link: the page sends the kept answer by itself, and the request is
            // still running while the screen is looked at.
            ChromiumNetworkConditions slow = new ChromiumNetworkConditions();
            slow.setLatency(Duration.ofMillis(1500));
            tablet.driver.setNetworkConditions(slow);
            tablet.waitVisible("busy");
            assertFalse(tablet.byId("undo").isEnabled(), "buttons wait for the answer");
            assertFalse(tablet.byId("new-job").isEnabled(), "buttons wait for the answer");
            tablet.waitIdle();
        } finally {
            tablet.driver.deleteNetworkConditions();
        }
        assertFalse(tablet.visible("notice"));
        assertFalse(tablet.visible("waiting"));
        assertEquals(second, tablet.text("check-title"), "the kept answer was sent once back online");
        JsonPath session = given().filter(Contract.VALIDATED).get("/api/v1/sessions/" + tablet.sessionId())
                .then().statusCode(200).extract().jsonPath();
        assertEquals(List.of("check", "retraction", "check"),
                session.getList("events.findAll { it.type in ['check', 'retraction'] }.type"),
                "answer, its undo and the answer tapped offline, each stored once");

        tablet.tap("new-job");
        tablet.tap("new-job");
        tablet.waitVisible("step-tag");
        assertEquals("", tablet.byId("tag").getAttribute("value"));
        assertEquals("", tablet.byId("job-tag").getAttribute("textContent"));
    }

    /**
     * The answer reaches the service but its reply is lost on the way back (the Wi-Fi drops), then
     * the undo is tapped with no network at all. Retry sends both in order; the answer goes with
     * the key it was first sent with, so the service replays it instead of storing it again.
     */
    @Test
    void answerWhoseReplyIsLostIsStoredOnceAndQueuedUndoFollowsInOrder() {
        tablet.startJob("LV-0812", List.of("hunting"), List.of());
        tablet.diagnose();
        String first = tablet.text("check-title");
        String check = tablet.byId("check-card").getAttribute("data-check");
        tablet.js("""
                const real = window.fetch;
                window.sentPosts = [];
                window.lostReplies = 2;
                window.fetch = async function (url, options) {
                  const res = await real.apply(this, arguments);
                  if (options && options.method === 'POST') {
                    window.sentPosts.push({ url: String(url), key: options.headers['Idempotency-Key'],
                      replayed: res.headers.get('Idempotent-Replayed') });
                    if (window.lostReplies > 0) {
                      window.lostReplies--;
                      throw new TypeError('Failed to fetch');
                    }
                  }
                  return res;
                };""");
        tablet.tap(tablet.outcomeButtons().get(0));
        tablet.waitIdle();
        assertTrue(tablet.text("notice").startsWith("Offline — answers kept, retry"), tablet.text("notice"));
        assertEquals("1 answer waiting to be sent", tablet.text("waiting"));
        assertEquals(1, tablet.answersShown());
        tablet.tap("retry");
        tablet.waitIdle();
        assertEquals("1 answer waiting to be sent", tablet.text("waiting"), "its reply was lost once more");

        ChromiumNetworkConditions offline = new ChromiumNetworkConditions();
        offline.setOffline(true);
        tablet.driver.setNetworkConditions(offline);
        try {
            tablet.tap("undo");
            tablet.waitIdle();
            assertEquals("2 answers waiting to be sent", tablet.text("waiting"), "the undo waits behind the answer");
            assertEquals(0, tablet.answersShown());
        } finally {
            tablet.driver.deleteNetworkConditions();
        }
        // Back online the page sends what waited by itself.
        tablet.waitIdle();
        assertFalse(tablet.visible("waiting"), "nothing left to send");
        assertFalse(tablet.visible("notice"));
        assertEquals(first, tablet.text("check-title"), "after the undo the first check is asked again");

        List<Map<String, String>> posts = (List<Map<String, String>>) tablet.js("return window.sentPosts;");
        List<Map<String, String>> checkPosts = posts.stream().filter(p -> p.get("url").endsWith("/checks")).toList();
        assertEquals(3, checkPosts.size(), "the answer reached the service three times: " + posts);
        assertTrue(checkPosts.stream().allMatch(p -> p.get("key").equals(checkPosts.get(0).get("key"))), "with one key");
        assertEquals(List.of("false", "true", "true"), checkPosts.stream().map(p -> p.get("replayed")).toList(),
                "after the first, the service answered from its record");

        JsonPath session = given().filter(Contract.VALIDATED).get("/api/v1/sessions/" + tablet.sessionId())
                .then().statusCode(200).extract().jsonPath();
        List<Map<String, Object>> checks = session.getList("events.findAll { it.type == 'check' }");
        assertEquals(1, checks.size(), "the answer is stored once: " + checks);
        assertEquals(check, ((Map<?, ?>) checks.get(0).get("data")).get("check"));
        List<Integer> retracted = session.getList("events.findAll { it.type == 'retraction' }.data.retracts");
        assertEquals(List.of(checks.get(0).get("seq")), retracted, "the undo took back that answer, once");
    }

    private static void assertCheckCardIsComplete() {
        assertTrue(tablet.visible("check-card"), "the next check is the main card");
        assertFalse(tablet.text("check-title").isBlank());
        String minutes = tablet.byId("check-minutes").getAttribute("textContent");
        assertTrue(minutes.matches("about [0-9.]+ min"), minutes);
        assertFalse(tablet.all("#check-steps li").isEmpty(), "instructions shown");
        assertTrue(tablet.outcomeButtons().size() >= 2, "outcome buttons shown");
        assertFalse(tablet.text("check-why").isBlank(), "why this check is shown");
    }
}
