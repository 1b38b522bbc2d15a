package io.github.atomledger.atommapper.mapping;

import java.time.Duration;
import java.util.List;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * The outcome of mapping one reaction. Immutable and thread-safe.
 *
 * <p>Everything except {@link #elapsed()} is deterministic: the same input and options give equal
 * results on any thread count ({@link #equals} ignores {@code elapsed}). Lists are sorted as
 * documented on each accessor and empty (never null) when they do not apply: an
 * {@link MappingStatus#UNMAPPABLE} or {@link MappingStatus#TOO_LARGE} result has no map, no edits,
 * cost and lower bound -1 and an empty mapped SMILES.
 */
public final class MappingResult {

    private final String reactionId;
    private final MappingStatus status;
    private final List<AtomTransition> atomMap;
    private final List<BondEdit> bondEdits;
    private final int cost;
    private final int lowerBound;
    private final List<List<AtomTransition>> alternatives;
    private final List<String> stereoNotes;
    private final List<AtomRef> prochiralAtoms;
    private final String mappedSmiles;
    private final SortedMap<String, Long> elementDifference;
    private final String reason;
    private final Duration elapsed;
    private final MapConfidence confidence;

    MappingResult(String reactionId, MappingStatus status, List<AtomTransition> atomMap, List<BondEdit> bondEdits,
                  int cost, int lowerBound, List<List<AtomTransition>> alternatives, List<String> stereoNotes,
                  List<AtomRef> prochiralAtoms, String mappedSmiles, SortedMap<String, Long> elementDifference,
                  String reason, Duration elapsed) {
        this(reactionId, status, atomMap, bondEdits, cost, lowerBound, alternatives, stereoNotes, prochiralAtoms,
                mappedSmiles, elementDifference, reason, elapsed, MapConfidence.NONE);
    }

    MappingResult(String reactionId, MappingStatus status, List<AtomTransition> atomMap, List<BondEdit> bondEdits,
                  int cost, int lowerBound, List<List<AtomTransition>> alternatives, List<String> stereoNotes,
                  List<AtomRef> prochiralAtoms, String mappedSmiles, SortedMap<String, Long> elementDifference,
                  String reason, Duration elapsed, MapConfidence confidence) {
        this.reactionId = Objects.requireNonNull(reactionId);
        this.status = Objects.requireNonNull(status);
        this.atomMap = List.copyOf(atomMap);
        this.bondEdits = List.copyOf(bondEdits);
        this.cost = cost;
        this.lowerBound = lowerBound;
        this.alternatives = alternatives.stream().map(List::copyOf).toList();
        this.stereoNotes = List.copyOf(stereoNotes);
        this.prochiralAtoms = List.copyOf(prochiralAtoms);
        this.mappedSmiles = Objects.requireNonNull(mappedSmiles);
        this.elementDifference = java.util.Collections.unmodifiableSortedMap(new TreeMap<>(elementDifference));
        this.reason = Objects.requireNonNull(reason);
        this.elapsed = Objects.requireNonNull(elapsed);
        this.confidence = Objects.requireNonNull(confidence);
    }

    /**
     * An {@link MappingStatus#UNMAPPABLE} result for input the mapper cannot take, for example a
     * non-integer coefficient found by the caller.
     */
    public static MappingResult unmappable(String reactionId, String reason) {
        return new MappingResult(reactionId, MappingStatus.UNMAPPABLE, List.of(), List.of(), -1, -1, List.of(),
                List.of(), List.of(), "", new TreeMap<>(), reason, Duration.ZERO);
    }

    /** The reaction id from the input. */
    public String reactionId() {
        return reactionId;
    }

    /** How the attempt ended. */
    public MappingStatus status() {
        return status;
    }

    /** Every heavy-atom transition of the map, sorted by {@code from} (then {@code to}). */
    public List<AtomTransition> atomMap() {
        return atomMap;
    }

    /** The carbon transitions of {@link #atomMap()}, same order. */
    public List<AtomTransition> carbonTransitions() {
        return carbonsOf(atomMap);
    }

    /** Bond edits implied by the map, sorted by kind, then reactant atoms. */
    public List<BondEdit> bondEdits() {
        return bondEdits;
    }

    /** Weighted number of bond edits of the map (the sum of the edit weights); -1 without a map. */
    public int cost() {
        return cost;
    }

    /** A proven lower bound on the optimum; equal to {@link #cost()} when the map is proven optimal. */
    public int lowerBound() {
        return lowerBound;
    }

    /** True when cost and lower bound meet. */
    public boolean provenOptimal() {
        return cost >= 0 && cost == lowerBound;
    }

    /**
     * For {@link MappingStatus#AMBIGUOUS}: the other co-optimal carbon maps, each distinct up to
     * symmetry from the main one and from each other, in the deterministic order the search found
     * them, at most {@link MappingOptions#maxAlternatives()}. Each is a full carbon transition
     * list sorted by {@code from}.
     */
    public List<List<AtomTransition>> alternatives() {
        return alternatives;
    }

    /**
     * Notes on equivalences the map relies on that are constitutional only (prochiral branches such
     * as citrate's two arms): a curator should pin them. One sentence each, deterministic order.
     */
    public List<String> stereoNotes() {
        return stereoNotes;
    }

    /** The carbon atoms named in {@link #stereoNotes()}, sorted, without duplicates. */
    public List<AtomRef> prochiralAtoms() {
        return prochiralAtoms;
    }

    /** True when {@link #stereoNotes()} is not empty. */
    public boolean needsStereoPin() {
        return !stereoNotes.isEmpty();
    }

    /**
     * The reaction as SMILES with OpenSMILES atom classes as map numbers: reactant heavy atoms are
     * numbered 1..n in reactant order (copies expanded), each product atom carries its source's
     * number. Molecules are written in input atom order. Empty without a map.
     */
    public String mappedSmiles() {
        return mappedSmiles;
    }

    /** For UNMAPPABLE: products minus reactants, heavy atoms per element, non-zero entries only. */
    public SortedMap<String, Long> elementDifference() {
        return elementDifference;
    }

    /** One sentence for UNMAPPABLE, TOO_LARGE and BEST_FOUND (and notes for other statuses); else empty. */
    public String reason() {
        return reason;
    }

    /**
     * How sure the map is: margin to the runner-up, rearrangement patterns, alternative
     * weightings. {@link MapConfidence#NONE} unless the map is proven optimal (mapped or
     * ambiguous), no pins were given and the options' confidence budget is positive; the
     * rearrangement patterns of the map are filled in for every result with a map.
     */
    public MapConfidence confidence() {
        return confidence;
    }

    /** Wall time spent; informative only, not part of {@link #equals}. */
    public Duration elapsed() {
        return elapsed;
    }

    static List<AtomTransition> carbonsOf(List<AtomTransition> transitions) {
        return transitions.stream().filter(t -> t.element().equals("C")).toList();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MappingResult m && m.reactionId.equals(reactionId) && m.status == status
                && m.atomMap.equals(atomMap) && m.bondEdits.equals(bondEdits) && m.cost == cost
                && m.lowerBound == lowerBound && m.alternatives.equals(alternatives)
                && m.stereoNotes.equals(stereoNotes) && m.prochiralAtoms.equals(prochiralAtoms)
                && m.mappedSmiles.equals(mappedSmiles) && m.elementDifference.equals(elementDifference)
                && m.reason.equals(reason) && m.confidence.equals(confidence);
    }

    @Override
    public int hashCode() {
        return Objects.hash(reactionId, status, atomMap, cost, lowerBound, mappedSmiles);
    }

    @Override
    public String toString() {
        return reactionId + ": " + status.label() + " cost " + cost + " (bound " + lowerBound + ")"
                + (reason.isEmpty() ? "" : ", " + reason);
    }
}
