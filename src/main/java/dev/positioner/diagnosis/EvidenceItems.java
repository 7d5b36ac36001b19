package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.Evidence;
import dev.positioner.diagnosis.facts.Observation;
import dev.positioner.diagnosis.facts.Reading;
import dev.positioner.diagnosis.facts.ReportedSymptom;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.SymptomDef;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Turns what the rules concluded into likelihood vectors. Each symptom and each check counts once
 * (a technician's check before a reading of the same thing); subsumed symptoms and explained
 * evidence are left out, which is what makes them neutral.
 */
final class EvidenceItems {

    private EvidenceItems() {
    }

    /**
     * P(the valve works after repairing h | the cause is another one): a wrong repair rarely cures the
     * valve, by coincidence or because the work disturbed what was wrong (from memory).
     */
    static final double WRONG_REPAIR_FIXES = 0.02;

    static List<EvidenceItem> from(Catalogue catalogue, SymptomRates rates, RuleOutcome outcome, Map<String, Reading> readings,
            List<DiagnosisInput.RepairTried> repairs) {
        List<EvidenceItem> items = from(catalogue, rates, outcome, readings);
        List<Fault> hypotheses = catalogue.hypotheses();
        for (DiagnosisInput.RepairTried r : repairs) {
            int h = indexOf(hypotheses, r.fault());
            double fix = hypotheses.get(h).repair().fixChance();
            double[] l = new double[hypotheses.size()];
            Arrays.fill(l, r.fixed() ? WRONG_REPAIR_FIXES : 1.0);
            l[h] = r.fixed() ? fix : Math.max(1 - fix, 0.01);
            String title = hypotheses.get(h).title();
            items.add(new EvidenceItem(r.fixed() ? "The valve worked again after the repair for: " + title
                    : "The repair for this did not get the valve working: " + title, l));
        }
        return items;
    }

    static List<EvidenceItem> from(Catalogue catalogue, SymptomRates rates, RuleOutcome outcome, Map<String, Reading> readings) {
        List<Fault> hypotheses = catalogue.hypotheses();
        List<EvidenceItem> items = new ArrayList<>();
        Map<String, ReportedSymptom> symptoms = new LinkedHashMap<>();
        outcome.symptoms().stream().sorted(java.util.Comparator.comparing((ReportedSymptom s) -> !s.origin().equals("client")))
                .forEach(s -> symptoms.putIfAbsent(s.code(), s));
        for (ReportedSymptom s : symptoms.values()) {
            SymptomDef def = catalogue.symptoms().get(s.code());
            if (def == null || outcome.isSubsumed(s.code()) || outcome.explanation("symptom:" + s.code()).isPresent()) {
                continue;
            }
            double[] present = rates.present().get(s.code());
            double[] l = new double[hypotheses.size()];
            for (int h = 0; h < l.length; h++) {
                l[h] = s.present() ? present[h] : 1 - present[h];
            }
            String derived = s.origin().equals("client") ? "" : " (from the readings)";
            items.add(new EvidenceItem((s.present() ? "Reported: " : "Reported absent: ") + def.text().toLowerCase() + derived, l));
        }
        Map<String, Observation> observations = new LinkedHashMap<>();
        outcome.observations().stream().sorted(java.util.Comparator.comparing((Observation o) -> !o.byTechnician()))
                .forEach(o -> observations.putIfAbsent(o.check(), o));
        for (Observation o : observations.values()) {
            CheckDef check = catalogue.checks().get(o.check());
            if (check == null || !check.outcomes().contains(o.outcome())
                    || outcome.explanation("check:" + o.check()).isPresent()) {
                continue;
            }
            double[] l = Likelihoods.ofOutcome(catalogue, check, o.outcome());
            items.add(new EvidenceItem(observationLabel(check, o, readings), l));
        }
        for (Evidence e : outcome.evidence()) {
            int h = indexOf(hypotheses, e.fault());
            if (h < 0) {
                continue;
            }
            double[] l = new double[hypotheses.size()];
            Arrays.fill(l, 1.0);
            l[h] = e.factor();
            items.add(new EvidenceItem(e.reason(), l));
        }
        return items;
    }

    private static String observationLabel(CheckDef check, Observation o, Map<String, Reading> readings) {
        if (o.byTechnician()) {
            return check.title() + ": " + o.outcome().replace('_', ' ');
        }
        String quantity = o.origin().replaceFirst("^reading:", "");
        Reading r = readings.get(quantity);
        String reading = r == null ? quantity.replace('_', ' ')
                : quantity.replace('_', ' ') + " " + dev.positioner.diagnosis.facts.Say.show(r.givenValue(), r.givenUnit());
        return check.title() + ": " + o.outcome().replace('_', ' ') + " (from the reading, " + reading + ")";
    }

    private static int indexOf(List<Fault> hypotheses, String code) {
        for (int h = 0; h < hypotheses.size(); h++) {
            if (hypotheses.get(h).code().equals(code)) {
                return h;
            }
        }
        return -1;
    }
}
