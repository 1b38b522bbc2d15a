package io.github.atomledger.checker.diff;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.checker.engine.ModelResult;
import io.github.atomledger.checker.engine.ReactionResult;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Where the release diff gets each reaction's carbon transitions from. The diff compares them
 * only for reactions that carry them in both versions. {@link StoredTransitions} reads the
 * transitions annotated in the model file, {@link #COMPUTED} takes the atom maps computed during
 * the run; {@link #firstOf} combines sources. Other sources plug in without changing
 * {@link ReleaseDiff}.
 *
 * <p>Implementations are stateless and thread-safe.
 */
@FunctionalInterface
public interface CarbonTransitions {

    /** A source that knows no transitions: the diff then compares balances only. */
    CarbonTransitions NONE = (result, file) -> Map.of();

    /** The atom maps computed during the run (mapped, ambiguous or best-found reactions). */
    CarbonTransitions COMPUTED = (result, file) -> {
        Map<String, List<AtomTransition>> out = new TreeMap<>();
        for (ReactionResult r : result.reactions()) {
            if (r.mapping() != null && r.mapping().hasMap() && !r.mapping().carbons().isEmpty()) {
                out.put(r.id(), r.mapping().carbons());
            }
        }
        return out;
    };

    /** Per reaction, the transitions of {@code first} when it has them, else those of {@code second}. */
    static CarbonTransitions firstOf(CarbonTransitions first, CarbonTransitions second) {
        return (result, file) -> {
            Map<String, List<AtomTransition>> out = new TreeMap<>(second.carbons(result, file));
            out.putAll(first.carbons(result, file));
            return out;
        };
    }

    /**
     * The carbon transitions of every reaction that has them, by reaction id.
     *
     * @param result the model's check result
     * @param file   the model file it was read from
     * @return reaction id to its transitions (any order); reactions without transitions are absent
     */
    Map<String, List<AtomTransition>> carbons(ModelResult result, Path file);
}
