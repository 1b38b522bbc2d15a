package io.github.atomledger.atommapper.structure.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The automorphism orbits of one coloured graph, by individualisation and refinement as in
 * McKay's practical graph isomorphism (Congressus Numerantium 30:45, 1981), without the canonical
 * labelling: only automorphisms are looked for.
 *
 * <p>The search tree: the root is the coarsest equitable partition of the colour classes
 * ({@link OrderedPartition}); the children of a node individualise, one at a time, each atom of its
 * first cell with more than one atom, and refine. Leaves are discrete partitions, that is,
 * orderings of the atoms. The first path always takes the first atom of that cell and ends in
 * the leaf ζ. Two leaves that order the graph the same way give an automorphism (ζ[i] to λ[i]
 * for all positions i), which is checked bond by bond before it is used.
 *
 * <p>The first-path nodes are processed from the deepest up. At depth k, with first-path atom
 * v_k, every other atom w of the target cell is tried unless it is already known to be in the
 * orbit of v_k, or in the orbit of an atom that failed, under the automorphisms found so far
 * (orbit pruning). All of those fix v_0..v_{k-1}, so this is sound. Trying w means searching the
 * subtree of w for a leaf equivalent to ζ: only nodes whose cell count and refinement trace equal
 * those of the first-path node at the same depth can lead there, and a sibling that an
 * automorphism fixing the current prefix maps onto a failed sibling is skipped. When level k is
 * done, the automorphisms found generate the stabiliser of v_0..v_{k-1} (McKay's argument: they
 * hold a coset representative for every atom in the orbit of v_k, plus generators of the deeper
 * stabiliser), so at the root they generate the whole group, and the union of their cycles is
 * exactly the orbit partition.
 *
 * <p>Every copy, refinement and check counts against a {@link StepBudget}. Not thread-safe.
 */
final class AutomorphismSearch {

    private final int n;
    private final int[] colour;
    private final int[][] nbr;
    private final int[][] code;
    private final StepBudget budget;
    private final int[] parent;
    private final List<int[]> generators = new ArrayList<>();
    /** The atoms individualised on the way to the current node, in order. */
    private final int[] prefix;

    private final OrderedPartition partition;
    /** Per depth of the first path: the node's cell count, trace, target cell and atom order. */
    private int[] pathCells;
    private long[] pathTrace;
    private int[] pathTarget;
    private final List<int[]> pathOrder = new ArrayList<>();

    private AutomorphismSearch(int[] colour, int[][] nbr, int[][] code, StepBudget budget)
            throws StepBudget.Exhausted {
        this.n = nbr.length;
        this.colour = colour;
        this.nbr = nbr;
        this.code = code;
        this.budget = budget;
        this.parent = new int[n];
        Arrays.setAll(parent, i -> i);
        this.prefix = new int[n];
        this.partition = new OrderedPartition(colour, nbr, code, budget);
    }

    /**
     * Orbits of the automorphisms of the graph that keep colours and bond codes: each atom labelled
     * by the smallest atom of its orbit.
     *
     * @param colour colour per atom, numbered in an order that does not depend on atom numbers
     * @param nbr neighbours per atom, ascending
     * @param code bond codes 1 to 4 parallel to {@code nbr}
     * @throws StepBudget.Exhausted when the budget runs out first
     */
    static int[] orbits(int[] colour, int[][] nbr, int[][] code, StepBudget budget) throws StepBudget.Exhausted {
        AutomorphismSearch search = new AutomorphismSearch(colour, nbr, code, budget);
        search.run();
        int[] orbit = new int[search.n];
        for (int v = 0; v < search.n; v++) {
            orbit[v] = root(search.parent, v);
        }
        return orbit;
    }

    private void run() throws StepBudget.Exhausted {
        OrderedPartition p = partition;
        int depth = 0;
        pathCells = new int[n + 1];
        pathTrace = new long[n + 1];
        pathTarget = new int[n + 1];
        pathCells[0] = p.cells();
        pathTrace[0] = p.trace();
        pathTarget[0] = p.nextNonSingleton(0);
        pathOrder.add(null);
        // Cells only split on the way down, so the next target cell is never left of this one.
        while (!p.discrete()) {
            int v = p.atomAt(pathTarget[depth]);
            prefix[depth] = v;
            p.individualise(v);
            depth++;
            pathCells[depth] = p.cells();
            pathTrace[depth] = p.trace();
            pathTarget[depth] = p.nextNonSingleton(pathTarget[depth - 1]);
            pathOrder.add(p.order());
            budget.spend(n);
        }
        int[] firstPath = Arrays.copyOf(prefix, depth);
        for (int k = depth - 1; k >= 0; k--) {
            p.undo();
            int v = firstPath[k];
            int target = pathTarget[k];
            List<Integer> failed = new ArrayList<>();
            for (int i = target; i < p.cellEnd(target); i++) {
                int w = p.atomAt(i);
                if (root(parent, w) == root(parent, v) || joinedWithAny(parent, w, failed)) {
                    continue;
                }
                prefix[k] = w;
                int[] automorphism = explore(w, k, true);
                if (automorphism == null) {
                    failed.add(w);
                } else {
                    generators.add(automorphism);
                    for (int x = 0; x < n; x++) {
                        union(parent, x, automorphism[x]);
                    }
                    budget.spend(n);
                }
            }
        }
    }

    /**
     * Searches the subtree that individualises {@code w} below the current node (at depth
     * {@code depth}) for a leaf equivalent to ζ; returns the automorphism or null. The partition
     * is the same afterwards. {@code prefix[0..depth]} holds the atoms individualised on the way,
     * {@code w} last.
     *
     * <p>With {@code guess}, the node is first compared with the first-path node at the same
     * depth position by position (their atom orders, non-singleton cells included): when that
     * map happens to be an automorphism it fixes v_0..v_{depth-1} and sends v_depth to w (both
     * orders keep those atoms at the same positions), which is all the search needs, and no leaf
     * has to be reached. Exchanging two identical branches of a chain is found this way, so a
     * polymer with n such branches costs about n nodes instead of n squared over two.
     */
    private int[] explore(int w, int depth, boolean guess) throws StepBudget.Exhausted {
        OrderedPartition p = partition;
        p.individualise(w);
        try {
            if (p.cells() != pathCells[depth + 1] || p.trace() != pathTrace[depth + 1]) {
                return null;
            }
            if (p.discrete() || guess) {
                int[] found = automorphism(pathOrder.get(depth + 1), p);
                if (found != null || p.discrete()) {
                    return found;
                }
            }
            int target = pathTarget[depth + 1];
            if (!p.startsNonSingleton(target)) {
                return null;
            }
            List<Integer> failed = new ArrayList<>();
            int[] stabiliserOrbits = null;
            for (int i = target; i < p.cellEnd(target); i++) {
                int x = p.atomAt(i);
                if (!failed.isEmpty()) {
                    if (stabiliserOrbits == null) {
                        stabiliserOrbits = orbitsFixing(depth + 1);
                    }
                    if (joinedWithAny(stabiliserOrbits, x, failed)) {
                        continue;
                    }
                }
                prefix[depth + 1] = x;
                int[] found = explore(x, depth + 1, false);
                if (found != null) {
                    return found;
                }
                failed.add(x);
            }
            return null;
        } finally {
            p.undo();
        }
    }

    /** Orbits of the automorphisms found so far that fix {@code prefix[0..length)}, as union-find roots. */
    private int[] orbitsFixing(int length) throws StepBudget.Exhausted {
        int[] local = new int[n];
        Arrays.setAll(local, i -> i);
        for (int[] g : generators) {
            budget.spend(length + n);
            boolean fixes = true;
            for (int i = 0; i < length && fixes; i++) {
                fixes = g[prefix[i]] == prefix[i];
            }
            if (fixes) {
                for (int x = 0; x < n; x++) {
                    union(local, x, g[x]);
                }
            }
        }
        return local;
    }

    private static boolean joinedWithAny(int[] unionFind, int x, List<Integer> atoms) {
        for (int f : atoms) {
            if (root(unionFind, f) == root(unionFind, x)) {
                return true;
            }
        }
        return false;
    }

    /** The map from {@code order[i]} to the atom at position i of {@code to}, or null when it is not an automorphism. */
    private int[] automorphism(int[] order, OrderedPartition to) throws StepBudget.Exhausted {
        int[] g = new int[n];
        for (int i = 0; i < n; i++) {
            g[order[i]] = to.atomAt(i);
        }
        long work = n;
        for (int a = 0; a < n; a++) {
            int[] na = nbr[a];
            int b = g[a];
            if (colour[b] != colour[a] || nbr[b].length != na.length) {
                budget.spend(work);
                return null;
            }
            work += na.length;
            for (int k = 0; k < na.length; k++) {
                int j = Arrays.binarySearch(nbr[b], g[na[k]]);
                if (j < 0 || code[b][j] != code[a][k]) {
                    budget.spend(work);
                    return null;
                }
            }
        }
        budget.spend(work);
        return g;
    }

    static void union(int[] parent, int x, int y) {
        int a = root(parent, x);
        int b = root(parent, y);
        parent[Math.max(a, b)] = Math.min(a, b);
    }

    static int root(int[] parent, int k) {
        while (parent[k] != k) {
            parent[k] = parent[parent[k]];
            k = parent[k];
        }
        return k;
    }
}
