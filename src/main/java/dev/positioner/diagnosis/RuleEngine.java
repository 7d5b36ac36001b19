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
import dev.positioner.knowledge.KnowledgeBase;
import jakarta.enterprise.context.ApplicationScoped;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.kie.api.event.rule.AfterMatchFiredEvent;
import org.kie.api.event.rule.DefaultAgendaEventListener;
import org.kie.api.runtime.KieSession;

/**
 * The one bean in front of Drools. Each call gets a fresh session from the compiled base, inserts
 * the facts, fires, and reads the conclusions back by type; nothing of the engine leaks out.
 */
@ApplicationScoped
public class RuleEngine {

    private final KnowledgeBase knowledge;

    public RuleEngine(KnowledgeBase knowledge) {
        this.knowledge = knowledge;
    }

    public RuleOutcome evaluate(Collection<?> facts) {
        KieSession session = knowledge.rules().newKieSession();
        Set<String> fired = new LinkedHashSet<>();
        try {
            session.addEventListener(new DefaultAgendaEventListener() {
                @Override
                public void afterMatchFired(AfterMatchFiredEvent event) {
                    fired.add(event.getMatch().getRule().getName().split(" ", 2)[0]);
                }
            });
            facts.forEach(session::insert);
            session.fireAllRules();
            Collection<?> all = session.getObjects();
            return new RuleOutcome(of(all, ReportedSymptom.class), sorted(of(all, Observation.class)),
                    of(all, Finding.class), of(all, Subsumed.class), of(all, Explained.class),
                    of(all, Evidence.class), of(all, Caution.class), of(all, Assumption.class), fired,
                    of(all, Alert.class), of(all, Hold.class));
        } finally {
            session.dispose();
        }
    }

    private static List<Observation> sorted(List<Observation> observations) {
        return observations.stream().sorted(Comparator.comparing(Observation::check)).toList();
    }

    private static <T> List<T> of(Collection<?> objects, Class<T> type) {
        return objects.stream().filter(type::isInstance).map(type::cast).distinct().toList();
    }
}
