package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.mapping.MapConfidence;
import io.github.atomledger.checker.transitions.TransitionAnnotation;
import io.github.atomledger.checker.check.structure.SpeciesStructures;

import java.util.Map;
import java.util.Optional;

/**
 * Mapping results of one model for the checks: per-reaction maps, curated-map verdicts, the
 * annotations stored in the model, the resolved species structures, the curated maps read from
 * RXN files ({@code imported}, by reaction id) and the review margin the run was configured with.
 * {@link #NONE} when mapping was not run. Immutable.
 */
public record MappingData(boolean enabled, Map<String, ReactionMapping> mappings,
                          Map<String, CuratedVerdict> curated, Map<String, TransitionAnnotation> stored,
                          SpeciesStructures structures, Map<String, ImportedMap> imported, int reviewMargin) {

    public static final MappingData NONE = new MappingData(false, Map.of(), Map.of(), Map.of(), SpeciesStructures.EMPTY);

    /** Without curated map files, with the default review margin. */
    public MappingData(boolean enabled, Map<String, ReactionMapping> mappings, Map<String, CuratedVerdict> curated,
                       Map<String, TransitionAnnotation> stored, SpeciesStructures structures) {
        this(enabled, mappings, curated, stored, structures, Map.of());
    }

    /** With the default review margin. */
    public MappingData(boolean enabled, Map<String, ReactionMapping> mappings, Map<String, CuratedVerdict> curated,
                       Map<String, TransitionAnnotation> stored, SpeciesStructures structures,
                       Map<String, ImportedMap> imported) {
        this(enabled, mappings, curated, stored, structures, imported, MapConfidence.DEFAULT_REVIEW_MARGIN);
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
