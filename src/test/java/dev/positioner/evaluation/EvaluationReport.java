package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisResponse.HypothesisView;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Predicate;
import java.util.function.ToDoubleFunction;

/**
 * The figures of one evaluation run over one set of cases and their Markdown rendering. Ranks count
 * from 1; "first" is the answer to the presenting request, "end" the answer after the last check of
 * the session.
 */
public record EvaluationReport(String title, List<CaseResult> results, String settings) {

    public EvaluationReport(List<CaseResult> results) {
        this("case library", results, "");
    }

    /** The same figures over the cases of both reports together. */
    public EvaluationReport with(String combinedTitle, EvaluationReport other) {
        List<CaseResult> all = new ArrayList<>(results);
        all.addAll(other.results);
        return new EvaluationReport(combinedTitle, all, settings);
    }

    public int cases() {
        return results.size();
    }

    public double top1First() {
        return share(r -> r.guided().firstRank() == 1);
    }

    public double top3First() {
        return share(r -> r.guided().firstRank() <= 3);
    }

    /** Top-3 from the first request on the typical cases only (the atypical ones are built to mislead). */
    public double top3FirstTypical() {
        return shareOf(false, r -> r.guided().firstRank() <= 3);
    }

    public double top1End() {
        return share(r -> r.guided().solved());
    }

    public double baselineTop1End() {
        return share(r -> r.baseline().solved());
    }

    public double meanMinutesGuided() {
        return mean(r -> r.guided().minutes());
    }

    public double meanMinutesBaseline() {
        return mean(r -> r.baseline().minutes());
    }

    public double minutesRatio() {
        return meanMinutesGuided() / meanMinutesBaseline();
    }

    public double meanChecksGuided() {
        return mean(r -> r.guided().steps().size());
    }

    public double meanChecksBaseline() {
        return mean(r -> r.baseline().steps().size());
    }

    double share(Predicate<CaseResult> p) {
        return results.isEmpty() ? 0 : (double) results.stream().filter(p).count() / results.size();
    }

    private double mean(ToDoubleFunction<CaseResult> f) {
        return results.stream().mapToDouble(f).average().orElse(0);
    }

    /** The same figures over the cases {@code which} selects. */
    EvaluationReport within(Predicate<CaseResult> which) {
        return new EvaluationReport(title, results.stream().filter(which).toList(), settings);
    }

    private double shareOf(boolean atypical, Predicate<CaseResult> p) {
        return within(r -> r.c().atypical() == atypical).share(p);
    }

    /** Whether the case's presenting request carries readings, not only symptoms. */
    static boolean hasReadings(CaseResult r) {
        var m = r.c().request().measurements();
        return m != null && !m.isEmpty();
    }

    public String markdown() {
        StringBuilder md = new StringBuilder("# Evaluation of the diagnosis: " + title + "\n\n");
        md.append("Invented cases replayed as guided sessions (each next check answered from the case's truth) and, for\n")
          .append("comparison, with the checks done quickest first until one cause reaches the stopping probability.\n")
          .append("Minutes are the catalogue minutes of the checks made (no bypass penalty). Service settings: ")
          .append(settings.isEmpty() ? "as configured" : settings).append(".\n\n");
        summary(md);
        md.append("\n## Per case\n\n| case | truth | first rank | first leader | final leader (guided) | acted on first | checks | min | final leader (cheapest first) | checks | min |\n")
          .append("| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |\n");
        for (CaseResult r : results) {
            md.append(String.format(Locale.ROOT, "| %s%s | %s | %d | %s | %s%s | %s | %d | %s | %s%s | %d | %s |%n",
                    r.c().id(), r.c().atypical() ? " (atypical)" : "", r.c().truth(), r.guided().firstRank(),
                    hyp(r.guided().first().hypotheses().get(0)), hyp(r.guided().finalLeader()), r.guided().solved() ? "" : " **miss**",
                    r.guided().firstActedOn(), r.guided().steps().size(), num(r.guided().minutes()), hyp(r.baseline().finalLeader()),
                    r.baseline().solved() ? "" : " **miss**", r.baseline().steps().size(), num(r.baseline().minutes())));
        }
        misses(md);
        return md.toString();
    }

    /** The headline figures as a Markdown table. */
    public StringBuilder summary(StringBuilder md) {
        long atypical = results.stream().filter(r -> r.c().atypical()).count();
        md.append("| figure | value | target |\n| --- | --- | --- |\n");
        row(md, "cases (atypical)", cases() + " (" + atypical + ")", "");
        row(md, "top-1 from the first request", pct(top1First()), "");
        row(md, "top-3 from the first request", pct(top3First()), ">= 90 %");
        row(md, "top-3 from the first request, typical / atypical cases",
                pct(top3FirstTypical()) + " / " + pct(shareOf(true, r -> r.guided().firstRank() <= 3)), "");
        row(md, "top-3 from the first request, requests with readings / symptoms only",
                top3Of(within(EvaluationReport::hasReadings)) + " / " + top3Of(within(r -> !hasReadings(r))), "");
        row(md, "top-1 at the end, guided", pct(top1End()), ">= 95 %");
        row(md, "top-1 at the end, guided, typical / atypical cases",
                pct(shareOf(false, r -> r.guided().solved())) + " / " + pct(shareOf(true, r -> r.guided().solved())), "");
        row(md, "top-1 at the end, cheapest first", pct(baselineTop1End()), "");
        row(md, "truth is the first cause acted on (repair order p / repair minutes) at the end, guided",
                pct(share(r -> r.guided().firstActedOn().equals(r.c().truth()))), "");
        row(md, "mean minutes, guided", num(meanMinutesGuided()), "<= half of cheapest first");
        row(md, "mean minutes, cheapest first", num(meanMinutesBaseline()), "");
        row(md, "minutes ratio guided / cheapest first", String.format(Locale.ROOT, "%.2f", minutesRatio()), "<= 0.50");
        row(md, "mean checks, guided / cheapest first", num(meanChecksGuided()) + " / " + num(meanChecksBaseline()), "");
        row(md, "mean bypass checks, guided / cheapest first", num(mean(r -> r.guided().bypassChecks())) + " / "
                + num(mean(r -> r.baseline().bypassChecks())), "");
        return md;
    }

    private void misses(StringBuilder md) {
        md.append("\n## Misses\n\n");
        boolean any = false;
        for (CaseResult r : results) {
            boolean firstMiss = r.guided().firstRank() > 3;
            if (!firstMiss && r.guided().solved()) {
                continue;
            }
            any = true;
            md.append(String.format(Locale.ROOT, "- **%s**%s (truth %s): %s%s%n", r.c().id(), r.c().atypical() ? " (atypical)" : "",
                    r.c().truth(), firstMiss ? "first request ranks it " + r.guided().firstRank() + "; " : "",
                    r.guided().solved() ? "solved at the end." : "ends on " + hyp(r.guided().finalLeader())
                            + " with the truth ranked " + r.guided().finalRank() + "."));
            md.append("  - first top 3: ").append(top3(r.guided().first().hypotheses())).append('\n');
            md.append("  - guided: ").append(r.guided().path()).append(" (").append(r.guided().stopReason()).append(")\n");
            md.append("  - end top 3: ").append(top3(r.guided().last().hypotheses())).append('\n');
        }
        if (!any) {
            md.append("None.\n");
        }
    }

    private static String top3Of(EvaluationReport sub) {
        return pct(sub.top3First()) + " of " + sub.cases();
    }

    private static String top3(List<HypothesisView> h) {
        return String.join(", ", h.stream().limit(3).map(EvaluationReport::hyp).toList());
    }

    private static String hyp(HypothesisView h) {
        return String.format(Locale.ROOT, "%s %.0f %%", h.fault(), h.probability() * 100);
    }

    private static void row(StringBuilder md, String figure, String value, String target) {
        md.append("| ").append(figure).append(" | ").append(value).append(" | ").append(target).append(" |\n");
    }

    private static String pct(double share) {
        return String.format(Locale.ROOT, "%.1f %%", share * 100);
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }
}
