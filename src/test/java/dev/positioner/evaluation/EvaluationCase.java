package dev.positioner.evaluation;

import dev.positioner.diagnosis.DiagnosisRequest;
import dev.positioner.knowledge.CheckDef;
import java.util.Map;

/**
 * One invented troubleshooting scenario: the true cause, what the work order and the first minutes at
 * the valve give ({@code request}), and the outcome the true cause would show for every check it
 * affects ({@code answers}); any check not listed shows its first (normal) outcome. {@code atypical}
 * marks a case written with one realistic misleading element.
 */
public record EvaluationCase(String id, String truth, String story, boolean atypical, DiagnosisRequest request,
        Map<String, String> answers) {

    public EvaluationCase {
        answers = answers == null ? Map.of() : Map.copyOf(answers);
    }

    /** What the technician would find if the check were made on this valve. */
    public String answer(CheckDef check) {
        return answers.getOrDefault(check.code(), check.normalOutcome());
    }
}
