package dev.positioner.asset;

import dev.positioner.storage.Storage;
import io.quarkus.runtime.StartupEvent;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import org.eclipse.microprofile.config.inject.ConfigProperty;
import org.jboss.logging.Logger;

/**
 * With {@code positioner.demo-data=true}, registers the demonstration valves that are not there yet.
 * Tags already present are left alone so edits made through the API survive a restart; when two
 * instances start together on one database, the loser of an insert race simply skips the tag.
 */
@ApplicationScoped
public class DemoSeeder {

    private static final Logger LOG = Logger.getLogger(DemoSeeder.class);

    void seed(@Observes StartupEvent start, @ConfigProperty(name = "positioner.demo-data") boolean enabled,
            Storage storage, AssetRegistry registry, AssetValidator validator) {
        if (!enabled) {
            return;
        }
        int added = 0;
        for (AssetRecord demo : DemoPlant.assets()) {
            AssetValidator.Result checked = validator.validate(demo, "demo/plant.yaml " + demo.tag() + ".");
            if (!checked.errors().isEmpty()) {
                throw new IllegalStateException("demo/plant.yaml is invalid: " + checked.errors());
            }
            try {
                if (storage.inTransaction(c -> registry.create(c, checked.asset()))) {
                    added++;
                }
            } catch (RuntimeException e) {
                if (!Storage.isUniqueViolation(e)) {
                    throw e;
                }
            }
        }
        LOG.infof("Demo plant: %d valve(s) added to the registry", added);
    }
}
