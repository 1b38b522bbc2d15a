package io.github.atomledger.atommapper.mapping.internal;

import io.github.atomledger.atommapper.mapping.MappingOptions;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Exact minimum weighted bond-edit search: depth-first branch and bound over reactant atoms, each
 * assigned to an unused product atom of the same element.
 *
 * <p>The cost of a complete map is the sum over all atom pairs of the edit between the reactant
 * bond and the product bond of the images. A node's bound adds three admissible parts over
 * disjoint pair sets (see {@link Bounds}); a child is cut when its bound cannot beat the incumbent.
 * Symmetry is used only where it is sound at a node: two product twins (same neighbours, same bond
 * codes) and two atoms in one automorphism class of a product molecule that nothing is mapped to
 * yet give the same subtree, so only the first is tried.
 *
 * <p>Phase 1 finds an optimum (the first descent, guided by identity of molecules and by
 * environment similarity, is the seed incumbent; it never fixes anything, so the proof stands).
 * Phase 2 re-runs with the optimal cost as the threshold and collects every distinct carbon
 * assignment that has an optimal completion. Not thread-safe: one instance per reaction.
 */
public final class Search {

    /** Distinct carbon symmetry classes collected in phase 2 before the enumeration stops. */
    static final int CLASS_CAP = 64;

    final SideGraph r;
    final SideGraph p;
    final Bounds bounds;
    private final int[] mixedOrder;
    private final int[] carbonOrder;
    private int[] order;
    private final int carbonDone;
    private final int[] pin;
    private final boolean[] pinnedP;
    private final boolean pinned;
    private final int[][] candidatesByElement;
    private final int[] twinRep;
    private final boolean[] orbitRep;
    private final int[] sameMolecule;
    private final Ordering ordering;
    private final LocalSearch polish;

    final int[] map;
    final int[] inv;
    private final int[] usedInMolecule;
    private final long[][] buffer;

    private long nodes;
    private boolean stop;
    private int upper = Integer.MAX_VALUE;
    private int threshold;
    private boolean enumerate;
    private boolean runnerUp;
    private Set<String> excluded = Set.of();
    private int runnerUpper = Integer.MAX_VALUE;
    private int[] runnerBest;
    private long phaseDeadline;
    private long phaseNodeLimit;
    private boolean completing;
    private boolean completed;
    private int openMin = Integer.MAX_VALUE;
    private int[] best;
    private int[] completedMap;
    private final Set<String> seenCarbon = new HashSet<>();
    private final Map<String, int[]> carbonMaps = new LinkedHashMap<>();

    /**
     * Prepares a search; {@code pin[u]} is the forced image of reactant atom u or -1. The time
     * budget is counted in CPU time of the calling thread (see {@link SearchClock}).
     */
    public Search(SideGraph r, SideGraph p, MappingOptions options, int[] pin, long deadlineNanos) {
        this.r = r;
        this.p = p;
        this.pin = pin;
        this.phaseDeadline = deadlineNanos;
        this.phaseNodeLimit = options.nodeLimit();
        this.bounds = new Bounds(r, p, options);
        this.polish = new LocalSearch(r, p, options, pin);
        this.map = new int[r.n];
        this.inv = new int[p.n];
        Arrays.fill(map, -1);
        Arrays.fill(inv, -1);
        pinnedP = new boolean[p.n];
        boolean any = false;
        for (int x : pin) {
            if (x >= 0) {
                pinnedP[x] = true;
                any = true;
            }
        }
        pinned = any;
        int elements = 0;
        for (int e : r.elementId) {
            elements = Math.max(elements, e + 1);
        }
        for (int e : p.elementId) {
            elements = Math.max(elements, e + 1);
        }
        List<List<Integer>> byElement = new ArrayList<>();
        for (int e = 0; e < elements; e++) {
            byElement.add(new ArrayList<>());
        }
        for (int x = 0; x < p.n; x++) {
            byElement.get(p.elementId[x]).add(x);
        }
        candidatesByElement = new int[elements][];
        int widest = 1;
        for (int e = 0; e < elements; e++) {
            candidatesByElement[e] = byElement.get(e).stream().mapToInt(Integer::intValue).toArray();
            widest = Math.max(widest, candidatesByElement[e].length);
        }
        buffer = new long[r.n + 1][widest];
        twinRep = Ordering.twins(p);
        orbitRep = new boolean[p.n];
        for (int x = 0; x < p.n; x++) {
            orbitRep[x] = p.structure(p.molecule[x]).graph().orbit(p.local[x]) == p.local[x];
        }
        sameMolecule = new int[p.moleculeCount()];
        for (int m = 0; m < p.moleculeCount(); m++) {
            sameMolecule[m] = -1;
            for (int k = 0; k < m; k++) {
                if (p.structure(k).fingerprint().equals(p.structure(m).fingerprint())) {
                    sameMolecule[m] = k;
                    break;
                }
            }
        }
        usedInMolecule = new int[p.moleculeCount()];
        this.ordering = new Ordering(r, p);
        this.mixedOrder = ordering.order(false);
        this.carbonOrder = ordering.order(true);
        this.carbonDone = ordering.carbonPrefix(carbonOrder);
    }

    /** Runs phase 1; returns true when the optimum is proven (false: budget ran out). */
    public boolean optimise() {
        enumerate = false;
        order = mixedOrder;
        threshold = Integer.MAX_VALUE;
        dfs(0, 0);
        return !stop;
    }

    /**
     * Runs phase 2 at the proven optimal cost; returns true when the enumeration finished (false:
     * budget or {@link #CLASS_CAP} reached).
     */
    public boolean enumerateCoOptimal() {
        enumerate = true;
        order = carbonOrder;
        threshold = upper;
        if (carbonDone == 0) {
            return true;
        }
        dfs(0, 0);
        return !stop;
    }

    /** The best complete map found (reactant atom to product atom), or null. */
    public int[] best() {
        return best == null ? null : best.clone();
    }

    /** Cost of {@link #best()}; {@link Integer#MAX_VALUE} when none. */
    public int upper() {
        return upper;
    }

    /** A proven lower bound on the optimum, valid also after an interrupted phase 1. */
    public int lowerBound() {
        int root = bounds.rootBound();
        return stop ? Math.max(root, Math.min(openMin, upper)) : upper;
    }

    /** Complete co-optimal maps from phase 2, one per carbon symmetry class, in finding order. */
    public List<int[]> coOptimal() {
        return new ArrayList<>(carbonMaps.values());
    }

    /**
     * The carbon symmetry class of a complete map, in the form {@link #coOptimalClasses()} uses:
     * two maps have the same key exactly when they send every reactant carbon class to the same
     * product carbon classes, counted with multiplicity.
     */
    public String carbonClass(int[] complete) {
        long[] pairs = new long[carbonDone];
        for (int k = 0; k < carbonDone; k++) {
            int u = carbonOrder[k];
            pairs[k] = ((long) r.orbitKey[u] << 32) | p.orbitKey[complete[u]];
        }
        Arrays.sort(pairs);
        return Arrays.toString(pairs);
    }

    /** The carbon classes of {@link #coOptimal()}, same order. */
    public List<String> coOptimalClasses() {
        return new ArrayList<>(carbonMaps.keySet());
    }

    /** True when the reaction has carbons, so carbon fates can differ at all. */
    public boolean hasCarbons() {
        return carbonDone > 0;
    }

    /**
     * Phase 3, the runner-up: the cheapest complete map whose carbon class is none of
     * {@code excluded} (normally every class phase 2 found at the optimum), among maps cheaper
     * than {@code limit}. The same depth-first search with the carbons first; a carbon assignment
     * whose class is excluded is cut as soon as the last carbon is placed, and every other subtree
     * is searched for its cheapest completion under the usual bounds and symmetry pruning. The
     * first incumbent comes from cheap swaps of {@code from}, a map of cost {@code fromCost}
     * (see {@link LocalSearch#otherClass}). Runs on its own budget: {@code deadlineNanos} on
     * {@link SearchClock} and {@code nodes} more search nodes. Phases 1 and 2 need not have run.
     *
     * @return true when finished: {@link #runnerUp()} is then the proven cheapest such map, or
     *     null when there is none below the limit; false when the budget ran out
     */
    public boolean searchRunnerUp(Set<String> excluded, int[] from, int fromCost, int limit, long deadlineNanos,
                                  long nodes) {
        enumerate = false;
        runnerUp = true;
        this.excluded = excluded;
        order = carbonOrder;
        stop = false;
        openMin = Integer.MAX_VALUE;
        runnerUpper = limit;
        runnerBest = null;
        phaseDeadline = deadlineNanos;
        phaseNodeLimit = nodes == Long.MAX_VALUE ? Long.MAX_VALUE : this.nodes + nodes;
        if (carbonDone > 0) {
            // A cheap map of another class as the first incumbent: the search then only has to
            // look for cheaper ones, which is most of the pruning.
            int[] seedCost = new int[1];
            int[] seed = polish.otherClass(from, fromCost, m -> !excluded.contains(carbonClass(m)), seedCost);
            if (seed != null && seedCost[0] < runnerUpper) {
                runnerBest = seed;
                runnerUpper = seedCost[0];
            }
            dfs(0, 0);
        }
        runnerUp = false;
        return !stop;
    }

    /** The exact cost of a complete map under this search's weights. */
    public int cost(int[] complete) {
        return polish.cost(complete);
    }

    /** The runner-up found by {@link #searchRunnerUp}, or null. */
    public int[] runnerUp() {
        return runnerBest == null ? null : runnerBest.clone();
    }

    /** Cost of {@link #runnerUp()}; the limit when none was found. */
    public int runnerUpCost() {
        return runnerUpper;
    }

    /**
     * A proven lower bound on the runner-up's cost after {@link #searchRunnerUp}: its cost when
     * the search finished, else the least bound among the subtrees left open, and never below
     * {@code floor} (the optimum plus one, as every map of another class costs more than the
     * optimum).
     */
    public int runnerUpLowerBound(int floor) {
        if (!stop) {
            return runnerUpper;
        }
        return Math.max(floor, Math.min(openMin, runnerUpper));
    }

    /** Search nodes visited so far. */
    public long nodes() {
        return nodes;
    }

    private void dfs(int depth, int g) {
        nodes++;
        if ((nodes & 255) == 0 && (best != null || enumerate || runnerUp)
                && (nodes > phaseNodeLimit || SearchClock.now() > phaseDeadline)) {
            stop = true;
        }
        if (stop) {
            openMin = Math.min(openMin, g + bounds.bound(map, inv));
            return;
        }
        // The carbon-level checks come before the leaf test: without heteroatoms the last carbon is the leaf.
        if (enumerate && !completing && depth == carbonDone) {
            complete(depth, g);
            return;
        }
        if (runnerUp && depth == carbonDone && excluded.contains(classKey(depth))) {
            return;
        }
        if (depth == r.n) {
            leaf(g);
            return;
        }
        int u = order[depth];
        long[] cand = buffer[depth];
        int count = 0;
        for (int x : candidatesByElement[r.elementId[u]]) {
            if (inv[x] >= 0 || (pin[u] >= 0 && x != pin[u]) || (pin[u] < 0 && pinnedP[x]) || symmetric(x)) {
                continue;
            }
            int delta = bounds.delta(map, inv, u, x);
            cand[count++] = ((long) delta << 40) | ((long) (31 - similarity(u, x)) << 32) | x;
        }
        Arrays.sort(cand, 0, count);
        for (int i = 0; i < count; i++) {
            int delta = (int) (cand[i] >>> 40);
            int x = (int) (cand[i] & 0xffffffffL);
            if (cut(g + delta)) {
                break;
            }
            assign(u, x);
            int lb = g + delta + bounds.bound(map, inv);
            if (!cut(lb)) {
                dfs(depth + 1, g + delta);
            }
            unassign(u, x);
            if (stop) {
                if (i + 1 < count) {
                    openMin = Math.min(openMin, g + (int) (cand[i + 1] >>> 40));
                }
                return;
            }
            if (completing && completed) {
                return;
            }
            if (!enumerate && !runnerUp && upper <= bounds.rootBound()) {
                return;
            }
        }
    }

    private boolean cut(int bound) {
        if (runnerUp) {
            return bound >= runnerUpper;
        }
        return enumerate ? bound > threshold : bound >= upper;
    }

    private boolean symmetric(int x) {
        // Pins single out atoms, so the product's symmetries are no longer symmetries of the problem.
        if (pinned) {
            return false;
        }
        int twin = twinRep[x];
        if (twin != x && inv[twin] < 0) {
            return true;
        }
        int m = p.molecule[x];
        if (usedInMolecule[m] == 0) {
            if (!orbitRep[x]) {
                return true;
            }
            int same = sameMolecule[m];
            return same >= 0 && usedInMolecule[same] == 0;
        }
        return false;
    }

    private int similarity(int u, int x) {
        return ordering.similarity(u, x);
    }

    private void complete(int depth, int g) {
        StringBuilder key = new StringBuilder();
        for (int k = 0; k < depth; k++) {
            key.append(map[order[k]]).append(',');
        }
        String raw = key.toString();
        if (!seenCarbon.add(raw)) {
            return;
        }
        // A carbon assignment in a symmetry class that already has an optimal completion adds
        // nothing: only the first of each class is completed.
        String cls = classKey(depth);
        if (carbonMaps.containsKey(cls)) {
            return;
        }
        completing = true;
        completed = false;
        dfs(depth, g);
        if (completed) {
            carbonMaps.put(cls, completedMap);
            if (carbonMaps.size() >= CLASS_CAP) {
                stop = true;
            }
        }
        completing = false;
    }

    private String classKey(int depth) {
        long[] pairs = new long[depth];
        for (int k = 0; k < depth; k++) {
            int u = order[k];
            pairs[k] = ((long) r.orbitKey[u] << 32) | p.orbitKey[map[u]];
        }
        Arrays.sort(pairs);
        return Arrays.toString(pairs);
    }

    private void leaf(int g) {
        if (runnerUp) {
            if (g < runnerUpper) {
                runnerUpper = g;
                runnerBest = map.clone();
            }
        } else if (enumerate) {
            completed = true;
            completedMap = map.clone();
        } else if (g < upper) {
            best = map.clone();
            upper = polish.improve(best, g);
        }
    }

    private void assign(int u, int x) {
        bounds.assign(map, inv, u, x);
        map[u] = x;
        inv[x] = u;
        usedInMolecule[p.molecule[x]]++;
    }

    private void unassign(int u, int x) {
        map[u] = -1;
        inv[x] = -1;
        usedInMolecule[p.molecule[x]]--;
        bounds.unassign(map, inv, u, x);
    }
}
