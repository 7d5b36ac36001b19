package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;
import io.quarkus.arc.DefaultBean;
import jakarta.enterprise.context.ApplicationScoped;

/** The catalogue's own symptom likelihoods, used unless a learning source is installed. */
@ApplicationScoped
@DefaultBean
public class CatalogueSymptomRates implements SymptomRateSource {

    @Override
    public SymptomRates rates(Catalogue catalogue, AssetSpec asset) {
        return SymptomRates.catalogue(catalogue);
    }
}
