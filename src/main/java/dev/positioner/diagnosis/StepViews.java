package dev.positioner.diagnosis;

import dev.positioner.diagnosis.DiagnosisResponse.NextStepView;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.Repair;
import java.util.List;

/** The next step as the contract shows it, with caution texts rather than codes. */
final class StepViews {

    static final List<String> REPAIR_OUTCOMES = RequestReader.REPAIR_OUTCOMES;

    private StepViews() {
    }

    static NextStepView of(Catalogue catalogue, StepPlan plan) {
        if (plan.check() != null) {
            CheckDef c = plan.check();
            return new NextStepView("check", c.code(), c.title(), c.minutes(), c.outcomes(), c.bypass(), c.instructions(),
                    texts(catalogue, c.cautions()), plan.why(), c.disturbs(), c.persons(), null, null);
        }
        if (plan.repair() == null) {
            return null;
        }
        Fault f = plan.repair();
        Repair r = f.repair();
        boolean bypass = r.disturbs().stream().map(catalogue::disturbance).anyMatch(d -> d != null && d.bypass());
        List<String> steps = r.steps().isEmpty() ? List.of(r.action()) : r.steps();
        return new NextStepView("repair", f.code(), f.title(), r.minutes(), REPAIR_OUTCOMES, bypass, steps,
                texts(catalogue, r.cautions()), plan.why(), r.disturbs(), 1, r.reversible(), r.partsCost());
    }

    private static List<String> texts(Catalogue catalogue, List<String> codes) {
        return codes.stream().map(code -> catalogue.cautions().getOrDefault(code, code)).toList();
    }
}
