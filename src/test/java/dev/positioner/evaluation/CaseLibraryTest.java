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
    /** Every library: every rule about a usable case holds for the held-out cases too. */
    static List<CaseLibrary> libraries;

    @BeforeAll
    static void load() {
        evaluation = new Evaluation();
        catalogue = evaluation.kb.catalogue();
        library = CaseLibrary.load(CaseLibrary.DEFAULT_DIR);
        libraries = CaseLibrary.ALL_DIRS.stream().map(CaseLibrary::load).toList();
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

    /**
     * In the development cases a gauge reading in the request and the case's answer for the same
     * check must tell the same story. The held-out writers' readings are not corrected to agree:
     * where they read a gauge differently from the knowledge base, the evaluation report lists it.
     */
    @Test
    void presentingReadingsAgreeWithTheCaseAnswers() {
        List<String> disagreements = ReadingProbe.disagreements(evaluation.service, catalogue, library.all());
        assertTrue(disagreements.isEmpty(), String.join("\n", disagreements));
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
