package dev.positioner.asset;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import jakarta.enterprise.context.ApplicationScoped;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.eclipse.microprofile.config.inject.ConfigProperty;

/**
 * The invented demonstration plant (classpath {@code demo/plant.yaml}): a few valve tags with
 * design data, loaded when {@code positioner.demo-data} is true. None of it is measured data.
 */
@ApplicationScoped
public class DemoPlant implements AssetDirectory {

    private final Map<String, AssetRecord> byTag = new LinkedHashMap<>();

    public DemoPlant(@ConfigProperty(name = "positioner.demo-data", defaultValue = "false") boolean enabled) {
        if (!enabled) {
            return;
        }
        try (InputStream in = DemoPlant.class.getResourceAsStream("/demo/plant.yaml")) {
            Map<String, List<AssetRecord>> doc = new ObjectMapper(new YAMLFactory()).readValue(in, new TypeReference<>() { });
            doc.get("assets").forEach(a -> byTag.put(a.tag(), a));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read demo/plant.yaml", e);
        }
    }

    @Override
    public Optional<AssetRecord> find(String tag) {
        return Optional.ofNullable(byTag.get(tag));
    }

    @Override
    public Collection<AssetRecord> all() {
        return byTag.values();
    }
}
