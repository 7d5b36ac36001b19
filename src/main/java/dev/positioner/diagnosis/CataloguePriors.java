package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.Fault;
import io.quarkus.arc.DefaultBean;
import jakarta.enterprise.context.ApplicationScoped;

/** The catalogue's own priors, used unless a learning prior source is installed. */
@ApplicationScoped
@DefaultBean
public class CataloguePriors implements PriorSource {

    @Override
    public Priors priors(Catalogue catalogue, AssetSpec asset) {
        return new Priors(catalogue.hypotheses().stream().mapToDouble(Fault::prior).toArray(),
                "Prior from the fault catalogue (no site history applied).");
    }
}
