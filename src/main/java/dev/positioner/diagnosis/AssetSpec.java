package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.ValveAction;
import java.util.Map;

/**
 * Design data of the valve under diagnosis in canonical units, as given by the client or the
 * registry, with which way it acts and where it fails. Missing values are filled by {@link NormalBands} with stated assumptions. The site is
 * the registry's (null when the tag has none or is not registered): learning from closures is by
 * site, and carrying it here spares each learning source its own registry lookup.
 */
public record AssetSpec(String tag, String site, String oilGrade, String cleanlinessTarget, Map<String, Double> design,
        ValveAction action) {

    public AssetSpec(String tag, String site, String oilGrade, String cleanlinessTarget, Map<String, Double> design) {
        this(tag, site, oilGrade, cleanlinessTarget, design, ValveAction.of(null, null, null));
    }

    public static AssetSpec none() {
        return new AssetSpec(null, null, null, null, Map.of());
    }

    public Double value(String quantity) {
        return design.get(quantity);
    }
}
