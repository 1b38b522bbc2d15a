package io.github.atomledger.checker.check.mapping;

import io.github.atomledger.atommapper.mapping.AtomTransition;

import java.util.List;
import java.util.Objects;

/**
 * How a curated (hand-written or pinned) carbon map compares with the structures and the inferred
 * optimum.
 *
 * @param reactionId   the reaction
 * @param problems     why the map is not a valid carbon map (unknown atoms, non-carbons, atoms used
 *                     twice or not at all); empty when valid
 * @param agrees       true when the map equals the inferred optimum or one of its co-optimal
 *                     alternatives, up to symmetry
 * @param extraCost    weighted bond edits the curated map needs beyond the optimum (0 when it
 *                     agrees, -1 when unknown)
 * @param differing    curated transitions that differ from the optimum (the carbons that go elsewhere)
 * @param undecided    true when the map differs but is accepted because the criterion cannot
 *                     decide against it ("curated, criterion undecided"): it costs at most the review
 *                     margin more than the optimum, or the optimum shows a rearrangement pattern or a
 *                     weight-dependent fate and it costs at most one moved C–C bond (twice the C–C
 *                     weight) more
 */
public record CuratedVerdict(String reactionId, List<String> problems, boolean agrees, int extraCost,
                             List<AtomTransition> differing, boolean undecided) {

    /** A verdict that is not "criterion undecided". */
    public CuratedVerdict(String reactionId, List<String> problems, boolean agrees, int extraCost,
                          List<AtomTransition> differing) {
        this(reactionId, problems, agrees, extraCost, differing, false);
    }

    public CuratedVerdict {
        Objects.requireNonNull(reactionId, "reactionId");
        problems = List.copyOf(problems);
        differing = differing.stream().sorted().toList();
    }

    public boolean valid() {
        return problems.isEmpty();
    }
}
