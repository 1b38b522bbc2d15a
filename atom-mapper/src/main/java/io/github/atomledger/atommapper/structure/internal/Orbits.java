package io.github.atomledger.atommapper.structure.internal;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * The automorphism orbits of a heavy-atom graph whose atoms are coloured by element and whose
 * bonds are coloured by bond code: exact, deterministic, and bounded by a step budget.
 *
 * <p>The graph is split into connected pieces. The automorphisms of the whole graph are those of
 * the pieces combined with exchanges of isomorphic pieces, so the orbits are: the orbits inside
 * each piece, joined across pieces by an isomorphism. Pieces are grouped by an invariant (the
 * multiset of their atoms' cells in the coarsest equitable partition of the whole graph, which
 * isomorphic pieces share), and each piece is compared with the representatives of its group:
 * the orbits of the two pieces taken together join them exactly when they are isomorphic. That
 * keeps 130 methanes at 130 tiny comparisons instead of one search over 130! symmetries. Each
 * single search is {@link AutomorphismSearch}.
 *
 * <p>Thread-safe: static, with no shared state.
 */
final class Orbits {

    private Orbits() {
    }

    /**
     * Each atom labelled by the smallest atom of its orbit.
     *
     * @param elements element symbol per atom; atoms with equal symbols have equal colours
     * @param nbr neighbours per atom, ascending
     * @param code bond codes 1 to 4 parallel to {@code nbr}
     * @param budget the work limit; it is charged with the steps taken
     * @throws StepBudget.Exhausted when the budget runs out before the orbits are found
     */
    static int[] of(String[] elements, int[][] nbr, int[][] code, StepBudget budget) throws StepBudget.Exhausted {
        int n = elements.length;
        List<String> symbols = new ArrayList<>(new TreeSet<>(Arrays.asList(elements)));
        int[] colour = new int[n];
        for (int v = 0; v < n; v++) {
            colour[v] = symbols.indexOf(elements[v]);
        }
        List<int[]> pieces = pieces(nbr);
        if (pieces.size() <= 1) {
            return AutomorphismSearch.orbits(colour, nbr, code, budget);
        }
        OrderedPartition whole = new OrderedPartition(colour, nbr, code, budget);
        int[] parent = new int[n];
        Arrays.setAll(parent, i -> i);
        Map<String, List<int[]>> groups = new LinkedHashMap<>();
        int[] local = new int[n];
        for (int[] piece : pieces) {
            int[] cells = new int[piece.length];
            for (int i = 0; i < piece.length; i++) {
                cells[i] = whole.cellOf(piece[i]);
            }
            Arrays.sort(cells);
            budget.spend(piece.length);
            List<int[]> representatives = groups.computeIfAbsent(Arrays.toString(cells), k -> new ArrayList<>());
            boolean matched = false;
            for (int r = 0; r < representatives.size() && !matched; r++) {
                matched = joinOrbits(representatives.get(r), piece, colour, nbr, code, local, parent, budget);
            }
            if (!matched) {
                if (representatives.isEmpty()) {
                    joinOrbits(new int[0], piece, colour, nbr, code, local, parent, budget);
                }
                representatives.add(piece);
            }
        }
        int[] orbit = new int[n];
        for (int v = 0; v < n; v++) {
            orbit[v] = AutomorphismSearch.root(parent, v);
        }
        return orbit;
    }

    /**
     * Computes the orbits of the subgraph made of pieces {@code first} and {@code second} and joins
     * them into {@code parent}; true when some orbit spans both pieces (they are isomorphic).
     */
    private static boolean joinOrbits(int[] first, int[] second, int[] colour, int[][] nbr, int[][] code,
                                      int[] local, int[] parent, StepBudget budget) throws StepBudget.Exhausted {
        int[] atoms = new int[first.length + second.length];
        System.arraycopy(first, 0, atoms, 0, first.length);
        System.arraycopy(second, 0, atoms, first.length, second.length);
        for (int i = 0; i < atoms.length; i++) {
            local[atoms[i]] = i;
        }
        int[] subColour = new int[atoms.length];
        int[][] subNbr = new int[atoms.length][];
        int[][] subCode = new int[atoms.length][];
        long work = atoms.length;
        for (int i = 0; i < atoms.length; i++) {
            int a = atoms[i];
            subColour[i] = colour[a];
            // Each piece lists its atoms in ascending order and keeps its bonds inside, so the
            // local neighbour lists stay ascending.
            subNbr[i] = new int[nbr[a].length];
            for (int k = 0; k < nbr[a].length; k++) {
                subNbr[i][k] = local[nbr[a][k]];
            }
            subCode[i] = code[a];
            work += nbr[a].length;
        }
        budget.spend(work);
        int[] orbit = AutomorphismSearch.orbits(subColour, subNbr, subCode, budget);
        for (int i = 0; i < atoms.length; i++) {
            AutomorphismSearch.union(parent, atoms[i], atoms[orbit[i]]);
        }
        return first.length > 0 && orbit[first.length] < first.length;
    }

    /** The connected pieces, each as its atoms in ascending order, ordered by their first atom. */
    private static List<int[]> pieces(int[][] nbr) {
        int n = nbr.length;
        int[] piece = new int[n];
        Arrays.fill(piece, -1);
        int count = 0;
        int[] stack = new int[n];
        for (int s = 0; s < n; s++) {
            if (piece[s] >= 0) {
                continue;
            }
            int top = 0;
            stack[top++] = s;
            piece[s] = count;
            while (top > 0) {
                int v = stack[--top];
                for (int u : nbr[v]) {
                    if (piece[u] < 0) {
                        piece[u] = count;
                        stack[top++] = u;
                    }
                }
            }
            count++;
        }
        int[] size = new int[count];
        for (int p : piece) {
            size[p]++;
        }
        List<int[]> out = new ArrayList<>();
        for (int p = 0; p < count; p++) {
            out.add(new int[size[p]]);
        }
        int[] filled = new int[count];
        for (int v = 0; v < n; v++) {
            out.get(piece[v])[filled[piece[v]]++] = v;
        }
        return out;
    }
}
