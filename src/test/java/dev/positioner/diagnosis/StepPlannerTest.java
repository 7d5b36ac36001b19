package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.knowledge.Catalogue;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Checks against repairs on a two-fault catalogue small enough to follow by hand. */
class StepPlannerTest {

    static final double[] P = {0.594, 0.396, 0.01};

    static StepPlanner planner(Catalogue c) {
        return new StepPlanner(c, 0.9, 120, 0.5, 6);
    }

    @Test
    void aDecisiveQuickCheckComesBeforeDearRepairs() {
        // Repairs of 100 and 80 minutes: a 5-minute check that tells them apart saves about a third of them.
        Catalogue c = TinyCatalogue.of(TinyCatalogue.check("decisive", 5, false, 0.95, 0.05));
        StepPlan plan = planner(c).plan(P, Set.of(), Set.of(), Set.of(), false);
        assertNotNull(plan.check());
        assertEquals("decisive", plan.check().code());
        assertTrue(plan.expectedCostWithStep() < plan.expectedCostNow(), plan.toString());
    }

    @Test
    void aQuickFixCheaperThanTheCheckIsTriedFirst() {
        // f0's repair is a 3-minute quick fix that works 95 % of the time: trying it beats a 30-minute check.
        Catalogue c = TinyCatalogue.with(30, TinyCatalogue.fault("f0", 0.594, 3, 0.95, true),
                TinyCatalogue.fault("f1", 0.396, 80, 0.9, true), TinyCatalogue.check("slow", 30, false, 0.95, 0.05));
        StepPlan plan = planner(c).plan(P, Set.of(), Set.of(), Set.of(), false);
        assertNotNull(plan.repair(), plan.toString());
        assertEquals("f0", plan.repair().code());
        assertTrue(plan.why().startsWith("About 3 minutes"), plan.why());
        // A site that finds the cause first checks instead.
        StepPlan causeFirst = planner(c).plan(P, Set.of(), Set.of(), Set.of(), true);
        assertEquals("slow", causeFirst.check().code());
    }

    @Test
    void aRepairThatCannotBeUndoneWaitsForAClearCause() {
        // Same quick fix, but it cannot be undone: at 59 % it is not proposed, the check is.
        Catalogue c = TinyCatalogue.with(30, TinyCatalogue.fault("f0", 0.594, 3, 0.95, false),
                TinyCatalogue.fault("f1", 0.396, 80, 0.9, true), TinyCatalogue.check("slow", 30, false, 0.95, 0.05));
        StepPlan plan = new StepPlanner(c, 0.9, 120, 0.7, 6).plan(P, Set.of(), Set.of(), Set.of(), false);
        assertNull(plan.repair(), plan.toString());
    }

    @Test
    void aRepairTriedIsNotProposedAgainAndTheOtherCauseIsRepairedNext() {
        Catalogue c = TinyCatalogue.with(30, TinyCatalogue.fault("f0", 0.594, 3, 0.95, true),
                TinyCatalogue.fault("f1", 0.396, 10, 0.9, true));
        StepPlan plan = planner(c).plan(new double[] {0.07, 0.92, 0.01}, Set.of(), Set.of(), Set.of("f0"), false);
        assertEquals("f1", plan.repair().code());
    }
}
