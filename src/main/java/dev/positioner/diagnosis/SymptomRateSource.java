package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;

/**
 * Where P(symptom | cause) comes from. The default is the catalogue; a source that learns from
 * closed jobs can replace it by providing another bean of this type.
 */
public interface SymptomRateSource {

    SymptomRates rates(Catalogue catalogue, AssetSpec asset);
}
