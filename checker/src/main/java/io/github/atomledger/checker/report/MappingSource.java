package io.github.atomledger.checker.report;

import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.util.Optional;

/**
 * Where the HTML report gets a reaction's atom map from. The engine fills it once it maps
 * reactions; until then (and for reactions it could not map) the report shows the balance only.
 * Implementations must be deterministic and safe to call from one thread in document order.
 */
@FunctionalInterface
public interface MappingSource {

    /** No mapping data at all: every reaction renders with its balance only. */
    MappingSource NONE = (model, reaction) -> Optional.empty();

    Optional<ReactionMapping> mapping(ModelResult model, ReactionResult reaction);
}
