package io.github.atomledger.checker.diff;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.engine.ModelResult;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * Where the release diff gets each reaction's carbon transitions from. The diff compares them
 * only for reactions that carry them in both versions. {@link StoredTransitions} reads the
 * transitions annotated in the model file; a source that takes them from model-level atom maps
 * computed during the run can replace it without changing {@link ReleaseDiff}.
 *
 * <p>Implementations are stateless and thread-safe.
 */
@FunctionalInterface
public interface CarbonTransitions {

    /** A source that knows no transitions: the diff then compares balances only. */
    CarbonTransitions NONE = (result, file) -> Map.of();

    /**
     * The carbon transitions of every reaction that has them, by reaction id.
     *
     * @param result the model's check result
     * @param file   the model file it was read from
     * @return reaction id to its transitions (any order); reactions without transitions are absent
     */
    Map<String, List<AtomTransition>> carbons(ModelResult result, Path file);
}
