package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.Map;
import java.util.Optional;

/**
 * Mapping results of one model for the checks: per-reaction maps, curated-map verdicts, the
 * annotations stored in the model, the resolved species structures and the curated maps read from
 * RXN files ({@code imported}, by reaction id). {@link #NONE} when mapping was not run. Immutable.
 */
public record MappingData(boolean enabled, Map<String, ReactionMapping> mappings,
                          Map<String, CuratedVerdict> curated, Map<String, TransitionAnnotation> stored,
                          SpeciesStructures structures, Map<String, ImportedMap> imported) {

    public static final MappingData NONE = new MappingData(false, Map.of(), Map.of(), Map.of(), SpeciesStructures.EMPTY);

    /** Without curated map files. */
    public MappingData(boolean enabled, Map<String, ReactionMapping> mappings, Map<String, CuratedVerdict> curated,
                       Map<String, TransitionAnnotation> stored, SpeciesStructures structures) {
        this(enabled, mappings, curated, stored, structures, Map.of());
    }

    public MappingData {
        mappings = Map.copyOf(mappings);
        curated = Map.copyOf(curated);
        stored = Map.copyOf(stored);
        imported = Map.copyOf(imported);
    }

    public Optional<ReactionMapping> mapping(String reactionId) {
        return Optional.ofNullable(mappings.get(reactionId));
    }
}
