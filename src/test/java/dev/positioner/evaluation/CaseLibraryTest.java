package dev.positioner.evaluation;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.knowledge.Catalogue;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.yaml.snakeyaml.Yaml;

/** The case library covers every base fault and every case is one the service accepts as written. */
class CaseLibraryTest {

    static Evaluation evaluation;
    static Catalogue catalogue;
    static CaseLibrary library;
    /** Both libraries: every rule about a usable case holds for the held-out cases too. */
    static List<CaseLibrary> libraries;

    @BeforeAll
    static void load() {
        evaluation = new Evaluation();
        catalogue = evaluation.kb.catalogue();
        library = CaseLibrary.load(CaseLibrary.DEFAULT_DIR);
        libraries = List.of(library, CaseLibrary.load(CaseLibrary.HELD_OUT_DIR));
    }

    @Test
    @SuppressWarnings("unchecked")
    void everyBaseFaultHasAtLeastOneCase() throws IOException {
        Map<String, Object> base = new Yaml().load(Files.readString(Path.of("rules", "base-vocabulary.yaml")));
        Set<String> missing = new TreeSet<>(((Map<String, Object>) base.get("faults")).keySet());
        library.all().forEach(c -> missing.remove(c.truth()));
        assertTrue(missing.isEmpty(), "base faults without a case: " + missing);
    }

    @Test
    void everyCaseIsValidAgainstTheCatalogue() {
        List<String> problems = libraries.stream().flatMap(l -> l.problems(catalogue).stream()).toList();
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void theServiceAcceptsEveryPresentingRequest() {
        assertAll(libraries.stream().flatMap(l -> l.all().stream()).map(c -> () -> assertDoesNotThrow(() -> evaluation.service.diagnose(c.request()),
                c.id() + " is rejected")));
    }

    /** A gauge reading in the request and the case's answer for the same check must tell the same story. */
    @Test
    void presentingReadingsAgreeWithTheCaseAnswers() {
        ReadingProbe probe = new ReadingProbe(evaluation.service, catalogue);
        assertAll(libraries.stream().flatMap(l -> l.all().stream()).flatMap(c -> probe.knownFromReadings(c.request()).entrySet().stream()
                .map(e -> () -> assertEquals(c.answer(catalogue.checks().get(e.getKey())), e.getValue(),
                        c.id() + ": reading implies " + e.getKey() + "=" + e.getValue()))));
    }

    @Test
    void validationCatchesAnInvalidCase() {
        EvaluationCase bad = new EvaluationCase("x-1", "pump_tired", "", false,
                new DiagnosisRequest(List.of(), null, null, null, null, null),
                Map.of("listen_pump", "screaming", "tap_the_gauge", "ok"));
        List<String> problems = CaseLibrary.problems(bad, "pump_worn", catalogue);
        String all = String.join("\n", problems);
        assertAll(() -> assertEquals(5, problems.size(), all),
                () -> assertTrue(all.contains("'pump_tired' is not a catalogue fault"), all),
                () -> assertTrue(all.contains("has no story"), all),
                () -> assertTrue(all.contains("presents 0 symptoms"), all),
                () -> assertTrue(all.contains("'screaming' is not an outcome of listen_pump"), all),
                () -> assertTrue(all.contains("unknown check 'tap_the_gauge'"), all));
        EvaluationCase good = library.all().get(0);
        assertFalse(CaseLibrary.problems(good, good.truth(), catalogue).iterator().hasNext());
    }
}
