package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.util.Optional;

/**
 * Where the HTML report gets a reaction's atom map from: normally {@link #FROM_ENGINE}; reactions
 * without a map (mapping off, or not mappable) show their balance only.
 * Implementations must be deterministic and safe to call from one thread in document order.
 */
@FunctionalInterface
public interface MappingSource {

    /** No mapping data at all: every reaction renders with its balance only. */
    MappingSource NONE = (model, reaction) -> Optional.empty();

    /** The maps the engine computed ({@code ReactionResult.mapping()}); balance only where there is none. */
    MappingSource FROM_ENGINE = MapPictures::fromEngine;

    Optional<MapPicture> mapping(ModelResult model, ReactionResult reaction);
}
