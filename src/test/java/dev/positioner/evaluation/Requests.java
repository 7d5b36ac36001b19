package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.diagnosis.DiagnosisRequest.CheckInput;
import dev.positioner.diagnosis.DiagnosisResponse;
import dev.positioner.diagnosis.DiagnosisResponse.HypothesisView;
import java.util.List;

/** Small helpers shared by the replays: a request with check results added, and reading a response. */
final class Requests {

    private Requests() {
    }

    static DiagnosisRequest withChecks(DiagnosisRequest presenting, List<CheckInput> checks) {
        return new DiagnosisRequest(presenting.symptoms(), presenting.absentSymptoms(), presenting.measurements(),
                List.copyOf(checks), presenting.unavailableChecks(), presenting.asset());
    }

    /** 1-based rank of the fault among the hypotheses; hypotheses.size() + 1 if it is missing. */
    static int rank(DiagnosisResponse response, String fault) {
        List<HypothesisView> h = response.hypotheses();
        for (int i = 0; i < h.size(); i++) {
            if (h.get(i).fault().equals(fault)) {
                return i + 1;
            }
        }
        return h.size() + 1;
    }

    static HypothesisView leader(DiagnosisResponse response) {
        return response.hypotheses().get(0);
    }
}
