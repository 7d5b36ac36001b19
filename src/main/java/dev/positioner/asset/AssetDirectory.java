package dev.positioner.asset;

import java.util.Collection;
import java.util.Optional;

/** Looks up valves by tag. */
public interface AssetDirectory {

    Optional<AssetRecord> find(String tag);

    Collection<AssetRecord> all();
}
