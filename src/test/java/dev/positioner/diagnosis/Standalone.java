package dev.positioner.diagnosis;

import dev.positioner.asset.DemoPlant;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.knowledge.KnowledgeBaseLoader;
import java.nio.file.Path;

/** The diagnosis service without the container, on the shipped knowledge base and the demo plant. */
final class Standalone {

    static final KnowledgeBase KB = KnowledgeBaseLoader.load(Path.of("rules"));

    private Standalone() {
    }

    static DiagnosisService service() {
        return new DiagnosisService(KB, new RuleEngine(KB), new DemoPlant(true), new CataloguePriors(), new CatalogueSymptomRates(), 0.9, 0.05, 120, 0.5, 6, false);
    }
}
