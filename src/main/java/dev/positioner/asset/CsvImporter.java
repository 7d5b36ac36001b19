package dev.positioner.asset;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import dev.positioner.api.FieldError;
import dev.positioner.api.InvalidRequestException;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.storage.Storage;
import jakarta.enterprise.context.ApplicationScoped;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Registers valves from a spreadsheet export. The header names the columns: tag, description, area,
 * site, oilGrade, cleanlinessTarget, and one column per design quantity, either with the unit in the
 * header ({@code piston_bore[in]}, cells are numbers) or without ({@code piston_bore}, cells like
 * {@code 8 in}). A header the service does not know rejects the whole file, because every row would
 * lose that column; a bad row is reported and the good rows are stored in one transaction.
 */
@ApplicationScoped
public class CsvImporter {

    @com.fasterxml.jackson.annotation.JsonInclude(com.fasterxml.jackson.annotation.JsonInclude.Include.NON_NULL)
    public record Rejected(int row, String tag, List<FieldError> errors) {
    }

    public record Report(int rows, int created, int updated, List<Rejected> rejected) {
    }

    private static final List<String> TEXT_COLUMNS = List.of("tag", "description", "area", "site", "oilGrade", "cleanlinessTarget");
    private static final Pattern UNIT_HEADER = Pattern.compile("([a-z0-9_]+)\\[([A-Za-z0-9_]+)]");
    private static final Pattern VALUE_WITH_UNIT = Pattern.compile("\\s*([-+0-9.eE]+)\\s*([A-Za-z0-9_]+)\\s*");

    private final KnowledgeBase knowledge;
    private final AssetValidator validator;
    private final AssetRegistry registry;
    private final Storage storage;

    public CsvImporter(KnowledgeBase knowledge, AssetValidator validator, AssetRegistry registry, Storage storage) {
        this.knowledge = knowledge;
        this.validator = validator;
        this.registry = registry;
        this.storage = storage;
    }

    /** One design column: the quantity and, if the header carries it, the unit of every cell. */
    private record DesignColumn(String header, String quantity, String unit) {
    }

    public Report importCsv(String csv, boolean update) {
        List<String[]> lines = parse(csv);
        if (lines.isEmpty()) {
            throw new InvalidRequestException("$", "the CSV has no header line");
        }
        String[] header = lines.get(0);
        Map<Integer, DesignColumn> design = new HashMap<>();
        Map<String, Integer> text = new HashMap<>();
        List<FieldError> headerErrors = new ArrayList<>();
        for (int i = 0; i < header.length; i++) {
            String h = header[i].strip();
            Matcher withUnit = UNIT_HEADER.matcher(h);
            if (TEXT_COLUMNS.contains(h)) {
                text.put(h, i);
            } else if (withUnit.matches() && knowledge.catalogue().design().containsKey(withUnit.group(1))) {
                design.put(i, new DesignColumn(h, withUnit.group(1), withUnit.group(2)));
            } else if (knowledge.catalogue().design().containsKey(h)) {
                design.put(i, new DesignColumn(h, h, null));
            } else if (!h.isEmpty()) {
                headerErrors.add(new FieldError("header[" + i + "]", "unknown column '" + h + "'; use " + TEXT_COLUMNS
                        + " or a design quantity of " + knowledge.catalogue().design().keySet() + ", optionally as name[unit]"));
            }
        }
        if (!text.containsKey("tag")) {
            headerErrors.add(new FieldError("header", "a 'tag' column is required"));
        }
        if (!headerErrors.isEmpty()) {
            throw new InvalidRequestException(headerErrors);
        }
        List<Rejected> rejected = new ArrayList<>();
        List<AssetRecord> good = new ArrayList<>();
        Map<String, Integer> seenTags = new HashMap<>();
        for (int n = 1; n < lines.size(); n++) {
            String[] cells = lines.get(n);
            if (cells.length == 1 && cells[0].isBlank()) {
                continue;
            }
            int row = n + 1;
            List<FieldError> errors = new ArrayList<>();
            List<MeasurementInput> values = new ArrayList<>();
            List<String> valueColumns = new ArrayList<>();
            design.forEach((i, col) -> {
                String cell = cell(cells, i);
                if (cell != null) {
                    MeasurementInput m = measurement(col, cell);
                    if (m == null) {
                        errors.add(new FieldError(col.header(), "'" + cell + "' is not a number followed by a unit, like 8 in"));
                    } else {
                        values.add(m);
                        valueColumns.add(col.header());
                    }
                }
            });
            AssetRecord raw = new AssetRecord(cell(cells, text.get("tag")), cell(cells, text.get("description")),
                    cell(cells, text.get("area")), cell(cells, text.get("site")), cell(cells, text.get("oilGrade")),
                    cell(cells, text.get("cleanlinessTarget")), values);
            AssetValidator.Result checked = validator.validate(raw, "");
            checked.errors().forEach(e -> errors.add(toColumn(e, valueColumns)));
            Integer earlier = raw.tag() == null ? null : seenTags.putIfAbsent(raw.tag(), row);
            if (earlier != null) {
                errors.add(new FieldError("tag", "'" + raw.tag() + "' is also in row " + earlier));
            }
            if (errors.isEmpty()) {
                good.add(checked.asset());
            } else {
                rejected.add(new Rejected(row, raw.tag(), errors));
            }
        }
        return store(good, update, rejected, lines.size() - 1, seenTags);
    }

    private Report store(List<AssetRecord> good, boolean update, List<Rejected> rejected, int rows, Map<String, Integer> rowOf) {
        int[] counts = new int[2];
        storage.inTransaction(c -> {
            for (AssetRecord a : good) {
                if (registry.create(c, a)) {
                    counts[0]++;
                } else if (update && registry.update(c, a)) {
                    counts[1]++;
                } else {
                    rejected.add(new Rejected(rowOf.get(a.tag()), a.tag(), List.of(new FieldError("tag",
                            "'" + a.tag() + "' is already registered; import with update=true to replace it"))));
                }
            }
            return null;
        });
        rejected.sort((a, b) -> Integer.compare(a.row(), b.row()));
        return new Report(rows, counts[0], counts[1], rejected);
    }

    private static MeasurementInput measurement(DesignColumn col, String cell) {
        try {
            if (col.unit() != null) {
                return new MeasurementInput(col.quantity(), Double.valueOf(cell), col.unit());
            }
            Matcher m = VALUE_WITH_UNIT.matcher(cell);
            return m.matches() ? new MeasurementInput(col.quantity(), Double.valueOf(m.group(1)), m.group(2)) : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** The validator names design[i].unit; a spreadsheet user looks for the column header. */
    private static FieldError toColumn(FieldError e, List<String> valueColumns) {
        Matcher m = Pattern.compile("design\\[(\\d+)](\\..*)?").matcher(e.field());
        return m.matches() ? new FieldError(valueColumns.get(Integer.parseInt(m.group(1))), e.message()) : e;
    }

    private static String cell(String[] cells, Integer index) {
        if (index == null || index >= cells.length || cells[index].isBlank()) {
            return null;
        }
        return cells[index].strip();
    }

    private static List<String[]> parse(String csv) {
        CsvMapper mapper = new CsvMapper().enable(CsvParser.Feature.WRAP_AS_ARRAY);
        try (MappingIterator<String[]> it = mapper.readerFor(String[].class).readValues(csv == null ? "" : csv)) {
            return it.readAll();
        } catch (IOException | RuntimeException e) {
            throw new InvalidRequestException("$", "cannot read CSV: " + e.getMessage());
        }
    }
}
