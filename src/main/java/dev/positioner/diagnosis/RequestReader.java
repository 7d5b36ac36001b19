package dev.positioner.diagnosis;

import dev.positioner.api.FieldError;
import dev.positioner.api.InvalidRequestException;
import dev.positioner.asset.AssetDirectory;
import dev.positioner.asset.AssetRecord;
import dev.positioner.diagnosis.DiagnosisRequest.AssetInput;
import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisRequest.MeasurementInput;
import dev.positioner.diagnosis.facts.Assumption;
import dev.positioner.diagnosis.facts.ValveAction;
import dev.positioner.diagnosis.facts.Finding;
import dev.positioner.diagnosis.facts.Observation;
import dev.positioner.diagnosis.facts.TraceVerdict;
import dev.positioner.diagnosis.facts.Reading;
import dev.positioner.diagnosis.facts.ReportedSymptom;
import dev.positioner.hydraulics.Iso4406;
import dev.positioner.hydraulics.IsoVgGrade;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.trace.TraceAnalysis;
import dev.positioner.trace.TraceFindings;
import dev.positioner.trace.TraceRecord;
import dev.positioner.trace.TraceStore;
import dev.positioner.knowledge.CheckDef;
import dev.positioner.measure.QuantityDef;
import dev.positioner.measure.QuantityReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/**
 * Validates a diagnosis request against the catalogue and converts it to facts. It collects every
 * error with its JSON path before failing, so a client fixes its request in one round.
 */
final class RequestReader {

    private final Catalogue catalogue;
    private final AssetDirectory assets;
    private final TraceStore traces;
    private final List<FieldError> errors = new ArrayList<>();
    private final List<Assumption> assumptions = new ArrayList<>();
    private final List<Object> traceFacts = new ArrayList<>();

    /** @param traces where uploaded traces are found; null when the service runs without one */
    RequestReader(Catalogue catalogue, AssetDirectory assets, TraceStore traces) {
        this.catalogue = catalogue;
        this.assets = assets;
        this.traces = traces;
    }

    DiagnosisInput read(DiagnosisRequest request) {
        if (request == null) {
            throw new InvalidRequestException("$", "a JSON body is required");
        }
        AssetSpec asset = asset(request.asset());
        double stroke = Optional.ofNullable(asset.value("stroke_length")).orElse(NormalBands.DEFAULT_STROKE_M);
        boolean creepInPercent = request.measurements() != null && request.measurements().stream()
                .anyMatch(m -> m != null && "creep_rate".equals(m.quantity()) && "percent_per_min".equals(m.unit()));
        if (creepInPercent && asset.value("stroke_length") == null) {
            assumptions.add(new Assumption("No stroke length given: a creep rate in percent per minute was converted with a 150 mm stroke."));
        }
        List<ReportedSymptom> symptoms = symptoms(request);
        List<Reading> readings = readings(request.measurements(), stroke);
        readings.addAll(fromTraces(request.traces(), readings));
        List<Observation> checks = checks(request.checks());
        Set<String> unavailable = new LinkedHashSet<>();
        each(request.unavailableChecks(), "unavailableChecks", (code, field) -> {
            if (!catalogue.checks().containsKey(code)) {
                errors.add(new FieldError(field, "unknown check '" + code + "'"));
            }
            unavailable.add(code);
        });
        List<DiagnosisInput.RepairTried> repairs = repairs(request.repairs());
        if (!errors.isEmpty()) {
            throw new InvalidRequestException(errors);
        }
        List<Assumption> all = new ArrayList<>(assumptions);
        return new DiagnosisInput(symptoms, readings, checks, unavailable, asset, all, traceFacts, repairs, request.findCauseFirst());
    }

    /** Trace metrics as readings in percent or seconds, unless the same quantity was measured by hand. */
    private List<Reading> fromTraces(List<String> ids, List<Reading> byHand) {
        List<Reading> out = new ArrayList<>();
        for (int i = 0; ids != null && i < ids.size(); i++) {
            String id = ids.get(i);
            Optional<TraceRecord> trace = traces == null || id == null ? Optional.empty() : traces.find(id);
            if (trace.isEmpty()) {
                errors.add(new FieldError("traces[" + i + "]", "no uploaded trace '" + id + "'"));
                continue;
            }
            TraceAnalysis a = trace.get().analysis();
            TraceFindings.measurements(a).forEach((quantity, value) -> {
                boolean known = byHand.stream().anyMatch(r -> r.quantity().equals(quantity))
                        || out.stream().anyMatch(r -> r.quantity().equals(quantity));
                if (!known) {
                    String unit = quantity.equals("oscillation_period") ? "s" : "percent";
                    out.add(new Reading(quantity, value, unit, value, unit));
                }
            });
            traceFacts.add(new TraceVerdict(id, a.stiction() == null ? "CANNOT_TELL" : a.stiction().verdict().name(),
                    a.oscillation() != null && a.oscillation().detected()));
            TraceFindings.sentences(a).forEach(text -> traceFacts.add(Finding.note("trace", "Trace " + id + ": " + text)));
        }
        return out;
    }

    private List<ReportedSymptom> symptoms(DiagnosisRequest request) {
        Map<String, ReportedSymptom> out = new LinkedHashMap<>();
        each(request.symptoms(), "symptoms", (code, field) -> symptom(out, code, field, true));
        each(request.absentSymptoms(), "absentSymptoms", (code, field) -> symptom(out, code, field, false));
        return new ArrayList<>(out.values());
    }

    private void symptom(Map<String, ReportedSymptom> out, String code, String field, boolean present) {
        if (!catalogue.symptoms().containsKey(code)) {
            errors.add(new FieldError(field, "unknown symptom '" + code + "'"));
        } else if (out.containsKey(code)) {
            errors.add(new FieldError(field, "symptom '" + code + "' is given twice (present and absent?)"));
        } else {
            out.put(code, new ReportedSymptom(code, present, "client"));
        }
    }

    private List<Reading> readings(List<MeasurementInput> inputs, double strokeM) {
        Map<String, Reading> out = new LinkedHashMap<>();
        for (int i = 0; inputs != null && i < inputs.size(); i++) {
            String field = "measurements[" + i + "]";
            Reading r = quantity(inputs.get(i), field, catalogue.measurements(), strokeM);
            if (r != null && out.put(r.quantity(), r) != null) {
                errors.add(new FieldError(field + ".quantity", "'" + r.quantity() + "' is given twice"));
            }
        }
        return new ArrayList<>(out.values());
    }

    /** Converts one {quantity, value, unit}; returns null (with errors recorded) if it is not valid. */
    private Reading quantity(MeasurementInput m, String field, Map<String, QuantityDef> defs, double strokeM) {
        if (m == null) {
            errors.add(new FieldError(field, "must be an object with quantity, value and unit"));
            return null;
        }
        QuantityReader reader = new QuantityReader(defs, errors);
        double value = reader.read(field, m.quantity(), m.value(), m.unit(), strokeM);
        if (Double.isNaN(value)) {
            return null;
        }
        QuantityDef def = reader.def(m.quantity());
        return new Reading(def.code(), value, def.kind().canonicalUnit(), m.value(), m.unit());
    }

    private List<Observation> checks(List<CheckInput> inputs) {
        Map<String, Observation> out = new LinkedHashMap<>();
        for (int i = 0; inputs != null && i < inputs.size(); i++) {
            String field = "checks[" + i + "]";
            CheckInput c = inputs.get(i);
            CheckDef def = c == null || c.check() == null ? null : catalogue.checks().get(c.check());
            if (def == null) {
                errors.add(new FieldError(field + ".check", c == null || c.check() == null ? "is required"
                        : "unknown check '" + c.check() + "'"));
            } else if (c.outcome() == null || !def.outcomes().contains(c.outcome())) {
                errors.add(new FieldError(field + ".outcome", "outcome of " + def.code() + " must be one of "
                        + def.outcomes() + (c.outcome() == null ? "" : ", not '" + c.outcome() + "'")));
            } else if (out.put(def.code(), new Observation(def.code(), c.outcome(), Observation.TECHNICIAN)) != null) {
                errors.add(new FieldError(field + ".check", "check '" + def.code() + "' is given twice"));
            }
        }
        return new ArrayList<>(out.values());
    }

    static final List<String> REPAIR_OUTCOMES = List.of("fixed", "not_fixed");

    private List<DiagnosisInput.RepairTried> repairs(List<DiagnosisRequest.RepairInput> inputs) {
        List<DiagnosisInput.RepairTried> out = new ArrayList<>();
        Set<String> seen = new java.util.HashSet<>();
        for (int i = 0; inputs != null && i < inputs.size(); i++) {
            String field = "repairs[" + i + "]";
            DiagnosisRequest.RepairInput r = inputs.get(i);
            if (r == null || r.fault() == null || catalogue.hypothesis(r.fault()) == null) {
                errors.add(new FieldError(field + ".fault", r == null || r.fault() == null ? "is required"
                        : "unknown fault '" + r.fault() + "'"));
            } else if (r.outcome() == null || !REPAIR_OUTCOMES.contains(r.outcome())) {
                errors.add(new FieldError(field + ".outcome", "must be one of " + REPAIR_OUTCOMES
                        + (r.outcome() == null ? "" : ", not '" + r.outcome() + "'")));
            } else if (!seen.add(r.fault())) {
                errors.add(new FieldError(field + ".fault", "the repair for '" + r.fault() + "' is given twice"));
            } else {
                out.add(new DiagnosisInput.RepairTried(r.fault(), r.outcome().equals("fixed")));
            }
        }
        return out;
    }

    private AssetSpec asset(AssetInput input) {
        if (input == null) {
            assumptions.add(new Assumption("No asset data given: defaults assumed for every design value."));
            return AssetSpec.none();
        }
        Optional<AssetRecord> registered = input.tag() == null ? Optional.empty() : assets.find(input.tag());
        if (input.tag() != null && registered.isEmpty()) {
            assumptions.add(new Assumption("Tag " + input.tag() + " is not in the valve registry: only the design data sent were used."));
        }
        Map<String, Double> design = new LinkedHashMap<>();
        registered.ifPresent(r -> convertDesign(r.design(), "registry " + r.tag() + " design", design, false));
        convertDesign(input.design(), "asset.design", design, true);
        String grade = input.oilGrade() != null ? input.oilGrade() : registered.map(AssetRecord::oilGrade).orElse(null);
        if (grade != null && !validGrade(grade)) {
            errors.add(new FieldError("asset.oilGrade", "'" + grade + "' is not an ISO 3448 grade from VG10 to VG150, such as VG46"));
        }
        Double bore = design.get("piston_bore");
        Double rod = design.get("rod_diameter");
        if (bore != null && rod != null && rod >= bore) {
            errors.add(new FieldError("asset.design", "rod_diameter must be smaller than piston_bore"));
        }
        String target = input.cleanlinessTarget() != null ? input.cleanlinessTarget()
                : registered.map(AssetRecord::cleanlinessTarget).orElse(null);
        if (target != null && !validIso4406(target)) {
            errors.add(new FieldError("asset.cleanlinessTarget", "'" + target + "' is not an ISO 4406 code such as 16/14/11"));
        }
        String action = input.action() != null ? input.action() : registered.map(AssetRecord::action).orElse(null);
        String fail = input.failPosition() != null ? input.failPosition() : registered.map(AssetRecord::failPosition).orElse(null);
        Boolean spring = input.returnSpring() != null ? input.returnSpring() : registered.map(AssetRecord::returnSpring).orElse(null);
        if (action != null && !ValveAction.ACTIONS.contains(action)) {
            errors.add(new FieldError("asset.action", "'" + action + "' is not one of " + ValveAction.ACTIONS));
        }
        if (fail != null && !ValveAction.FAIL_POSITIONS.contains(fail)) {
            errors.add(new FieldError("asset.failPosition", "'" + fail + "' is not one of " + ValveAction.FAIL_POSITIONS));
        }
        return new AssetSpec(input.tag(), registered.map(AssetRecord::site).orElse(null), grade, target, design,
                ValveAction.of(action, fail, spring));
    }

    private void convertDesign(List<MeasurementInput> inputs, String prefix, Map<String, Double> design, boolean fromClient) {
        for (int i = 0; inputs != null && i < inputs.size(); i++) {
            Reading r = quantity(inputs.get(i), prefix + "[" + i + "]", catalogue.design(), NormalBands.DEFAULT_STROKE_M);
            if (r != null) {
                design.put(r.quantity(), r.value());
            }
        }
        if (!fromClient && !errors.isEmpty()) {
            throw new IllegalStateException("registry entry has invalid design data: " + errors);
        }
    }

    static boolean validIso4406(String code) {
        try {
            Iso4406.parse(code);
            return true;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    static boolean validGrade(String grade) {
        try {
            IsoVgGrade.parse(grade);
            return true;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    private static void each(List<String> codes, String name, java.util.function.BiConsumer<String, String> action) {
        for (int i = 0; codes != null && i < codes.size(); i++) {
            action.accept(codes.get(i), name + "[" + i + "]");
        }
    }
}
