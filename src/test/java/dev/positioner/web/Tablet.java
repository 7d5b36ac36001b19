package dev.positioner.web;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * A headless Debian chromium sized like a tablet in portrait, and the few gestures the tests use.
 * Chromium and its driver come from the distribution (apt chromium chromium-driver) because this
 * machine cannot download a browser build.
 */
final class Tablet implements AutoCloseable {

    final ChromeDriver driver;
    private final Path profile;
    private final WebDriverWait wait;

    private static final String BROWSER = "/usr/bin/chromium";
    private static final String DRIVER = "/usr/bin/chromedriver";

    Tablet() {
        // Fail with the fix rather than a driver stack trace; skipping would hide a missing CI step.
        if (!new File(BROWSER).canExecute() || !new File(DRIVER).canExecute()) {
            throw new IllegalStateException("browser tests need Debian's chromium: apt-get install -y chromium chromium-driver");
        }
        try {
            profile = Files.createTempDirectory("tablet-profile");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        ChromeOptions options = new ChromeOptions();
        options.setBinary(BROWSER);
        options.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update",
                "--disable-sync", "--user-data-dir=" + profile, "--window-size=820,1180");
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(new File(DRIVER)).build();
        driver = new ChromeDriver(service, options);
        wait = new WebDriverWait(driver, Duration.ofSeconds(15));
    }

    /** Opens the page as a tablet that has never run a job: nothing left from an earlier test. */
    void openFresh(String url) {
        driver.get(url);
        js("localStorage.clear();");
        driver.navigate().refresh();
        waitVisible("step-tag");
    }

    Object js(String script, Object... args) {
        return ((JavascriptExecutor) driver).executeScript(script, args);
    }

    WebElement byId(String id) {
        return driver.findElement(By.id(id));
    }

    List<WebElement> all(String css) {
        return driver.findElements(By.cssSelector(css));
    }

    /**
     * Brings the control to the middle of the screen and taps it, as a thumb would; a plain click
     * may land on the fixed safety footer when the control sits at the bottom edge.
     */
    void tap(WebElement element) {
        js("arguments[0].scrollIntoView({block: 'center'});", element);
        element.click();
    }

    void tap(String id) {
        tap(byId(id));
    }

    boolean visible(String id) {
        return Boolean.TRUE.equals(js("const e = document.getElementById(arguments[0]);"
                + " return !!e && !e.closest('[hidden]') && e.getClientRects().length > 0;", id));
    }

    void waitVisible(String id) {
        wait.until(d -> visible(id));
    }

    /** Every request shows the busy bar; the answer is drawn once it is gone. */
    void waitIdle() {
        wait.until(d -> Boolean.TRUE.equals(js("return document.getElementById('busy').hidden"
                + " && document.getElementById('loading').hidden;")));
    }

    static final String AUTHOR = "R. Okafor";

    void startJob(String tag, List<String> seen, List<String> notSeen) {
        startJob(tag, null, seen, notSeen);
    }

    /** Fills the start screen (the name only when the tablet does not remember one) and the symptoms. */
    void startJob(String tag, String workOrder, List<String> seen, List<String> notSeen) {
        byId("tag").sendKeys(tag);
        if (workOrder != null) {
            byId("work-order").sendKeys(workOrder);
        }
        if (byId("author").getAttribute("value").isEmpty()) {
            byId("author").sendKeys(AUTHOR);
        }
        tap("to-symptoms");
        waitVisible("step-symptoms");
        seen.forEach(code -> tap(driver.findElement(By.cssSelector("label[for='sym-" + code + "-present']"))));
        notSeen.forEach(code -> tap(driver.findElement(By.cssSelector("label[for='sym-" + code + "-absent']"))));
        tap("to-readings");
        waitVisible("step-readings");
    }

    void reading(String quantity, String value, String unit) {
        new Select(byId("unit-" + quantity)).selectByValue(unit);
        WebElement input = byId("reading-" + quantity);
        input.clear();
        input.sendKeys(value);
    }

    void diagnose() {
        tap("diagnose");
        waitIdle();
    }

    List<WebElement> outcomeButtons() {
        return all("#outcomes button");
    }

    int answersShown() {
        return all("#answer-list li").size();
    }

    /** The id of the session the page has opened for this job, as it keeps it on the tablet. */
    String sessionId() {
        return (String) js("return JSON.parse(localStorage.getItem('positioner-job.job.v2')).sessionId;");
    }

    String text(String id) {
        return byId(id).getText().trim();
    }

    @Override
    public void close() {
        try {
            driver.quit();
        } finally {
            try (Stream<Path> files = Files.walk(profile)) {
                files.sorted(Comparator.reverseOrder()).map(Path::toFile).forEach(File::delete);
            } catch (IOException e) {
                // A temp profile left behind is harmless; the test result is what matters.
            }
        }
    }
}
