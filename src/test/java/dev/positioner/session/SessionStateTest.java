package dev.positioner.session;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.positioner.diagnosis.DiagnosisRequest;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class SessionStateTest {

    private final List<SessionEvent> events = new ArrayList<>();

    private SessionEvent add(EventType type, EventData data) {
        SessionEvent e = new SessionEvent(events.size() + 1, type, "t", Instant.EPOCH, data, null);
        events.add(e);
        return e;
    }

    @Test
    void aLaterAnswerReplacesTheEarlierOneAndARetractionUndoesIt() {
        add(EventType.OPENED, EventData.opened("WO"));
        add(EventType.CHECK, EventData.check("read_filter_dp", "normal"));
        add(EventType.CHECK, EventData.check("read_filter_dp", "high"));
        add(EventType.READING, EventData.reading("supply_pressure", 205.0, "psi"));
        add(EventType.RETRACTION, EventData.retraction(3, "wrong gauge"));
        DiagnosisRequest r = SessionState.of(events).request("PV-2041", null);
        assertEquals(1, r.checks().size());
        assertEquals("normal", r.checks().get(0).outcome());
        assertEquals(1, r.measurements().size());
        assertEquals("PV-2041", r.asset().tag());
    }

    @Test
    void retractingARetractionRestoresItsTarget() {
        add(EventType.OPENED, EventData.opened(null));
        add(EventType.SYMPTOM, EventData.symptom("hunting", true));
        add(EventType.RETRACTION, EventData.retraction(2, null));
        assertEquals(List.of(), SessionState.of(events).request("X", null).symptoms());
        add(EventType.RETRACTION, EventData.retraction(3, null));
        assertEquals(Map.of(3, 4), SessionState.retractions(events));
        assertEquals(List.of("hunting"), SessionState.of(events).request("X", null).symptoms());
    }

    @Test
    void theItemJustAddedComesFirstSoItsErrorsCanBeNamed() {
        add(EventType.READING, EventData.reading("supply_pressure", 205.0, "psi"));
        SessionEvent drain = add(EventType.READING, EventData.reading("drain_pressure", 2.0, "psi"));
        add(EventType.SYMPTOM, EventData.symptom("slow_stroke", false));
        SessionEvent hunting = add(EventType.SYMPTOM, EventData.symptom("hunting", false));
        SessionState state = SessionState.of(events);
        assertEquals(List.of("hunting", "slow_stroke"), state.request("X", hunting).absentSymptoms());
        assertEquals("drain_pressure", state.request("X", drain).measurements().get(0).quantity());
        assertEquals("supply_pressure", state.request("X", null).measurements().get(0).quantity());
    }

    /** What a closure records for learning: each symptom's last answer, retracted ones left out. */
    @Test
    void theSymptomsAClosureKeepsAreTheLastAnswersNotRetracted() {
        add(EventType.OPENED, EventData.opened(null));
        add(EventType.SYMPTOM, EventData.symptom("slow_stroke", true));
        add(EventType.SYMPTOM, EventData.symptom("hunting", true));
        add(EventType.RETRACTION, EventData.retraction(3, "it was the controller"));
        add(EventType.SYMPTOM, EventData.symptom("noisy_pump", true));
        add(EventType.SYMPTOM, EventData.symptom("noisy_pump", false));
        assertEquals(Map.of("slow_stroke", true, "noisy_pump", false), SessionState.of(events).symptoms());
    }
}
