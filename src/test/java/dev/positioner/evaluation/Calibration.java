package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisResponse.HypothesisView;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * How far the probabilities can be taken at their word, over the blind case sets: the Brier score of
 * the whole ranking (Brier, "Verification of forecasts expressed in terms of probability", Monthly
 * Weather Review 78(1), 1950: the mean over cases of the sum over causes of (p - outcome)^2, 0 best,
 * 2 worst) and a reliability table of the leading cause: when the service gives its leader 60-70 %,
 * how often is the leader the true cause (Murphy and Winkler's reliability diagram, 1977).
 */
final class Calibration {

    record Forecast(double leaderProbability, boolean leaderRight) {
    }

    private Calibration() {
    }

    static double brier(DiagnosisResponse r, String truth) {
        double sum = 0;
        for (HypothesisView h : r.hypotheses()) {
            double outcome = h.fault().equals(truth) ? 1 : 0;
            sum += (h.probability() - outcome) * (h.probability() - outcome);
        }
        return sum;
    }

    /** Every answer of the guided sessions: the first request's and one after each check. */
    static List<Forecast> leaderForecasts(List<CaseResult> results) {
        List<Forecast> out = new ArrayList<>();
        for (CaseResult r : results) {
            HypothesisView first = Requests.leader(r.guided().first());
            out.add(new Forecast(first.probability(), first.fault().equals(r.c().truth())));
            r.guided().steps().forEach(s -> out.add(new Forecast(s.leaderProbability(), s.leader().equals(r.c().truth()))));
        }
        return out;
    }

    static String markdown(List<CaseResult> blind) {
        double brierFirst = blind.stream().mapToDouble(r -> brier(r.guided().first(), r.c().truth())).average().orElse(Double.NaN);
        double brierEnd = blind.stream().mapToDouble(r -> brier(r.guided().last(), r.c().truth())).average().orElse(Double.NaN);
        List<Forecast> forecasts = leaderForecasts(blind);
        StringBuilder md = new StringBuilder("## Calibration of the probabilities on the blind sets\n\n");
        md.append(String.format(Locale.ROOT, "Brier score of the whole ranking (0 best, 2 worst) over %d blind cases: %.3f from the first "
                + "request, %.3f at the end of the guided session.%n%n", blind.size(), brierFirst, brierEnd));
        md.append("Reliability of the leading cause, over every answer of the guided sessions (the first request and one after each check):\n\n"
                + "| leader given | answers | mean given | leader was the true cause |\n| --- | --- | --- | --- |\n");
        for (int b = 0; b < 10; b++) {
            double lo = b / 10.0;
            double hi = b == 9 ? 1.0001 : (b + 1) / 10.0;
            List<Forecast> in = forecasts.stream().filter(f -> f.leaderProbability() >= lo && f.leaderProbability() < hi).toList();
            if (in.isEmpty()) {
                continue;
            }
            md.append(String.format(Locale.ROOT, "| %d-%d %% | %d | %.0f %% | %.0f %% |%n", b * 10, b * 10 + 10, in.size(),
                    in.stream().mapToDouble(Forecast::leaderProbability).average().orElse(0) * 100,
                    in.stream().filter(Forecast::leaderRight).count() * 100.0 / in.size()));
        }
        long wrongAtEnd = blind.stream().filter(r -> !r.guided().solved()).count();
        md.append(String.format(Locale.ROOT, "%nThe guided session ends on a wrong cause in %d of %d blind cases (%.1f %%).%n%n",
                wrongAtEnd, blind.size(), wrongAtEnd * 100.0 / blind.size()));
        return md.toString();
    }
}
