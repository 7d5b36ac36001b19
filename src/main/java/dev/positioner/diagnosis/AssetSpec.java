package dev.positioner.diagnosis;

import java.util.Map;

/**
 * Design data of the valve under diagnosis in canonical units, as given by the client or the
 * registry. Missing values are filled by {@link NormalBands} with stated assumptions.
 */
public record AssetSpec(String tag, String oilGrade, String cleanlinessTarget, Map<String, Double> design) {

    public static AssetSpec none() {
        return new AssetSpec(null, null, null, Map.of());
    }

    public Double value(String quantity) {
        return design.get(quantity);
    }
}
