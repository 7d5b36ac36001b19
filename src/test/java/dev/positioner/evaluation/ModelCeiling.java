package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.SymptomDef;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Random;

/**
 * How well any ranking could do from symptoms alone if the knowledge base's own tables were the
 * truth: draw a fault, let each symptom be present with the catalogue's P(symptom | fault), report
 * at most three of those present (as the case library does) and nothing about the rest, and see
 * where the service ranks the fault. With symptoms only, the service's posterior is the Bayes
 * ranking for these tables (no reading for a rule to reinterpret), so this is about the best any
 * ranking can do from symptom-only presenting information: a figure below the target says the
 * symptoms, as the tables describe them, cannot carry it, however the cases are written. Seeded, so
 * every run gives the same figure.
 */
final class ModelCeiling {

    record Result(int draws, double top3PriorWeighted, double top3EveryFaultAlike) {

        String markdown() {
            return String.format(Locale.ROOT, """
                    ## Ceiling from symptoms alone under the knowledge base's own tables

                    %d jobs drawn from the catalogue's own P(symptom | fault), each reporting 1 to %d of the symptoms
                    present and nothing else: top-3 from the first request %.1f %% with faults weighted by their priors,
                    %.1f %% with every fault drawn equally often (as in the case library).

                    """, draws, MAX_REPORTED, 100 * top3PriorWeighted, 100 * top3EveryFaultAlike);
        }
    }

    static final int DRAWS_PER_FAULT = 60;
    static final int MAX_REPORTED = CaseLibrary.MAX_PRESENTING_SYMPTOMS;

    private final DiagnosisService service;
    private final Catalogue catalogue;
    private final Random random = new Random(20261202L);

    ModelCeiling(DiagnosisService service, Catalogue catalogue) {
        this.service = service;
        this.catalogue = catalogue;
    }

    Result run() {
        double weighted = 0, weights = 0;
        int hitsAlike = 0, draws = 0;
        for (Fault fault : catalogue.faults().values()) {
            int hits = 0;
            for (int i = 0; i < DRAWS_PER_FAULT; i++) {
                List<String> reported = draw(fault.code());
                DiagnosisRequest request = new DiagnosisRequest(reported, null, null, null, null, null);
                if (Requests.rank(service.diagnose(request), fault.code()) <= 3) {
                    hits++;
                }
            }
            draws += DRAWS_PER_FAULT;
            hitsAlike += hits;
            weighted += fault.prior() * hits / DRAWS_PER_FAULT;
            weights += fault.prior();
        }
        return new Result(draws, weighted / weights, (double) hitsAlike / draws);
    }

    /** The symptoms one job with this fault reports: at least one, at most three of those present. */
    private List<String> draw(String fault) {
        while (true) {
            List<String> present = new ArrayList<>();
            for (SymptomDef s : catalogue.symptoms().values()) {
                if (random.nextDouble() < s.present(fault)) {
                    present.add(s.code());
                }
            }
            if (!present.isEmpty()) {
                Collections.shuffle(present, random);
                return List.copyOf(present.subList(0, Math.min(MAX_REPORTED, present.size())));
            }
        }
    }
}
