package dev.positioner.evaluation;

import dev.positioner.evaluation.WorkingValveReplay.Policy;
import dev.positioner.evaluation.WorkingValveReplay.RepairForecast;
import dev.positioner.evaluation.WorkingValveReplay.Result;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.ToDoubleFunction;

/** Minutes to a working valve per case set and way of working, and how well the stated repair chances held. */
record WorkingValveReport(String title, boolean blind, Map<Policy, List<Result>> results) {

    static WorkingValveReport replay(String title, boolean blind, List<EvaluationCase> cases, WorkingValveReplay replay) {
        Map<Policy, List<Result>> results = new EnumMap<>(Policy.class);
        for (Policy p : Policy.values()) {
            results.put(p, cases.stream().map(c -> replay.run(c, p)).toList());
        }
        return new WorkingValveReport(title, blind, results);
    }

    double meanMinutes(Policy p) {
        return mean(p, Result::minutes);
    }

    double wrongRepairsPerCase(Policy p) {
        return mean(p, r -> r.wrongRepairs());
    }

    double top1End(Policy p) {
        return mean(p, r -> r.solved() ? 1 : 0);
    }

    double fixedShare(Policy p) {
        return mean(p, r -> r.fixed() ? 1 : 0);
    }

    /** 1 - minutes of the next-step planner over minutes of checks-then-repairs. */
    double saving() {
        return 1 - meanMinutes(Policy.NEXT_STEP) / meanMinutes(Policy.CHECKS_THEN_REPAIRS);
    }

    private double mean(Policy p, ToDoubleFunction<Result> f) {
        return results.get(p).stream().mapToDouble(f).average().orElse(Double.NaN);
    }

    static String markdown(List<WorkingValveReport> sets) {
        StringBuilder md = new StringBuilder("## Time to a working valve\n\n");
        md.append("Each case is replayed until the valve works: checks answered from the case, a repair \"fixed\" exactly when it repairs "
                + "the case's cause. Minutes are the checks' and repairs' own (no exposure penalties). (a) = the service's checks until it "
                + "stops, then repairs by probability; (b) = checks quickest first to 90 %, then repairs by probability.\n\n");
        md.append("| set | cases | minutes: next step / (a) / (b) | saving against (a) | repairs that did not fix, per case: next step / (a) / (b) "
                + "| top-1 at the end: next step / (a) / (b) | valve working: next step / (a) / (b) |\n| --- | --- | --- | --- | --- | --- | --- |\n");
        List<Result> blindNext = new ArrayList<>();
        List<Result> blindA = new ArrayList<>();
        for (WorkingValveReport s : sets) {
            md.append(String.format(Locale.ROOT, "| %s%s | %d | %.0f / %.0f / %.0f | %.0f %% | %.2f / %.2f / %.2f | %.1f / %.1f / %.1f %% | %.1f / %.1f / %.1f %% |%n",
                    s.title, s.blind ? "" : " (not blind)", s.results.get(Policy.NEXT_STEP).size(),
                    s.meanMinutes(Policy.NEXT_STEP), s.meanMinutes(Policy.CHECKS_THEN_REPAIRS), s.meanMinutes(Policy.CHEAPEST_FIRST_THEN_REPAIRS),
                    s.saving() * 100, s.wrongRepairsPerCase(Policy.NEXT_STEP), s.wrongRepairsPerCase(Policy.CHECKS_THEN_REPAIRS),
                    s.wrongRepairsPerCase(Policy.CHEAPEST_FIRST_THEN_REPAIRS), s.top1End(Policy.NEXT_STEP) * 100,
                    s.top1End(Policy.CHECKS_THEN_REPAIRS) * 100, s.top1End(Policy.CHEAPEST_FIRST_THEN_REPAIRS) * 100,
                    s.fixedShare(Policy.NEXT_STEP) * 100, s.fixedShare(Policy.CHECKS_THEN_REPAIRS) * 100,
                    s.fixedShare(Policy.CHEAPEST_FIRST_THEN_REPAIRS) * 100));
            if (s.blind) {
                blindNext.addAll(s.results.get(Policy.NEXT_STEP));
                blindA.addAll(s.results.get(Policy.CHECKS_THEN_REPAIRS));
            }
        }
        double next = blindNext.stream().mapToDouble(Result::minutes).average().orElse(Double.NaN);
        double a = blindA.stream().mapToDouble(Result::minutes).average().orElse(Double.NaN);
        md.append(String.format(Locale.ROOT, "%nBlind sets together: %.0f min with the next step against %.0f min for (a), %.0f %% fewer "
                + "(target at least 25 %%); %.2f repairs that did not fix per case (target at most 0.2).%n%n", next, a, (1 - next / a) * 100,
                blindNext.stream().mapToDouble(Result::wrongRepairs).average().orElse(Double.NaN)));
        md.append(calibration(blindNext));
        return md.toString();
    }

    /** When the service proposes a repair saying it will get the valve working with chance p, how often it does. */
    static String calibration(List<Result> results) {
        List<RepairForecast> all = results.stream().flatMap(r -> r.forecasts().stream()).toList();
        StringBuilder md = new StringBuilder("### Repair forecasts on the blind sets\n\n"
                + "| stated chance the repair gets the valve working | repairs | mean stated | share that did |\n| --- | --- | --- | --- |\n");
        double[] edges = {0, 0.2, 0.4, 0.6, 0.8, 1.0001};
        for (int b = 0; b < edges.length - 1; b++) {
            double lo = edges[b];
            double hi = edges[b + 1];
            List<RepairForecast> in = all.stream().filter(f -> f.stated() >= lo && f.stated() < hi).toList();
            md.append(String.format(Locale.ROOT, "| %.0f-%.0f %% | %d | %s | %s |%n", lo * 100, Math.min(hi, 1) * 100, in.size(),
                    in.isEmpty() ? "-" : String.format(Locale.ROOT, "%.0f %%", in.stream().mapToDouble(RepairForecast::stated).average().orElse(0) * 100),
                    in.isEmpty() ? "-" : String.format(Locale.ROOT, "%.0f %%", in.stream().filter(RepairForecast::fixed).count() * 100.0 / in.size())));
        }
        double brier = all.stream().mapToDouble(f -> Math.pow(f.stated() - (f.fixed() ? 1 : 0), 2)).average().orElse(Double.NaN);
        md.append(String.format(Locale.ROOT, "%nBrier score of the repair forecasts: %.3f over %d repairs.%n%n", brier, all.size()));
        return md.toString();
    }

    /** Per case: minutes of each way of working and the next-step path. */
    String cases() {
        StringBuilder md = new StringBuilder("### " + title + ": to a working valve, case by case\n\n"
                + "| case | minutes: next step / (a) / (b) | repairs that did not fix | path with the next step |\n| --- | --- | --- | --- |\n");
        List<Result> next = results.get(Policy.NEXT_STEP);
        for (int i = 0; i < next.size(); i++) {
            Result n = next.get(i);
            md.append(String.format(Locale.ROOT, "| %s | %.0f / %.0f / %.0f | %d | %s |%n", n.c().id(), n.minutes(),
                    results.get(Policy.CHECKS_THEN_REPAIRS).get(i).minutes(), results.get(Policy.CHEAPEST_FIRST_THEN_REPAIRS).get(i).minutes(),
                    n.wrongRepairs(), String.join(" > ", n.path())));
        }
        return md.append('\n').toString();
    }
}
