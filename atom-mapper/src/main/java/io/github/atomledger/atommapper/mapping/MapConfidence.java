package io.github.atomledger.atommapper.mapping;

import java.util.List;
import java.util.Objects;

/**
 * How sure a proven optimal map is: by how many weighted bond edits it beats the cheapest map
 * that sends the carbons elsewhere (the runner-up), which rearrangement patterns the optimum and
 * the runner-up show, and whether the carbon fate survives the alternative weightings.
 *
 * <p>The runner-up is the cheapest map whose carbon fate (up to symmetry) differs from every map
 * of optimal cost, co-optimal alternatives and maps the hydrogen tie-break passed over included;
 * so the margin is at least 1. A wide margin is no proof of mechanism, and a narrow one no proof
 * of error: this ranks maps by how much they need a curator's eye.
 *
 * @param computed               true when the analysis ran (proven optimal maps, no pins, a
 *                               positive confidence budget); all other fields are then meaningful
 * @param margin                 runner-up cost minus optimal cost; when {@code marginProven} is
 *                               false, a proven lower bound on it; -1 when no map sends the
 *                               carbons elsewhere or the analysis did not run
 * @param marginProven           true when {@code margin} is exact (the runner-up search finished)
 * @param runnerUpCost           weighted bond edits of {@code runnerUp}; -1 when there is none
 * @param runnerUp               the runner-up's carbon transitions, sorted by {@code from}; when the
 *                               margin is not proven, the best such map found so far (maybe empty)
 * @param atStake                the reactant carbons the runner-up sends to another place than the
 *                               reported map (compared up to the products' symmetry), sorted
 * @param rearrangements         patterns recognised in the reported optimal map
 * @param runnerUpRearrangements patterns recognised in the runner-up
 * @param weights                the fate under the alternative weightings, lower C–C weight first
 * @param note                   one sentence when the analysis ran but found no runner-up, else empty
 */
public record MapConfidence(boolean computed, int margin, boolean marginProven, int runnerUpCost,
                            List<AtomTransition> runnerUp, List<AtomRef> atStake, List<Rearrangement> rearrangements,
                            List<Rearrangement> runnerUpRearrangements, List<WeightCheck> weights, String note) {

    /** The analysis did not run. */
    public static final MapConfidence NONE = new MapConfidence(false, -1, false, -1, List.of(), List.of(), List.of(),
            List.of(), List.of(), "");

    /**
     * The default review margin: 0, so a narrow margin alone does not call for review. Measured on
     * the reference maps of the test suite (see BENCHMARKS.md, "Map confidence"): correct maps of
     * central metabolism commonly win by 1 or 2 weighted bond edits (a chain read backwards with
     * a heteroatom moved costs little more), so any threshold of 1 or more flagged more than one in
     * twenty correct maps while catching no wrong map the rearrangement patterns and the
     * alternative weightings miss.
     */
    public static final int DEFAULT_REVIEW_MARGIN = 0;

    /** Why a map calls for review. */
    public enum Reason {
        /** The reported map shows a rearrangement pattern. */
        REARRANGEMENT("rearrangement"),
        /**
         * Under an alternative weighting another carbon fate is cheaper, or as cheap and shows a
         * rearrangement pattern ({@link WeightCheck#questionsTheFate()}).
         */
        WEIGHTS("weights"),
        /** The margin is at most the review margin. */
        MARGIN("margin");

        private final String label;

        Reason(String label) {
            this.label = label;
        }

        /** The machine name, e.g. "weights". */
        public String label() {
            return label;
        }
    }

    /** Rejects nulls; copies and sorts lists. */
    public MapConfidence {
        runnerUp = runnerUp.stream().sorted().toList();
        atStake = atStake.stream().sorted().distinct().toList();
        rearrangements = List.copyOf(rearrangements);
        runnerUpRearrangements = List.copyOf(runnerUpRearrangements);
        weights = List.copyOf(weights);
        Objects.requireNonNull(note, "note");
    }

    /** True when a margin (exact or a lower bound) is known. */
    public boolean hasMargin() {
        return computed && margin >= 0;
    }

    /**
     * Why this map calls for a curator's review, in {@link Reason} order; empty when it does not
     * or when the analysis did not run.
     *
     * @param reviewMargin margins at most this flag the map (0: a margin alone never does, as
     *     every margin is at least 1)
     */
    public List<Reason> reviewReasons(int reviewMargin) {
        if (!computed) {
            return List.of();
        }
        List<Reason> out = new java.util.ArrayList<>();
        if (!rearrangements.isEmpty()) {
            out.add(Reason.REARRANGEMENT);
        }
        if (weights.stream().anyMatch(WeightCheck::questionsTheFate)) {
            out.add(Reason.WEIGHTS);
        }
        if (hasMargin() && margin <= reviewMargin) {
            out.add(Reason.MARGIN);
        }
        return out;
    }

    /** True when some alternative weighting makes another carbon fate strictly cheaper. */
    public boolean weightDependent() {
        return weights.stream().anyMatch(w -> w.outcome() == WeightCheck.Outcome.CHANGED);
    }
}
