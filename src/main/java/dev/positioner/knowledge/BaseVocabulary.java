package dev.positioner.knowledge;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.yaml.snakeyaml.Yaml;

/**
 * The base codes that clients rely on ({@code rules/base-vocabulary.yaml}, a copy of the shared
 * contract). The knowledge base may add codes but must keep every one of these, with the check
 * outcomes in the same order and the bypass requirement never dropped.
 */
record BaseVocabulary(Set<String> symptoms, Set<String> measurements, Set<String> faults,
        Map<String, List<String>> checkOutcomes, Set<String> bypassChecks) {

    @SuppressWarnings("unchecked")
    static BaseVocabulary read(Path file) throws IOException {
        Map<String, Object> doc = new Yaml().load(Files.readString(file));
        Map<String, List<String>> outcomes = new LinkedHashMap<>();
        Set<String> bypass = new java.util.LinkedHashSet<>();
        ((Map<String, Map<String, Object>>) doc.get("checks")).forEach((code, check) -> {
            outcomes.put(code, (List<String>) check.get("outcomes"));
            if (Boolean.TRUE.equals(check.get("bypass"))) {
                bypass.add(code);
            }
        });
        return new BaseVocabulary(keys(doc, "symptoms"), keys(doc, "measurements"), keys(doc, "faults"),
                outcomes, bypass);
    }

    @SuppressWarnings("unchecked")
    private static Set<String> keys(Map<String, Object> doc, String section) {
        return ((Map<String, Object>) doc.get(section)).keySet();
    }
}
