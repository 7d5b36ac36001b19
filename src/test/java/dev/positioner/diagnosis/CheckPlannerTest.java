package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.knowledge.Catalogue;
import java.util.Set;
import org.junit.jupiter.api.Test;

class CheckPlannerTest {

    static final double[] P = {0.594, 0.396, 0.01};

    @Test
    void proposesTheCheckThatSeparatesTheLeaders() {
        Catalogue c = TinyCatalogue.of(TinyCatalogue.check("decisive", 5, false, 0.95, 0.05),
                TinyCatalogue.check("weak", 2, false, 0.55, 0.45));
        CheckPlan plan = new CheckPlanner(c, 0.9, 0.05).plan(P, Set.of(), Set.of());
        assertEquals("decisive", plan.check().code());
        assertTrue(plan.expectedCostWithCheck() < plan.expectedCostNow(), "the chosen check lowers the expected cost");
        assertTrue(plan.why().contains("Separates"), plan.why());
    }

    @Test
    void neverProposesAnUnavailableCheckAndSaysWhyItStops() {
        Catalogue c = TinyCatalogue.of(TinyCatalogue.check("decisive", 5, false, 0.95, 0.05));
        CheckPlan plan = new CheckPlanner(c, 0.9, 0.05).plan(P, Set.of(), Set.of("decisive"));
        assertNull(plan.check());
        assertTrue(plan.stopReason().contains("unavailable: decisive"), plan.stopReason());
    }

    @Test
    void stopsAtTheThreshold() {
        Catalogue c = TinyCatalogue.of(TinyCatalogue.check("decisive", 5, false, 0.95, 0.05));
        CheckPlan plan = new CheckPlanner(c, 0.9, 0.05).plan(new double[] {0.92, 0.07, 0.01}, Set.of(), Set.of());
        assertNull(plan.check());
        assertTrue(plan.stopReason().contains("stopping threshold"));
    }

    @Test
    void aBypassPenaltyCanTipTheChoiceToAQuickerWeakerCheck() {
        // Both checks cost 10 minutes; one needs the bypass. Without a penalty the bypass check,
        // being more decisive, wins; with 60 minutes of process exposure added, the other one does.
        var needsBypass = TinyCatalogue.check("needs_bypass", 10, true, 0.97, 0.03);
        var fromOutside = TinyCatalogue.check("from_outside", 10, false, 0.85, 0.15);
        assertEquals("needs_bypass", new CheckPlanner(TinyCatalogue.withBypassPenalty(0, needsBypass, fromOutside), 0.9, 0.0)
                .plan(P, Set.of(), Set.of()).check().code());
        assertEquals("from_outside", new CheckPlanner(TinyCatalogue.withBypassPenalty(60, needsBypass, fromOutside), 0.9, 0.0)
                .plan(P, Set.of(), Set.of()).check().code());
    }

    @Test
    void aCheckDearerThanTryingTheRepairIsStillProposedButSaysSo() {
        // A slow, vague check: ECO is above ECR, so by expected cost alone one would try the
        // repair of the cause with the best probability per minute first; the reason says so.
        Catalogue c = TinyCatalogue.of(TinyCatalogue.check("slow_and_vague", 90, false, 0.8, 0.2));
        CheckPlan plan = new CheckPlanner(c, 0.9, 0.05).plan(P, Set.of(), Set.of());
        assertTrue(plan.expectedCostWithCheck() >= plan.expectedCostNow());
        assertTrue(plan.why().contains("trying the repair for f0"), plan.why());
    }

    @Test
    void aCheckThatCannotChangeTheDecisionIsNotProposed() {
        // Both faults give the same outcomes: no outcome can change the leader or lift it to 0.9.
        Catalogue c = TinyCatalogue.of(TinyCatalogue.check("blind", 2, false, 0.5, 0.5));
        CheckPlan plan = new CheckPlanner(c, 0.9, 0.05).plan(P, Set.of(), Set.of());
        assertNull(plan.check());
        assertTrue(plan.stopReason().startsWith("No remaining check"), plan.stopReason());
    }

    @Test
    void checksAlreadyDoneAreNotProposedAgain() {
        Catalogue c = TinyCatalogue.of(TinyCatalogue.check("decisive", 5, false, 0.95, 0.05),
                TinyCatalogue.check("second", 5, false, 0.8, 0.2));
        assertEquals("second", new CheckPlanner(c, 0.9, 0.05).plan(P, Set.of("decisive"), Set.of()).check().code());
    }
}
