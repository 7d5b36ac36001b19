package dev.positioner.diagnosis;

import dev.positioner.knowledge.Catalogue;

/**
 * Where the priors of a diagnosis come from. The default is the fault catalogue itself; a source
 * that learns from confirmed closures can replace it by providing another bean of this type.
 */
public interface PriorSource {

    Priors priors(Catalogue catalogue, AssetSpec asset);
}
