package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.mapping.AtomTransition;
import io.github.atomledger.atommapper.mapping.MapConfidence;

import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * What the checker knows about one reaction's atom map: the status, the carbon transitions of the
 * optimum, the co-optimal alternatives, cost and bound, and the structures it was computed from.
 * It is what reports, annotations and the cache carry (the mapper's full result is not kept).
 *
 * @param reactionId        the reaction
 * @param status            the status
 * @param carbons           carbon transitions of the optimum (best map for best-found), sorted
 * @param alternatives      other co-optimal carbon maps, distinct up to symmetry (ambiguous only)
 * @param cost              weighted bond edits of the map, -1 when there is none
 * @param lowerBound        proven lower bound on the optimum, -1 when there is none
 * @param mappedSmiles      reaction SMILES with atom classes as map numbers, "" when none
 * @param stereoNotes       notes on symmetries that only stereochemistry breaks (need a curated pin)
 * @param reason            one sentence for unmappable, skipped, best-found and no-structure
 * @param elementDifference heavy-atom differences (products − reactants) for unmappable
 * @param missingStructures participants without a structure (no-structure), sorted
 * @param fingerprints      species to structure fingerprint, for the participants used
 * @param confidence        margin to the runner-up, rearrangement patterns and alternative
 *                          weightings ({@link MapConfidence#NONE} when not computed)
 */
public record ReactionMapping(String reactionId, MapStatus status, List<AtomTransition> carbons,
                              List<List<AtomTransition>> alternatives, int cost, int lowerBound,
                              String mappedSmiles, List<String> stereoNotes, String reason,
                              SortedMap<String, Long> elementDifference, List<String> missingStructures,
                              SortedMap<String, String> fingerprints, MapConfidence confidence) {

    public ReactionMapping {
        Objects.requireNonNull(reactionId, "reactionId");
        Objects.requireNonNull(status, "status");
        carbons = carbons.stream().sorted().toList();
        alternatives = alternatives.stream().map(a -> a.stream().sorted().toList()).toList();
        mappedSmiles = mappedSmiles == null ? "" : mappedSmiles;
        stereoNotes = List.copyOf(stereoNotes);
        reason = reason == null ? "" : reason;
        elementDifference = Collections.unmodifiableSortedMap(new TreeMap<>(elementDifference));
        missingStructures = missingStructures.stream().sorted().toList();
        fingerprints = Collections.unmodifiableSortedMap(new TreeMap<>(fingerprints));
        confidence = confidence == null ? MapConfidence.NONE : confidence;
    }

    /** A mapping without a confidence analysis. */
    public ReactionMapping(String reactionId, MapStatus status, List<AtomTransition> carbons,
                           List<List<AtomTransition>> alternatives, int cost, int lowerBound, String mappedSmiles,
                           List<String> stereoNotes, String reason, SortedMap<String, Long> elementDifference,
                           List<String> missingStructures, SortedMap<String, String> fingerprints) {
        this(reactionId, status, carbons, alternatives, cost, lowerBound, mappedSmiles, stereoNotes, reason,
                elementDifference, missingStructures, fingerprints, MapConfidence.NONE);
    }

    /** A result with no map: skipped, no-structure or unmappable before mapping. */
    public static ReactionMapping without(String reactionId, MapStatus status, String reason, List<String> missing) {
        return new ReactionMapping(reactionId, status, List.of(), List.of(), -1, -1, "", List.of(), reason,
                new TreeMap<>(), missing, new TreeMap<>());
    }

    /** True when there is a map to report or write (mapped, ambiguous, best-found). */
    public boolean hasMap() {
        return status == MapStatus.MAPPED || status == MapStatus.AMBIGUOUS || status == MapStatus.BEST_FOUND;
    }
}
