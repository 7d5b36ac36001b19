package dev.positioner.diagnosis;

import dev.positioner.asset.AssetDirectory;
import dev.positioner.diagnosis.DiagnosisResponse.DecisionView;
import dev.positioner.diagnosis.DiagnosisResponse.FindingView;
import dev.positioner.diagnosis.DiagnosisResponse.HypothesisView;
import dev.positioner.diagnosis.DiagnosisResponse.NextCheckView;
import dev.positioner.diagnosis.facts.Assumption;
import dev.positioner.diagnosis.facts.Caution;
import dev.positioner.diagnosis.facts.Observation;
import dev.positioner.diagnosis.facts.Reading;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.trace.TraceStore;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.inject.Inject;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.eclipse.microprofile.config.inject.ConfigProperty;

/**
 * Request in, ranked causes and next check out: validation, facts, rules, Bayes, planner. Stateless;
 * everything a call needs comes in with it or from the knowledge base.
 */
@ApplicationScoped
public class DiagnosisService {

    /** Shown with any check that needs a second person (the loader makes sure the catalogue has it). */
    static final String LONE_WORKING = "lone_working";

    static final String METHOD = "Expected cost of repair with one-step look-ahead (Heckerman, Breese and Rommelse, CACM 1995)";
    static final String STEP_METHOD = "Expected cost to a working valve over checks and repairs, two steps ahead "
            + "(Breese and Heckerman, UAI 1996)";

    private final Catalogue catalogue;
    private final RuleEngine engine;
    private final AssetDirectory assets;
    private final PriorSource priorSource;
    private final SymptomRateSource rateSource;
    private final CheckPlanner planner;
    private final StepPlanner stepPlanner;
    private final double stopThreshold;
    private final boolean findCauseFirst;

    public DiagnosisService(KnowledgeBase knowledge, RuleEngine engine, AssetDirectory assets, PriorSource priorSource,
            SymptomRateSource rateSource,
            @ConfigProperty(name = "positioner.stop-threshold") double stopThreshold,
            @ConfigProperty(name = "positioner.minimum-outcome-chance") double minimumChance,
            @ConfigProperty(name = "positioner.repair.money-per-hour") double moneyPerHour,
            @ConfigProperty(name = "positioner.repair.irreversible-min-probability") double irreversibleMinimum,
            @ConfigProperty(name = "positioner.repair.look-ahead-breadth") int breadth,
            @ConfigProperty(name = "positioner.repair.find-cause-first") boolean findCauseFirst) {
        this.catalogue = knowledge.catalogue();
        this.engine = engine;
        this.assets = assets;
        this.priorSource = priorSource;
        this.rateSource = rateSource;
        this.stopThreshold = stopThreshold;
        this.planner = new CheckPlanner(catalogue, stopThreshold, minimumChance);
        this.stepPlanner = new StepPlanner(catalogue, stopThreshold, moneyPerHour, irreversibleMinimum, breadth);
        this.findCauseFirst = findCauseFirst;
    }

    /** Optional: without a trace store (a service built outside the container) traces cannot be referenced. */
    @Inject
    TraceStore traces;

    public DiagnosisResponse diagnose(DiagnosisRequest request) {
        DiagnosisInput input = new RequestReader(catalogue, assets, traces).read(request);
        List<Object> facts = new ArrayList<>();
        facts.addAll(input.symptoms());
        facts.addAll(input.readings());
        facts.addAll(input.checks());
        facts.addAll(input.assumptions());
        facts.addAll(input.traceFacts());
        facts.addAll(NormalBands.facts(input.asset()));
        facts.add(input.asset().action());
        Map<String, Reading> readings = input.readings().stream().collect(Collectors.toMap(Reading::quantity, Function.identity()));
        facts.addAll(EngineeringFindings.facts(input.asset(), readings));
        RuleOutcome outcome = engine.evaluate(facts);

        SymptomRates rates = rateSource.rates(catalogue, input.asset());
        List<EvidenceItem> items = EvidenceItems.from(catalogue, rates, outcome, readings, input.repairs());
        List<Fault> hypotheses = catalogue.hypotheses();
        Priors priors = priorSource.priors(catalogue, input.asset());
        double[] prior = priors.values();
        double[] posterior = Bayes.posterior(prior, items.stream().map(EvidenceItem::likelihood).toList());

        Set<String> done = outcome.observations().stream().map(Observation::check).collect(Collectors.toSet());
        Set<String> unavailable = unavailable(input.unavailableChecks(), outcome);
        boolean causeFirst = input.findCauseFirst() != null ? input.findCauseFirst() : findCauseFirst;
        var fixed = input.repairs().stream().filter(DiagnosisInput.RepairTried::fixed).findFirst();
        CheckPlan plan;
        StepPlan step;
        if (fixed.isPresent()) {
            String reason = "The valve works again after the repair for " + catalogue.hypothesis(fixed.get().fault()).title()
                    + ": finish the return to service and close the job.";
            plan = new CheckPlan(null, null, reason, 0, Double.NaN);
            step = StepPlan.stop(reason, 0);
        } else {
            plan = planner.plan(posterior, done, unavailable);
            step = stepPlanner.plan(posterior, done, unavailable,
                    input.repairs().stream().map(DiagnosisInput.RepairTried::fault).collect(Collectors.toSet()), causeFirst);
        }
        return new DiagnosisResponse(rank(hypotheses, prior, posterior, items, priors.notes()), nextCheck(plan),
                outcome.findings().stream().map(f -> new FindingView(f.code(), f.text(),
                        Double.isNaN(f.value()) ? null : f.value(), f.unit(), f.limit())).toList(),
                cautions(outcome, plan), assumptions(outcome, priors, rates),
                new DecisionView(METHOD, stopThreshold, plan.expectedCostNow(),
                        Double.isNaN(plan.expectedCostWithCheck()) ? null : plan.expectedCostWithCheck(),
                        plan.stopReason(), List.copyOf(outcome.firedRules()), STEP_METHOD, step.expectedCostNow(),
                        Double.isNaN(step.expectedCostWithStep()) ? null : step.expectedCostWithStep(), step.stopReason(), causeFirst),
                outcome.alerts().stream().map(a -> catalogue.alerts().get(a.code())).distinct().toList(),
                StepViews.of(catalogue, step));
    }

    /** What the technician cannot do, and what the situation holds back (a rule's Hold on a class of disturbance). */
    private Set<String> unavailable(Set<String> marked, RuleOutcome outcome) {
        if (outcome.holds().isEmpty()) {
            return marked;
        }
        Set<String> held = outcome.holds().stream().map(h -> h.disturbance()).collect(Collectors.toSet());
        Set<String> out = new java.util.HashSet<>(marked);
        catalogue.checks().values().stream().filter(c -> c.disturbs().stream().anyMatch(held::contains))
                .forEach(c -> out.add(c.code()));
        return out;
    }

    private List<HypothesisView> rank(List<Fault> hypotheses, double[] prior, double[] posterior, List<EvidenceItem> items,
            String[] priorNotes) {
        return IntStream.range(0, hypotheses.size()).boxed()
                .sorted(Comparator.comparingDouble((Integer h) -> -posterior[h]))
                .map(h -> {
                    Fault f = hypotheses.get(h);
                    return new HypothesisView(f.code(), f.title(), posterior[h], f.failureMode(), f.mechanism(),
                            f.action(), Reasons.forHypothesis(h, prior, items, priorNotes[h]));
                })
                .toList();
    }

    private NextCheckView nextCheck(CheckPlan plan) {
        CheckDef c = plan.check();
        if (c == null) {
            return null;
        }
        return new NextCheckView(c.code(), c.title(), c.minutes(), c.outcomes(), c.bypass(), c.instructions(),
                c.cautions().stream().map(code -> catalogue.cautions().get(code)).toList(), plan.why(), c.disturbs(), c.persons());
    }

    private static List<String> assumptions(RuleOutcome outcome, Priors priors, SymptomRates rates) {
        List<String> out = new ArrayList<>(outcome.assumptions().stream().map(Assumption::text).distinct().toList());
        out.add(priors.basis());
        if (rates.basis() != null) {
            out.add(rates.basis());
        }
        return out;
    }

    /** Situation cautions first (site procedures leads), then those of the next check, each once. */
    private List<String> cautions(RuleOutcome outcome, CheckPlan plan) {
        Set<String> codes = new LinkedHashSet<>();
        codes.add("site_procedures");
        outcome.cautions().stream().map(Caution::code).sorted().forEach(codes::add);
        if (plan.check() != null) {
            codes.addAll(plan.check().cautions());
            if (plan.check().persons() > 1) {
                codes.add(LONE_WORKING);
            }
        }
        return codes.stream().map(code -> catalogue.cautions().getOrDefault(code, code)).toList();
    }
}
