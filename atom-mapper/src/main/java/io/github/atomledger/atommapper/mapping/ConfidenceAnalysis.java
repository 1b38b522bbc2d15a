package io.github.atomledger.atommapper.mapping;

import io.github.atomledger.atommapper.mapping.internal.Rearrangements;
import io.github.atomledger.atommapper.mapping.internal.Search;
import io.github.atomledger.atommapper.mapping.internal.SearchClock;
import io.github.atomledger.atommapper.mapping.internal.SideGraph;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * The confidence analysis of a proven optimal map ({@link MapConfidence}), run right after the
 * optimal search on the same search object: phase 3 finds the runner-up with the optimal carbon
 * classes excluded, then the alternative weightings are checked, first by a bound on the margin
 * and only where that does not settle it by mapping again.
 *
 * <p>The bound: let the optimum cost A under C–C weight w, and every map of another carbon fate
 * cost at least A + m. Under weight w' the cost of a map with k C–C edits changes by (w' − w)k.
 * With w' &lt; w, a map that is not dearer than the optimum under w' costs at most A there, so it
 * has fewer than A/w' C–C edits, and its lead shrinks by at most (w − w')A/w'. With w' &gt; w, the
 * optimum gains at most (w' − w)A/w. When m exceeds that, no other fate can catch up, and the
 * fate is proven robust without a new search. This holds when the optimum has a single carbon
 * fate; otherwise the reaction is mapped again.
 */
final class ConfidenceAnalysis {

    private final SideGraph r;
    private final SideGraph p;
    private final MappingOptions options;
    private final ResultWriter writer;

    ConfidenceAnalysis(SideGraph r, SideGraph p, MappingOptions options, ResultWriter writer) {
        this.r = r;
        this.p = p;
        this.options = options;
        this.writer = writer;
    }

    /**
     * @param search       the finished optimal search (phases 1 and 2 complete)
     * @param main         the reported map
     * @param reported     the carbon classes of the reported map and its listed alternatives
     * @param optimalCost  the proven optimum
     */
    MapConfidence analyse(Search search, int[] main, Set<String> reported, int optimalCost) {
        long deadline = SearchClock.now() + options.confidenceBudget().toNanos();
        List<Rearrangement> patterns = Rearrangements.find(r, p, main);
        Set<String> optimal = new LinkedHashSet<>(search.coOptimalClasses());
        optimal.addAll(reported);
        boolean finished = search.searchRunnerUp(optimal, main, optimalCost, Integer.MAX_VALUE, deadline,
                options.nodeLimit());
        int[] runner = search.runnerUp();
        if (finished && runner == null) {
            List<WeightCheck> weights = new ArrayList<>();
            for (int w : options.alternativeCarbonCarbonWeights()) {
                weights.add(new WeightCheck(w, WeightCheck.Outcome.ROBUST, List.of()));
            }
            return new MapConfidence(true, -1, true, -1, List.of(), List.of(), patterns, List.of(), weights,
                    "no map sends the carbons elsewhere");
        }
        int margin = (finished ? search.runnerUpCost() : search.runnerUpLowerBound(optimalCost + 1)) - optimalCost;
        List<WeightCheck> weights = new ArrayList<>();
        for (int w : options.alternativeCarbonCarbonWeights()) {
            weights.add(weight(w, main, margin, optimalCost, optimal, reported, deadline));
        }
        List<AtomRef> atStake = new ArrayList<>();
        for (int u = 0; runner != null && u < r.atomCount(); u++) {
            if (r.element(u).equals("C") && p.orbitKey(main[u]) != p.orbitKey(runner[u])) {
                atStake.add(r.ref(u));
            }
        }
        return new MapConfidence(true, margin, finished, runner == null ? -1 : search.runnerUpCost(),
                runner == null ? List.of() : writer.carbons(runner), atStake, patterns,
                runner == null ? List.of() : Rearrangements.find(r, p, runner), weights, "");
    }

    private WeightCheck weight(int w, int[] main, int margin, int cost, Set<String> optimal, Set<String> reported,
                               long deadline) {
        int base = options.carbonCarbonWeight();
        boolean robust = optimal.size() == 1 && (w < base ? (long) margin * w > (long) (base - w) * cost
                : (long) margin * base > (long) (w - base) * cost);
        if (robust) {
            return new WeightCheck(w, WeightCheck.Outcome.ROBUST, List.of());
        }
        if (SearchClock.now() > deadline) {
            return new WeightCheck(w, WeightCheck.Outcome.UNDECIDED, List.of());
        }
        // First a cheap question: under the other weight, does any map of another fate cost at
        // most what the reported map costs there? Usually not, and then the fate stays.
        MappingOptions alternative = options.withCarbonCarbonWeight(w);
        int[] noPins = new int[r.atomCount()];
        Arrays.fill(noPins, -1);
        Search probe = new Search(r, p, alternative, noPins, deadline);
        int mainCost = probe.cost(main);
        boolean finished = probe.searchRunnerUp(reported, main, mainCost, mainCost + 1, deadline, options.nodeLimit());
        if (!finished) {
            return new WeightCheck(w, WeightCheck.Outcome.UNDECIDED, List.of());
        }
        if (probe.runnerUp() == null) {
            return new WeightCheck(w, WeightCheck.Outcome.SAME, List.of());
        }
        // Another fate is as cheap as the reported map there: map again to see who wins.
        Search again = new Search(r, p, alternative, noPins, deadline);
        if (!again.optimise() || !again.enumerateCoOptimal()) {
            return new WeightCheck(w, WeightCheck.Outcome.UNDECIDED, List.of());
        }
        List<int[]> maps = new ArrayList<>();
        maps.add(again.best());
        maps.addAll(again.coOptimal());
        int fewest = Integer.MAX_VALUE;
        for (int[] m : maps) {
            fewest = Math.min(fewest, writer.carbonHydrogenChanges(m));
        }
        boolean keepsReported = false;
        int[] preferred = null;
        int[] newcomer = null;
        for (int[] m : maps) {
            String cls = again.carbonClass(m);
            keepsReported |= reported.contains(cls);
            if (preferred == null && writer.carbonHydrogenChanges(m) == fewest) {
                preferred = m;
            }
            if (newcomer == null && !optimal.contains(cls)) {
                newcomer = m;
            }
        }
        if (!keepsReported) {
            return new WeightCheck(w, WeightCheck.Outcome.CHANGED, writer.carbons(preferred),
                    Rearrangements.find(r, p, preferred));
        }
        return newcomer == null ? new WeightCheck(w, WeightCheck.Outcome.SAME, List.of())
                : new WeightCheck(w, WeightCheck.Outcome.TIED, writer.carbons(newcomer), Rearrangements.find(r, p, newcomer));
    }
}
