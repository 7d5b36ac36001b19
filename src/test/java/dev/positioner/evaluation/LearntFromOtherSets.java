package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.diagnosis.SymptomRates;
import dev.positioner.learning.LearntSymptomRates;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * What the service's own symptom learning ({@link LearntSymptomRates}, the code that learns from a
 * site's closed jobs) would make of the case sets: for each held-out set, the other sets' cases are
 * taken as closed jobs (truth confirmed, presenting symptoms reported present or absent) and the set
 * left out is ranked from its first request. Nothing here is fed back into the shipped tables.
 */
final class LearntFromOtherSets {

    record Row(String title, int cases, double shipped, double learnt) {
    }

    /** Learnt from every set, scored on the held-out sets themselves: in-sample, so an upper bound, not a result. */
    static Row inSample(Evaluation evaluation, List<EvaluationReport> sets) {
        double weight = Evaluation.setting("positioner.learning.symptom-weight");
        LearntSymptomRates.Counts counts = new LearntSymptomRates.Counts();
        sets.stream().flatMap(s -> s.results().stream()).map(CaseResult::c)
                .forEach(c -> counts.addJob(c.truth(), orEmpty(c.request().symptoms()), orEmpty(c.request().absentSymptoms())));
        SymptomRates rates = LearntSymptomRates.rates(evaluation.kb.catalogue(), counts, weight, "in all case sets");
        DiagnosisService learnt = evaluation.withSymptomRates((catalogue, asset) -> rates);
        List<CaseResult> heldOut = sets.subList(1, sets.size()).stream().flatMap(s -> s.results().stream()).toList();
        long hits = heldOut.stream().map(CaseResult::c).filter(c -> Requests.rank(learnt.diagnose(c.request()), c.truth()) <= 3).count();
        long shipped = heldOut.stream().filter(r -> r.guided().firstRank() <= 3).count();
        return new Row("all held-out sets, learnt from every set including themselves (in-sample: an upper bound)",
                heldOut.size(), (double) shipped / heldOut.size(), (double) hits / heldOut.size());
    }

    private LearntFromOtherSets() {
    }

    static List<Row> run(Evaluation evaluation, List<EvaluationReport> sets) {
        double weight = Evaluation.setting("positioner.learning.symptom-weight");
        List<Row> rows = new ArrayList<>();
        for (EvaluationReport left : sets.subList(1, sets.size())) {
            LearntSymptomRates.Counts counts = new LearntSymptomRates.Counts();
            sets.stream().filter(s -> s != left).flatMap(s -> s.results().stream()).map(CaseResult::c)
                    .forEach(c -> counts.addJob(c.truth(), orEmpty(c.request().symptoms()), orEmpty(c.request().absentSymptoms())));
            SymptomRates rates = LearntSymptomRates.rates(evaluation.kb.catalogue(), counts, weight, "in the other case sets");
            DiagnosisService learnt = evaluation.withSymptomRates((catalogue, asset) -> rates);
            long hits = left.results().stream().map(CaseResult::c)
                    .filter(c -> Requests.rank(learnt.diagnose(c.request()), c.truth()) <= 3).count();
            rows.add(new Row(left.title(), left.cases(), left.top3First(), (double) hits / left.cases()));
        }
        return rows;
    }

    static String markdown(List<Row> rows, Row inSample, double weight) {
        StringBuilder md = new StringBuilder(String.format(Locale.ROOT, """
                ## Symptom likelihoods learnt from the other sets, scored on the set left out

                The other sets' cases taken as a site's closed jobs, learnt as the service learns from closures
                (each catalogue value counted as %s jobs; Beta posterior mean), then top-3 from the first request
                on the set left out. A measure of what closures could sharpen, not a figure of the shipped tables.

                | set left out | cases | top-3, shipped tables | top-3, learnt from the other sets |
                | --- | --- | --- | --- |
                """, weight == Math.rint(weight) ? String.valueOf((long) weight) : String.valueOf(weight)));
        for (Row r : rows) {
            md.append(String.format(Locale.ROOT, "| %s | %d | %.1f %% | %.1f %% |%n", r.title(), r.cases(), 100 * r.shipped(), 100 * r.learnt()));
        }
        double shipped = rows.stream().mapToDouble(Row::shipped).average().orElse(Double.NaN);
        double learnt = rows.stream().mapToDouble(Row::learnt).average().orElse(Double.NaN);
        md.append(String.format(Locale.ROOT, "| mean of the sets left out | | %.1f %% | %.1f %% |%n", 100 * shipped, 100 * learnt));
        return md.append(String.format(Locale.ROOT, "| %s | %d | %.1f %% | %.1f %% |%n%n", inSample.title(), inSample.cases(),
                100 * inSample.shipped(), 100 * inSample.learnt())).toString();
    }

    private static List<String> orEmpty(List<String> codes) {
        return codes == null ? List.of() : codes;
    }
}
