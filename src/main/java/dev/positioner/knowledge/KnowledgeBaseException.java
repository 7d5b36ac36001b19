package dev.positioner.knowledge;

import java.util.List;
import java.util.stream.Collectors;

/** Thrown at start-up when the knowledge base has problems; the message lists every one. */
public class KnowledgeBaseException extends RuntimeException {

    private final transient List<KnowledgeProblem> problems;

    public KnowledgeBaseException(List<KnowledgeProblem> problems) {
        super("The knowledge base has " + problems.size() + " problem(s); the service will not start:\n  "
                + problems.stream().map(KnowledgeProblem::toString).collect(Collectors.joining("\n  ")));
        this.problems = List.copyOf(problems);
    }

    public List<KnowledgeProblem> problems() {
        return problems;
    }
}
