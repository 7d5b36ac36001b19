package dev.positioner.asset;

import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;

/**
 * The invented demonstration plant (classpath {@code demo/plant.yaml}): a few valve tags with
 * design data. None of it is measured data. {@link DemoSeeder} copies it into the registry.
 */
public final class DemoPlant {

    private DemoPlant() {
    }

    public static List<AssetRecord> assets() {
        try (InputStream in = DemoPlant.class.getResourceAsStream("/demo/plant.yaml")) {
            Map<String, List<AssetRecord>> doc = new ObjectMapper(new YAMLFactory()).readValue(in, new TypeReference<>() { });
            return doc.get("assets");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read demo/plant.yaml", e);
        }
    }
}
