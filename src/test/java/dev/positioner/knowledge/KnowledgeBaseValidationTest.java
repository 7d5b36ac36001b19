package dev.positioner.knowledge;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shipped knowledge base loads cleanly, and a broken copy is refused with every problem listed
 * by file and line: the reliability engineer must get the whole list from one failed start.
 */
class KnowledgeBaseValidationTest {

    static KnowledgeBase shipped;

    @BeforeAll
    static void load() {
        shipped = KnowledgeBaseLoader.load(Path.of("rules"));
    }

    @Test
    void shippedBaseCoversTheWholeBaseVocabulary() throws IOException {
        BaseVocabulary base = BaseVocabulary.read(Path.of("rules/base-vocabulary.yaml"));
        assertTrue(shipped.catalogue().faults().keySet().containsAll(base.faults()));
        assertTrue(shipped.catalogue().symptoms().keySet().containsAll(base.symptoms()));
        assertTrue(shipped.catalogue().checks().keySet().containsAll(base.checkOutcomes().keySet()));
        assertTrue(shipped.catalogue().measurements().keySet().containsAll(base.measurements()));
    }

    @Test
    void baseVocabularyCopyMatchesTheSharedContract() throws IOException {
        Path shared = Path.of("../shared/vocabulary.yaml");
        if (Files.exists(shared)) {
            assertEquals(Files.readString(shared), Files.readString(Path.of("rules/base-vocabulary.yaml")),
                    "rules/base-vocabulary.yaml must be an unchanged copy of shared/vocabulary.yaml");
        }
    }

    @Test
    void aBrokenBaseIsRefusedWithEveryProblemLocated(@TempDir Path tmp) throws IOException {
        Path rules = copy(Path.of("rules"), tmp.resolve("rules"));
        edit(rules.resolve("catalogue/faults.yaml"), "    prior: 0.045\n", "    prior: 1.45\n");
        edit(rules.resolve("catalogue/checks.yaml"), "otherwise: {normal: 0.92, low: 0.05, high: 0.03}",
                "otherwise: {normal: 0.82, low: 0.05, high: 0.03}");
        edit(rules.resolve("catalogue/checks.yaml"), "      pump_worn: {normal: 0.58, low: 0.4, high: 0.02}",
                "      pump_wron: {normal: 0.58, low: 0.4, high: 0.02}");
        edit(rules.resolve("catalogue/symptoms.yaml"), "source: [from_memory]", "source: [hearsay]");
        edit(rules.resolve("context/hunting.drl"), "rule \"CTX-HUN-02 ", "rule \"cycling ");
        edit(rules.resolve("safety/cautions.drl"), "new Caution(\"hot_oil\")", "new Caution(\"hot_oill\")");
        Files.writeString(rules.resolve("interpret/broken.drl"), "package interpret;\nrule \"INT-BRK-01 x\"\nwhen\n  Nonsense(\nthen\nend\n");

        KnowledgeBaseException e = assertThrows(KnowledgeBaseException.class, () -> KnowledgeBaseLoader.load(rules));
        List<String> problems = e.problems().stream().map(KnowledgeProblem::toString).toList();
        String all = String.join("\n", problems);
        assertTrue(all.contains("prior = 1.45 must lie strictly between 0 and 1"), all);
        assertTrue(all.contains("priors of all faults and the unlisted cause sum to"), all);
        assertTrue(all.matches("(?s).*rules/catalogue/checks.yaml:\\d+ \\[read_supply_pressure/otherwise].*sums to 0.9000.*"), all);
        assertTrue(all.contains("unknown fault code 'pump_wron'"), all);
        assertTrue(all.contains("unknown source id 'hearsay'"), all);
        assertTrue(all.contains("rules/interpret/broken.drl"), all);
        assertTrue(all.matches("(?s).*rules/safety/cautions.drl:\\d+: caution 'hot_oill'.*"), all);
    }

    @Test
    void ruleNamesWithoutStableIdsAreRefused(@TempDir Path tmp) throws IOException {
        Path rules = copy(Path.of("rules"), tmp.resolve("rules"));
        edit(rules.resolve("context/hunting.drl"), "rule \"CTX-HUN-02 ", "rule \"cycling ");
        KnowledgeBaseException e = assertThrows(KnowledgeBaseException.class, () -> KnowledgeBaseLoader.load(rules));
        assertTrue(e.getMessage().contains("rule name must start with a stable ID"), e.getMessage());
    }

    @Test
    void aDroppedBaseCodeIsRefused(@TempDir Path tmp) throws IOException {
        Path rules = copy(Path.of("rules"), tmp.resolve("rules"));
        String faults = Files.readString(rules.resolve("catalogue/symptoms.yaml"));
        Files.writeString(rules.resolve("catalogue/symptoms.yaml"), faults.replace("  noisy_pump:", "  noisy_pumps:"));
        KnowledgeBaseException e = assertThrows(KnowledgeBaseException.class, () -> KnowledgeBaseLoader.load(rules));
        assertTrue(e.getMessage().contains("[noisy_pump]: base symptom code is missing"), e.getMessage());
    }

    @Test
    void reportListsTheBlindSpots() {
        KnowledgeBaseReport report = KnowledgeBaseReport.of(shipped);
        assertEquals(shipped.catalogue().faults().size(), report.faults());
        // Every reported pair really is below the threshold on its best check.
        report.indistinguishable().forEach(p -> assertTrue(p.separation() < KnowledgeBaseReport.SEPARATION));
        // And a pair the tables do separate (a reversed-port check) is not reported.
        assertTrue(report.indistinguishable().stream().noneMatch(p -> p.faultA().equals("ports_reversed") || p.faultB().equals("ports_reversed")));
        assertTrue(KnowledgeBaseReport.bestSeparation(shipped.catalogue(), "ports_reversed", "pump_worn").separation() > 0.8);
    }

    static void edit(Path file, String from, String to) throws IOException {
        String text = Files.readString(file);
        assertTrue(text.contains(from), "fixture text not found in " + file + ": " + from);
        Files.writeString(file, text.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to)));
    }

    static Path copy(Path from, Path to) throws IOException {
        try (Stream<Path> walk = Files.walk(from)) {
            for (Path p : walk.toList()) {
                Path target = to.resolve(from.relativize(p).toString());
                if (Files.isDirectory(p)) {
                    Files.createDirectories(target);
                } else {
                    Files.copy(p, target);
                }
            }
        }
        return to;
    }
}
