package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.Assumption;
import dev.positioner.diagnosis.facts.Observation;
import dev.positioner.diagnosis.facts.Reading;
import dev.positioner.diagnosis.facts.ReportedSymptom;
import java.util.List;
import java.util.Set;

/** A request that has passed validation, converted to facts in canonical units. */
public record DiagnosisInput(List<ReportedSymptom> symptoms, List<Reading> readings, List<Observation> checks,
        Set<String> unavailableChecks, AssetSpec asset, List<Assumption> assumptions, List<Object> traceFacts,
        List<RepairTried> repairs, Boolean findCauseFirst) {

    /** A repair tried: the hypothesis it was for and whether the valve worked afterwards. */
    public record RepairTried(String fault, boolean fixed) {
    }
}
