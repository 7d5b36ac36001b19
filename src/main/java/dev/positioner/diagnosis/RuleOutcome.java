package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.Alert;
import dev.positioner.diagnosis.facts.Assumption;
import dev.positioner.diagnosis.facts.Hold;
import dev.positioner.diagnosis.facts.Caution;
import dev.positioner.diagnosis.facts.Evidence;
import dev.positioner.diagnosis.facts.Explained;
import dev.positioner.diagnosis.facts.Finding;
import dev.positioner.diagnosis.facts.Observation;
import dev.positioner.diagnosis.facts.ReportedSymptom;
import dev.positioner.diagnosis.facts.Subsumed;
import java.util.List;
import java.util.Set;

/** Everything the rules concluded for one request, and which rules fired (by ID). */
public record RuleOutcome(List<ReportedSymptom> symptoms, List<Observation> observations, List<Finding> findings,
        List<Subsumed> subsumed, List<Explained> explained, List<Evidence> evidence, List<Caution> cautions,
        List<Assumption> assumptions, Set<String> firedRules, List<Alert> alerts, List<Hold> holds) {

    public boolean isSubsumed(String symptom) {
        return subsumed.stream().anyMatch(s -> s.symptom().equals(symptom));
    }

    public java.util.Optional<Explained> explanation(String evidenceKey) {
        return explained.stream().filter(e -> e.evidence().equals(evidenceKey)).findFirst();
    }
}
