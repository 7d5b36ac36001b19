package dev.positioner.evaluation;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;

/**
 * The case library: one YAML file per base fault in {@code src/test/resources/cases}, each a list of
 * cases. Reading is strict (an unknown field is an error, so a typo cannot silently drop evidence),
 * and {@link #problems} checks every case against the catalogue.
 */
public final class CaseLibrary {

    public static final Path DEFAULT_DIR = Path.of("src/test/resources/cases");
    /**
     * Cases written afterwards by someone who saw only the codes (faults, symptoms, quantities,
     * checks and their outcomes) and the demo plant, never the likelihood tables, the rules or the
     * evaluation figures: the held-out measure of how the knowledge base generalises.
     */
    public static final Path HELD_OUT_DIR = Path.of("src/test/resources/cases-heldout");
    /**
     * A second set written the same way, later, by another writer with the same codes-only sheet;
     * first run against the knowledge base exactly as it stood when the set was written.
     */
    public static final Path HELD_OUT_2_DIR = Path.of("src/test/resources/cases-heldout2");
    /**
     * A third set written the same way by a third writer after the changes the second set prompted:
     * the blind measure of those changes.
     */
    public static final Path HELD_OUT_3_DIR = Path.of("src/test/resources/cases-heldout3");
    /**
     * A fourth set written the same way by a fourth writer, after the third set had been run and the
     * stroke-demand rules added: the blind measure of the knowledge base at that point.
     */
    public static final Path HELD_OUT_4_DIR = Path.of("src/test/resources/cases-heldout4");
    /**
     * A fifth set written the same way by a fifth writer, after the fourth had been run and readings
     * within their instrument's uncertainty of a band limit were made borderline.
     */
    public static final Path HELD_OUT_5_DIR = Path.of("src/test/resources/cases-heldout5");
    /** Every case set, development first. */
    public static final List<Path> ALL_DIRS = List.of(DEFAULT_DIR, HELD_OUT_DIR, HELD_OUT_2_DIR, HELD_OUT_3_DIR, HELD_OUT_4_DIR,
            HELD_OUT_5_DIR);
    static final int MAX_PRESENTING_SYMPTOMS = 3;

    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory());

    private final Map<String, List<EvaluationCase>> byFile;

    private CaseLibrary(Map<String, List<EvaluationCase>> byFile) {
        this.byFile = byFile;
    }

    public static CaseLibrary load(Path dir) {
        Map<String, List<EvaluationCase>> byFile = new LinkedHashMap<>();
        try (Stream<Path> files = Files.list(dir)) {
            for (Path file : files.filter(f -> f.toString().endsWith(".yaml")).sorted().toList()) {
                byFile.put(file.getFileName().toString().replaceFirst("\\.yaml$", ""), read(file));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list " + dir.toAbsolutePath(), e);
        }
        return new CaseLibrary(byFile);
    }

    static List<EvaluationCase> read(Path file) {
        try {
            List<EvaluationCase> cases = YAML.readValue(file.toFile(), new TypeReference<List<EvaluationCase>>() { });
            return cases == null ? List.of() : cases;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read case file " + file + ": " + e.getMessage(), e);
        }
    }

    public Map<String, List<EvaluationCase>> byFile() {
        return byFile;
    }

    public List<EvaluationCase> all() {
        return byFile.values().stream().flatMap(List::stream).toList();
    }

    /** Everything wrong with the library, one line per problem; empty when every case is usable. */
    public List<String> problems(Catalogue catalogue) {
        List<String> problems = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        byFile.forEach((file, cases) -> {
            if (!catalogue.faults().containsKey(file)) {
                problems.add(file + ".yaml: file name is not a catalogue fault");
            }
            if (cases.isEmpty() || cases.size() > 3) {
                problems.add(file + ".yaml: holds " + cases.size() + " cases, expected 1 to 3");
            }
            for (EvaluationCase c : cases) {
                if (c.id() == null || !ids.add(c.id())) {
                    problems.add(file + ".yaml: missing or duplicate id " + c.id());
                }
                problems.addAll(problems(c, file, catalogue));
            }
        });
        return problems;
    }

    static List<String> problems(EvaluationCase c, String file, Catalogue catalogue) {
        List<String> out = new ArrayList<>();
        String where = file + ".yaml " + c.id() + ": ";
        if (c.truth() == null || !catalogue.faults().containsKey(c.truth())) {
            out.add(where + "truth '" + c.truth() + "' is not a catalogue fault");
        } else if (!c.truth().equals(file)) {
            out.add(where + "truth '" + c.truth() + "' filed under " + file + ".yaml");
        }
        if (c.story() == null || c.story().isBlank()) {
            out.add(where + "has no story");
        }
        if (c.request() == null) {
            out.add(where + "has no request");
        } else {
            int symptoms = c.request().symptoms() == null ? 0 : c.request().symptoms().size();
            if (symptoms < 1 || symptoms > MAX_PRESENTING_SYMPTOMS) {
                out.add(where + "presents " + symptoms + " symptoms, expected 1 to " + MAX_PRESENTING_SYMPTOMS);
            }
            if (c.request().checks() != null && !c.request().checks().isEmpty()) {
                out.add(where + "the presenting request must not already contain check results");
            }
        }
        c.answers().forEach((check, outcome) -> {
            CheckDef def = catalogue.checks().get(check);
            if (def == null) {
                out.add(where + "answer for unknown check '" + check + "'");
            } else if (!def.outcomes().contains(outcome)) {
                out.add(where + "'" + outcome + "' is not an outcome of " + check + " " + def.outcomes());
            }
        });
        return out;
    }
}
