package dev.positioner.knowledge;

import org.kie.api.KieBase;

/** A validated catalogue and its compiled rules: what the diagnosis runs on. */
public record KnowledgeBase(Catalogue catalogue, KieBase rules) {
}
