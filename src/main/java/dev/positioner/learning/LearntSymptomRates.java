package dev.positioner.learning;

import dev.positioner.diagnosis.SymptomRates;
import dev.positioner.knowledge.Catalogue;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;

/**
 * Symptom likelihoods revised by what closed jobs reported: for every symptom and confirmed cause,
 * {@link BetaRates} over the jobs that reported the symptom present or absent. Kept apart from
 * where the jobs come from (the database, or a case set in the evaluation) so both learn alike.
 */
public final class LearntSymptomRates {

    /** Per symptom and confirmed fault: how many jobs reported it present, and how many reported it at all. */
    public static final class Counts {
        private final Map<String, Map<String, int[]>> bySymptom = new HashMap<>();
        private int jobs;

        public void add(String symptom, String fault, int present, int reported) {
            int[] c = bySymptom.computeIfAbsent(symptom, s -> new HashMap<>()).computeIfAbsent(fault, f -> new int[2]);
            c[0] += present;
            c[1] += reported;
        }

        /** One job's report: each symptom it named present or absent counts once for its confirmed fault. */
        public void addJob(String fault, Iterable<String> present, Iterable<String> absent) {
            present.forEach(s -> add(s, fault, 1, 1));
            absent.forEach(s -> add(s, fault, 0, 1));
            jobs++;
        }

        public void addJobs(int n) {
            jobs += n;
        }

        public int jobs() {
            return jobs;
        }

        int[] of(String symptom, String fault) {
            return bySymptom.getOrDefault(symptom, Map.of()).getOrDefault(fault, new int[2]);
        }
    }

    private LearntSymptomRates() {
    }

    /** The catalogue's rates, revised by {@code counts}; {@code from} says whose jobs they are, for the basis. */
    public static SymptomRates rates(Catalogue catalogue, Counts counts, double weight, String from) {
        if (counts.jobs() == 0) {
            return SymptomRates.catalogue(catalogue);
        }
        String basis = String.format(Locale.ROOT, "Symptom likelihoods: the catalogue's, each counted as %s jobs, revised by the"
                + " symptoms reported in %d closed job(s) %s (Beta posterior mean).", plain(weight), counts.jobs(), from);
        return SymptomRates.revised(catalogue, (symptom, fault, p0) -> {
            int[] c = counts.of(symptom, fault);
            return c[1] == 0 ? p0 : BetaRates.update(p0, c[0], c[1], weight);
        }, basis);
    }

    private static String plain(double x) {
        return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
    }
}
