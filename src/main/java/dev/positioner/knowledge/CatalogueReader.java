package dev.positioner.knowledge;

import dev.positioner.measure.QuantityDef;
import dev.positioner.measure.QuantityKind;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.nodes.Node;

/**
 * Reads the catalogue files of {@code rules/catalogue/} into records. Shape errors (missing fields,
 * text where a number belongs, YAML syntax) are collected with file and line; meaning errors
 * (unknown codes, sums, ranges) are the {@link CatalogueValidator}'s job.
 */
final class CatalogueReader {

    private final Path dir;
    private final List<KnowledgeProblem> problems;
    private final Map<String, Integer> lines = new LinkedHashMap<>();

    CatalogueReader(Path catalogueDir, List<KnowledgeProblem> problems) {
        this.dir = catalogueDir;
        this.problems = problems;
    }

    Catalogue read() {
        YamlNode faultsDoc = open("faults.yaml");
        YamlNode repairsDoc = open("repairs.yaml");
        Map<String, YamlNode> repairNodes = repairsDoc.get("repairs").map();
        Map<String, Fault> faults = new LinkedHashMap<>();
        faultsDoc.get("faults").map().forEach((code, n) -> faults.put(code, fault(code, n.withEntry(code), repairNodes)));
        YamlNode unlistedNode = faultsDoc.require("unlisted").withEntry("unlisted");
        Fault unlisted = fault(unlistedNode.require("code").text(), unlistedNode, repairNodes);
        double unlistedSymptom = unlistedNode.require("symptomPresent").number();
        repairNodes.forEach((code, n) -> lines.put("repairs.yaml/" + code, n.line()));
        repairNodes.keySet().stream().filter(code -> !faults.containsKey(code) && !code.equals(unlisted.code()))
                .forEach(code -> problem("repairs.yaml", repairNodes.get(code).line(), code,
                        "repair for a fault that is not in faults.yaml"));
        YamlNode common = repairsDoc.get("afterEveryRepair");
        RepairGuide guide = new RepairGuide(common.require("returnToService").texts(), common.require("ifNotTonight").texts());

        Map<String, SymptomDef> symptoms = new LinkedHashMap<>();
        open("symptoms.yaml").get("symptoms").map().forEach((code, n) -> symptoms.put(code, symptom(code, n)));
        Map<String, CheckDef> checks = new LinkedHashMap<>();
        open("checks.yaml").get("checks").map().forEach((code, n) -> checks.put(code, check(code, n)));

        Map<String, String> cautions = texts(open("cautions.yaml").get("cautions"));
        Map<String, String> sources = texts(open("sources.yaml").get("sources"));
        Map<String, Disturbance> disturbances = new LinkedHashMap<>();
        open("disturbances.yaml").get("disturbances").map().forEach((code, n) -> disturbances.put(code, disturbance(code, n.withEntry(code))));
        Map<String, String> alerts = texts(open("alerts.yaml").get("alerts"));
        YamlNode quantities = open("quantities.yaml");
        return new Catalogue(faults, unlisted, unlistedSymptom, symptoms, checks, cautions, sources,
                quantities(quantities.get("measurements")), quantities(quantities.get("design")), disturbances, guide, alerts);
    }

    /** Line of each entry, keyed like {@code checks.yaml/read_filter_dp/pump_worn}, for the validator. */
    Map<String, Integer> lines() {
        return lines;
    }

    private Fault fault(String code, YamlNode n, Map<String, YamlNode> repairs) {
        lines.put("faults.yaml/" + code, n.line());
        YamlNode r = repairs.get(code);
        Repair repair;
        if (r == null) {
            problem("repairs.yaml", 0, code, "no repair entry for this fault (every fault needs one)");
            repair = Repair.minimal(code, "", Double.NaN, List.of());
        } else {
            repair = repair(code, r.withEntry(code));
        }
        return new Fault(code, n.require("title").text(), n.get("group").text(), n.require("prior").number(),
                n.require("failureMode").text(), n.require("mechanism").text(), n.get("cause").text(),
                n.require("source").texts(), repair);
    }

    private static Repair repair(String fault, YamlNode n) {
        return new Repair(fault, n.require("action").text(), n.require("minutes").number(),
                n.get("partsCost").isMissing() ? 0 : n.get("partsCost").number(),
                n.get("reversible").isMissing() || n.get("reversible").bool(),
                n.require("fixChance").number(), n.require("disturbs").oneOrMoreTexts(), n.get("tools").texts(),
                n.get("spares").texts(), n.get("steps").texts(), n.get("adjustments").texts(), n.get("cautions").texts(),
                n.get("returnToService").texts(), n.get("ifNotTonight").texts(), n.require("source").texts());
    }

    private Disturbance disturbance(String code, YamlNode n) {
        lines.put("disturbances.yaml/" + code, n.line());
        return new Disturbance(code, n.require("title").text(), n.require("penaltyMinutes").number(),
                n.require("bypass").bool(), n.get("cautions").texts(), n.require("source").texts());
    }

    private SymptomDef symptom(String code, YamlNode n) {
        Map<String, Double> given = new LinkedHashMap<>();
        lines.put("symptoms.yaml/" + code, n.line());
        n.get("given").map().forEach((fault, p) -> {
            lines.put("symptoms.yaml/" + code + "/" + fault, p.line());
            given.put(fault, p.number());
        });
        return new SymptomDef(code, n.require("text").text(), n.require("otherwise").number(), given,
                n.require("source").texts());
    }

    private CheckDef check(String code, YamlNode n) {
        Map<String, Map<String, Double>> given = new LinkedHashMap<>();
        lines.put("checks.yaml/" + code, n.line());
        lines.put("checks.yaml/" + code + "/otherwise", n.get("otherwise").line());
        n.get("given").map().forEach((fault, row) -> {
            lines.put("checks.yaml/" + code + "/" + fault, row.line());
            given.put(fault, distribution(row));
        });
        return new CheckDef(code, n.require("title").text(), n.require("minutes").number(),
                n.get("bypass").isMissing() ? false : n.get("bypass").bool(), n.require("outcomes").texts(),
                n.require("instructions").texts(), n.get("cautions").texts(),
                distribution(n.require("otherwise")), given, n.require("source").texts(), n.require("disturbs").oneOrMoreTexts(),
                n.get("resultAfterHours").isMissing() ? 0 : n.get("resultAfterHours").number(),
                n.get("persons").isMissing() ? 1 : (int) n.get("persons").number());
    }

    private static Map<String, Double> distribution(YamlNode row) {
        Map<String, Double> out = new LinkedHashMap<>();
        row.map().forEach((outcome, p) -> out.put(outcome, p.number()));
        return out;
    }

    private static Map<String, String> texts(YamlNode n) {
        Map<String, String> out = new LinkedHashMap<>();
        n.map().forEach((k, v) -> out.put(k, v.text()));
        return out;
    }

    private Map<String, QuantityDef> quantities(YamlNode n) {
        Map<String, QuantityDef> out = new LinkedHashMap<>();
        n.map().forEach((code, q) -> {
            String kindText = q.require("kind").text();
            QuantityKind kind;
            try {
                kind = QuantityKind.valueOf(kindText.toUpperCase(Locale.ROOT));
            } catch (IllegalArgumentException e) {
                problem("quantities.yaml", q.line(), code, "unknown kind '" + kindText + "'");
                return;
            }
            out.put(code, new QuantityDef(code, kind, q.require("units").texts(), q.require("min").number(),
                    q.require("max").number(), q.get("meaning").text()));
        });
        return out;
    }

    private YamlNode open(String name) {
        Problems fileProblems = new Problems("rules/catalogue/" + name, problems);
        Path file = dir.resolve(name);
        if (!Files.exists(file)) {
            fileProblems.add(0, null, "file is missing");
            return new YamlNode(null, fileProblems, null);
        }
        try (Reader reader = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            Node root = new Yaml(new LoaderOptions()).compose(reader);
            return new YamlNode(root, fileProblems, null);
        } catch (MarkedYAMLException e) {
            int line = e.getProblemMark() == null ? 0 : e.getProblemMark().getLine() + 1;
            fileProblems.add(line, null, "YAML syntax: " + e.getProblem());
        } catch (IOException | RuntimeException e) {
            fileProblems.add(0, null, "cannot read: " + e.getMessage());
        }
        return new YamlNode(null, fileProblems, null);
    }

    private void problem(String file, int line, String entry, String message) {
        problems.add(new KnowledgeProblem("rules/catalogue/" + file, line, entry, message));
    }
}
