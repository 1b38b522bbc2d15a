package io.github.atomledger.atommapper.mapping.internal;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The order in which {@link Search} assigns reactant atoms, and the similarity used to try the
 * most plausible image first. Neither changes what is optimal; both only change how soon a good
 * incumbent is found and how early bounds bite.
 *
 * <p>Order: carbon-bearing molecules, largest first, each walked breadth-first from the carbon
 * whose environment is rarest on the product side, with the carbons placed before the
 * heteroatoms (so phase 2 can stop at a complete carbon assignment); carbon-free molecules come
 * last. Similarity: how many rounds of Morgan-style environment refinement (Morgan 1965, J Chem
 * Doc 5:107) agree between a reactant and a product atom, highest for the same atom of the same
 * molecule.
 */
final class Ordering {

    private static final int ROUNDS = 6;

    private final SideGraph r;
    private final SideGraph p;
    private final long[][] invR;
    private final long[][] invP;

    Ordering(SideGraph r, SideGraph p) {
        this.r = r;
        this.p = p;
        this.invR = invariants(r);
        this.invP = invariants(p);
    }

    /** Environment invariants per round: element, then neighbour bond codes and invariants. */
    private static long[][] invariants(SideGraph g) {
        long[][] inv = new long[ROUNDS][g.n];
        for (int a = 0; a < g.n; a++) {
            inv[0][a] = g.element[a].hashCode() * 31L + g.nbr[a].length;
        }
        for (int round = 1; round < ROUNDS; round++) {
            for (int a = 0; a < g.n; a++) {
                long[] parts = new long[g.nbr[a].length];
                for (int k = 0; k < parts.length; k++) {
                    parts[k] = inv[round - 1][g.nbr[a][k]] * 7 + g.code[a][k];
                }
                Arrays.sort(parts);
                long h = inv[round - 1][a];
                for (long part : parts) {
                    h = h * 1_000_003L + part;
                }
                inv[round][a] = h;
            }
        }
        return inv;
    }

    /** 0..ROUNDS for matching environments, 10 for the same atom class of the same molecule. */
    int similarity(int u, int x) {
        if (r.structure(r.molecule[u]).fingerprint().equals(p.structure(p.molecule[x]).fingerprint())
                && r.structure(r.molecule[u]).graph().orbit(r.local[u])
                == p.structure(p.molecule[x]).graph().orbit(p.local[x])) {
            return 10;
        }
        int s = 0;
        while (s < ROUNDS && invR[s][u] == invP[s][x]) {
            s++;
        }
        return s;
    }

    /**
     * The reactant atoms in search order. With {@code carbonsFirst} every carbon precedes every
     * heteroatom; otherwise only terminal heteroatoms (=O, -OH, ...) wait until the end.
     */
    int[] order(boolean carbonsFirst) {
        Map<Long, Integer> productEnv = new HashMap<>();
        for (int x = 0; x < p.n; x++) {
            productEnv.merge(invP[ROUNDS - 1][x], 1, Integer::sum);
        }
        Map<Long, Integer> reactantEnv = new HashMap<>();
        for (int a = 0; a < r.n; a++) {
            reactantEnv.merge(invR[ROUNDS - 1][a], 1, Integer::sum);
        }
        List<Integer> molecules = new ArrayList<>();
        for (int m = 0; m < r.moleculeCount(); m++) {
            molecules.add(m);
        }
        int[] carbons = new int[r.moleculeCount()];
        int[] size = new int[r.moleculeCount()];
        for (int a = 0; a < r.n; a++) {
            size[r.molecule[a]]++;
            if (r.element[a].equals("C")) {
                carbons[r.molecule[a]]++;
            }
        }
        molecules.sort(Comparator.<Integer>comparingInt(m -> carbons[m] > 0 ? 0 : 1)
                .thenComparingInt(m -> -size[m]).thenComparingInt(m -> m));
        List<Integer> skeleton = new ArrayList<>();
        List<Integer> later = new ArrayList<>();
        List<Integer> carbonFree = new ArrayList<>();
        boolean[] seen = new boolean[r.n];
        for (int m : molecules) {
            int off = r.offset(m);
            int end = off + size[m];
            if (carbons[m] == 0) {
                for (int a = off; a < end; a++) {
                    carbonFree.add(a);
                }
                continue;
            }
            while (true) {
                int root = -1;
                long rootScore = Long.MAX_VALUE;
                for (int a = off; a < end; a++) {
                    if (!seen[a] && r.element[a].equals("C")) {
                        // A good root has an unchanged environment on the product side, with a
                        // partner for every reactant atom that looks the same (so a second copy of
                        // a molecule does not start from a spot the first copy took), and few
                        // such partners.
                        int freq = productEnv.getOrDefault(invR[ROUNDS - 1][a], 0);
                        int need = reactantEnv.get(invR[ROUNDS - 1][a]);
                        long score = (freq < need ? 1_000_000L : freq) * 100 - r.nbr[a].length;
                        if (score < rootScore) {
                            rootScore = score;
                            root = a;
                        }
                    }
                }
                if (root < 0) {
                    break;
                }
                ArrayDeque<Integer> queue = new ArrayDeque<>();
                queue.add(root);
                seen[root] = true;
                while (!queue.isEmpty()) {
                    int a = queue.poll();
                    boolean carbon = r.element[a].equals("C");
                    boolean defer = carbonsFirst ? !carbon : !carbon && r.nbr[a].length <= 1;
                    (defer ? later : skeleton).add(a);
                    for (int b : r.nbr[a]) {
                        if (!seen[b]) {
                            seen[b] = true;
                            queue.add(b);
                        }
                    }
                }
            }
            for (int a = off; a < end; a++) {
                if (!seen[a]) {
                    seen[a] = true;
                    later.add(a);
                }
            }
        }
        List<Integer> all = new ArrayList<>(skeleton);
        all.addAll(later);
        all.addAll(carbonFree);
        return all.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Length of the carbon prefix of {@code order}. */
    int carbonPrefix(int[] order) {
        int k = 0;
        while (k < order.length && r.element[order[k]].equals("C")) {
            k++;
        }
        return k;
    }

    /**
     * For each product atom, the smallest atom of the same molecule that is its twin: same element,
     * same neighbours with the same bond codes, not bonded to it. Swapping twins is an automorphism
     * that moves nothing else.
     */
    static int[] twins(SideGraph g) {
        int[] rep = new int[g.n];
        Map<String, Integer> first = new HashMap<>();
        for (int a = 0; a < g.n; a++) {
            rep[a] = a;
            if (g.nbr[a].length == 0) {
                continue;
            }
            StringBuilder sig = new StringBuilder(g.element[a]).append('|');
            for (int k = 0; k < g.nbr[a].length; k++) {
                sig.append(g.nbr[a][k]).append(':').append(g.code[a][k]).append(',');
            }
            Integer f = first.putIfAbsent(sig.toString(), a);
            if (f != null) {
                rep[a] = f;
            }
        }
        return rep;
    }
}
