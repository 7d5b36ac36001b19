package dev.positioner.knowledge;

import io.quarkus.runtime.Startup;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.inject.Produces;
import jakarta.inject.Singleton;
import java.nio.file.Path;
import org.eclipse.microprofile.config.inject.ConfigProperty;
import org.jboss.logging.Logger;

/**
 * Loads the knowledge base once at start-up. {@link Startup} makes the load eager, so a broken base
 * stops the service before it takes a request, with every problem in the log.
 */
@ApplicationScoped
public class KnowledgeBaseProducer {

    private static final Logger LOG = Logger.getLogger(KnowledgeBaseProducer.class);

    @Produces
    @Singleton
    @Startup
    KnowledgeBase knowledgeBase(@ConfigProperty(name = "positioner.rules-dir") String rulesDir) {
        long start = System.nanoTime();
        KnowledgeBase base = KnowledgeBaseLoader.load(Path.of(rulesDir));
        LOG.infof("Knowledge base loaded from %s: %d faults, %d symptoms, %d checks, %d rules in %d ms",
                Path.of(rulesDir).toAbsolutePath(), base.catalogue().faults().size(),
                base.catalogue().symptoms().size(), base.catalogue().checks().size(),
                base.rules().getKiePackages().stream().mapToInt(p -> p.getRules().size()).sum(),
                (System.nanoTime() - start) / 1_000_000);
        return base;
    }
}
