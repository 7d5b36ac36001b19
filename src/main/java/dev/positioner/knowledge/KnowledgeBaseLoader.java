package dev.positioner.knowledge;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.kie.api.KieBase;

/**
 * Loads and validates the whole knowledge base from a {@code rules/} folder. Every problem is
 * collected before giving up, so one failed start tells the reliability engineer everything that
 * needs fixing rather than the first thing.
 */
public final class KnowledgeBaseLoader {

    private KnowledgeBaseLoader() {
    }

    public static KnowledgeBase load(Path rulesDir) {
        List<KnowledgeProblem> problems = new ArrayList<>();
        if (!Files.isDirectory(rulesDir)) {
            throw new KnowledgeBaseException(List.of(new KnowledgeProblem(rulesDir.toString(), 0, null,
                    "rules folder not found (working directory " + Path.of("").toAbsolutePath() + ")")));
        }
        CatalogueReader reader = new CatalogueReader(rulesDir.resolve("catalogue"), problems);
        Catalogue catalogue = reader.read();
        try {
            BaseVocabulary base = BaseVocabulary.read(rulesDir.resolve("base-vocabulary.yaml"));
            problems.addAll(new CatalogueValidator(catalogue, reader.lines()).validate(base));
        } catch (IOException | RuntimeException e) {
            problems.add(new KnowledgeProblem("rules/base-vocabulary.yaml", 0, null, "cannot read: " + e.getMessage()));
        }
        KieBase rules = new RuleCompiler(rulesDir, problems, catalogue.cautions().keySet(), catalogue.alerts().keySet()).compile();
        if (!problems.isEmpty()) {
            throw new KnowledgeBaseException(problems);
        }
        return new KnowledgeBase(catalogue, rules);
    }
}
