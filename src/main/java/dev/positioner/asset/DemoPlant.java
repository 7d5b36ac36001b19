package dev.positioner.asset;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The invented demonstration plant (classpath {@code demo/plant.yaml}): a few valve tags with
 * design data. None of it is measured data. In the service {@link DemoSeeder} copies it into the
 * registry; it is not a bean. As an in-memory {@link AssetDirectory} it serves tests and tools that
 * run the diagnosis without a container or a database.
 */
public final class DemoPlant implements AssetDirectory {

    private final Map<String, AssetRecord> byTag = new LinkedHashMap<>();

    public DemoPlant(boolean enabled) {
        if (enabled) {
            assets().forEach(a -> byTag.put(a.tag(), a));
        }
    }

    public static List<AssetRecord> assets() {
        try (InputStream in = DemoPlant.class.getResourceAsStream("/demo/plant.yaml")) {
            Map<String, List<AssetRecord>> doc = new ObjectMapper(new YAMLFactory()).readValue(in, new TypeReference<>() { });
            return doc.get("assets");
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
