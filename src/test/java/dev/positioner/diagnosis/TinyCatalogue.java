package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.CheckDef;
import dev.positioner.knowledge.Disturbance;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.Repair;
import dev.positioner.knowledge.RepairGuide;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A two-fault catalogue small enough to compute by hand, for planner tests. */
final class TinyCatalogue {

    private TinyCatalogue() {
    }

    static Fault fault(String code, double prior, double repair) {
        return new Fault(code, code, "test", prior, "OTH", "6.4 Unknown", "", List.of("from_memory"),
                Repair.minimal(code, "repair " + code, repair, List.of("from_memory")));
    }

    /** P(a | f0), P(a | f1); the unlisted cause takes the prior-weighted mean. */
    static CheckDef check(String code, double minutes, boolean bypass, double aGivenF0, double aGivenF1) {
        return new CheckDef(code, code, minutes, bypass, List.of("a", "b"), List.of("do it"), List.of(),
                Map.of("a", 0.5, "b", 0.5),
                Map.of("f0", Map.of("a", aGivenF0, "b", 1 - aGivenF0), "f1", Map.of("a", aGivenF1, "b", 1 - aGivenF1)),
                List.of("from_memory"), List.of(bypass ? "positioner_out_of_loop" : "nothing"), 0, 1);
    }

    static Catalogue of(CheckDef... checks) {
        return withBypassPenalty(30, checks);
    }

    static Catalogue withBypassPenalty(double penalty, CheckDef... checks) {
        return with(penalty, fault("f0", 0.594, 100), fault("f1", 0.396, 80), checks);
    }

    /** A fault whose repair takes these minutes, fixes it with this chance and may or may not be undone. */
    static Fault fault(String code, double prior, double repair, double fixChance, boolean reversible) {
        return new Fault(code, code, "test", prior, "OTH", "6.4 Unknown", "", List.of("from_memory"),
                new Repair(code, "repair " + code, repair, 0, reversible, fixChance, List.of("nothing"), List.of(), List.of(),
                        List.of(), List.of(), List.of(), List.of(), List.of(), List.of("from_memory")));
    }

    static Catalogue with(double penalty, Fault f0, Fault f1, CheckDef... checks) {
        Map<String, Fault> faults = new LinkedHashMap<>();
        faults.put("f0", f0);
        faults.put("f1", f1);
        Map<String, CheckDef> byCode = new LinkedHashMap<>();
        for (CheckDef c : checks) {
            byCode.put(c.code(), c);
        }
        Map<String, Disturbance> disturbances = Map.of(
                "nothing", new Disturbance("nothing", "nothing", 0, false, List.of(), List.of("common_practice")),
                "positioner_out_of_loop", new Disturbance("positioner_out_of_loop", "Bypassed", penalty, true, List.of(), List.of("common_practice")));
        return new Catalogue(faults, fault("not_in_catalogue", 0.01, 240), 0.15, Map.of(), byCode, Map.of(),
                Map.of(), Map.of(), Map.of(), disturbances, RepairGuide.empty(), Map.of());
    }
}
