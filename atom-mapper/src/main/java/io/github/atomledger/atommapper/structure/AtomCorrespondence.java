package io.github.atomledger.atommapper.structure;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Which heavy atom of one molecule is which of another drawing of the same molecule: a graph
 * isomorphism of the heavy-atom graphs that keeps element symbols (and, if asked, bond codes).
 * Used to read a map drawn on someone else's atom order (an RXN file) onto ours.
 *
 * <pre>{@code
 * int[] at = AtomCorrespondence.find(drawn.graph(), ours.graph(), true).orElseThrow();
 * // heavy atom i (0-based) of drawn is heavy atom at[i] of ours
 * }</pre>
 *
 * <p>Hydrogens and charges are not compared, so two protonation states of one skeleton match.
 * Without bond codes, two tautomers or a carboxylate drawn as acid match as well. When the molecule
 * is symmetric, one of the equivalent correspondences is returned (the first in a fixed search
 * order: deterministic). Candidates are narrowed by colour refinement on both graphs together,
 * then a backtracking search extends the correspondence atom by atom in breadth-first order.
 *
 * <p>Does not handle: stereo; a search longer than {@value #STEP_LIMIT} steps gives up (empty).
 * Stateless and thread-safe.
 */
public final class AtomCorrespondence {

    /** Work limit of the search, in candidate tries. */
    public static final long STEP_LIMIT = 2_000_000L;

    private AtomCorrespondence() {
    }

    /**
     * @param from      the molecule whose atoms are looked up
     * @param to        the molecule they are found in
     * @param bondCodes whether bond codes (single, double, triple, aromatic) must agree
     * @return {@code at[i]} = the 0-based heavy atom of {@code to} that is heavy atom {@code i} of
     *     {@code from}; empty when the graphs differ (or the search gives up)
     */
    public static Optional<int[]> find(MoleculeGraph from, MoleculeGraph to, boolean bondCodes) {
        int n = from.atomCount();
        if (n != to.atomCount() || edges(from) != edges(to)) {
            return Optional.empty();
        }
        int[][] colours = refine(from, to, bondCodes);
        int[] order = bfsOrder(from, colours[0]);
        int[] at = new int[n];
        Arrays.fill(at, -1);
        boolean[] used = new boolean[n];
        long[] steps = {0};
        return extend(from, to, bondCodes, colours, order, 0, at, used, steps) ? Optional.of(at) : Optional.empty();
    }

    private static boolean extend(MoleculeGraph a, MoleculeGraph b, boolean codes, int[][] colours, int[] order,
                                  int depth, int[] at, boolean[] used, long[] steps) {
        if (depth == order.length) {
            return true;
        }
        int u = order[depth];
        for (int v = 0; v < b.atomCount(); v++) {
            if (used[v] || colours[0][u] != colours[1][v]) {
                continue;
            }
            if (++steps[0] > STEP_LIMIT) {
                return false;
            }
            if (!consistent(a, b, codes, u, v, at, used)) {
                continue;
            }
            at[u] = v;
            used[v] = true;
            if (extend(a, b, codes, colours, order, depth + 1, at, used, steps)) {
                return true;
            }
            at[u] = -1;
            used[v] = false;
            if (steps[0] > STEP_LIMIT) {
                return false;
            }
        }
        return false;
    }

    /** Every mapped neighbour of u is a neighbour of v (same code) and v has no other mapped neighbour. */
    private static boolean consistent(MoleculeGraph a, MoleculeGraph b, boolean codes, int u, int v, int[] at,
                                      boolean[] used) {
        int[] nu = a.neighbours(u);
        int[] cu = a.bondCodes(u);
        int mappedNeighbours = 0;
        for (int k = 0; k < nu.length; k++) {
            int w = at[nu[k]];
            if (w < 0) {
                continue;
            }
            mappedNeighbours++;
            int code = b.bond(v, w);
            if (code == MoleculeGraph.NO_BOND || (codes && code != cu[k])) {
                return false;
            }
        }
        int count = 0;
        for (int w : b.neighbours(v)) {
            if (used[w]) {
                count++;
            }
        }
        return count == mappedNeighbours;
    }

    private static int edges(MoleculeGraph g) {
        int sum = 0;
        for (int i = 0; i < g.atomCount(); i++) {
            sum += g.neighbours(i).length;
        }
        return sum;
    }

    /**
     * Colour refinement (one dictionary for both graphs, so colours compare across them): start
     * from element and degree, then repeatedly add the sorted colours (and bond codes) of the
     * neighbours, until the number of colours stops growing.
     */
    private static int[][] refine(MoleculeGraph a, MoleculeGraph b, boolean codes) {
        Map<String, Integer> dictionary = new HashMap<>();
        int[][] colour = {initial(a, dictionary), initial(b, dictionary)};
        int classes = dictionary.size();
        for (int round = 0; round < a.atomCount(); round++) {
            Map<String, Integer> next = new HashMap<>();
            int[][] refined = {step(a, colour[0], codes, next), step(b, colour[1], codes, next)};
            colour = refined;
            if (next.size() == classes) {
                break;
            }
            classes = next.size();
        }
        return colour;
    }

    private static int[] initial(MoleculeGraph g, Map<String, Integer> dictionary) {
        int[] c = new int[g.atomCount()];
        for (int i = 0; i < c.length; i++) {
            String key = g.element(i) + "/" + g.neighbours(i).length;
            c[i] = dictionary.computeIfAbsent(key, k -> dictionary.size());
        }
        return c;
    }

    private static int[] step(MoleculeGraph g, int[] colour, boolean codes, Map<String, Integer> dictionary) {
        int[] c = new int[g.atomCount()];
        for (int i = 0; i < c.length; i++) {
            int[] nb = g.neighbours(i);
            int[] bc = g.bondCodes(i);
            long[] keys = new long[nb.length];
            for (int k = 0; k < nb.length; k++) {
                keys[k] = (long) colour[nb[k]] * 8 + (codes ? bc[k] : 0);
            }
            Arrays.sort(keys);
            String key = colour[i] + ":" + Arrays.toString(keys);
            c[i] = dictionary.computeIfAbsent(key, k -> dictionary.size());
        }
        return c;
    }

    /** Breadth-first per component, each component started at its atom of the rarest colour. */
    private static int[] bfsOrder(MoleculeGraph g, int[] colour) {
        int n = g.atomCount();
        Map<Integer, Integer> frequency = new HashMap<>();
        for (int c : colour) {
            frequency.merge(c, 1, Integer::sum);
        }
        List<Integer> starts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            starts.add(i);
        }
        starts.sort((x, y) -> frequency.get(colour[x]) != frequency.get(colour[y])
                ? Integer.compare(frequency.get(colour[x]), frequency.get(colour[y])) : Integer.compare(x, y));
        boolean[] seen = new boolean[n];
        int[] order = new int[n];
        int k = 0;
        for (int s : starts) {
            if (seen[s]) {
                continue;
            }
            ArrayDeque<Integer> queue = new ArrayDeque<>();
            queue.add(s);
            seen[s] = true;
            while (!queue.isEmpty()) {
                int u = queue.poll();
                order[k++] = u;
                for (int w : g.neighbours(u)) {
                    if (!seen[w]) {
                        seen[w] = true;
                        queue.add(w);
                    }
                }
            }
        }
        return order;
    }
}
