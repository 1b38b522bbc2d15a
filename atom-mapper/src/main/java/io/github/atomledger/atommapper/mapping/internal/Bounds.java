package io.github.atomledger.atommapper.mapping.internal;

import io.github.atomledger.atommapper.mapping.MappingOptions;

/**
 * Exact edit costs and admissible lower bounds for {@link Search}.
 *
 * <p>For a partial map the atom pairs fall into three disjoint sets, and each gets a bound that
 * never overestimates:
 * <ul>
 *   <li>both ends mapped: the exact cost, accumulated by {@link #delta};</li>
 *   <li>one end mapped: each unmapped reactant atom must pay for its bonds to mapped atoms that the
 *       cheapest same-element image does not have (break or order change), and each unused product
 *       atom for its bonds to used atoms that no unmapped reactant atom can bring along (formed);
 *       the two halves look at different edits of the same pairs, so they add up;</li>
 *   <li>both ends unmapped: per element pair, the bonds among unmapped reactant atoms and among
 *       unused product atoms are counted by bond code; a surplus on either side must be broken or
 *       formed, and kept bonds beyond the code-by-code overlap must change order.</li>
 * </ul>
 */
final class Bounds {

    private final SideGraph r;
    private final SideGraph p;
    private final int orderWeight;
    private final int[][] pairType;
    private final int[] pairWeight;
    private final int[][] residualR;
    private final int[][] residualP;
    private final int[] mappedNbrR;
    private final int[] usedNbrP;
    private final boolean[] carbonR;
    private final boolean[] carbonP;
    private final int cc;
    private final int other;
    private final int root;

    Bounds(SideGraph r, SideGraph p, MappingOptions options) {
        this.r = r;
        this.p = p;
        this.orderWeight = options.orderChangeWeight();
        this.cc = options.carbonCarbonWeight();
        this.other = options.otherBondWeight();
        int elements = 0;
        for (int e : r.elementId) {
            elements = Math.max(elements, e + 1);
        }
        for (int e : p.elementId) {
            elements = Math.max(elements, e + 1);
        }
        String[] symbol = new String[elements];
        for (int a = 0; a < r.n; a++) {
            symbol[r.elementId[a]] = r.element[a];
        }
        for (int a = 0; a < p.n; a++) {
            symbol[p.elementId[a]] = p.element[a];
        }
        pairType = new int[elements][elements];
        int types = 0;
        for (int i = 0; i < elements; i++) {
            for (int j = i; j < elements; j++) {
                pairType[i][j] = types;
                pairType[j][i] = types;
                types++;
            }
        }
        pairWeight = new int[types];
        for (int i = 0; i < elements; i++) {
            for (int j = i; j < elements; j++) {
                pairWeight[pairType[i][j]] = options.bondWeight(symbol[i], symbol[j]);
            }
        }
        residualR = new int[types][5];
        residualP = new int[types][5];
        count(r, residualR);
        count(p, residualP);
        mappedNbrR = new int[r.n];
        usedNbrP = new int[p.n];
        carbonR = carbons(r);
        carbonP = carbons(p);
        root = unmappedPairs();
    }

    private static boolean[] carbons(SideGraph g) {
        boolean[] c = new boolean[g.n];
        for (int a = 0; a < g.n; a++) {
            c[a] = g.element[a].equals("C");
        }
        return c;
    }

    private void count(SideGraph g, int[][] residual) {
        for (int a = 0; a < g.n; a++) {
            for (int k = 0; k < g.nbr[a].length; k++) {
                int b = g.nbr[a][k];
                if (a < b) {
                    residual[pairType[g.elementId[a]][g.elementId[b]]][g.code[a][k]]++;
                }
            }
        }
    }

    /** The bound at the empty map: a lower bound on every map's cost. */
    int rootBound() {
        return root;
    }

    private int breakWeightR(int a, int b) {
        return carbonR[a] && carbonR[b] ? cc : other;
    }

    private int formWeightP(int x, int y) {
        return carbonP[x] && carbonP[y] ? cc : other;
    }

    /** Exact extra cost of mapping reactant atom u to product atom x, given the current map. */
    int delta(int[] map, int[] inv, int u, int x) {
        int d = 0;
        int[] nb = r.nbr[u];
        int[] cd = r.code[u];
        byte[] bx = p.bond[x];
        for (int k = 0; k < nb.length; k++) {
            int y = map[nb[k]];
            if (y >= 0) {
                int c = bx[y];
                if (c == 0) {
                    d += breakWeightR(u, nb[k]);
                } else if (c != cd[k]) {
                    d += orderWeight;
                }
            }
        }
        byte[] bu = r.bond[u];
        for (int y : p.nbr[x]) {
            int v = inv[y];
            if (v >= 0 && bu[v] == 0) {
                d += formWeightP(x, y);
            }
        }
        return d;
    }

    /** Updates residual counts before u is mapped to x (u and x still free in the arrays). */
    void assign(int[] map, int[] inv, int u, int x) {
        for (int k = 0; k < r.nbr[u].length; k++) {
            int v = r.nbr[u][k];
            mappedNbrR[v]++;
            if (map[v] < 0) {
                residualR[pairType[r.elementId[u]][r.elementId[v]]][r.code[u][k]]--;
            }
        }
        for (int k = 0; k < p.nbr[x].length; k++) {
            int y = p.nbr[x][k];
            usedNbrP[y]++;
            if (inv[y] < 0) {
                residualP[pairType[p.elementId[x]][p.elementId[y]]][p.code[x][k]]--;
            }
        }
    }

    /** Reverses {@link #assign} (u and x already freed in the arrays). */
    void unassign(int[] map, int[] inv, int u, int x) {
        for (int k = 0; k < r.nbr[u].length; k++) {
            int v = r.nbr[u][k];
            mappedNbrR[v]--;
            if (map[v] < 0) {
                residualR[pairType[r.elementId[u]][r.elementId[v]]][r.code[u][k]]++;
            }
        }
        for (int k = 0; k < p.nbr[x].length; k++) {
            int y = p.nbr[x][k];
            usedNbrP[y]--;
            if (inv[y] < 0) {
                residualP[pairType[p.elementId[x]][p.elementId[y]]][p.code[x][k]]++;
            }
        }
    }

    /** Lower bound on the cost of all pairs not yet fully mapped; order[from..] are unmapped. */
    int bound(int[] map, int[] inv, int[] order, int from) {
        int total = unmappedPairs();
        for (int i = from; i < order.length; i++) {
            int u = order[i];
            if (mappedNbrR[u] > 0) {
                total += crossReactant(map, inv, u);
            }
        }
        for (int x = 0; x < p.n; x++) {
            if (inv[x] < 0 && usedNbrP[x] > 0) {
                total += crossProduct(map, inv, x);
            }
        }
        return total;
    }

    private int unmappedPairs() {
        int total = 0;
        for (int t = 0; t < pairWeight.length; t++) {
            int[] a = residualR[t];
            int[] b = residualP[t];
            int sa = a[1] + a[2] + a[3] + a[4];
            int sb = b[1] + b[2] + b[3] + b[4];
            if (sa == 0 && sb == 0) {
                continue;
            }
            int same = Math.min(a[1], b[1]) + Math.min(a[2], b[2]) + Math.min(a[3], b[3]) + Math.min(a[4], b[4]);
            total += pairWeight[t] * Math.abs(sa - sb) + orderWeight * (Math.min(sa, sb) - same);
        }
        return total;
    }

    private int crossReactant(int[] map, int[] inv, int u) {
        int[] nb = r.nbr[u];
        int full = 0;
        for (int v : nb) {
            if (map[v] >= 0) {
                full += breakWeightR(u, v);
            }
        }
        int best = full;
        int e = r.elementId[u];
        for (int v : nb) {
            int y0 = map[v];
            if (y0 < 0) {
                continue;
            }
            for (int x : p.nbr[y0]) {
                if (inv[x] >= 0 || p.elementId[x] != e) {
                    continue;
                }
                int c = 0;
                for (int k = 0; k < nb.length && c < best; k++) {
                    int y = map[nb[k]];
                    if (y >= 0) {
                        int b = p.bond[x][y];
                        c += b == 0 ? breakWeightR(u, nb[k]) : b != r.code[u][k] ? orderWeight : 0;
                    }
                }
                best = Math.min(best, c);
                if (best == 0) {
                    return 0;
                }
            }
        }
        return best;
    }

    private int crossProduct(int[] map, int[] inv, int x) {
        int[] nb = p.nbr[x];
        int full = 0;
        for (int y : nb) {
            if (inv[y] >= 0) {
                full += formWeightP(x, y);
            }
        }
        int best = full;
        int e = p.elementId[x];
        for (int y0 : nb) {
            int v0 = inv[y0];
            if (v0 < 0) {
                continue;
            }
            for (int u : r.nbr[v0]) {
                if (map[u] >= 0 || r.elementId[u] != e) {
                    continue;
                }
                int c = 0;
                for (int k = 0; k < nb.length && c < best; k++) {
                    int v = inv[nb[k]];
                    if (v >= 0 && r.bond[u][v] == 0) {
                        c += formWeightP(x, nb[k]);
                    }
                }
                best = Math.min(best, c);
                if (best == 0) {
                    return 0;
                }
            }
        }
        return best;
    }
}
